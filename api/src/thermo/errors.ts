/**
 * Typed errors of the thermochemistry engine. Each carries a machine-readable `code` and a
 * message a person can act on; callers (the HTTP layer) map them to responses, so no stack
 * trace ever needs to leave the server.
 */

/** Base class: every error the engine raises on purpose. */
export abstract class ThermoError extends Error {
  abstract readonly code: string;
}

/** A chemical formula or species label that cannot be read. */
export class FormulaError extends ThermoError {
  readonly code = 'formula';

  /**
   * @param input  the text that was parsed
   * @param column 0-based column in `input` where the problem starts
   * @param reason what is wrong, e.g. "unknown element 'Xx'"
   */
  constructor(
    readonly input: string,
    readonly column: number,
    readonly reason: string,
  ) {
    super(`${reason} at column ${column}`);
    this.name = 'FormulaError';
  }
}

/** A reaction equation that cannot be read, or cannot be balanced. */
export class ReactionError extends ThermoError {
  readonly code = 'reaction';

  /**
   * @param input  the equation text
   * @param column 0-based column in `input`, or null when the problem is not at one place
   *               (e.g. "the balance is not unique")
   * @param reason what is wrong
   */
  constructor(
    readonly input: string,
    readonly column: number | null,
    readonly reason: string,
  ) {
    super(column === null ? reason : `${reason} at column ${column}`);
    this.name = 'ReactionError';
  }
}

/** A temperature outside the valid range of a heat-capacity function. */
export class OutOfRangeError extends ThermoError {
  readonly code = 'out-of-range';

  /**
   * @param temperature requested T / K
   * @param tMin lower end of the valid range / K
   * @param tMax upper end of the valid range / K
   * @param subject what was evaluated (e.g. a species label), for the message
   */
  constructor(
    readonly temperature: number,
    readonly tMin: number,
    readonly tMax: number,
    readonly subject = 'heat-capacity function',
  ) {
    super(
      `T = ${temperature} K is outside the valid range ${tMin}–${tMax} K of the ${subject}; ` +
        'pass {extrapolate: true} to extrapolate (the result is then flagged)',
    );
    this.name = 'OutOfRangeError';
  }
}

/** Input values that make no physical sense (T ≤ 0 K, a mass of zero, a malformed fit…). */
export class ThermoInputError extends ThermoError {
  readonly code = 'input';

  constructor(
    readonly field: string,
    readonly reason: string,
  ) {
    super(`${field}: ${reason}`);
    this.name = 'ThermoInputError';
  }
}
