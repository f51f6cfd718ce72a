import { useMemo, useState } from 'react';
import { StyleSheet, useWindowDimensions, View } from 'react-native';

import { useBow } from '@/components/bows/api';
import { useUnits } from '@/components/account/use-units';
import { formatLength, quantityTextToStored } from '@/components/forms/form-numbers';
import { formatDay } from '@/components/bows/readiness-words';
import { buildLine } from '@/components/builds/build-words';
import { useCompare, type CompareParams } from '@/components/compare/api';
import { BuildPicker, type PickableBuild } from '@/components/compare/build-picker';
import { CompareChart } from '@/components/compare/compare-chart';
import { CompareFigures } from '@/components/compare/compare-figures';
import { CompareMarksTable } from '@/components/compare/compare-marks-table';
import { ComparePrintButton, ComparePrintOnly } from '@/components/compare/compare-print';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { NotFoundScreen } from '@/components/ui/not-found-screen';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';
import { SegmentedControl } from '@/components/ui/segmented-control';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { space } from '@/components/theme';
import type { BowDetail } from '@/shared/bow-detail';
import { airInUnits, messageInUnits, shownUnit, storedToText } from '@/shared/units';

/** Window width (px) from which the chart and the marks table sit side by side. */
const splitFrom = 1100;

const forgivenessOptions = [20, 30, 40, 50, 60].map((distance) => ({ value: String(distance), label: String(distance) }));
const airOptions = [
  { value: 'sighted', label: 'As each was sighted' },
  { value: 'common', label: 'All in one air' },
] as const;

/** The bow's builds as choices: a build without a sight-in cannot be compared and says so. */
function pickableBuilds(bow: BowDetail): PickableBuild[] {
  const sighted = new Set(bow.sightIns.map((sightIn) => sightIn.buildId));
  return bow.builds.map((build) => ({
    id: build.id,
    name: build.name,
    detail: buildLine(build.derived, build.speedFps),
    unavailable: sighted.has(build.id) ? null : 'no sight-in yet',
  }));
}

/** The first choice: the builds asked for in the address (if they can be compared), else the first two that can. */
function initialChoice(builds: PickableBuild[], asked: number[]): number[] {
  const usable = builds.filter((build) => build.unavailable === null).map((build) => build.id);
  const fromAddress = asked.filter((id) => usable.includes(id)).slice(0, 4);
  return fromAddress.length >= 2 ? fromAddress : usable.slice(0, 2);
}

/**
 * Builds side by side on one bow: choose two to four sighted builds (the
 * first is the reference), see their fitted mark curves on one chart, their
 * marks by distance with the differences in mm and in distance, and their
 * speed, weight, FOC, energy, momentum, drop and forgiveness. Printable on
 * the web. Each build comes from its most recent sight-in.
 * Example: `<CompareScreen bowId={3} initialBuilds={[5, 6]} />`
 */
export function CompareScreen({ bowId, initialBuilds = [] }: { bowId: number; initialBuilds?: number[] }) {
  const bow = useBow(bowId);
  if (!Number.isInteger(bowId) || bowId <= 0) return <NotFoundScreen />;
  if (bow.isPending) {
    return (
      <>
        <ScreenTitle name="Compare builds" />
        <LoadingView label="Loading the bow…" />
      </>
    );
  }
  if (bow.isError) {
    return (
      <>
        <ScreenTitle name="Compare builds" />
        <ErrorView title="The bow could not be loaded" error={bow.error} onRetry={() => bow.refetch()} retrying={bow.isFetching} />
      </>
    );
  }
  return <CompareBody bow={bow.data} initialBuilds={initialBuilds} />;
}

