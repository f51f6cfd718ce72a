import { useMemo, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { FieldGrid } from '@/components/forms/field-grid';
import { applyFieldErrors, flatFieldPath } from '@/components/forms/server-field-errors';
import { textFormResolver } from '@/components/forms/text-form-resolver';
import { useSaveTape } from '@/components/tapes/api';
import { PinGaps } from '@/components/tapes/pin-gaps';
import {
  TAPE_VIEW_CAUTION,
  layoutQuery,
  tapeFormDefaults,
  tapeFormFields,
  tapeFormSchema,
  type TapeFormText,
} from '@/components/tapes/tape-form-values';
import { TapePreview } from '@/components/tapes/tape-preview';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { DownloadLink } from '@/components/ui/download-link';
import { SendTapeForm } from '@/components/import-export/send-tape-form';
import { FormChoice } from '@/components/ui/form-choice';
import { FormField } from '@/components/ui/form-field';
import { SectionHeading } from '@/components/ui/section-heading';
import { Text } from '@/components/ui/text';
import { useWide } from '@/components/ui/use-wide';
import { space } from '@/components/theme';
import { isFitInputError } from '@/math/fit/fit-input-error';
import type { SightModel } from '@/math/flight/sight-model';
import { tapeLayout, type TapeLayout as MathTapeLayout } from '@/math/tape/tape-layout';
import type { DistanceUnit, LengthUnit } from '@/shared/auth';
import type { BowDetail } from '@/shared/bow-detail';
import type { SightIn } from '@/shared/sight-in';
import { scaleSignOf } from '@/shared/sight-in-fit';
import { tapeOptionsOf, type Tape, type TapeLayout } from '@/shared/tape';

export interface TapeEditorProps {
  bow: BowDetail;
  sightIn: SightIn;
  /** A saved layout to start from (and to update on save). */
  tape?: Tape;
  lengthUnit: LengthUnit;
  distanceUnit: DistanceUnit;
  /**
   * The viewer may add but not change saved layouts (a technician on a shared
   * bow, see useBowRole): saving always stores a new layout. Default false.
   */
  addOnly?: boolean;
}

const stepOptions = [
  { value: '1', label: '1' },
  { value: '5', label: '5' },
] as const;
const unitOptions = [
  { value: 'yd', label: 'Yards' },
  { value: 'm', label: 'Metres' },
] as const;
const orientationOptions = [
  { value: 'down', label: 'Numbers grow down' },
  { value: 'up', label: 'Numbers grow up' },
] as const;
const mirrorOptions = [
  { value: 'no', label: 'Ticks on the left' },
  { value: 'yes', label: 'Mirrored' },
] as const;
const paperOptions = [
  { value: 'letter', label: 'Letter' },
  { value: 'a4', label: 'A4' },
] as const;

type Preview = { ok: true; layout: TapeLayout; drawn: MathTapeLayout } | { ok: false; message: string };

/** The tape drawn by the math core for the options as typed, or why it cannot be. */
function previewOf(text: TapeFormText, lengthUnit: LengthUnit, model: SightModel): Preview {
  const parsed = tapeFormSchema(lengthUnit).safeParse(text);
  if (!parsed.success) return { ok: false, message: parsed.error.issues[0]?.message ?? 'Check the options.' };
  try {
    return { ok: true, layout: parsed.data, drawn: tapeLayout(model, tapeOptionsOf(parsed.data)) };
  } catch (error) {
    if (isFitInputError(error)) return { ok: false, message: error.detail };
    throw error;
  }
}

/**
 * A sight-in's tape: the options, a preview drawn from the math core's tape
 * geometry, and the ways out: save the layout, print the sheet at true size,
 * download the SVG or the PDF. Sights with fixed pins also get the pin gaps.
 * Example: `<TapeEditor bow={bow} sight-in={sight-in} lengthUnit="mm" distanceUnit="yd" />`
 */
export function TapeEditor({ bow, sightIn, tape, lengthUnit, distanceUnit, addOnly = false }: TapeEditorProps) {
  const wide = useWide();
  const save = useSaveTape();
  const [general, setGeneral] = useState<string | null>(null);
  // The saved layout this editor updates: the one it opened with, or the one it created.
  const [savedId, setSavedId] = useState<number | undefined>(tape?.id);
  const fit = sightIn.fit;
  const model = fit.model;
  const sign = scaleSignOf(fit.scaleDirection);
  const resolver = useMemo(
    () => textFormResolver<TapeFormText, TapeLayout>(tapeFormSchema(lengthUnit), { inches: lengthUnit === 'in' }),
    [lengthUnit],
  );
  const { control, handleSubmit, setError, formState, reset } = useForm<TapeFormText, unknown, TapeLayout>({
    resolver,
    defaultValues: tapeFormDefaults(tape, fit, bow.tapeWidthMm, lengthUnit, distanceUnit),
  });
  const text = useWatch({ control }) as TapeFormText;
  const key = JSON.stringify(text);
  const preview = useMemo(() => previewOf(JSON.parse(key) as TapeFormText, lengthUnit, model), [key, lengthUnit, model]);
  const query = preview.ok ? layoutQuery(preview.layout) : null;
  const hasPins = bow.sightKind !== 'single-pin-slider' && bow.pinDistances.length > 0;

  const submit = handleSubmit(
    (input) => {
      setGeneral(null);
      save.mutate(
        { id: addOnly ? undefined : savedId, sightInId: sightIn.id, input },
        {
          onSuccess: (saved) => {
            setSavedId(saved.id);
            reset(tapeFormDefaults(saved, fit, bow.tapeWidthMm, lengthUnit, distanceUnit));
          },
          onError: (error) => setGeneral(applyFieldErrors(error, flatFieldPath(tapeFormFields), setError)),
        },
      );
    },
    () => setGeneral('Some options need another look; nothing was saved.'),
  );

  const options = (
    <Card style={styles.section}>
      <SectionHeading title="Options" />
      <FieldGrid minWidth={130}>
        <FormField control={control} name="fromDistance" label="From" unit={text.unit} numeric testID="tape-from" />
        <FormField control={control} name="toDistance" label="To" unit={text.unit} numeric testID="tape-to" />
        <FormField control={control} name="widthMm" label="Width" unit={lengthUnit} numeric testID="tape-width" />
      </FieldGrid>
      <FieldGrid minWidth={200}>
        <FormChoice control={control} name="unit" label="Distances in" options={unitOptions} />
        <FormChoice control={control} name="step" label="Tick every" options={stepOptions} />
      </FieldGrid>
      <FormChoice control={control} name="orientation" label="Orientation" options={orientationOptions} />
      <FormChoice
        control={control}
        name="mirror"
        label="Tick side"
        hint="Mirrored puts the ticks on the right, for a pointer on the right of the tape."
        options={mirrorOptions}
      />
      <FieldGrid minWidth={200}>
        <FormChoice control={control} name="paper" label="Paper" options={paperOptions} />
        <FormField control={control} name="label" label="Label" hint="Optional, printed on the sheet" />
      </FieldGrid>
    </Card>
  );

  const drawn = (
    <Card style={styles.section} testID="tape-drawn">
      <SectionHeading title="Preview" description="The same geometry as the printed tape." />
      {preview.ok ? (
        <TapePreview layout={preview.drawn} />
      ) : (
        <Banner tone="warn" title="This tape cannot be drawn" testID="tape-problem">
          {preview.message.endsWith('.') ? preview.message : `${preview.message}.`}
        </Banner>
      )}
    </Card>
  );

  const actions = (
    <View style={styles.actions}>
      <Button
        label={savedId ? (addOnly ? 'Save as a new layout' : 'Save the layout') : 'Save this layout'}
        pendingLabel="Saving…"
        pending={save.isPending}
        disabled={!preview.ok || (savedId !== undefined && !formState.isDirty)}
        onPress={submit}
        testID="tape-save"
      />
      <Button
        label="Print"
        variant="secondary"
        disabled={!query}
        href={query ? `/print/sheet?sight-in=${sightIn.id}&${query}` : undefined}
        testID="tape-print"
      />
      {query ? (
        <>
          <DownloadLink label="Download SVG" href={`/api/sight-ins/${sightIn.id}/tape.svg?${query}`} testID="download-svg" />
          <DownloadLink label="Download PDF" href={`/api/sight-ins/${sightIn.id}/sheet.pdf?${query}`} testID="download-pdf" />
        </>
      ) : null}
      <SendTapeForm sightInId={sightIn.id} layoutQuery={query} />
    </View>
  );

  return (
    <View style={styles.editor}>
      {fit.method === 'one-mark' ? (
        <Banner tone="warn" title="Estimate from one mark: not a sighted tape" testID="tape-one-mark">
          {oneMarkWords(fit)}
        </Banner>
      ) : null}
      <Banner tone="caution" testID="tape-caution">
        {TAPE_VIEW_CAUTION}
      </Banner>
      {general ? (
        <Banner tone="error" title="Could not save the layout" testID="tape-error">
          {general}
        </Banner>
      ) : null}
      {save.isSuccess && !formState.isDirty ? <Text tone="verified">Layout saved.</Text> : null}
      {hasPins ? (
        <Card style={styles.section}>
          <SectionHeading
            title="Pin gaps"
            description="Where each fixed pin goes: set the first pin at its distance, then space the others by these gaps."
          />
          <PinGaps model={model} pinDistances={bow.pinDistances} pinUnit={bow.pinDistanceUnit} sign={sign} />
        </Card>
      ) : null}
      {wide ? (
        <View style={styles.split}>
          <View style={styles.main}>
            {options}
            {actions}
          </View>
          <View style={styles.side}>{drawn}</View>
        </View>
      ) : (
        <>
          {drawn}
          {options}
          {actions}
        </>
      )}
    </View>
  );
}

/**
 * What a one-mark tape is, in words: the sighted distance, the band where it
 * matters most, and the distance to shoot next (from the stored fit).
 * Example: oneMarkWords(fit) → 'Only 20 yd is sighted; every other tick comes from the chronographed speed and is uncertain by up to ±2.5 mm (100 yd). Shoot 90 yd next, save the sight-in and print again.'
 */
export function oneMarkWords(fit: SightIn['fit']): string {
  const unit = fit.distanceUnit;
  const sighted = fit.residuals[0]?.distance;
  const widest = fit.marks.reduce<(typeof fit.marks)[number] | null>(
    (a, b) => (b.sigmaMm !== null && (!a || (a.sigmaMm ?? 0) < b.sigmaMm) ? b : a),
    null,
  );
  return [
    sighted !== undefined ? `Only ${sighted} ${unit} is sighted;` : 'One mark is sighted;',
    `every other tick comes from the chronographed speed${widest?.sigmaMm ? ` and is uncertain by up to ±${widest.sigmaMm.toFixed(1)} mm (${widest.distance} ${unit})` : ''}.`,
    fit.nextDistance !== null
      ? `Shoot ${fit.nextDistance} ${unit} next, save the sight-in and print again.`
      : 'Shoot another distance, save the sight-in and print again.',
    'The printed tape says ESTIMATE FROM ONE MARK along its edge.',
  ].join(' ');
}

const styles = StyleSheet.create({
  editor: { gap: space.xl },
  section: { gap: space.lg },
  split: { flexDirection: 'row', gap: space.xl, alignItems: 'flex-start' },
  main: { flex: 1, minWidth: 0, gap: space.xl },
  side: { flexBasis: 320, flexShrink: 0 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
