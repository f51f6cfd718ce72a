import { useMemo, useState } from 'react';
import { StyleSheet, View, useWindowDimensions } from 'react-native';
import { SvgXml } from 'react-native-svg';

import { useUnits } from '@/components/account/use-units';
import { quantityTextToStored } from '@/components/forms/form-numbers';
import { airInUnits, messageInUnits, shownUnit } from '@/shared/units';
import { formatDay } from '@/components/bows/readiness-words';
import { formatFixed, formatSigned } from '@/components/compare/format';
import { useFieldCard, fieldCardQueryString, type FieldCardParams } from '@/components/field-card/api';
import { CardPrint } from '@/components/field-card/card-print';
import { SlopeTable } from '@/components/field-card/slope-table';
import { WindTable } from '@/components/field-card/wind-table';
import { useSightIn } from '@/components/sight-ins/api';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { DownloadLink } from '@/components/ui/download-link';
import { ErrorView } from '@/components/ui/error-view';
import { LoadingView } from '@/components/ui/loading-view';
import { NotFoundScreen } from '@/components/ui/not-found-screen';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { SectionHeading } from '@/components/ui/section-heading';
import { SegmentedControl } from '@/components/ui/segmented-control';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { colors, radii, space } from '@/components/theme';
import { airWords, fieldCardSvg, FIELD_CARD_SIZE_MM } from '@/math/card/field-card-svg';
import type { FieldCardData } from '@/shared/field-card';

const angleSets = {
  '40': [-40, -30, -20, -10, 0, 10, 20, 30, 40],
  '30': [-30, -20, -10, 0, 10, 20, 30],
  '45': [-45, -30, -15, 0, 15, 30, 45],
} as const;
const angleOptions = [
  { value: '40', label: '−40° to +40°' },
  { value: '30', label: '−30° to +30°' },
  { value: '45', label: '−45° to +45° by 15' },
] as const;
const distanceSets = {
  '20-60': [20, 30, 40, 50, 60],
  '10-50': [10, 20, 30, 40, 50],
  '20-70': [20, 30, 40, 50, 60, 70],
  '30-80': [30, 40, 50, 60, 70, 80],
} as const;
const distanceOptions = (Object.keys(distanceSets) as (keyof typeof distanceSets)[]).map((value) => ({
  value,
  label: value.replace('-', '–'),
}));

/**
 * A sight-in's field card: for the chosen slopes and slant distances, the mark
 * to hold and the distance to set on the sight-in tape, beside the rifleman's
 * rule; the shift of the level marks at the hunt's altitude and temperature;
 * the cautions; and the 100 × 150 mm card itself (outline glyphs) to print or
 * download as SVG or PDF.
 * Example: `<FieldCardScreen sightInId={12} />`
 */
export function FieldCardScreen({ sightInId }: { sightInId: number }) {
  const sightIn = useSightIn(sightInId);
  const [angles, setAngles] = useState<keyof typeof angleSets>('40');
  const [distances, setDistances] = useState<keyof typeof distanceSets>('20-60');
  const [altitudeText, setAltitudeText] = useState('');
  const [temperatureText, setTemperatureText] = useState('');
  // Typed in the account's units (feet or metres, °F or °C: shared/units.ts); asked for in m and °C.
  const units = useUnits();
  const altitude = quantityTextToStored(altitudeText, 'altitude', units);
  const temperature = quantityTextToStored(temperatureText, 'temperature', units);
  const altitudeError =
    altitude !== undefined && (Number.isNaN(altitude) || altitude < -500 || altitude > 5000)
      ? messageInUnits('Enter an altitude between -500 and 5000 m', units)
      : undefined;
  const temperatureError =
    temperature !== undefined && (Number.isNaN(temperature) || temperature < -40 || temperature > 50)
      ? messageInUnits('Enter a temperature between -40 and 50 °C', units)
      : undefined;
  const params: FieldCardParams = { angles: [...angleSets[angles]], distances: [...distanceSets[distances]] };
  if (altitude !== undefined && !altitudeError) params.altitudeM = altitude;
  if (temperature !== undefined && !temperatureError) params.temperatureC = temperature;
  const card = useFieldCard(sightInId, params);
  const query = fieldCardQueryString(params);

  if (!Number.isInteger(sightInId) || sightInId <= 0) return <NotFoundScreen />;
  if (sightIn.isError || (card.isError && !card.data)) {
    const failed = sightIn.isError ? sightIn : card;
    return (
      <>
        <ScreenTitle name="Field card" />
        <ErrorView
          title="The field card could not be made"
          error={failed.error!}
          onRetry={() => failed.refetch()}
          retrying={failed.isFetching}
        />
      </>
    );
  }
  if (sightIn.isPending || !card.data) {
    return (
      <>
        <ScreenTitle name="Field card" />
        <LoadingView label="Working out the field card…" />
      </>
    );
  }
  const { card: data, labels } = card.data;

  return (
    <Screen testID="field-card-screen">
      <ScreenTitle name={`Field card ${sightIn.data.date}`} />
      <SectionHeading
        level={1}
        title="Field card"
        description={`${labels.bow} · ${labels.build} · sight-in ${formatDay(labels.date)}${labels.place ? `, ${labels.place}` : ''}`}
        action={<Button label="Back to the sight-in" variant="quiet" href={`/sight-ins/${sightInId}`} />}
      />

      <Card>
        <SectionHeading
          title="Where you will hunt"
          level={2}
          description={`Sight-in air: ${airInUnits(data.sightIn, units)}. Leave the altitude empty for that air.`}
        />
        <View style={styles.airFields}>
          <View style={styles.airField}>
            <TextField
              label="Altitude"
              unit={shownUnit('altitude', units)}
              numeric
              value={altitudeText}
              onChangeText={setAltitudeText}
              error={altitudeError}
              placeholder="sight-in"
              testID="field-card-altitude"
            />
          </View>
          <View style={styles.airField}>
            <TextField
              label="Temperature"
              hint="Empty: the standard air’s at that altitude"
              unit={shownUnit('temperature', units)}
              numeric
              value={temperatureText}
              onChangeText={setTemperatureText}
              error={temperatureError}
              testID="field-card-temperature"
            />
          </View>
        </View>
        <SegmentedControl label="Slopes" options={angleOptions} value={angles} onChange={setAngles} />
        <SegmentedControl
          label="Slant distances"
          hint={`In ${data.unit}, as a rangefinder reads them`}
          options={distanceOptions}
          value={distances}
          onChange={setDistances}
        />
      </Card>

      <Card>
        <SectionHeading
          title={data.sameAirAsSightIn ? 'Marks for the sight-in air' : `Marks for ${airInUnits(data.air, units)}`}
          level={2}
          description={`Each box: the mark to hold (mm, large); ≈ the distance to set on your sight-in tape; the rifleman’s rule (slant × cos angle) and how far the set distance differs from it (${data.unit}).`}
        />
        {card.isFetching ? (
          <Text variant="small" tone="soft">
            Updating…
          </Text>
        ) : null}
        <SlopeTable card={data} />
        <ShiftTable card={data} />
        <WindTable card={data} />
      </Card>

      <Banner tone="caution" title="Estimates" testID="field-card-cautions">
        {data.cautions.join(' ')}
      </Banner>

      <Card>
        <SectionHeading
          title="The printed card"
          level={2}
          description="100 × 150 mm, to tape inside the bow case lid. Print at actual size (100 %)."
        />
        <CardPreview card={data} labels={labels} />
        <View style={styles.actions}>
          <CardPrint svg={fieldCardSvg(data, labels)} testID="field-card-print" />
          <DownloadLink label="Download PDF" href={`/api/sight-ins/${sightInId}/field-card.pdf?${query}`} testID="field-card-pdf" />
          <DownloadLink label="Download SVG" href={`/api/sight-ins/${sightInId}/field-card.svg?${query}`} testID="field-card-svg" />
        </View>
      </Card>
    </Screen>
  );
}

