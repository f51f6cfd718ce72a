import { resultHints, resultLabels } from '@/components/level/level-words';
import { resultColors, resultIcons } from '@/components/level/result-icons';
import { SegmentedControl, type SegmentOption } from '@/components/ui/segmented-control';
import { layout } from '@/components/theme';
import type { LevelResult } from '@/shared/level';

/** Height of a result button, px: larger than the usual 48 because hands are busy with the bow (layout.bigTap). */
export const bigTap = layout.bigTap;

const results: LevelResult[] = ['pass', 'adjusted', 'fail', 'skipped'];

export interface ResultButtonsProps {
  value: LevelResult | null;
  onChange: (result: LevelResult) => void;
  error?: string;
  disabled?: boolean;
  /** Prefix for test ids, e.g. the step key. */
  testID?: string;
}

/** Each result as a large choice: its icon, word, hint and colour. */
function resultOptions(testID: string | undefined): SegmentOption<LevelResult>[] {
  return results.map((result) => ({
    value: result,
    label: resultLabels[result],
    hint: resultHints[result],
    icon: resultIcons[result],
    tone: resultColors[result],
    testID: testID ? `${testID}-result-${result}` : undefined,
  }));
}

/**
 * The four results of a step as large radio buttons, two by two: icon, word and a hint.
 * Example: `<ResultButtons value={result} onChange={setResult} />`
 */
export function ResultButtons({ value, onChange, error, disabled = false, testID }: ResultButtonsProps) {
  return (
    <SegmentedControl<LevelResult>
      label="Result"
      size="large"
      optionBasis={150}
      options={resultOptions(testID)}
      value={value}
      onChange={onChange}
      error={error}
      disabled={disabled}
    />
  );
}
