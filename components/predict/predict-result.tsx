import { StyleSheet, View } from 'react-native';

import { useUnits } from '@/components/account/use-units';
import { formatFixed, formatSigned } from '@/components/compare/format';
import { PredictedTapePreview } from '@/components/predict/predicted-tape-preview';
import { Banner } from '@/components/ui/banner';
import { Card } from '@/components/ui/card';
import { DownloadLink } from '@/components/ui/download-link';
import { SectionHeading } from '@/components/ui/section-heading';
import { Text } from '@/components/ui/text';
import { colors, radii, space } from '@/components/theme';
import { formatDay } from '@/components/bows/readiness-words';
import type { PredictResponse } from '@/shared/predict';
import { formatQuantity } from '@/shared/units';

export interface PredictResultProps {
  result: PredictResponse;
  bowName: string;
  tapeWidthMm: number;
  /** The predicted tape's download address for a range, or null when it cannot be asked for. */
  tapeHref: ((from: number, to: number) => string) | null;
  /** The predicted print sheet's address (SVG or PDF), or null. */
  sheetHref?: ((from: number, to: number, format: 'svg' | 'pdf') => string) | null;
  /** The name of the sight-in it is carried on (shared/sight-in-name.ts), when known. */
  sightInName?: string | null;
}

/** Distances shown in the marks table: every 10 from 20. */
const shown = (distance: number) => distance >= 20 && distance % 10 === 0;

/**
 * A prediction: the speed (and where it comes from), energy and momentum, the
 * predicted marks beside the sighted build's, the predicted tape, and the
 * caution that none of it is sighted.
 * Example: `<PredictResult result={prediction} bowName="Timberline slider" tapeWidthMm={12} tapeHref={(from, to) => href} />`
 */
