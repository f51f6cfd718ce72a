import { useMemo, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { useUnits } from '@/components/account/use-units';
import { useMe } from '@/components/auth/api';
import { useBow } from '@/components/bows/api';
import { FieldGrid } from '@/components/forms/field-grid';
import { applyFieldErrors, flatFieldPath } from '@/components/forms/server-field-errors';
import { textFormResolver } from '@/components/forms/text-form-resolver';
import { buildFormDefaults, buildFormFields, buildFormSchema, type BuildFormText } from '@/components/builds/build-form-values';
import { buildLine } from '@/components/builds/build-words';
import { liveQuantities } from '@/components/builds/live-quantities';
import { formatFixed } from '@/components/compare/format';
import { predictedTapeHref, usePredict } from '@/components/predict/api';
import { PredictResult } from '@/components/predict/predict-result';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ErrorView } from '@/components/ui/error-view';
import { FormField } from '@/components/ui/form-field';
import { LoadingView } from '@/components/ui/loading-view';
import { NotFoundScreen } from '@/components/ui/not-found-screen';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';
import { SegmentedControl } from '@/components/ui/segmented-control';
import { Text } from '@/components/ui/text';
import { useWide } from '@/components/ui/use-wide';
import { space } from '@/components/theme';
import type { LengthUnit } from '@/shared/auth';
import { formatQuantity, shownUnit, type UnitsLike } from '@/shared/units';
import type { BowDetail } from '@/shared/bow-detail';
import type { BuildInput } from '@/shared/build';
import { sightInName, sightInNameParts } from '@/shared/sight-in-name';

/** The form's text for a new build started from `build`: its parts, a new name, no speed (that is what we predict). */
function startingText(build: BowDetail['builds'][number] | undefined, units: UnitsLike): BuildFormText {
  const text = buildFormDefaults(build, units);
  return { ...text, name: build ? `${build.name}, changed` : 'New build', speedFps: '' };
}

/**
 * Predict a build not shot yet on a bow: start from one of its builds, change
 * the parts (a heavier point, another shaft), choose the sight-in whose sight
 * carries it, and see its speed from the bow's chronographed builds and its
 * predicted marks and tape, all marked as predicted, not sighted.
 * Example: `<PredictScreen bowId={3} startFromBuildId={5} />`
 */
export function PredictScreen({ bowId, startFromBuildId }: { bowId: number; startFromBuildId?: number }) {
  const me = useMe();
  const bow = useBow(bowId);
  if (!Number.isInteger(bowId) || bowId <= 0) return <NotFoundScreen />;
  if (bow.isError) {
    return (
      <>
        <ScreenTitle name="Predict a build" />
        <ErrorView title="The bow could not be loaded" error={bow.error} onRetry={() => bow.refetch()} retrying={bow.isFetching} />
      </>
    );
  }
  if (bow.isPending || !me.data) {
    return (
      <>
        <ScreenTitle name="Predict a build" />
        <LoadingView label="Loading the bow…" />
      </>
    );
  }
  return <PredictBody bow={bow.data} unit={me.data.lengthUnit} startFromBuildId={startFromBuildId} />;
}

