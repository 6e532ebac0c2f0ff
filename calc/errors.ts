/**
 * The one rule for invalid input in calc/:
 * public functions check their arguments and throw a CalcInputError whose message names the
 * parameter, what was expected (range and unit) and what was given. They never return NaN or
 * Infinity for a valid input, and never accept an invalid one silently. The frame validates
 * field input against each parameter's spec before calling calc/, so in the UI these errors are
 * a second line of defence; in library use they are the first.
 */
export class CalcInputError extends RangeError {
  readonly parameter: string;
  constructor(parameter: string, message: string) {
    super(`${parameter}: ${message}`);
    this.name = 'CalcInputError';
    this.parameter = parameter;
  }
}

function describe(value: unknown): string {
  return typeof value === 'number' ? String(value) : JSON.stringify(value);
}

/** Throws unless value is a finite number. */
export function requireFinite(parameter: string, value: number, unit = ''): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new CalcInputError(parameter, `expected a finite number${unit ? ` in ${unit}` : ''}, got ${describe(value)}`);
  }
  return value;
}

/** Throws unless value is finite and > 0. */
export function requirePositive(parameter: string, value: number, unit = ''): number {
  requireFinite(parameter, value, unit);
  if (!(value > 0)) throw new CalcInputError(parameter, `expected a value > 0${unit ? ` ${unit}` : ''}, got ${value}`);
  return value;
}

/** Throws unless value is finite and ≥ 0. */
export function requireNonNegative(parameter: string, value: number, unit = ''): number {
  requireFinite(parameter, value, unit);
  if (!(value >= 0)) throw new CalcInputError(parameter, `expected a value ≥ 0${unit ? ` ${unit}` : ''}, got ${value}`);
  return value;
}

/** Throws unless min ≤ value ≤ max (inclusive). */
export function requireInRange(parameter: string, value: number, min: number, max: number, unit = ''): number {
  requireFinite(parameter, value, unit);
  if (value < min || value > max) {
    const u = unit ? ` ${unit}` : '';
    throw new CalcInputError(parameter, `expected a value from ${min} to ${max}${u}, got ${value}${u}`);
  }
  return value;
}

/** Throws unless value is an integer in [min, max]. */
export function requireInteger(parameter: string, value: number, min: number, max: number): number {
  requireFinite(parameter, value);
  if (!Number.isInteger(value) || value < min || value > max) {
    throw new CalcInputError(parameter, `expected a whole number from ${min} to ${max}, got ${value}`);
  }
  return value;
}