export function PredictResult({ result, bowName, tapeWidthMm, tapeHref, sheetHref = null, sightInName = null }: PredictResultProps) {
  const { prediction } = result;
  const unit = prediction.unit ?? 'yd';
  // Speeds and masses in the archer's units (fps or m/s, gr or g).
  const units = useUnits();
  const speed = (fps: number) => formatQuantity(fps, 'speed', units);
  const mass = (gr: number) => formatQuantity(gr, 'mass', units);
  const source =
    prediction.speedSource === 'chronograph'
      ? 'Chronographed speed of this build.'
      : `Predicted from ${result.chronographed.map((build) => `${build.name} (${mass(build.massGr)}, ${speed(build.speedFps)})`).join(' and ')}.`;
  const reachable = (prediction.marks ?? []).filter((mark) => mark.markMm !== null);
  const lastReachable = reachable.length > 0 ? reachable[reachable.length - 1].distance : 80;
  const tapeTo = Math.max(30, Math.min(80, Math.floor(lastReachable / 10) * 10));
  const speedWords = `${speed(prediction.speedFps)} (${prediction.speedSource === 'chronograph' ? 'chronographed' : 'predicted'})`;

  return (
    <View style={styles.box} testID="predict-result">
      <Banner tone="caution" title="PREDICTED — not sighted" testID="predict-caution">
        {prediction.caution.replace(/^PREDICTED — not sighted\. /, '')}
      </Banner>
      {prediction.warnings.map((warning) => (
        <Banner key={warning} tone="warn">
          {warning}
        </Banner>
      ))}

      <Card>
        <SectionHeading title={`${result.build.name}, ${mass(result.build.totalGr)}`} level={2} description={source} />
        <View style={styles.figures}>
          <Figure label="Speed" value={speed(prediction.speedFps)} testID="predict-speed" />
          <Figure
            label="Kinetic energy"
            value={`${formatFixed(prediction.kineticEnergyFtLbf, 1)} ft·lbf`}
            detail={`${formatFixed(prediction.kineticEnergyJ, 1)} J`}
          />
          <Figure
            label="Momentum"
            value={`${formatFixed(prediction.momentumSlugFps, 3)}`}
            detail={`slug·ft/s · ${formatFixed(prediction.momentumKgMps, 2)} kg·m/s`}
          />
          <Figure
            label="FOC"
            value={result.build.focPct === null ? '—' : `${formatFixed(result.build.focPct, 1)} %`}
            detail={result.build.focPct === null ? 'balance point not given' : undefined}
          />
        </View>
        {prediction.virtualMass ? (
          <Text variant="small" tone="soft">
            The bow’s fit: {formatFixed(prediction.virtualMass.energyJ, 1)} J shared with a virtual mass of{' '}
            {mass(prediction.virtualMass.virtualMassGr)} of limbs and string (speed = √(2E / (arrow + virtual mass))).{' '}
            {result.chronographed.length === 2
              ? 'Two builds fit it exactly; a third chronographed build would check it.'
              : `The chronographed builds sit ${formatQuantity(prediction.virtualMass.rmsFps, 'speed', units, 1)} (RMS) off it.`}
          </Text>
        ) : null}
        <Text variant="small" tone="soft">
          {result.energyCaution}
        </Text>
      </Card>

      {result.marksMissing ? (
        <Banner tone="info" title="No marks yet" testID="predict-marks-missing">
          {result.marksMissing}
        </Banner>
      ) : null}

      {prediction.marks && result.sightIn && result.model ? (
        <Card>
          <SectionHeading
            title="Predicted marks"
            level={2}
            description={`On the sight of the sight-in of ${sightInName ?? `${formatDay(result.sightIn.date)} · ${result.sightIn.buildName}`}; mm as your scale reads them.`}
          />
          <View style={styles.table} role="table" aria-label="Predicted marks" testID="predict-marks">
            <View style={[styles.row, styles.head]} role="row">
              <Text variant="label" style={styles.distance} role="columnheader">
                {unit}
              </Text>
              <Text variant="label" style={styles.cell} role="columnheader">
                Predicted
              </Text>
              <Text variant="label" style={styles.cell} role="columnheader">
                {result.sightIn.buildName}
              </Text>
              <Text variant="label" style={styles.cell} role="columnheader">
                Δ mm
              </Text>
            </View>
            {prediction.marks
              .filter((mark) => shown(mark.distance))
              .map((mark, index) => (
                <View key={mark.distance} style={[styles.row, index % 2 === 1 && styles.stripe]} role="row">
                  <Text variant="numeral" style={styles.distance} role="rowheader">
                    {mark.distance}
                  </Text>
                  <Text variant="numeral" style={styles.cell} role="cell">
                    {formatFixed(mark.markMm, 1)}
                  </Text>
                  <Text variant="numeral" style={[styles.cell, styles.soft]} role="cell">
                    {formatFixed(mark.sightedBuildMarkMm, 1)}
                  </Text>
                  <Text variant="numeral" style={styles.cell} role="cell">
                    {formatSigned(mark.differenceMm, 1)}
                  </Text>
                </View>
              ))}
          </View>
          <SectionHeading
            title="Predicted tape"
            level={3}
            description="PREDICTED runs along its edge, so a cut-out tape still says so. Confirm two distances at the range before you trust the rest."
          />
          <PredictedTapePreview
            model={result.model}
            from={20}
            to={tapeTo}
            widthMm={tapeWidthMm}
            labels={{ bow: bowName, build: `${result.build.name}, ${mass(result.build.totalGr)}`, speed: speedWords }}
          />
          {tapeHref ? (
            <DownloadLink
              label="Download the predicted tape (SVG)"
              href={tapeHref(20, tapeTo)}
              fileName="predicted-tape.svg"
              testID="predict-download"
            />
          ) : null}
          {sheetHref ? (
            <View style={styles.downloads}>
              <Text variant="small" tone="soft">
                The print sheet: PREDICTED — NOT SIGHTED at its head, calibration bars, the tape at 100 %. Print at actual size.
              </Text>
              <DownloadLink
                label="Print sheet (PDF)"
                href={sheetHref(20, tapeTo, 'pdf')}
                fileName="predicted-sheet.pdf"
                testID="predict-sheet-pdf"
              />
              <DownloadLink
                label="Print sheet (SVG)"
                href={sheetHref(20, tapeTo, 'svg')}
                fileName="predicted-sheet.svg"
                testID="predict-sheet-svg"
              />
            </View>
          ) : null}
        </Card>
      ) : null}
    </View>
  );
}

function Figure({ label, value, detail, testID }: { label: string; value: string; detail?: string; testID?: string }) {
  return (
    <View style={styles.figure}>
      <Text variant="small" tone="soft">
        {label}
      </Text>
      <Text variant="numeralLarge" style={styles.figureValue} testID={testID}>
        {value}
      </Text>
      {detail ? (
        <Text variant="caption" tone="soft">
          {detail}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xl },
  figures: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  figure: { flexGrow: 1, flexBasis: 130, gap: space.xxs },
  figureValue: { fontSize: 32, lineHeight: 36 },
  table: { borderRadius: radii.md, overflow: 'hidden', borderWidth: 1, borderColor: colors.line },
  row: { flexDirection: 'row', alignItems: 'center', paddingVertical: space.xs, paddingHorizontal: space.sm, gap: space.sm },
  head: { backgroundColor: colors.sunken, paddingVertical: space.sm },
  stripe: { backgroundColor: colors.surface },
  distance: { width: 44 },
  cell: { flex: 1 },
  soft: { color: colors.inkSoft },
  downloads: { gap: space.xs },
});
