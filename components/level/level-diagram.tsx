import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import Svg, { Circle, G, Line, Path, Polygon, Rect, Text as SvgText } from 'react-native-svg';

import { stepGuides } from '@/components/level/step-guide';
import { colors, fonts } from '@/components/theme';
import type { LevelStepKey } from '@/shared/level';

/** Drawing colours: the bow in ink, the reference (string, plumb line) in blue, the part being checked in ember, "level" in green. */
const ink = colors.ink;
const reference = colors.info;
const checked = colors.signal;
const good = colors.verified;
const wrong = colors.failed;

function Label({
  x,
  y,
  children,
  anchor = 'start',
  color = colors.inkSoft,
}: {
  x: number;
  y: number;
  children: string;
  anchor?: 'start' | 'middle' | 'end';
  color?: string;
}) {
  return (
    <SvgText x={x} y={y} fontSize={13} fill={color} fontFamily={fonts.bold} textAnchor={anchor}>
      {children}
    </SvgText>
  );
}

/** A bubble vial centred on (cx, cy); `vertical` turns it upright; `offset` moves the bubble off centre (px). */
function Vial({
  cx,
  cy,
  length = 56,
  vertical = false,
  offset = 0,
  edge = checked,
}: {
  cx: number;
  cy: number;
  length?: number;
  vertical?: boolean;
  offset?: number;
  edge?: string;
}) {
  const thick = 14;
  const w = vertical ? thick : length;
  const h = vertical ? length : thick;
  const bx = vertical ? cx : cx + offset;
  const by = vertical ? cy + offset : cy;
  const tick = 9;
  return (
    <G>
      <Rect x={cx - w / 2} y={cy - h / 2} width={w} height={h} rx={thick / 2} fill={colors.verifiedTint} stroke={edge} strokeWidth={2} />
      {vertical ? (
        <>
          <Line x1={cx - thick / 2} y1={cy - tick} x2={cx + thick / 2} y2={cy - tick} stroke={ink} strokeWidth={1.5} />
          <Line x1={cx - thick / 2} y1={cy + tick} x2={cx + thick / 2} y2={cy + tick} stroke={ink} strokeWidth={1.5} />
        </>
      ) : (
        <>
          <Line x1={cx - tick} y1={cy - thick / 2} x2={cx - tick} y2={cy + thick / 2} stroke={ink} strokeWidth={1.5} />
          <Line x1={cx + tick} y1={cy - thick / 2} x2={cx + tick} y2={cy + thick / 2} stroke={ink} strokeWidth={1.5} />
        </>
      )}
      <Circle cx={bx} cy={by} r={5} fill={good} />
    </G>
  );
}

/** A straight arrow from (x1, y1) to (x2, y2), with heads at one or both ends. */
function Arrow({
  x1,
  y1,
  x2,
  y2,
  color = checked,
  both = false,
}: {
  x1: number;
  y1: number;
  x2: number;
  y2: number;
  color?: string;
  both?: boolean;
}) {
  const head = (fromX: number, fromY: number, toX: number, toY: number) => {
    const angle = Math.atan2(toY - fromY, toX - fromX);
    const size = 8;
    const left = [toX - size * Math.cos(angle - 0.45), toY - size * Math.sin(angle - 0.45)];
    const right = [toX - size * Math.cos(angle + 0.45), toY - size * Math.sin(angle + 0.45)];
    return <Polygon points={`${toX},${toY} ${left[0]},${left[1]} ${right[0]},${right[1]}`} fill={color} />;
  };
  return (
    <G>
      <Line x1={x1} y1={y1} x2={x2} y2={y2} stroke={color} strokeWidth={2.5} />
      {head(x1, y1, x2, y2)}
      {both ? head(x2, y2, x1, y1) : null}
    </G>
  );
}

/** A compound bow in side view, riser centred on (cx, cy), string on the right, `tall` from tip to tip. */
function SideBow({ cx, cy, tall = 200, opacity = 1 }: { cx: number; cy: number; tall?: number; opacity?: number }) {
  const half = tall / 2;
  const tipX = cx + 44;
  return (
    <G opacity={opacity}>
      <Path
        d={`M${cx} ${cy - half * 0.55} Q ${cx + 12} ${cy - half * 0.9} ${tipX} ${cy - half}`}
        stroke={ink}
        strokeWidth={6}
        fill="none"
        strokeLinecap="round"
      />
      <Path
        d={`M${cx} ${cy + half * 0.55} Q ${cx + 12} ${cy + half * 0.9} ${tipX} ${cy + half}`}
        stroke={ink}
        strokeWidth={6}
        fill="none"
        strokeLinecap="round"
      />
      <Rect x={cx - 8} y={cy - half * 0.6} width={16} height={half * 1.2} rx={7} fill={colors.slate} />
      <Line x1={tipX} y1={cy - half} x2={tipX} y2={cy + half} stroke={colors.inkSoft} strokeWidth={2} />
      {/* The cams at the limb tips (a compound bow). */}
      <Circle cx={tipX - 3} cy={cy - half + 4} r={6} fill={colors.surface} stroke={ink} strokeWidth={2.5} />
      <Circle cx={tipX - 3} cy={cy + half - 4} r={6} fill={colors.surface} stroke={ink} strokeWidth={2.5} />
    </G>
  );
}

