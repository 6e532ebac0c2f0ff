import { CalcInputError, requireInteger } from '../errors';

/** Largest number of elements the array engine accepts. */
export const MAX_ARRAY_ELEMENTS = 65_536;

/** Throws a CalcInputError unless count is a whole number of elements from 1 to MAX_ARRAY_ELEMENTS. */
export function requireElementCount(parameter: string, count: number): number {
  requireInteger(parameter, count, 1, Number.MAX_SAFE_INTEGER);
  if (count > MAX_ARRAY_ELEMENTS) {
    throw new CalcInputError(parameter, `expected at most ${MAX_ARRAY_ELEMENTS} elements, got ${count}`);
  }
  return count;
}
