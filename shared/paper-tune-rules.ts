import type { CamSystem, RestKind } from './setup-measures';

/**
 * Reading a paper tear: the next adjustment, in our own plain words, as one
 * small table. Each rule names its source. These are trade practice with no
 * published source, written from memory; they suit a release-aid compound
 * bow. When unsure, the pro shop. tests/unit/paper-tune-rules.test.ts covers
 * every direction, both hands, every rest kind and cam system.
 *
 * The tear is read from behind the paper (where the archer stands): the
 * direction the tail (nock end) tore away from the point's hole, one of eight,
 * or a clean hole.
 *
 * The geometry behind the table: a tail that tears away from the hole means
 * the nock end trails to that side of the line from nock to rest, so the rest
 * moves toward the tail ("follow the tail with the rest"), or, for a vertical
 * tear, the nock moves away from it. For a right-handed bow the riser is on
 * the arrow's right (seen from behind), so "right" is toward the riser; a
 * left-handed bow mirrors that.
 *
 * Example: suggestNext({ tear: 'up', lengthMm: 20, hand: 'right', rest: 'drop-away', cam: 'hybrid' }).headline
 *   → 'Tail high: move the nock point down, or the rest up'
 */

export const tearDirections = ['up', 'up-right', 'right', 'down-right', 'down', 'down-left', 'left', 'up-left'] as const;
export type TearDirection = (typeof tearDirections)[number];
export type Tear = TearDirection | 'clean';
export const tearValues = [...tearDirections, 'clean'] as const;

export const tearNames: Record<Tear, string> = {
  up: 'Tail high',
  'up-right': 'Tail high and right',
  right: 'Tail right',
  'down-right': 'Tail low and right',
  down: 'Tail low',
  'down-left': 'Tail low and left',
  left: 'Tail left',
  'up-left': 'Tail high and left',
  clean: 'Clean hole',
};

/** Unit vector of the tail's direction as drawn (x right, y up), for diagrams. Clean: 0, 0. */
export function tearVector(tear: Tear): { x: number; y: number } {
  if (tear === 'clean') return { x: 0, y: 0 };
  const index = tearDirections.indexOf(tear);
  const angle = Math.PI / 2 - (index * Math.PI) / 4; // up = 90°, then clockwise by 45°
  return { x: Math.cos(angle), y: Math.sin(angle) };
}

export type Hand = 'right' | 'left';

const source = 'Trade practice, no published source (from memory).';

/**
 * A tear this long or shorter is "small": adjust in small steps. 12 mm is
 * about 1/2 in (common practice, no published source; from memory).
 */
export const smallTearMm = 12;

export interface PaperTuneRule {
  id: string;
  /** When it applies. */
  applies: (facts: TuneFacts) => boolean;
  /** Its words for these facts. */
  words: (facts: TuneFacts) => string;
  source: string;
}

export interface TuneFacts {
  tear: Tear;
  lengthMm: number | null;
  hand: Hand;
  /** The rest kind from the bow's set-up, or null when not recorded. */
  rest: RestKind | null;
  /** The cam system from the bow's set-up, or null when not recorded. */
  cam: CamSystem | null;
}

const vertical = (tear: Tear): 'up' | 'down' | null => (tear.startsWith('up') ? 'up' : tear.startsWith('down') ? 'down' : null);
const horizontal = (tear: Tear): 'left' | 'right' | null => (tear.endsWith('left') ? 'left' : tear.endsWith('right') ? 'right' : null);
/** Toward or away from the riser, for a rest moving to `side` (seen from behind) on a bow for `hand`. */
export const riserWords = (side: 'left' | 'right', hand: Hand) =>
  (side === 'right') === (hand === 'right') ? 'toward the riser (less centre shot)' : 'away from the riser (more centre shot)';
const hasYoke = (cam: CamSystem | null) => cam === 'single' || cam === 'hybrid' || cam === 'binary';
const twoCams = (cam: CamSystem | null) => cam === 'hybrid' || cam === 'binary' || cam === 'dual';

