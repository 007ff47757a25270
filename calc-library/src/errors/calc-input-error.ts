/**
 * The one error every calculator and formula throws for input it cannot use.
 *
 * `field` names the input (as the calculator declares it, e.g. `albedo`), `rule` says in
 * plain words what the input must satisfy (`albedo must be between 0 and 1`), and `where`
 * names the calculator or formula function that refused it, so an API can map the error
 * to a form field and a reader can see which check failed.
 *
 * @example
 * new CalcInputError('albedo', 'albedo must be between 0 and 1', 'energy-balance').message
 * // => 'energy-balance: albedo must be between 0 and 1'
 */
export class CalcInputError extends Error {
  readonly field: string;
  readonly rule: string;
  readonly where: string;

  constructor(field: string, rule: string, where: string) {
    super(`${where}: ${rule}`);
    this.name = 'CalcInputError';
    this.field = field;
    this.rule = rule;
    this.where = where;
  }
}

/** True when `error` is a {@link CalcInputError} (also across bundle copies of the library). */
export function isCalcInputError(error: unknown): error is CalcInputError {
  return (
    error instanceof CalcInputError ||
    (error instanceof Error &&
      error.name === 'CalcInputError' &&
      typeof (error as Partial<CalcInputError>).field === 'string' &&
      typeof (error as Partial<CalcInputError>).rule === 'string')
  );
}