function SetupDiagram() {
  return (
    <>
      {/* Vise: base, post, arm and jaws around the riser. */}
      <Rect x={24} y={214} width={70} height={12} rx={3} fill={colors.lineStrong} />
      <Rect x={52} y={128} width={14} height={88} fill={colors.lineStrong} />
      <Rect x={52} y={122} width={82} height={12} rx={3} fill={colors.lineStrong} />
      <Rect x={126} y={112} width={28} height={32} rx={4} fill="none" stroke={colors.lineStrong} strokeWidth={5} />
      <SideBow cx={140} cy={120} tall={216} />
      {/* Arrow across the rest, nocked on the string. */}
      <Line x1={46} y1={100} x2={186} y2={100} stroke={ink} strokeWidth={3} />
      <Polygon points="38,100 50,94 50,106" fill={ink} />
      <Vial cx={86} cy={92} length={60} />
      {/* String level on the bowstring, and the plumb reference beside it. */}
      <Line x1={206} y1={8} x2={206} y2={232} stroke={reference} strokeWidth={1.5} strokeDasharray="5 5" />
      <Vial cx={184} cy={168} length={50} vertical />
      <Label x={56} y={76} anchor="middle">
        Arrow level
      </Label>
      <Label x={214} y={164} color={reference}>
        String plumb
      </Label>
      <Label x={100} y={224}>
        Vise
      </Label>
    </>
  );
}

function FirstAxisDiagram() {
  return (
    <>
      {/* Seen from behind: the string as the plumb reference, the sight bar beside it. */}
      <Line x1={232} y1={8} x2={232} y2={232} stroke={reference} strokeWidth={2.5} />
      <Label x={240} y={24} color={reference}>
        String
      </Label>
      <Label x={240} y={40} color={reference}>
        (plumb)
      </Label>
      {/* A mis-set bar, for contrast. */}
      <G opacity={0.55}>
        <Rect
          x={138}
          y={36}
          width={14}
          height={168}
          rx={3}
          fill="none"
          stroke={wrong}
          strokeWidth={2}
          strokeDasharray="5 4"
          transform="rotate(7 145 120)"
        />
      </G>
      <Rect x={138} y={36} width={14} height={168} rx={3} fill={colors.slate} />
      {/* Pin housing on the bar, and the mount to the riser. */}
      <Circle cx={145} cy={98} r={20} fill="none" stroke={ink} strokeWidth={4} />
      <Circle cx={145} cy={98} r={3} fill={checked} />
      <Rect x={152} y={140} width={70} height={10} fill={colors.lineStrong} />
      {/* The level held against the bar's face. */}
      <Vial cx={131} cy={150} length={64} vertical />
      <Arrow x1={180} y1={60} x2={180} y2={120} both />
      <Label x={186} y={94} color={checked}>
        Pin
      </Label>
      <Label x={186} y={110} color={checked}>
        travel
      </Label>
      <Label x={20} y={228}>
        Level on the bar face
      </Label>
      <Label x={166} y={228} color={wrong}>
        tilted bar
      </Label>
    </>
  );
}

function SecondAxisDiagram() {
  return (
    <>
      <Line x1={282} y1={8} x2={282} y2={232} stroke={reference} strokeWidth={2.5} />
      <SvgText x={298} y={120} fontSize={13} fill={reference} fontFamily={fonts.bold} textAnchor="middle" transform="rotate(90 298 120)">
        String plumb
      </SvgText>
      {/* The housing from behind: ring, pin, and its bubble vial at the bottom. */}
      <Circle cx={140} cy={110} r={70} fill={colors.surface} stroke={ink} strokeWidth={8} />
      <Line x1={140} y1={180} x2={140} y2={112} stroke={ink} strokeWidth={3} />
      <Circle cx={140} cy={110} r={4} fill={checked} />
      <Vial cx={140} cy={160} length={76} />
      {/* Roll arrows around the ring. */}
      <Path d="M 52 70 A 98 98 0 0 1 94 24" stroke={checked} strokeWidth={2.5} fill="none" />
      <Polygon points="98,20 86,22 94,32" fill={checked} />
      <Path d="M 228 70 A 98 98 0 0 0 186 24" stroke={checked} strokeWidth={2.5} fill="none" />
      <Polygon points="182,20 194,22 186,32" fill={checked} />
      <Label x={140} y={222} anchor="middle">
        Bubble centred
      </Label>
      <Label x={12} y={100} color={checked}>
        roll
      </Label>
    </>
  );
}

