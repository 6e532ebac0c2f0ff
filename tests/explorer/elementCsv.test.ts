import { describe, expect, it } from 'vitest';
import { ELEMENT_CSV_COLUMNS, elementCsvFilename, elementTableCsv } from '../../components/calculators/explorer/elementCsv';
import { explorerElementTable } from '../../calc/explorer/explorerElementTable';
import { buildArrayModel, elementTable } from '../../calc/array/index';
import { explorerArray } from '../../calc/explorer/explorerInputs';
import { inputsFor } from '../calc/explorer/inputsFor';

function parse(csv: string) {
  const [header, ...rows] = csv.trimEnd().split('\n');
  return { header: header.split(','), rows: rows.map((r) => r.split(',').map(Number)) };
}

describe('elementTableCsv(table, wavelengthM)', () => {
  it("holds exactly calc/array/elementTable's values for a steered, tapered, quantized planar array", () => {
    const inputs = inputsFor({ geo: 'planar', lat: 'triangular', out: 'circle', nx: '12', ny: '12', tap: 'taylor', th: '40 deg', ph: '30 deg', bits: '4', f: '12 GHz', d: '0.55 λ' });
    const { table, wavelengthM } = explorerElementTable(inputs);
    const reference = elementTable(buildArrayModel(explorerArray(inputs).spec)); // the engine's own table, built independently
    const { header, rows } = parse(elementTableCsv(table, wavelengthM));
    expect(header).toEqual([...ELEMENT_CSV_COLUMNS]);
    expect(rows.length).toBe(reference.amplitude.length);
    rows.forEach((row, n) => {
      expect(row[0]).toBe(n + 1);
      expect(row[1]).toBe(reference.xWavelengths[n]);
      expect(row[2]).toBe(reference.yWavelengths[n]);
      expect(row[3]).toBe(reference.xWavelengths[n] * wavelengthM);
      expect(row[4]).toBe(reference.yWavelengths[n] * wavelengthM);
      expect(row[5]).toBe(reference.amplitude[n]);
      expect(row[6]).toBe(reference.amplitudeDb[n]);
      expect(row[7]).toBe(reference.phaseDeg[n]);
    });
    // 4-bit shifters: every phase is a multiple of 22.5° in [0, 360)
    for (const row of rows) {
      expect(row[7] / 22.5).toBeCloseTo(Math.round(row[7] / 22.5), 9);
      expect(row[7]).toBeGreaterThanOrEqual(0);
      expect(row[7]).toBeLessThan(360);
    }
  });
  it('writes no NaN, Infinity or negative zero, and names the file by element count', () => {
    const inputs = inputsFor({ geo: 'linear', nx: '5', th: '0 deg' });
    const { table, wavelengthM } = explorerElementTable(inputs);
    const csv = elementTableCsv(table, wavelengthM);
    expect(csv).not.toMatch(/NaN|Infinity|-0(,|\n)/);
    expect(csv.endsWith('\n')).toBe(true);
    expect(elementCsvFilename(5)).toBe('element-excitations-5.csv');
  });
});
