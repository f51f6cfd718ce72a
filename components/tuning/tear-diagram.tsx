import { Pressable, StyleSheet, View } from 'react-native';
import Svg, { Circle, Line, Rect } from 'react-native-svg';

import { Text } from '@/components/ui/text';
import { colors, layout, radii, space } from '@/components/theme';
import { tearNames, tearVector, type Tear } from '@/shared/paper-tune-rules';

/** The 3 × 3 grid of the diagram, row by row (the centre is a clean hole). */
const grid: Tear[][] = [
  ['up-left', 'up', 'up-right'],
  ['left', 'clean', 'right'],
  ['down-left', 'down', 'down-right'],
];

/**
 * A paper square with the point's hole and the tail's tear drawn from it
 * (`scale` 0..1 of the half-width), as seen from behind the paper.
 * Example: `<TearMark tear="up-left" scale={0.8} size={56} />`
 */
export function TearMark({
  tear,
  scale = 0.8,
  size = 56,
  tone = colors.ink,
}: {
  tear: Tear;
  scale?: number;
  size?: number;
  tone?: string;
}) {
  const half = size / 2;
  const v = tearVector(tear);
  const reach = Math.max(0, Math.min(1, scale)) * (half - 6);
  return (
    <Svg
      width={size}
      height={size}
      viewBox={`0 0 ${size} ${size}`}
      accessibilityElementsHidden
      importantForAccessibility="no-hide-descendants"
    >
      <Rect x={1} y={1} width={size - 2} height={size - 2} fill={colors.surface} stroke={colors.line} strokeWidth={1} />
      {tear === 'clean' ? null : (
        <Line x1={half} y1={half} x2={half + v.x * reach} y2={half - v.y * reach} stroke={tone} strokeWidth={5} strokeLinecap="round" />
      )}
      <Circle cx={half} cy={half} r={5} fill={tone} />
    </Svg>
  );
}

export interface TearDiagramProps {
  value: Tear | null;
  onChange: (tear: Tear) => void;
  error?: string;
  testID?: string;
}

/**
 * The tear, tapped: eight directions of the tail around the hole, and the hole
 * itself for a clean one. Seen from behind the paper, where the archer stands.
 * Example: `<TearDiagram value={tear} onChange={setTear} />`
 */
export function TearDiagram({ value, onChange, error, testID = 'tear' }: TearDiagramProps) {
  return (
    <View style={styles.wrap} accessibilityRole="radiogroup" accessibilityLabel="The tear, seen from behind the paper">
      <Text variant="label">The tear (tap where the tail tore, seen from behind)</Text>
      <View style={styles.grid}>
        {grid.map((row, index) => (
          <View key={index} style={styles.row}>
            {row.map((tear) => {
              const selected = value === tear;
              return (
                <Pressable
                  key={tear}
                  accessibilityRole="radio"
                  accessibilityState={{ checked: selected }}
                  accessibilityLabel={tearNames[tear]}
                  onPress={() => onChange(tear)}
                  testID={`${testID}-${tear}`}
                  style={({ pressed }) => [styles.cell, selected && styles.selected, pressed && styles.pressed]}
                >
                  <TearMark tear={tear} size={60} tone={selected ? colors.signal : colors.ink} />
                </Pressable>
              );
            })}
          </View>
        ))}
      </View>
      <Text variant="small" tone={value ? 'default' : 'soft'}>
        {value ? tearNames[value] : 'Nothing chosen yet.'}
      </Text>
      {error ? (
        <Text variant="small" tone="failed">
          {error}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  grid: { gap: space.xs, alignSelf: 'flex-start' },
  row: { flexDirection: 'row', gap: space.xs },
  cell: {
    minWidth: layout.bigTap + 4,
    minHeight: layout.bigTap + 4,
    alignItems: 'center',
    justifyContent: 'center',
    borderRadius: radii.md,
    borderWidth: 2,
    borderColor: 'transparent',
  },
  selected: { borderColor: colors.signal, backgroundColor: colors.signalTint },
  pressed: { backgroundColor: colors.sunken },
});