function ThirdAxisDiagram() {
  return (
    <>
      {/* The plumb line with its weight. */}
      <Line x1={150} y1={4} x2={150} y2={216} stroke={reference} strokeWidth={2} />
      <Polygon points="150,232 142,216 158,216" fill={reference} />
      <Label x={158} y={16} color={reference}>
        Plumb line
      </Label>
      {/* The bow pitched up and pitched down along the line. */}
      <G transform="rotate(-18 150 120)">
        <SideBow cx={106} cy={120} tall={176} opacity={0.22} />
      </G>
      <G transform="rotate(18 150 120)">
        <SideBow cx={106} cy={120} tall={176} opacity={0.22} />
      </G>
      <SideBow cx={106} cy={120} tall={176} />
      <Path d="M 52 70 A 80 80 0 0 0 52 170" stroke={checked} strokeWidth={2.5} fill="none" />
      <Polygon points="48,62 60,68 50,76" fill={checked} />
      <Polygon points="48,178 60,172 50,164" fill={checked} />
      <Label x={6} y={58} color={checked}>
        up
      </Label>
      <Label x={6} y={196} color={checked}>
        down
      </Label>
      {/* The bubble stays centred. */}
      <Rect x={196} y={88} width={116} height={66} rx={10} fill={colors.surface} stroke={colors.line} strokeWidth={1.5} />
      <Vial cx={254} cy={112} length={80} />
      <Label x={254} y={144} anchor="middle">
        stays centred
      </Label>
    </>
  );
}

function RangeDiagram() {
  const target = (cx: number, cy: number, r: number) => (
    <G>
      <Circle cx={cx} cy={cy} r={r} fill={colors.surface} stroke={ink} strokeWidth={2} />
      <Circle cx={cx} cy={cy} r={r * 0.6} fill="none" stroke={ink} strokeWidth={1.5} />
      <Circle cx={cx} cy={cy} r={r * 0.22} fill={checked} />
    </G>
  );
  return (
    <>
      {/* Ground: a ridge falling away to the right. */}
      <Path d="M 0 96 L 80 96 L 200 214 L 320 214" stroke={colors.lineStrong} strokeWidth={3} fill="none" />
      {/* The archer on the ridge. */}
      <Circle cx={46} cy={52} r={7} fill={ink} />
      <Line x1={46} y1={59} x2={46} y2={82} stroke={ink} strokeWidth={3} />
      <Line x1={46} y1={82} x2={38} y2={95} stroke={ink} strokeWidth={3} />
      <Line x1={46} y1={82} x2={54} y2={95} stroke={ink} strokeWidth={3} />
      <Path d="M 60 40 Q 70 64 60 88" stroke={ink} strokeWidth={3} fill="none" />
      {/* A long shot and a steep one. */}
      <Path d="M 62 62 Q 180 40 290 62" stroke={reference} strokeWidth={2} strokeDasharray="6 5" fill="none" />
      <Path d="M 62 68 L 236 186" stroke={reference} strokeWidth={2} strokeDasharray="6 5" fill="none" />
      {target(296, 64, 16)}
      {target(244, 192, 16)}
      <Label x={300} y={100} anchor="end">
        Long shot
      </Label>
      <Label x={180} y={140}>
        Steep shot
      </Label>
    </>
  );
}

const drawings: Record<LevelStepKey, () => ReactNode> = {
  setup: SetupDiagram,
  'first-axis': FirstAxisDiagram,
  'second-axis': SecondAxisDiagram,
  'third-axis': ThirdAxisDiagram,
  range: RangeDiagram,
};

/**
 * The diagram of one step of a level check, drawn for Pinwright: the bow, the
 * string line, the sight and its bubble, and the tilt being checked. It scales
 * to its container's width (320 × 240 units).
 * Example: `<LevelDiagram step="second-axis" />`
 */
export function LevelDiagram({ step, maxWidth = 420 }: { step: LevelStepKey; maxWidth?: number }) {
  const Drawing = drawings[step];
  return (
    <View style={[styles.frame, { maxWidth }]} role="img" aria-label={stepGuides[step].diagramLabel} testID={`diagram-${step}`}>
      <Svg width="100%" height="100%" viewBox="0 0 320 240" preserveAspectRatio="xMidYMid meet" aria-hidden>
        <Drawing />
      </Svg>
    </View>
  );
}

const styles = StyleSheet.create({
  frame: { width: '100%', aspectRatio: 320 / 240, alignSelf: 'center', backgroundColor: colors.paper, borderRadius: 12 },
});
