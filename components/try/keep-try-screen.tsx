import { useQueryClient } from '@tanstack/react-query';
import { useRouter } from 'expo-router';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { apiFetch, isApiError } from '@/components/api/client';
import { FieldGrid } from '@/components/forms/field-grid';
import { lengthTextToMm, quantityTextToStored, textToNumber } from '@/components/forms/form-numbers';
import { clearTryCarry, loadTryCarry } from '@/components/try/try-carry';
import type { TryFormText } from '@/components/try/try-form-values';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { FormChoice } from '@/components/ui/form-choice';
import { FormField } from '@/components/ui/form-field';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';
import { Text } from '@/components/ui/text';
import { space } from '@/components/theme';
import { bowInputSchema } from '@/shared/bow';
import { buildInputSchema } from '@/shared/build';
import { sightInInputSchema } from '@/shared/sight-in';

/** What the new account still has to tell: the bow's and the arrow's essentials the try page did not ask for. */
type KeepText = {
  nickname: string;
  hand: 'right' | 'left';
  drawWeightLb: string;
  drawLength: string;
  sightRadius: string;
  peepHeight: string;
  buildName: string;
  grainsPerInch: string;
  cutLength: string;
  diameter: string;
  pointGr: string;
  speedFps: string;
  date: string;
  placeLabel: string;
};

const handOptions = [
  { value: 'right', label: 'Right' },
  { value: 'left', label: 'Left' },
] as const;

const today = () => new Date().toISOString().slice(0, 10);

/** Field of the form a schema path belongs to, for each of the three records. */
const bowField: Record<string, keyof KeepText> = {
  nickname: 'nickname',
  hand: 'hand',
  drawWeightLb: 'drawWeightLb',
  drawLengthMm: 'drawLength',
  sightRadiusMm: 'sightRadius',
  peepHeightMm: 'peepHeight',
};
const buildField: Record<string, keyof KeepText> = {
  name: 'buildName',
  grainsPerInch: 'grainsPerInch',
  cutLengthMm: 'cutLength',
  diameterMm: 'diameter',
  pointGr: 'pointGr',
  speedFps: 'speedFps',
};
const sightInField: Record<string, keyof KeepText> = { date: 'date', placeLabel: 'placeLabel' };

/**
 * After signing up from the try page: the bow and the two marks typed there
 * become the account's first bow, arrow build and sight-in. The try page never
 * asked for the draw, the hand or the arrow's parts, so those are asked here,
 * with everything typed before filled in. Every field is checked first; then
 * the bow, the build and the sight-in are saved in turn (shown as it goes),
 * and if a later one is refused the bow is removed again: nothing half-saved.
 * Example: route /keep-try
 */
export function KeepTryScreen() {
  const [carried] = useState(loadTryCarry);
  if (!carried) {
    return (
      <Screen>
        <ScreenTitle name="Keep the tape you tried" />
        <EmptyState
          title="Nothing to carry over"
          message="This browser holds nothing typed on the try page (or it was saved already). Add a bow from the Bench."
          action={<Button label="To the Bench" href="/" />}
        />
      </Screen>
    );
  }
  return <KeepTryForm carried={carried} />;
}

