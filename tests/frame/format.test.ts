import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { canonicalToFieldText, formatCount, formatQuantity, formatSignificant } from '../../components/frame/format';

describe('formatSignificant', () => {
  it('rounds to significant digits and drops trailing zeros', () => {
    expect(formatSignificant(0.0299792458, 4)).toBe('0.02998');
    expect(formatSignificant(2.5, 4)).toBe('2.5');
    expect(formatSignificant(123456, 3)).toBe('123000');
    expect(formatSignificant(0, 3)).toBe('0');
  });
  it('never prints NaN or Infinity (property)', () => {
    fc.assert(
      fc.property(fc.double(), fc.integer({ min: 1, max: 10 }), (x, d) => {
        expect(formatSignificant(x, d)).not.toMatch(/NaN|Infinity/);
      }),
    );
  });
});

describe('formatQuantity picks a unit that reads well', () => {
  it('frequency in GHz/MHz', () => {
    expect(formatQuantity(10e9, 'frequency', 4)).toEqual({ text: '10', unit: 'GHz' });
    expect(formatQuantity(144e6, 'frequency', 4)).toEqual({ text: '144', unit: 'MHz' });
  });
  it('length in m/cm/mm', () => {
    expect(formatQuantity(1.5, 'length', 4)).toEqual({ text: '1.5', unit: 'm' });
    expect(formatQuantity(0.0299792458, 'length', 5)).toEqual({ text: '2.9979', unit: 'cm' });
    expect(formatQuantity(0.0012, 'length', 3)).toEqual({ text: '1.2', unit: 'mm' });
  });
  it('decibels with two decimals; a real minus sign on every negative quantity', () => {
    expect(formatQuantity(-13.2623, 'decibel', 4)).toEqual({ text: '−13.26', unit: 'dB' });
    expect(formatQuantity(-0.034738, 'length', 4)).toEqual({ text: '−3.474', unit: 'cm' });
    expect(formatQuantity(-0.9393, 'angle', 4)).toEqual({ text: '−0.9393', unit: '°' });
    expect(formatQuantity(35.2, 'decibel', 4, 'dBi')).toEqual({ text: '35.20', unit: 'dBi' });
  });
  it('counts with thin-space grouping', () => {
    expect(formatCount(65536)).toBe('65\u202f536');
  });
});

describe('canonicalToFieldText', () => {
  it('puts a space before the unit and shows λ', () => {
    expect(canonicalToFieldText('10GHz')).toBe('10 GHz');
    expect(canonicalToFieldText('0.5lambda')).toBe('0.5 λ');
    expect(canonicalToFieldText('triangular')).toBe('triangular');
  });
});

describe('scientific notation', () => {
  it('uses a superscript exponent for very small and very large values', () => {
    expect(formatSignificant(1.99e-6, 3)).toBe('1.99×10⁻⁶');
    expect(formatSignificant(2.5e12, 2)).toBe('2.5×10¹²');
  });
});

describe('formatOutput: noise below an output\'s resolution shows as 0', () => {
  it('a beam offset of 1.54e-7° with resolution 1e-3° shows as 0°, a real offset is kept', async () => {
    const { formatOutput } = await import('../../components/frame/format');
    const spec = { key: 'peakOffsetDeg', label: 'offset', kind: 'angle' as const, digits: 3, resolution: 1e-3 };
    expect(formatOutput(spec, 1.54e-7).text).toBe('0');
    expect(formatOutput(spec, -1.54e-7).text).toBe('0');
    expect(formatOutput(spec, 0.0123).text).toBe('0.0123');
    expect(formatOutput({ ...spec, resolution: undefined }, 1.54e-7).text).toBe('1.54×10⁻⁷');
  });
  it('a level below the peak shows as a negative number of dB, whatever sign it was given', () => {
    expect(formatQuantity(-30, 'levelBelowPeak', 4)).toEqual({ text: '−30', unit: 'dB' });
    expect(formatQuantity(25.6, 'levelBelowPeak', 4)).toEqual({ text: '−25.6', unit: 'dB' });
  });
});

describe('formatOutput: decibel decimals', () => {
  it('two decimals by default, fewer where the spec says the model supports fewer', async () => {
    const { formatOutput } = await import('../../components/frame/format');
    const spec = { key: 'g', label: 'gain', kind: 'decibel' as const, digits: 4, unit: 'dBi' };
    expect(formatOutput(spec, 12.346).text).toBe('12.35');
    expect(formatOutput({ ...spec, decimals: 1 }, 12.346).text).toBe('12.3');
    expect(formatOutput({ ...spec, decimals: 1 }, -0.04).text).toBe('0.0');
    expect(formatOutput(spec, -0.004).text).toBe('0.00');
  });
});
