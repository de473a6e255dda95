// Typed engine errors. Each names the input field (a dotted path, e.g. "reach.section.bottomWidth")
// so that the CLI, the API and the forms can show the message at the right place.

export class EngineError extends Error {
  constructor(
    message: string,
    readonly field: string,
    readonly code: string,
  ) {
    super(message);
    this.name = new.target.name;
  }
}

/** The input is malformed or out of its physical range (negative width, n ≤ 0, NaN…). */
export class InvalidInputError extends EngineError {
  constructor(field: string, reason: string) {
    super(`${field}: ${reason}`, field, 'invalid-input');
  }
}

/**
 * The input is well formed but the physics has no answer: no normal depth on a flat or adverse bed,
 * a control below critical depth on a mild reach, a weir drowned out, a section overtopped.
 */
export class NoPhysicalSolutionError extends EngineError {
  constructor(field: string, code: string, explanation: string) {
    super(`${field}: ${explanation}`, field, code);
  }
}

export function requirePositive(value: number, field: string): void {
  if (typeof value !== 'number' || !Number.isFinite(value)) throw new InvalidInputError(field, 'must be a finite number');
  if (value <= 0) throw new InvalidInputError(field, 'must be greater than 0');
}

export function requireNonNegative(value: number, field: string): void {
  if (typeof value !== 'number' || !Number.isFinite(value)) throw new InvalidInputError(field, 'must be a finite number');
  if (value < 0) throw new InvalidInputError(field, 'must be 0 or more');
}

export function requireFinite(value: number, field: string): void {
  if (typeof value !== 'number' || !Number.isFinite(value)) throw new InvalidInputError(field, 'must be a finite number');
}