/** The level marks in the card's air against the sight-in's. */
function ShiftTable({ card }: { card: FieldCardData }) {
  return (
    <View style={styles.shift} testID="field-card-shift">
      <Text variant="label">
        {card.sameAirAsSightIn ? 'Level marks (mm), sight-in air' : `Level marks (mm) at ${airWords(card.air)} against the sight-in`}
      </Text>
      <View style={styles.shiftTable} role="table" aria-label="Level marks and their shift">
        {[
          { label: card.unit, values: card.shift.map((row) => String(row.distance)) },
          { label: 'sight-in', values: card.shift.map((row) => formatFixed(row.sightInMarkMm, 1)) },
          ...(card.sameAirAsSightIn
            ? []
            : [
                { label: 'here', values: card.shift.map((row) => formatFixed(row.markMm, 1)) },
                { label: 'shift', values: card.shift.map((row) => formatSigned(row.shiftMm, 2)) },
              ]),
        ].map((line, index) => (
          <View key={line.label} style={[styles.shiftRow, index === 0 && styles.shiftHead]} role="row">
            <Text variant="small" tone="soft" style={styles.shiftLabel} role="rowheader">
              {line.label}
            </Text>
            {line.values.map((value, column) => (
              <Text key={column} variant="numeral" style={styles.shiftCell} role="cell">
                {value}
              </Text>
            ))}
          </View>
        ))}
      </View>
    </View>
  );
}

/** The card as it prints, drawn by the math core (the SVG the server sends), scaled to the screen. */
function CardPreview({ card, labels }: { card: FieldCardData; labels: Parameters<typeof fieldCardSvg>[1] }) {
  const { width } = useWindowDimensions();
  const xml = useMemo(() => fieldCardSvg(card, labels), [card, labels]);
  const shownWidth = Math.min(420, width - 2 * space.xxl);
  const shownHeight = (shownWidth * FIELD_CARD_SIZE_MM.heightMm) / FIELD_CARD_SIZE_MM.widthMm;
  return (
    <View style={styles.preview} testID="field-card-preview">
      <View role="img" accessibilityLabel={`The printed field card for ${labels.bow}, ${labels.build}`} style={styles.paper}>
        {/* The words are on the wrapper (role img + label); the drawing itself is hidden from assistive technology. */}
        <View aria-hidden>
          <SvgXml xml={xml} width={shownWidth} height={shownHeight} />
        </View>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  airFields: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  airField: { flexGrow: 1, flexBasis: 180 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  shift: { gap: space.sm, marginTop: space.md },
  shiftTable: { borderRadius: radii.md, borderWidth: 1, borderColor: colors.line, overflow: 'hidden' },
  shiftRow: { flexDirection: 'row', alignItems: 'center', paddingHorizontal: space.sm, paddingVertical: space.xxs },
  shiftHead: { backgroundColor: colors.sunken },
  shiftLabel: { width: 64 },
  shiftCell: { flex: 1, textAlign: 'center' },
  preview: { alignItems: 'center', padding: space.md, backgroundColor: colors.sunken, borderRadius: radii.md },
  paper: { backgroundColor: '#fff' },
});