function PredictBody({ bow, unit, startFromBuildId }: { bow: BowDetail; unit: LengthUnit; startFromBuildId?: number }) {
  const wide = useWide();
  const predict = usePredict();
  const [general, setGeneral] = useState<string | null>(null);
  const firstBuild = bow.builds.find((build) => build.id === startFromBuildId) ?? bow.builds[0];
  const [startFrom, setStartFrom] = useState<string>(firstBuild ? String(firstBuild.id) : 'blank');
  const [sightInId, setSightInId] = useState<string>(bow.sightIns[0] ? String(bow.sightIns[0].id) : '');
  const [sent, setSent] = useState<BuildInput | null>(null);
  // Lengths in the screen's unit and masses in the account's (gr or g), as in the build form; stored in mm and grains.
  const me = useUnits();
  const massUnit = me?.massUnit;
  const units = useMemo<UnitsLike>(() => ({ lengthUnit: unit, massUnit }), [unit, massUnit]);
  const mass = shownUnit('mass', units);
  const resolver = useMemo(() => textFormResolver<BuildFormText, BuildInput>(buildFormSchema(units), { units }), [units]);
  const { control, handleSubmit, setError, reset } = useForm<BuildFormText, unknown, BuildInput>({
    resolver,
    defaultValues: startingText(firstBuild, units),
  });
  const text = useWatch({ control }) as BuildFormText;
  const live = liveQuantities(text, units);
  const chronographed = bow.builds.filter((build) => build.speedFps !== null);

  const startOptions = [...bow.builds.map((build) => ({ value: String(build.id), label: build.name })), { value: 'blank', label: 'Blank' }];
  // Each sight-in on a row of its own: the day (and time, for two of one day) as the label, place and build below.
  const sightInOptions = bow.sightIns.slice(0, 6).map((sightIn) => {
    const name = sightInNameParts(sightIn, { builds: bow.builds, siblings: bow.sightIns });
    return {
      value: String(sightIn.id),
      label: [name.day, name.ordinal].filter(Boolean).join(' '),
      hint: [name.place, name.build].filter(Boolean).join(' · '),
    };
  });
  // What keeps Predict from running, in words (the button stays disabled until none is left).
  const missing = [
    chronographed.length < 2
      ? `Chronograph ${chronographed.length === 0 ? 'two builds' : 'one more build'} of ${chronographed.length === 0 ? 'different weights' : 'another weight'} on this bow: the new build’s speed comes from them.`
      : null,
    !text.name?.trim() ? 'Give the new build a name.' : null,
    live.totalGr === null ? 'Enter the arrow’s grains per inch and cut length: its weight comes from them.' : null,
    !text.diameterMm?.trim() ? 'Enter the shaft’s diameter.' : null,
  ].filter((reason): reason is string => reason !== null);

  const chooseStart = (value: string) => {
    setStartFrom(value);
    reset(
      startingText(
        bow.builds.find((build) => String(build.id) === value),
        units,
      ),
    );
    predict.reset();
  };

  const submit = handleSubmit(
    (input) => {
      setGeneral(null);
      const build = { ...input, speedFps: null };
      setSent(build);
      predict.mutate(
        { bowId: bow.id, request: { build, ...(sightInId ? { sightInId: Number(sightInId) } : {}) } },
        {
          onError: (error) => {
            // "Chronograph at least one more build …" is about the bow, not a field of the form.
            if (error.fields.builds) return setGeneral(error.message);
            const fields = flatFieldPath(buildFormFields);
            setGeneral(applyFieldErrors(error, (key) => fields(key.replace(/^build\./, '')), setError));
          },
        },
      );
    },
    () => setGeneral('Some fields need another look; nothing was predicted.'),
  );

  const form = (
    <Card>
      <SectionHeading title="The new build" level={2} description="Start from one of this bow’s builds and change what you would change." />
      <SegmentedControl label="Start from" options={startOptions} value={startFrom} onChange={chooseStart} testID="predict-start" />
      <FormField control={control} name="name" label="Name" autoCapitalize="sentences" />
      <FieldGrid minWidth={150}>
        <FormField control={control} name="grainsPerInch" label="Grains per inch" unit="gpi" numeric />
        <FormField control={control} name="cutLengthMm" label="Cut length" unit={unit} numeric />
        <FormField control={control} name="diameterMm" label="Diameter" unit={unit} numeric />
        <FormField control={control} name="pointGr" label="Point" unit={mass} numeric testID="predict-point" />
        <FormField control={control} name="insertGr" label="Insert" unit={mass} numeric />
        <FormField control={control} name="collarGr" label="Collar" unit={mass} numeric />
        <FormField control={control} name="nockGr" label="Nock" unit={mass} numeric />
        <FormField control={control} name="vaneCount" label="Vanes" unit="×" numeric />
        <FormField control={control} name="vaneWeightGr" label="Each vane" unit={mass} numeric />
        <FormField control={control} name="wrapGr" label="Wrap" unit={mass} numeric />
        <FormField control={control} name="balancePointMm" label="Balance point" hint="Optional, for FOC" unit={unit} numeric />
        <FormField control={control} name="dragCoefficient" label="Drag coefficient" hint="Optional: else fitted" numeric />
      </FieldGrid>
      <Text variant="label" testID="predict-total">
        Total: {live.totalGr === null ? '—' : formatQuantity(live.totalGr, 'mass', units)}
        {live.focPct === null ? '' : ` · FOC ${formatFixed(live.focPct, 1)} %`}
      </Text>
      {sightInOptions.length > 0 ? (
        <SegmentedControl
          label="Carried on the sight of"
          hint="The sight-in whose fitted peep height, sight radius and scale set the marks"
          options={sightInOptions}
          value={sightInId}
          onChange={setSightInId}
          size="large"
          optionBasis={260}
          testID="predict-sight-in"
        />
      ) : null}
      {general ? (
        <Banner tone="warn" title="Cannot predict yet" testID="predict-error">
          {general}
        </Banner>
      ) : null}
      {missing.length > 0 ? (
        <View style={styles.missing} testID="predict-missing" aria-live="polite">
          <Text variant="label">Predict needs:</Text>
          {missing.map((reason) => (
            <Text key={reason} variant="small">
              • {reason}
            </Text>
          ))}
        </View>
      ) : null}
      <Button
        label="Predict"
        pendingLabel="Predicting…"
        pending={predict.isPending}
        disabled={missing.length > 0}
        onPress={submit}
        testID="predict-submit"
      />
    </Card>
  );

  const intro = (
    <Text tone="soft">
      {chronographed.length >= 2
        ? `Speed from ${chronographed.length} chronographed builds: ${chronographed.map((build) => `${build.name} (${buildLine(build.derived, build.speedFps, me)})`).join('; ')}.`
        : chronographed.length === 1
          ? `Only ${chronographed[0].name} is chronographed. Chronograph at least one more build on this bow (of another weight) to predict a new one’s speed.`
          : 'No build on this bow is chronographed yet. Chronograph at least two builds of different weights to predict a new one’s speed.'}
    </Text>
  );

  const result = predict.data ? (
    <PredictResult
      result={predict.data}
      bowName={bow.nickname}
      tapeWidthMm={bow.tapeWidthMm}
      tapeHref={
        sent
          ? (from, to) => predictedTapeHref(bow.id, sent, { sightInId: predict.data!.sightIn?.id, from, to, width: bow.tapeWidthMm })
          : null
      }
      sheetHref={
        sent
          ? (from, to, format) =>
              predictedTapeHref(bow.id, sent, { sightInId: predict.data!.sightIn?.id, from, to, width: bow.tapeWidthMm }).replace(
                '/predict/tape.svg?',
                `/predict/sheet.${format}?`,
              )
          : null
      }
      sightInName={(() => {
        const sightIn = predict.data.sightIn ? bow.sightIns.find((item) => item.id === predict.data!.sightIn!.id) : undefined;
        return sightIn ? sightInName(sightIn, { builds: bow.builds, siblings: bow.sightIns }) : null;
      })()}
    />
  ) : null;

  return (
    <Screen testID="predict-screen">
      <ScreenTitle name={`Predict a build · ${bow.nickname}`} />
      <SectionHeading
        level={1}
        title="Predict a build"
        description={`${bow.nickname} · what an arrow you have not shot yet will do`}
        action={<Button label="Back to the bow" variant="quiet" href={`/bows/${bow.id}`} />}
      />
      {intro}
      {wide ? (
        <View style={styles.split}>
          <View style={styles.column}>{form}</View>
          <View style={styles.column}>{result ?? <Text tone="soft">The prediction appears here.</Text>}</View>
        </View>
      ) : (
        <>
          {form}
          {result}
        </>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  split: { flexDirection: 'row', gap: space.xl, alignItems: 'flex-start' },
  column: { flex: 1, minWidth: 0, gap: space.xl },
  missing: { gap: space.xxs },
});
