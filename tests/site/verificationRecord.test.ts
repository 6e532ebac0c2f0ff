import { describe, expect, it } from 'vitest';
import { referenceGroups } from '../../verification/reference/index';
import { buildVerificationRecord, formatComputedNumber, formatRecordNumber } from '../../site/lib/verificationRecord';
import { caseUnit, type ReferenceGroup } from '../../verification/reference/referenceCase';
import { transcribedGroups } from '../../verification/reference/transcribed';

const record = buildVerificationRecord(referenceGroups, transcribedGroups);

describe('verification record data (site/lib/verificationRecord.ts)', () => {
  it('lists exactly the reference cases the test suite runs: same groups, ids, order and count', () => {
    expect(record.groups.map((g) => g.topic)).toEqual(referenceGroups.map((g) => g.topic));
    expect(record.groups.map((g) => g.rows.map((r) => r.id))).toEqual(referenceGroups.map((g) => g.cases.map((c) => c.id)));
    expect(record.total).toBe(referenceGroups.reduce((n, g) => n + g.cases.length, 0));
  });

  it('lists the transcribed values apart, with the decimals their source supports, outside the pass count', () => {
    const values = transcribedGroups.flatMap((t) => t.values);
    expect(record.transcribed.flatMap((t) => t.rows.map((r) => r.id))).toEqual(values.map((v) => v.id));
    const caseIds = new Set(record.groups.flatMap((g) => g.rows.map((r) => r.id)));
    for (const v of values) expect(caseIds.has(v.id), v.id).toBe(false);
    expect(record.total).toBe(referenceGroups.reduce((n, g) => n + g.cases.length, 0));
    // The Yagi–Uda table: from memory, shown to 0.1 dB (12.25 is not shown as 12.25).
    const yagi = record.transcribed.find((t) => t.constant.endsWith('NBS_YAGI_DESIGNS'))!;
    expect(yagi.rows.map((r) => r.text)).toEqual(['7.1 dBd', '9.2 dBd', '10.2 dBd', '12.3 dBd', '13.4 dBd', '14.2 dBd']);
  });

  it('carries each case’s source, expected value, tolerance and unit unchanged', () => {
    const cases = referenceGroups.flatMap((g) => g.cases);
    const rows = record.groups.flatMap((g) => g.rows);
    rows.forEach((row, i) => {
      const c = cases[i];
      expect([row.title, row.source, row.expected, row.tolerance, row.unit]).toEqual([c.title, c.source, c.expected, c.tolerance, caseUnit(c)]);
      expect(row.computed).toBe(c.compute());
    });
  });

  it('records failures honestly: out of tolerance, non-finite and throwing cases fail', () => {
    const group: ReferenceGroup = {
      topic: 'made-up failures',
      modules: [],
      cases: [
        { id: 'ok', title: 'ok', source: 'test only', expected: 1, tolerance: 0.1, quantity: 'ratio', reads: 'x', compute: () => 1.05 },
        { id: 'off', title: 'off', source: 'test only', expected: 1, tolerance: 0.01, quantity: 'ratio', reads: 'x', compute: () => 1.05 },
        { id: 'nan', title: 'nan', source: 'test only', expected: 1, tolerance: 1, quantity: 'ratio', reads: 'x', compute: () => Number.NaN },
        { id: 'throws', title: 'throws', source: 'test only', expected: 1, tolerance: 1, quantity: 'ratio', reads: 'x', compute: () => { throw new Error('boom'); } },
      ],
    };
    const r = buildVerificationRecord([group]);
    expect(r.groups[0].rows.map((row) => row.pass)).toEqual([true, false, false, false]);
    expect(r.groups[0].rows[3].failure).toBe('boom');
    expect(r.passed).toBe(1);
    expect(r.total).toBe(4);
  });

  it('formats numbers for the record without losing the digits that matter', () => {
    expect(formatRecordNumber(0.0299792458)).toBe('0.0299792458');
    expect(formatRecordNumber(1e-15)).toBe('1 × 10⁻¹⁵');
    expect(formatRecordNumber(2 / 3)).toBe('0.666666666667');
    expect(formatRecordNumber(null)).toBe('—');
    expect(formatRecordNumber(0)).toBe('0');
    expect(formatRecordNumber(-2.678946706226)).toBe('−2.67894670623');
  });

  it('shows a computed value with the digits its tolerance supports, not 12', () => {
    expect(formatComputedNumber(0.885893500457, 0.886e-3)).toBe('0.88589'); // ±0.000886: 5 decimals
    expect(formatComputedNumber(66.15948829687, 7)).toBe('66.2'); // ±7: 1 decimal
    expect(formatComputedNumber(-13.2619, 0.01)).toBe('−13.262');
    expect(formatComputedNumber(2 / 3, 1e-12)).toBe('0.666666666667'); // tight tolerance: all 12 digits
    expect(formatComputedNumber(1.5e-15, 1e-12)).toBe('1.5 × 10⁻¹⁵');
    expect(formatComputedNumber(null, 0.1)).toBe('—');
  });
});