/** The table, in the order its lines are given. */
export const paperTuneRules: readonly PaperTuneRule[] = [
  {
    id: 'clean',
    applies: (f) => f.tear === 'clean',
    words: () => 'Clean hole: change nothing. Shoot two or three more through the paper to be sure it repeats.',
    source,
  },
  {
    id: 'vertical-first',
    applies: (f) => vertical(f.tear) !== null && horizontal(f.tear) !== null,
    words: () => 'Both ways at once: fix the up-and-down part first, then read a new tear for the side-to-side part.',
    source,
  },
  {
    id: 'cam-timing-first',
    applies: (f) => vertical(f.tear) !== null && twoCams(f.cam),
    words: () =>
      'First check the cam timing: both draw stops should touch together. If they do not, have the timing set (a press job) before moving the nock or rest.',
    source,
  },
  {
    id: 'tail-high',
    applies: (f) => vertical(f.tear) === 'up',
    words: () => 'Move the nock point down, or the rest up.',
    source,
  },
  {
    id: 'tail-low',
    applies: (f) => vertical(f.tear) === 'down',
    words: () => 'Move the nock point up, or the rest down.',
    source,
  },
  {
    id: 'drop-away-high',
    applies: (f) => vertical(f.tear) === 'up' && f.rest === 'drop-away',
    words: () =>
      'With a drop-away rest a high tail can also be a vane striking the launcher: check that the rest falls in time (its cord) and look for vane marks.',
    source,
  },
  {
    id: 'blade-high',
    applies: (f) => vertical(f.tear) === 'up' && f.rest === 'blade',
    words: () =>
      'With a blade rest a high tail can also be a blade too stiff for the arrow, or a vane touching it: look for marks on the blade.',
    source,
  },
  {
    id: 'containment',
    applies: (f) => f.tear !== 'clean' && f.rest === 'containment',
    words: () => 'A full-containment rest touches the arrow all the way out: check that the vanes pass its bristles or ring cleanly.',
    source,
  },
  {
    id: 'side-rest',
    applies: (f) => vertical(f.tear) === null && horizontal(f.tear) !== null,
    words: (f) => `Move the rest ${horizontal(f.tear)}, ${riserWords(horizontal(f.tear)!, f.hand)}.`,
    source,
  },
  {
    id: 'side-yoke',
    applies: (f) => vertical(f.tear) === null && horizontal(f.tear) !== null && hasYoke(f.cam),
    words: () =>
      'If the rest already sits at the usual centre shot, the side tear can be tuned at the yoke instead (a twist on one side leans the cam): a press job.',
    source,
  },
  {
    id: 'side-no-yoke',
    applies: (f) => vertical(f.tear) === null && horizontal(f.tear) !== null && f.cam === 'dual',
    words: () => 'Without a yoke, a side tear that the rest cannot cure may be cam lean or the arrow’s spine: ask a pro shop.',
    source,
  },
  {
    id: 'step-size',
    applies: (f) => f.tear !== 'clean',
    words: (f) =>
      f.lengthMm !== null && f.lengthMm <= smallTearMm
        ? 'A short tear: move in small steps, about 1/32 in (0.8 mm) at a time.'
        : 'Move about 1/16 in (1.6 mm) at a time, one thing per shot, and note what you changed.',
    source,
  },
  {
    id: 'unknown-setup',
    applies: (f) => f.tear !== 'clean' && (f.rest === null || f.cam === null),
    words: () => 'Add the rest kind and cam system to the bow’s set-up for advice worded for them.',
    source,
  },
];

export interface Suggestion {
  /** One line: the tear and the main move. */
  headline: string;
  /** The rules that apply, in table order, with their words. */
  lines: { ruleId: string; words: string; source: string }[];
}

/**
 * The usual next adjustment for a tear.
 * Example: suggestNext({ tear: 'left', lengthMm: 10, hand: 'left', rest: 'blade', cam: 'single' }).lines[0].words
 *   → 'Move the rest left, toward the riser (less centre shot).'
 */
export function suggestNext(facts: TuneFacts): Suggestion {
  const lines = paperTuneRules
    .filter((rule) => rule.applies(facts))
    .map((rule) => ({ ruleId: rule.id, words: rule.words(facts), source: rule.source }));
  const v = vertical(facts.tear);
  const h = horizontal(facts.tear);
  const headline =
    facts.tear === 'clean'
      ? 'Clean hole: the run can end here'
      : v === 'up'
        ? `${tearNames[facts.tear]}: move the nock point down, or the rest up`
        : v === 'down'
          ? `${tearNames[facts.tear]}: move the nock point up, or the rest down`
          : `${tearNames[facts.tear]}: move the rest ${h}, ${riserWords(h!, facts.hand)}`;
  return { headline, lines };
}

/** The cautions every paper-tune screen shows. */
export const paperTuneCautions = [
  'Cam timing, cam lean and yoke work need the bow in a press: follow the press maker’s instructions and wear eye protection.',
  'Never dry-fire: always shoot an arrow of the right weight through the paper, into a safe backstop.',
  'Leave to a pro shop what you are unsure of.',
];
