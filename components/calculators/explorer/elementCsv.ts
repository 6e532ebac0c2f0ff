/**
 * The per-element excitation table as CSV, for whoever programs the beam-steering controller.
 * Values are written with JavaScript's shortest round-trip number text, so parsing the file gives
 * back exactly the numbers calc/array/elementTable returned (tested).
 */
import type { ElementTable } from '../../../calc/array/index';

export const ELEMENT_CSV_COLUMNS = ['element', 'x_wavelengths', 'y_wavelengths', 'x_m', 'y_m', 'amplitude', 'amplitude_db', 'phase_deg'] as const;

/** CSV text (header + one row per element, '\n' line ends); lengths in wavelengths and in metres at wavelengthM. */
export function elementTableCsv(table: ElementTable, wavelengthM: number): string {
  const lines: string[] = [ELEMENT_CSV_COLUMNS.join(',')];
  for (let n = 0; n < table.amplitude.length; n++) {
    const x = table.xWavelengths[n], y = table.yWavelengths[n];
    lines.push([n + 1, x, y, x * wavelengthM, y * wavelengthM, table.amplitude[n], table.amplitudeDb[n], table.phaseDeg[n]].map((value) => String(value === 0 ? 0 : value)).join(','));
  }
  return `${lines.join('\n')}\n`;
}

/** File name for the CSV of an array. */
export function elementCsvFilename(elementCount: number): string {
  return `element-excitations-${elementCount}.csv`;
}
