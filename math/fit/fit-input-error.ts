/**
 * An input no sight can have: too few marks, a gap no arrow speed gives, marks
 * in the wrong order for the scale direction, a shot out of reach. `field`
 * names the input field the way people write it ("marks", "marks[1].distance");
 * `detail` is the plain message alone, for display beside that field;
 * `message` joins them in one line ("marks: the 60 yd mark is only 0.4 mm below …").
 *
 * Example: new FitInputError('marks', 'Enter at least two marks').message → 'marks: enter at least two marks'
 */
export class FitInputError extends Error {
  readonly field: string;
  readonly detail: string;

  constructor(field: string, detail: string) {
    super(`${field}: ${detail.charAt(0).toLowerCase()}${detail.slice(1)}`);
    this.name = 'FitInputError';
    this.field = field;
    this.detail = detail;
  }
}

/** True for a FitInputError (also across bundles, by name). Example: isFitInputError(new FitInputError('marks', 'x')) → true */
export function isFitInputError(error: unknown): error is FitInputError {
  return error instanceof FitInputError || (error instanceof Error && error.name === 'FitInputError' && 'field' in error);
}
