/** A simulation input that cannot be run; the message says which field and why. */
export class KineticsInputError extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(`${field}: ${message}`);
    this.name = 'KineticsInputError';
  }
}
