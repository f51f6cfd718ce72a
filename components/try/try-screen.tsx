import { useRouter } from 'expo-router';
import { useMemo, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { FieldGrid } from '@/components/forms/field-grid';
import { quantityTextToStored, textToNumber } from '@/components/forms/form-numbers';
import { textFormResolver } from '@/components/forms/text-form-resolver';
import { TRY_SHEET_STORAGE_KEY } from '@/components/print/try-sheet';
import { FitWarnings } from '@/components/sight-ins/fit-warnings';
import type { LiveFit } from '@/components/sight-ins/live-fit';
import { PredictedMarks } from '@/components/sight-ins/predicted-marks';
import { VisitorBar } from '@/components/shell/visitor-bar';
import { TAPE_VIEW_CAUTION } from '@/components/tapes/tape-form-values';
import { TapePreview } from '@/components/tapes/tape-preview';
import { savePostedFile } from '@/components/try/save-posted-file';
import { saveTryCarry } from '@/components/try/try-carry';
import { ASSUMED_ARROW, tryFieldOf, tryFitInput, tryFormDefaults, tryFormSchema, type TryFormText } from '@/components/try/try-form-values';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { FormChoice } from '@/components/ui/form-choice';
import { FormField } from '@/components/ui/form-field';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';
import { Text } from '@/components/ui/text';
import { useWide } from '@/components/ui/use-wide';
import { colors, space } from '@/components/theme';
import { attemptSightFit } from '@/math/fit/fit-sight';
import { isFitInputError } from '@/math/fit/fit-input-error';
import { tapeLayout, type TapeLayout } from '@/math/tape/tape-layout';
import type { SheetInput } from '@/shared/fit';

const lengthOptions = [
  { value: 'mm', label: 'mm' },
  { value: 'in', label: 'inches' },
] as const;
const distanceOptions = [
  { value: 'yd', label: 'Yards' },
  { value: 'm', label: 'Metres' },
] as const;
const paperOptions = [
  { value: 'letter', label: 'Letter' },
  { value: 'a4', label: 'A4' },
] as const;

type Outcome = { live: LiveFit; tape: TapeLayout | null; tapeProblem: string | null };

/** The live fit and tape for what is typed so far (pure). */
function outcomeOf(text: TryFormText): Outcome {
  const required = [text.sightRadius, text.peepHeight, text.nearDistance, text.nearReading, text.farDistance, text.farReading];
  const input = tryFitInput(text);
  const marks = input.marks.map((mark, row) => ({ row, distance: mark.distance, scaleMm: mark.markMm }));
  if (required.some((value) => value.trim() === '')) {
    return {
      live: { state: 'waiting', message: 'Enter the sight radius, the peep height and both readings to see your tape.', marks: [] },
      tape: null,
      tapeProblem: null,
    };
  }
  // Predicted marks, and so the "confirm at" warnings, only for distances on the tape (every 10, and its ends).
  const from = textToNumber(text.tapeFrom);
  const to = textToNumber(text.tapeTo);
  if (from !== undefined && to !== undefined && Number.isFinite(from) && Number.isFinite(to) && to > from) {
    const tens = [];
    for (let d = Math.ceil(from / 10) * 10; d <= to; d += 10) tens.push(d);
    input.predict = [...new Set([from, ...tens, to])].sort((a, b) => a - b);
  }
  const attempt = attemptSightFit(input);
  if (!attempt.ok)
    return { live: { state: 'refused', message: attempt.error.message, field: attempt.error.field, marks }, tape: null, tapeProblem: null };
  try {
    const tape = tapeLayout(attempt.fit.model, {
      from: textToNumber(text.tapeFrom),
      to: textToNumber(text.tapeTo),
      widthMm: quantityTextToStored(text.tapeWidthMm, 'length', { lengthUnit: 'mm' }),
      step: 1,
    });
    return { live: { state: 'fit', fit: attempt.fit, marks, sign: 1 }, tape, tapeProblem: null };
  } catch (error) {
    if (!isFitInputError(error)) throw error;
    return { live: { state: 'fit', fit: attempt.fit, marks, sign: 1 }, tape: null, tapeProblem: error.detail };
  }
}

/**
 * One label each for the two readings: "Reading at 20 yd" and "Reading at 60 yd"
 * from the distances typed, or "Short-distance reading" / "Long-distance reading"
 * while a distance is missing or both are the same.
 */
function readingLabelsOf(text: TryFormText): { near: string; far: string } {
  const near = text.nearDistance.trim();
  const far = text.farDistance.trim();
  const usable = (value: string) => value !== '' && Number.isFinite(Number(value.replace(',', '.')));
  if (usable(near) && usable(far) && near !== far)
    return { near: `Reading at ${near} ${text.distanceUnit}`, far: `Reading at ${far} ${text.distanceUnit}` };
  return { near: 'Short-distance reading', far: 'Long-distance reading' };
}

/** The tape-only request for /api/try/tape.svg (no paper or labels: that route's schema is strict). */
function tapeRequest(sheet: SheetInput) {
  return { distanceUnit: sheet.distanceUnit, sight: sheet.sight, arrow: sheet.arrow, marks: sheet.marks, tape: sheet.tape };
}

/**
 * Try it, without an account: two sighted marks and the sight's measurements
 * give a fitted tape, previewed as it is typed (math core in the browser),
 * printed and downloaded through /api/try/*. Nothing is stored; a prompt
 * offers an account to keep it.
 * Example: route /try
 */
export function TryScreen() {
  const router = useRouter();
  const wide = useWide();
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState<'svg' | 'pdf' | null>(null);
  const resolver = useMemo(() => textFormResolver<TryFormText, SheetInput>(tryFormSchema, { mapPath: tryFieldOf }), []);
  const { control, handleSubmit } = useForm<TryFormText, unknown, SheetInput>({ resolver, defaultValues: tryFormDefaults });
  const text = useWatch({ control }) as TryFormText;
  const key = JSON.stringify(text);
  const outcome = useMemo(() => outcomeOf(JSON.parse(key) as TryFormText), [key]);
  const unit = text.lengthUnit;
  const distance = text.distanceUnit;
  const readingLabels = readingLabelsOf(text);

  const print = handleSubmit(
    (sheet) => {
      setProblem(null);
      if (typeof sessionStorage !== 'undefined') sessionStorage.setItem(TRY_SHEET_STORAGE_KEY, JSON.stringify(sheet));
      router.push(`/print/sheet?source=try&paper=${sheet.paper}`);
    },
    () => setProblem('Some fields need another look.'),
  );
  const download = (kind: 'svg' | 'pdf') =>
    handleSubmit(
      async (sheet) => {
        setProblem(null);
        setBusy(kind);
        try {
          if (kind === 'svg') await savePostedFile('/api/try/tape.svg', tapeRequest(sheet), 'pinwright-tape.svg');
          else await savePostedFile('/api/try/sheet.pdf', sheet, 'pinwright-sheet.pdf');
        } catch (error) {
          setProblem(error instanceof Error ? error.message : 'The file could not be made.');
        } finally {
          setBusy(null);
        }
      },
      () => setProblem('Some fields need another look.'),
    )();

  const form = (
    <View style={[styles.column, wide && styles.columnWide]}>
      <Card style={styles.section}>
        <SectionHeading title="Your sight" />
        <FieldGrid minWidth={200}>
          <FormChoice control={control} name="lengthUnit" label="Lengths in" options={lengthOptions} />
          <FormChoice control={control} name="distanceUnit" label="Distances in" options={distanceOptions} />
        </FieldGrid>
        <FieldGrid>
          <FormField
            control={control}
            name="sightRadius"
            label="Sight radius"
            hint="At full draw, peep centre to pin, along the arrow."
            unit={unit}
            numeric
            testID="try-sight-radius"
          />
          <FormField
            control={control}
            name="peepHeight"
            label="Peep height"
            hint="Peep centre to the nocked arrow's centre, along the string, at rest."
            unit={unit}
            numeric
            testID="try-peep-height"
          />
        </FieldGrid>
      </Card>

      <Card style={styles.section}>
        <SectionHeading
          title="Two marks"
          description="A short and a long distance you have sighted in; readings from the sight's scale in mm."
        />
        <FieldGrid minWidth={140}>
          <FormField control={control} name="nearDistance" label="Short distance" unit={distance} numeric testID="try-near-distance" />
          <FormField control={control} name="nearReading" label={readingLabels.near} unit="mm" numeric testID="try-near-reading" />
        </FieldGrid>
        <FieldGrid minWidth={140}>
          <FormField control={control} name="farDistance" label="Long distance" unit={distance} numeric testID="try-far-distance" />
          <FormField control={control} name="farReading" label={readingLabels.far} unit="mm" numeric testID="try-far-reading" />
        </FieldGrid>
      </Card>

      <Card style={styles.section}>
        <SectionHeading
          title="The arrow (optional)"
          description={`Left empty, a ${ASSUMED_ARROW.massGr} gr arrow on a ${ASSUMED_ARROW.diameterMm} mm shaft is assumed; it changes the long-range marks a little.`}
        />
        <FieldGrid minWidth={140}>
          <FormField control={control} name="arrowGr" label="Weight" hint="Or type grams: 27 g" unit="gr" numeric />
          <FormField control={control} name="diameter" label="Diameter" unit={unit} numeric />
          <FormField control={control} name="speedFps" label="Speed" hint="Chronographed; or type 85 m/s" unit="fps" numeric />
        </FieldGrid>
      </Card>
    </View>
  );

  const result = (
    <View style={[styles.column, wide && styles.columnWide]}>
      <Card style={styles.section} testID="try-result">
        <SectionHeading title="Your tape" />
        {outcome.live.state === 'waiting' ? <Text tone="soft">{outcome.live.message}</Text> : null}
        <FitWarnings live={outcome.live} />
        {outcome.tape ? <TapePreview layout={outcome.tape} zoom={6} /> : null}
        {outcome.tapeProblem ? <Banner tone="warn" title="This tape cannot be drawn">{`${outcome.tapeProblem}.`}</Banner> : null}
        <FieldGrid minWidth={110}>
          <FormField control={control} name="tapeFrom" label="From" unit={distance} numeric />
          <FormField control={control} name="tapeTo" label="To" unit={distance} numeric />
          <FormField control={control} name="tapeWidthMm" label="Width" unit="mm" numeric />
        </FieldGrid>
        <FormChoice control={control} name="paper" label="Paper" options={paperOptions} />
        <Banner tone="caution">{TAPE_VIEW_CAUTION}</Banner>
        {problem ? (
          <Banner tone="error" title="Not yet" testID="try-problem">
            {problem}
          </Banner>
        ) : null}
        <View style={styles.actions}>
          <Button label="Print" onPress={print} disabled={!outcome.tape} testID="try-print" />
          <Button
            label="Download SVG"
            variant="secondary"
            onPress={() => download('svg')}
            pending={busy === 'svg'}
            disabled={!outcome.tape}
          />
          <Button
            label="Download PDF"
            variant="secondary"
            onPress={() => download('pdf')}
            pending={busy === 'pdf'}
            disabled={!outcome.tape}
          />
        </View>
      </Card>
      {outcome.live.state === 'fit' ? (
        <Card style={styles.section}>
          <SectionHeading title="Predicted marks" />
          <PredictedMarks fit={outcome.live.fit} sign={1} marks={outcome.live.marks} />
        </Card>
      ) : null}
      <Banner
        tone="info"
        title="Keep it"
        action={
          <Button
            label="Create an account"
            variant="secondary"
            testID="try-keep"
            onPress={() => {
              saveTryCarry(text);
              router.push('/sign-up');
            }}
          />
        }
      >
        Nothing here is sent or saved. Make an account and what you typed here becomes your first bow and sight-in; then you keep every
        sight-in and its tape, refit as you add marks, and check the sight level.
      </Banner>
    </View>
  );

  return (
    <View style={styles.root}>
      <ScreenTitle name="Try a tape" />
      <VisitorBar />
      <Screen>
        <SectionHeading
          level={1}
          title="Try a tape"
          description="Two marks are enough to print a sight tape for every distance. No account needed."
        />
        {wide ? (
          <View style={styles.split}>
            {form}
            {result}
          </View>
        ) : (
          <>
            {form}
            {result}
          </>
        )}
      </Screen>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1, backgroundColor: colors.paper },
  split: { flexDirection: 'row', gap: space.xl, alignItems: 'flex-start' },
  // Stacked on a phone each column takes only its own height (flex 1 there stretched the form into a blank gap).
  column: { gap: space.xl },
  columnWide: { flex: 1, minWidth: 0 },
  section: { gap: space.lg },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
