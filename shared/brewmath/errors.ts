/**
 * The one error the brewing math throws. `field` names the offending input (as spelled in the
 * function's parameters, e.g. `volumeL`, `targetSg`) so the API can turn it into a per-field
 * 400; `message` is written for a brewer, not a programmer.
 */
export type BrewMathErrorCode =
  | 'not-a-number'
  | 'out-of-range'
  | 'empties-kettle'
  | 'target-below-current'
  | 'target-above-current'
  | 'inconsistent';

export class BrewMathError extends Error {
  readonly code: BrewMathErrorCode;
  readonly field: string | undefined;

  constructor(message: string, code: BrewMathErrorCode, field?: string) {
    super(message);
    this.name = 'BrewMathError';
    this.code = code;
    this.field = field;
  }
}
