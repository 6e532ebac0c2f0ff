/** The per-element amplitude and phase table of the explorer's array (calc/array/elementTable on the same model). */
import type { CalcInputs } from '../calculator';
import { buildArrayModel, elementTable, type ElementTable } from '../array/index';
import { explorerArray } from './explorerInputs';

export function explorerElementTable(inputs: CalcInputs): { table: ElementTable; wavelengthM: number } {
  const array = explorerArray(inputs);
  return { table: elementTable(buildArrayModel(array.spec)), wavelengthM: array.wavelengthM };
}