function CompareBody({ bow, initialBuilds }: { bow: BowDetail; initialBuilds: number[] }) {
  const builds = useMemo(() => pickableBuilds(bow), [bow]);
  const wide = useWindowDimensions().width >= splitFrom;
  const [chosen, setChosen] = useState<number[]>(() => initialChoice(builds, initialBuilds));
  const [at, setAt] = useState('40');
  const [air, setAir] = useState<'sighted' | 'common'>('sighted');
  // Altitude and temperature in the account's units (shared/units.ts); asked for in m and °C.
  const units = useUnits();
  const [altitudeText, setAltitudeText] = useState(() => storedToText(2700, 'altitude', units));
  const [temperatureText, setTemperatureText] = useState('');

  const altitude = quantityTextToStored(altitudeText, 'altitude', units);
  const temperature = quantityTextToStored(temperatureText, 'temperature', units);
  const altitudeError =
    air === 'common' && (altitude === undefined || Number.isNaN(altitude) || altitude < -500 || altitude > 5000)
      ? messageInUnits('Enter an altitude between -500 and 5000 m', units)
      : undefined;
  const temperatureError =
    air === 'common' && temperature !== undefined && (Number.isNaN(temperature) || temperature < -40 || temperature > 50)
      ? messageInUnits('Enter a temperature between -40 and 50 °C, or leave it empty', units)
      : undefined;
  const params: CompareParams = { builds: chosen, at: Number(at) };
  if (air === 'common' && !altitudeError && !temperatureError) {
    params.altitudeM = altitude;
    if (temperature !== undefined) params.temperatureC = temperature;
  }
  const compare = useCompare(bow.id, params);
  const sightedCount = builds.filter((build) => build.unavailable === null).length;

  return (
    <Screen testID="compare-screen">
      <ScreenTitle name={`Compare builds · ${bow.nickname}`} />
      <ComparePrintOnly rootId="compare-print" />
      <SectionHeading
        level={1}
        title="Compare builds"
        description={`${bow.nickname} · each build from its latest sight-in`}
        action={<Button label="Back to the bow" variant="quiet" href={`/bows/${bow.id}`} />}
      />

      {sightedCount < 2 ? (
        <Banner tone="info" title="Two sighted builds needed" testID="compare-needs">
          A comparison needs two builds that each have a sight-in on this bow. Sight in another build (two marks are enough), then come
          back.
        </Banner>
      ) : null}

      <Card>
        <SectionHeading
          title="Builds"
          level={2}
          description="Choose two to four. The first you choose is the reference for the differences."
        />
        <BuildPicker builds={builds} chosen={chosen} onChange={setChosen} />
        <SegmentedControl
          label="Forgiveness at"
          hint="The distance where the ±100 mm window is measured"
          options={forgivenessOptions}
          value={at}
          onChange={setAt}
        />
        <SegmentedControl
          label="Air"
          hint="One air compares the arrows alone; as sighted matches your tapes."
          options={airOptions}
          value={air}
          onChange={setAir}
        />
        {air === 'common' ? (
          <View style={styles.airFields}>
            <View style={styles.airField}>
              <TextField
                label="Altitude"
                unit={shownUnit('altitude', units)}
                numeric
                value={altitudeText}
                onChangeText={setAltitudeText}
                error={altitudeError}
                testID="compare-altitude"
              />
            </View>
            <View style={styles.airField}>
              <TextField
                label="Temperature"
                hint="Empty: the standard air’s"
                unit={shownUnit('temperature', units)}
                numeric
                value={temperatureText}
                onChangeText={setTemperatureText}
                error={temperatureError}
              />
            </View>
          </View>
        ) : null}
      </Card>

      {chosen.length < 2 ? (
        <Text tone="soft">Choose at least two builds to compare.</Text>
      ) : compare.isError ? (
        <Banner tone="error" title="The comparison could not be made" testID="compare-error">
          {compare.error.message}
        </Banner>
      ) : !compare.data ? (
        <LoadingView label="Comparing…" />
      ) : (
        <View nativeID="compare-print" style={styles.results} testID="compare-results">
          <View style={styles.printHead}>
            <Text variant="title">
              {bow.nickname}: {compare.data.comparison.builds.map((build) => build.label).join(' · ')}
            </Text>
            <Text variant="small" tone="soft">
              {compare.data.sources
                .map(
                  (source) =>
                    `${source.name}: sight-in ${formatDay(source.sightInDate)}${source.placeLabel ? `, ${source.placeLabel}` : ''} (${source.markCount} marks)`,
                )
                .join(' · ')}
            </Text>
            <Text variant="small" tone="soft">
              {compare.data.comparison.commonAirDensityKgM3 === null
                ? 'Each build in the air of its own sight-in.'
                : `Every build in one air: ${airInUnits({ altitudeM: params.altitudeM ?? null, temperatureC: params.temperatureC ?? null }, units)} (${compare.data.comparison.commonAirDensityKgM3.toFixed(3)} kg/m³).`}{' '}
              Sight radius {formatLength(bow.sightRadiusMm, 'mm')}, readings as your scale reads them.
            </Text>
          </View>
          <View style={wide ? styles.split : styles.stack}>
            <Card style={wide ? styles.half : undefined}>
              <SectionHeading title="Mark curves" level={2} />
              <CompareChart comparison={compare.data.comparison} />
            </Card>
            <Card style={wide ? styles.half : undefined}>
              <SectionHeading title="Marks by distance" level={2} />
              <CompareMarksTable comparison={compare.data.comparison} />
            </Card>
          </View>
          <Card>
            <SectionHeading title="Side by side" level={2} />
            <CompareFigures
              comparison={compare.data.comparison}
              chronographed={compare.data.sources.map((source) => source.chronographedSpeedFps)}
            />
          </Card>
          <Banner tone="caution" testID="compare-caution">
            {`${compare.data.comparison.caution} The marks are estimates from each fit: confirm every distance at the range.`}
          </Banner>
        </View>
      )}
      {compare.data && chosen.length >= 2 && !compare.isError ? (
        <View style={styles.actions}>
          <ComparePrintButton label="Print the comparison" testID="compare-print-button" />
          <Button label="Predict another build" variant="quiet" href={`/bows/${bow.id}/predict`} />
        </View>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  airFields: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  airField: { flexGrow: 1, flexBasis: 180 },
  results: { gap: space.xl },
  split: { flexDirection: 'row', gap: space.xl, alignItems: 'flex-start' },
  stack: { gap: space.xl },
  half: { flex: 1, minWidth: 0 },
  printHead: { gap: space.xxs },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, alignItems: 'center' },
});