function KeepTryForm({ carried }: { carried: TryFormText }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [step, setStep] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const unit = carried.lengthUnit;
  const distance = carried.distanceUnit;
  const { control, handleSubmit, setError } = useForm<KeepText>({
    defaultValues: {
      nickname: 'My bow',
      hand: 'right',
      drawWeightLb: '',
      drawLength: '',
      sightRadius: carried.sightRadius,
      peepHeight: carried.peepHeight,
      buildName: 'My arrows',
      grainsPerInch: '',
      cutLength: '',
      diameter: carried.diameter,
      pointGr: '',
      speedFps: carried.speedFps,
      date: today(),
      placeLabel: '',
    },
  });
  const marks = [
    {
      distance: textToNumber(carried.nearDistance) as number,
      unit: distance,
      scaleMm: textToNumber(carried.nearReading) as number,
      arrowsShot: null,
      note: '',
    },
    {
      distance: textToNumber(carried.farDistance) as number,
      unit: distance,
      scaleMm: textToNumber(carried.farReading) as number,
      arrowsShot: null,
      note: '',
    },
  ];

  const save = handleSubmit(async (text) => {
    setProblem(null);
    const bow = bowInputSchema.safeParse({
      nickname: text.nickname,
      hand: text.hand,
      drawWeightLb: textToNumber(text.drawWeightLb),
      drawLengthMm: lengthTextToMm(text.drawLength, unit),
      sightDescription: '',
      sightKind: 'single-pin-slider',
      sightRadiusMm: lengthTextToMm(text.sightRadius, unit),
      peepHeightMm: lengthTextToMm(text.peepHeight, unit),
      // As on the try page: mm, grains and fps unless a unit was typed after the number (0.5 in, 27 g, 85 m/s).
      tapeWidthMm: quantityTextToStored(carried.tapeWidthMm, 'length', { lengthUnit: 'mm' }),
      notes: '',
    });
    const build = buildInputSchema.safeParse({
      name: text.buildName,
      shaftLabel: '',
      grainsPerInch: textToNumber(text.grainsPerInch),
      cutLengthMm: lengthTextToMm(text.cutLength, unit),
      diameterMm: lengthTextToMm(text.diameter, unit),
      pointGr: quantityTextToStored(text.pointGr, 'mass', { massUnit: 'gr' }),
      speedFps: quantityTextToStored(text.speedFps, 'speed', { speedUnit: 'fps' }) ?? null,
    });
    const sightIn = sightInInputSchema.safeParse({
      buildId: 1,
      date: text.date,
      placeLabel: text.placeLabel,
      notes: 'Carried over from the try page.',
      marks,
    });
    let bad = false;
    for (const [result, fields] of [
      [bow, bowField],
      [build, buildField],
      [sightIn, sightInField],
    ] as const) {
      if (result.success) continue;
      for (const issue of result.error.issues) {
        const field = fields[String(issue.path[0])];
        if (field) setError(field, { message: issue.message });
        else setProblem(issue.message);
        bad = true;
      }
    }
    if (bad || !bow.success || !build.success || !sightIn.success) {
      setProblem((current) => current ?? 'Some fields need another look; nothing was saved.');
      return;
    }

    let bowId: number | null = null;
    try {
      setStep('Saving the bow… (1 of 3)');
      bowId = (await apiFetch<{ bow: { id: number } }>('/api/bows', { method: 'POST', body: bow.data })).bow.id;
      setStep('Saving the arrow build… (2 of 3)');
      const buildId = (await apiFetch<{ build: { id: number } }>(`/api/bows/${bowId}/builds`, { method: 'POST', body: build.data })).build
        .id;
      setStep('Fitting and saving the sight-in… (3 of 3)');
      const saved = await apiFetch<{ sightIn: { id: number } }>(`/api/bows/${bowId}/sight-ins`, {
        method: 'POST',
        body: { ...sightIn.data, buildId },
      });
      clearTryCarry();
      await queryClient.invalidateQueries();
      router.replace(`/sight-ins/${saved.sightIn.id}`);
    } catch (error) {
      // Nothing half-saved: a bow whose build or sight-in was refused goes again.
      if (bowId !== null) await apiFetch(`/api/bows/${bowId}`, { method: 'DELETE' }).catch(() => undefined);
      setProblem(isApiError(error) ? `${error.message} Nothing was saved.` : 'The bow could not be saved. Nothing was saved; try again.');
    } finally {
      setStep(null);
    }
  });

  return (
    <Screen testID="keep-try-screen">
      <ScreenTitle name="Keep the tape you tried" />
      <SectionHeading
        level={1}
        title="Keep the tape you tried"
        description={`Your two marks (${carried.nearDistance} ${distance} at ${carried.nearReading} mm, ${carried.farDistance} ${distance} at ${carried.farReading} mm) become your first bow's first sight-in. A few things the try page did not ask are needed for the bow and the arrow.`}
      />
      <Card>
        <SectionHeading title="The bow" level={2} />
        <FieldGrid minWidth={150}>
          <FormField control={control} name="nickname" label="Nickname" autoCapitalize="sentences" testID="keep-nickname" />
          <FormChoice control={control} name="hand" label="Hand" options={handOptions} />
          <FormField control={control} name="drawWeightLb" label="Draw weight" unit="lb" numeric testID="keep-draw-weight" />
          <FormField control={control} name="drawLength" label="Draw length" unit={unit} numeric testID="keep-draw-length" />
          <FormField control={control} name="sightRadius" label="Sight radius" unit={unit} numeric testID="keep-sight-radius" />
          <FormField control={control} name="peepHeight" label="Peep height" unit={unit} numeric testID="keep-peep-height" />
        </FieldGrid>
      </Card>
      <Card>
        <SectionHeading
          title="The arrow"
          level={2}
          description="The fit needs its weight and diameter; you can add the insert, nock and vanes later."
        />
        <FieldGrid minWidth={150}>
          <FormField control={control} name="buildName" label="Build name" autoCapitalize="sentences" testID="keep-build-name" />
          <FormField control={control} name="grainsPerInch" label="Grains per inch" unit="gpi" numeric testID="keep-gpi" />
          <FormField control={control} name="cutLength" label="Cut length" unit={unit} numeric testID="keep-cut-length" />
          <FormField control={control} name="diameter" label="Shaft diameter" unit={unit} numeric testID="keep-diameter" />
          <FormField control={control} name="pointGr" label="Point weight" unit="gr" numeric testID="keep-point" />
          <FormField control={control} name="speedFps" label="Chronographed speed" hint="Optional" unit="fps" numeric />
        </FieldGrid>
      </Card>
      <Card>
        <SectionHeading title="The sight-in" level={2} />
        <FieldGrid minWidth={150}>
          <FormField control={control} name="date" label="Date shot" hint="YYYY-MM-DD" testID="keep-date" />
          <FormField control={control} name="placeLabel" label="Place" hint="Optional" autoCapitalize="sentences" />
        </FieldGrid>
      </Card>
      {problem ? (
        <Banner tone="error" title="Not saved" testID="keep-problem">
          {problem}
        </Banner>
      ) : null}
      {step ? (
        <Text tone="soft" testID="keep-progress" aria-live="polite">
          {step}
        </Text>
      ) : null}
      <View style={styles.actions}>
        <Button label="Save as my first bow" pendingLabel="Saving…" pending={step !== null} onPress={save} testID="keep-save" />
        <Button
          label="Not now"
          variant="quiet"
          onPress={() => {
            clearTryCarry();
            router.replace('/');
          }}
        />
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
