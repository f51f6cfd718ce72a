import { StyleSheet, View } from 'react-native';
import Svg, { Circle, G, Line, Rect, Text as SvgText } from 'react-native-svg';

import { useUnits } from '@/components/account/use-units';
import { formatLength } from '@/components/forms/form-numbers';
import { Text } from '@/components/ui/text';
import { colors, fonts, space } from '@/components/theme';
import { tearNames, tearVector } from '@/shared/paper-tune-rules';
import type { PaperTuneShot } from '@/shared/paper-tune';

/** Tears this long (mm) or longer are drawn at full length. */
const fullLengthMm = 50;
const cell = 64;

/**
 * A run's tears in order, left to right: each paper square with the hole and
 * the tear drawn to its measured length (longer tears longer), so a run that
 * is working shrinks toward a clean hole. A sentence beside it says the same.
 * Example: `<TearHistory shots={run.shots} />`
 */
export function TearHistory({ shots }: { shots: readonly PaperTuneShot[] }) {
  // Tear lengths in the archer's length unit: "1.00 in" or "25 mm".
  const units = useUnits();
  const length = (mm: number) => formatLength(mm, units?.lengthUnit ?? 'mm');
  if (shots.length === 0) return null;
  const width = shots.length * (cell + 8);
  const words = shots
    .map((shot) => `${shot.position + 1}: ${tearNames[shot.tear].toLowerCase()}${shot.lengthMm ? ` ${length(shot.lengthMm)}` : ''}`)
    .join('; ');
  return (
    <View style={styles.wrap} testID="tear-history">
      <View accessible accessibilityRole="image" accessibilityLabel={`The tears in order — ${words}`} style={styles.scroll}>
        <Svg width={width} height={cell + 22} viewBox={`0 0 ${width} ${cell + 22}`}>
          {shots.map((shot, index) => {
            const x0 = index * (cell + 8);
            const half = cell / 2;
            const v = tearVector(shot.tear);
            const reach =
              shot.tear === 'clean' ? 0 : Math.max(0.15, Math.min(1, (shot.lengthMm ?? fullLengthMm) / fullLengthMm)) * (half - 6);
            const tone = shot.tear === 'clean' ? colors.verified : colors.ink;
            return (
              <G key={shot.id}>
                <Rect x={x0 + 1} y={1} width={cell - 2} height={cell - 2} fill={colors.surface} stroke={colors.line} strokeWidth={1} />
                {reach > 0 ? (
                  <Line
                    x1={x0 + half}
                    y1={half}
                    x2={x0 + half + v.x * reach}
                    y2={half - v.y * reach}
                    stroke={tone}
                    strokeWidth={5}
                    strokeLinecap="round"
                  />
                ) : null}
                <Circle cx={x0 + half} cy={half} r={5} fill={tone} />
                <SvgText x={x0 + half} y={cell + 16} fontSize={13} fontFamily={fonts.numeral} fill={colors.inkSoft} textAnchor="middle">
                  {`${shot.position + 1}${shot.lengthMm ? ` · ${length(shot.lengthMm)}` : ' · clean'}`}
                </SvgText>
              </G>
            );
          })}
        </Svg>
      </View>
      <Text variant="small" tone="soft">
        {words}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  scroll: { overflow: 'scroll' as never, maxWidth: '100%' },
});
