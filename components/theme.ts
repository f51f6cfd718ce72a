import { Platform } from 'react-native';

/**
 * Pinwright's visual identity in one place: a workshop bench at dusk.
 * Deep slate and ink for structure, a bone/paper ground for reading, one warm
 * ember for actions, and a green / amber / red trio for readiness.
 *
 * Every text pair below was checked against WCAG 2.1 contrast (1.4.3, 4.5:1
 * for text, 1.4.11, 3:1 for control borders); the ratio is noted beside it.
 * Example: `<View style={{ backgroundColor: colors.paper, padding: space.md }} />`
 */
export const colors = {
  /** Main text and dark structure. 13.2:1 on paper. */
  ink: '#1E262E',
  /** Secondary text (hints, captions). 6.0:1 on paper, 6.8:1 on surface. */
  inkSoft: '#4F5B66',
  /** App background: bone paper. */
  paper: '#F3EEE4',
  /** Cards, inputs, sheets. */
  surface: '#FFFCF7',
  /** Recessed areas: table stripes, read-only wells. */
  sunken: '#EAE3D6',
  /** Decorative dividers only (not a control boundary). */
  line: '#D6CCBB',
  /** Control borders (inputs, secondary buttons). 3.7:1 on surface. */
  lineStrong: '#7C848C',

  /** Navigation rail / bars: mountain-dusk slate. */
  slate: '#27323D',
  /** Hover / active cell on slate. */
  slateRaised: '#34424F',
  /** Text on slate. 11.3:1. */
  onSlate: '#F3EEE4',
  /** Secondary text on slate. 6.2:1. */
  onSlateMuted: '#A9B4BE',

  /** The one action colour: ember. Paper text on it 5.9:1; as text on paper 5.2:1. */
  signal: '#A9420E',
  /** Ember while pressed. */
  signalPressed: '#8A350B',
  /** Text on ember. */
  onSignal: '#FFFCF7',
  /** Ember tint for selected rows and soft highlights. */
  signalTint: '#F6E3D6',
  /** Ember as an indicator on slate (non-text, 4.3:1). */
  signalOnSlate: '#E0773A',

  /** Readiness: verified. 6.2:1 on its tint. */
  verified: '#24603A',
  verifiedTint: '#E1EEE2',
  /** Readiness: due for a check. 5.5:1 on its tint. */
  due: '#7E5300',
  dueTint: '#F7E8C4',
  /** Readiness: failed, and form errors. 5.9:1 on its tint. */
  failed: '#A12626',
  failedTint: '#F6E0DC',
  /** Readiness: never checked. 4.8:1 on its tint. */
  none: '#5A636C',
  noneTint: '#E8E4DC',

  /** Neutral information. 6.4:1 on its tint. */
  info: '#2F5675',
  infoTint: '#E1EAF1',
  /** Safety cautions: amber on ink, 7.0:1. */
  cautionGround: '#1E262E',
  cautionAccent: '#E3A33B',
  onCaution: '#F3EEE4',

  /** Keyboard focus ring. */
  focus: '#1F5F99',
} as const;

/** Font family names, one per face, as the web build's @font-face rules name them (WEB_FONTS in server/tools/web-pwa.ts). */
export type FontName =
  | 'AtkinsonHyperlegible_400Regular'
  | 'AtkinsonHyperlegible_700Bold'
  | 'BarlowCondensed_500Medium'
  | 'BarlowCondensed_600SemiBold';

// On the web a CSS fallback list keeps text readable if a font file fails to load.
// Each face is its own family, so styles never set fontWeight (that would fake-bold a bold face).
const family = (name: FontName, fallback: string) => (Platform.OS === 'web' ? `${name}, ${fallback}` : name);

/** Font families: Atkinson Hyperlegible for words, Barlow Condensed for numerals. */
export const fonts = {
  body: family('AtkinsonHyperlegible_400Regular', 'system-ui, sans-serif'),
  bold: family('AtkinsonHyperlegible_700Bold', 'system-ui, sans-serif'),
  numeral: family('BarlowCondensed_500Medium', '"Arial Narrow", system-ui, sans-serif'),
  numeralBold: family('BarlowCondensed_600SemiBold', '"Arial Narrow", system-ui, sans-serif'),
} as const;

/**
 * Type scale in px (fontSize / lineHeight). Body is 17 px: readable at arm's
 * length on a phone propped on a bench. Numerals run larger because the
 * condensed face is narrow.
 */
export const type = {
  caption: { fontFamily: fonts.body, fontSize: 14, lineHeight: 20 },
  small: { fontFamily: fonts.body, fontSize: 15, lineHeight: 22 },
  body: { fontFamily: fonts.body, fontSize: 17, lineHeight: 26 },
  label: { fontFamily: fonts.bold, fontSize: 16, lineHeight: 22 },
  lead: { fontFamily: fonts.body, fontSize: 19, lineHeight: 28 },
  title: { fontFamily: fonts.bold, fontSize: 21, lineHeight: 28 },
  heading: { fontFamily: fonts.bold, fontSize: 27, lineHeight: 34 },
  display: { fontFamily: fonts.bold, fontSize: 34, lineHeight: 40 },
  numeral: { fontFamily: fonts.numeral, fontSize: 22, lineHeight: 26 },
  numeralLarge: { fontFamily: fonts.numeralBold, fontSize: 40, lineHeight: 44 },
} as const;

/** Spacing steps in px. */
export const space = {
  xxs: 2,
  xs: 4,
  sm: 8,
  md: 12,
  lg: 16,
  xl: 24,
  xxl: 32,
  xxxl: 48,
} as const;

/** Corner radii in px. */
export const radii = {
  sm: 6,
  md: 10,
  lg: 16,
  pill: 999,
} as const;

/** Layout measures in px. */
export const layout = {
  /** Smallest tap target (WCAG 2.5.5 asks 44; we use 48 for gloved or busy hands). */
  minTap: 48,
  /** Tap target where hands are busy with the bow (level checks, results): 64. */
  bigTap: 64,
  /** Content column cap on wide screens. */
  contentMax: 1040,
  /** Narrow column for single forms (sign-in, one-field pages). */
  formMax: 440,
  /** Window width from which the navigation becomes a left rail. */
  wideFrom: 960,
  /** Left rail width on wide screens. */
  railWidth: 224,
  /** Bottom bar height on phones (without the safe-area inset). */
  bottomBarHeight: 64,
} as const;

/** Border widths in px. */
export const borders = {
  hairline: 1,
  control: 1.5,
  focus: 2,
  heavy: 4,
} as const;

/** The whole theme as one object, for code that wants to pass it around. */
export const theme = { colors, fonts, type, space, radii, layout, borders } as const;
export type Theme = typeof theme;
