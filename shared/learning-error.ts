/**
 * One error type for every bad input to the learning logic (units, hardiness, finder, side by side).
 *
 * Policy, applied the same way in every module: input that cannot be right (NaN, an impossible
 * temperature, an unknown zone, fewer than two records to compare, a malformed finder answer)
 * throws a `LearningInputError`; data that is merely missing (a record without a hardiness range,
 * a record without traits, a finder query with no answers) is not an error and yields an
 * "unknown"/neutral result instead. The server maps this error to a 400 with `code` and `message`.
 */
export type LearningErrorCode =
  | 'not_a_number'
  | 'impossible_temperature'
  | 'outside_zone_map'
  | 'unknown_zone'
  | 'invalid_length'
  | 'invalid_answer'
  | 'invalid_records'
  | 'too_few_records'
  | 'too_many_records'
  | 'invalid_argument';

/** Thrown for input that cannot be right; `code` is stable for the API, `message` is plain English. */
export class LearningInputError extends Error {
  readonly code: LearningErrorCode;

  constructor(code: LearningErrorCode, message: string) {
    super(message);
    this.name = 'LearningInputError';
    this.code = code;
  }
}

/** Throws `not_a_number` for NaN and ±Infinity, which would otherwise poison every sum downstream. */
export function assertFinite(value: number, what: string): void {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new LearningInputError('not_a_number', `${what} must be a finite number (got ${String(value)}).`);
  }
}
