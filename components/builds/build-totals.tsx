import { StyleSheet, View } from 'react-native';

import type { BuildFormText } from '@/components/builds/build-form-values';
import { liveQuantities } from '@/components/builds/live-quantities';
import { Banner } from '@/components/ui/banner';
import { Card } from '@/components/ui/card';
import { Text } from '@/components/ui/text';
import { colors, radii, space } from '@/components/theme';
import { grainsToGrams } from '@/math/units/convert';
import { unitsOf, type FormUnits } from '@/components/forms/form-numbers';
import { formatQuantity, shownUnit } from '@/shared/units';

/** The caution shown beside every energy figure. */
export const ENERGY_CAUTION_TEXT =
  'Energy figures are estimates, not a legal determination; hunting rules on arrow weight and energy vary — follow your local regulations.';

function Figure({
  label,
  value,
  unit,
  testID,
  second,
}: {
  label: string;
  value: string | null;
  unit: string;
  testID: string;
  second?: string | null;
}) {
  return (
    <View style={styles.figure}>
      <Text variant="small" tone="soft">
        {label}
      </Text>
      <View style={styles.valueRow}>
        <Text variant="numeralLarge" testID={testID} style={value === null ? styles.missing : undefined}>
          {value ?? '—'}
        </Text>
        {value !== null ? (
          <Text variant="label" tone="soft">
            {unit}
          </Text>
        ) : null}
      </View>
      {second && value !== null ? (
        <Text variant="numeral" tone="soft">
          {second}
        </Text>
      ) : null}
    </View>
  );
}

/**
 * Total grains and FOC on one line for the top of a phone screen (it stays in
 * view while the archer types further down; energy, with its caution, is in
 * the full card below the fields).
 * Example: `<BuildTotalsStrip text={watchedText} lengthUnit="mm" />`
 */
export function BuildTotalsStrip({ text, lengthUnit }: { text: BuildFormText; lengthUnit: FormUnits }) {
  const live = liveQuantities(text, lengthUnit);
  const parts = [
    live.totalGr === null
      ? `— ${shownUnit('mass', unitsOf(lengthUnit))}`
      : formatQuantity(live.totalGr, 'mass', unitsOf(lengthUnit), shownUnit('mass', unitsOf(lengthUnit)) === 'g' ? 2 : 1),
    live.focPct === null ? 'FOC —' : `FOC ${live.focPct.toFixed(1)} %`,
  ];
  return (
    <View style={styles.strip} testID="build-totals-strip" aria-live="polite">
      <Text variant="numeral" style={styles.stripText}>
        {parts.join('  ·  ')}
      </Text>
    </View>
  );
}

/**
 * The build's totals, recomputed by the math core on every keystroke: total
 * grains, FOC, kinetic energy (J and ft·lbf) and momentum, with the energy caution.
 * Example: `<BuildTotals text={watchedText} lengthUnit="in" />`
 */
export function BuildTotals({ text, lengthUnit }: { text: BuildFormText; lengthUnit: FormUnits }) {
  const live = liveQuantities(text, lengthUnit);
  const fixed = (value: number | null, digits: number) => (value === null ? null : value.toFixed(digits));
  return (
    <Card style={styles.card} testID="build-totals">
      <Text variant="title" role="heading" aria-level={2}>
        This arrow
      </Text>
      <View style={styles.grid} aria-live="polite">
        <Figure
          label="Total weight"
          value={fixed(live.totalGr, 1)}
          unit="gr"
          testID="total-grains"
          second={live.totalGr === null ? null : `${grainsToGrams(live.totalGr).toFixed(2)} g`}
        />
        <Figure label="FOC" value={fixed(live.focPct, 1)} unit="%" testID="foc" />
        <Figure
          label="Kinetic energy"
          value={fixed(live.kineticEnergyJ, 1)}
          unit="J"
          testID="kinetic-energy"
          second={live.kineticEnergyFtLb === null ? null : `${live.kineticEnergyFtLb.toFixed(1)} ft·lbf`}
        />
        <Figure
          label="Momentum"
          value={fixed(live.momentumKgMPerS, 3)}
          unit="kg·m/s"
          testID="momentum"
          second={live.momentumSlugFtPerS === null ? null : `${live.momentumSlugFtPerS.toFixed(3)} slug·ft/s`}
        />
      </View>
      {live.needs.length > 0 ? (
        <View style={styles.needs}>
          <Text variant="small" tone="soft">
            Still to enter: {live.needs.join('; ')}.
          </Text>
        </View>
      ) : null}
      <Banner tone="caution">{ENERGY_CAUTION_TEXT}</Banner>
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: space.lg },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  figure: { flexGrow: 1, flexBasis: 120, gap: space.xxs },
  valueRow: { flexDirection: 'row', alignItems: 'baseline', gap: space.xs },
  missing: { color: colors.lineStrong },
  needs: { backgroundColor: colors.sunken, borderRadius: radii.sm, padding: space.sm },
  strip: {
    position: 'sticky' as never,
    top: 0,
    zIndex: 2,
    backgroundColor: colors.slate,
    borderRadius: radii.md,
    paddingHorizontal: space.md,
    paddingVertical: space.sm,
  },
  stripText: { color: colors.onSlate, fontSize: 20, lineHeight: 24 },
});
