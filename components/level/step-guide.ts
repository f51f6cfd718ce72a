import type { LevelStepKey, ReadingUnit } from '@/shared/level';

/**
 * What each step of a level check asks, in our own words (the order and the
 * method are common practice, no published source): what to set up, what to
 * look at, what "level" means for this axis, and what to adjust when it is not.
 */
export interface StepGuide {
  /** Short title, e.g. "Second axis". */
  title: string;
  /** One line under the title. */
  summary: string;
  setUp: string;
  lookAt: string;
  levelMeans: string;
  adjust: string;
  /** An example of an adjustment note for this step. */
  adjustExample: string;
  /** The unit a reading of this step is usually taken in. */
  readingUnit: ReadingUnit;
  /** Plain description of the diagram, for screen readers. */
  diagramLabel: string;
  /** A step-specific safety caution, when there is one. */
  caution?: string;
}

export const stepGuides: Record<LevelStepKey, StepGuide> = {
  setup: {
    title: 'Set-up',
    summary: 'Bow level in the vise, string plumb: the reference for every axis.',
    setUp:
      'Clamp the riser in a bow vise with an arrow nocked and resting on the rest. Lay a bubble level on the arrow (or the riser’s flat), and hang a string level on the bowstring or line it up with a plumb line behind it.',
    lookAt: 'The bubble on the arrow and the string level, both at once.',
    levelMeans: 'The arrow reads level and the string reads plumb together. Everything after this is read against that.',
    adjust:
      'Loosen the vise, roll or tilt the bow a little, tighten, and read both levels again. Repeat until both agree; one can move the other.',
    adjustExample: 'Rolled the bow a little in the vise until the string read plumb',
    readingUnit: 'bubble',
    diagramLabel:
      'A bow clamped upright in a vise. A level on the arrow shows its bubble centred; a string level on the bowstring shows it plumb.',
    caution: 'Never draw or dry-fire a bow held in a vise.',
  },
  'first-axis': {
    title: 'First axis',
    summary: 'The sight’s travel runs parallel to the string.',
    setUp:
      'Keep the bow as the set-up left it: arrow level, string plumb. Hold a small level flat against the sight’s vertical face, the bar the elevation slide runs on.',
    lookAt: 'The level on the sight’s face, compared with the string.',
    levelMeans:
      'With the string plumb, the sight’s face reads plumb too. Then moving the pin up or down for distance does not also move it left or right.',
    adjust:
      'Loosen the sight’s mounting screws and square the bar at the mount (some sights have a first-axis screw, others need a thin shim), tighten evenly, and read again.',
    adjustExample: 'Added a thin shim under the front mounting screw',
    readingUnit: 'deg',
    diagramLabel:
      'The bowstring drawn as a plumb line beside the sight bar. A level held against the sight bar reads plumb; arrows show the pin travelling up and down parallel to the string.',
  },
  'second-axis': {
    title: 'Second axis',
    summary: 'With the string plumb, the sight’s own bubble is centred.',
    setUp: 'Bow still level in the vise, string plumb. Look at the sight from behind, as you would at full draw.',
    lookAt: 'The bubble in the sight housing.',
    levelMeans:
      'The bubble sits in the middle while the string is plumb. At full draw, centring the bubble then really means the bow is upright.',
    adjust:
      'Loosen the second-axis screws and rotate the housing (or the bubble vial) until the bubble centres, tighten, and check it did not move while tightening.',
    adjustExample: 'Turned the second-axis screw a quarter turn',
    readingUnit: 'bubble',
    diagramLabel:
      'The sight housing seen from behind with its bubble centred between two marks; a curved arrow shows the housing rolling left or right around the line of sight.',
  },
  'third-axis': {
    title: 'Third axis',
    summary: 'The bubble stays centred as the bow is pitched up and down.',
    setUp:
      'Hang a plumb line (a weighted string) in front of you. Hold the bow upright with the string lined up on the plumb line and the sight’s bubble centred.',
    lookAt: 'The bubble, while you pitch the bow to aim up the plumb line and then down it, keeping the string on the line.',
    levelMeans: 'The bubble stays centred through the whole pitch. Then steep uphill and downhill shots do not drift left or right.',
    adjust:
      'If the bubble runs off as you pitch, turn the third-axis adjustment a little, re-centre with the second axis, and pitch again. Small steps: each one affects the other.',
    adjustExample: 'Two small turns of the third-axis screw, then re-centred the bubble',
    readingUnit: 'bubble',
    diagramLabel:
      'A bow in side view pitched up and down along a hanging plumb line, with the sight’s bubble shown centred in both positions.',
    caution: 'If you draw the bow for this, have an arrow nocked and a safe backstop: never dry-fire.',
  },
  range: {
    title: 'At the range',
    summary: 'A long shot and a steep shot land where the tape says.',
    setUp: 'Shoot at your longest confirmed distance, then from a steep up or down position (a stand, a bank, a hillside).',
    lookAt: 'Where the groups land against the aiming point, especially left or right.',
    levelMeans: 'Long groups land on the tape’s mark, and steep shots do not drift sideways.',
    adjust:
      'Note any correction. A sideways drift only on steep shots points back to the third axis; a miss high or low at distance points to the marks and the tape: sight in again and print a new tape.',
    adjustExample: 'Groups 2 cm left on the steep shot; re-check the third axis',
    readingUnit: 'mm',
    diagramLabel: 'An archer on a slope shooting at a far target and at a target well below; both arrows land centred.',
  },
};
