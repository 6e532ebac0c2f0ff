import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { parseQuantity } from '../../components/frame/quantity';
import type { QuantityKind } from '../../calc/calculator';

const KINDS: QuantityKind[] = ['frequency', 'length', 'angle', 'decibel', 'levelBelowPeak', 'power', 'powerDensity', 'number', 'count'];

function value(text: string, kind: QuantityKind, wavelengthM?: number): number {
  const r = parseQuantity(text, kind, { wavelengthM });
  if (!r.ok) throw new Error(`expected ${text} to parse: ${r.message}`);
  return r.value;
}

describe('parseQuantity: frequencies (Hz inside)', () => {
  it('accepts 10 GHz, 10e9 and 10000 MHz as the same frequency', () => {
    expect(value('10 GHz', 'frequency')).toBe(10e9);
    expect(value('10e9', 'frequency')).toBe(10e9);
    expect(value('10000 MHz', 'frequency')).toBe(10e9);
    expect(value('10ghz', 'frequency')).toBe(10e9);
    expect(value(' 2.4  GHz ', 'frequency')).toBe(2.4e9);
    expect(value('144 MHz', 'frequency')).toBe(144e6);
  });
  it('gives the canonical link text with the unit', () => {
    const r = parseQuantity('10 GHz', 'frequency');
    expect(r.ok && r.canonical).toBe('10GHz');
  });
});

describe('parseQuantity: lengths (m inside)', () => {
  it('accepts 1.2 m, 30 cm, 4 ft (0.3048 m/ft exact) and 25 mm', () => {
    expect(value('1.2 m', 'length')).toBe(1.2);
    expect(value('30 cm', 'length')).toBeCloseTo(0.3, 15);
    expect(value('4 ft', 'length')).toBeCloseTo(1.2192, 15);
    expect(value('25 mm', 'length')).toBeCloseTo(0.025, 15);
    expect(value('2 in', 'length')).toBeCloseTo(0.0508, 15);
  });
  it('accepts 0.5 λ and 0.5 lambda where a wavelength is defined', () => {
    expect(value('0.5 λ', 'length', 0.03)).toBeCloseTo(0.015, 15);
    expect(value('0.5 lambda', 'length', 0.03)).toBeCloseTo(0.015, 15);
    expect(value('0.5λ', 'length', 0.03)).toBeCloseTo(0.015, 15);
  });
  it('refuses λ without a wavelength, with a message', () => {
    const r = parseQuantity('0.5 λ', 'length');
    expect(r.ok).toBe(false);
    expect(!r.ok && r.message).toMatch(/frequency/);
  });
});

describe('parseQuantity: other kinds', () => {
  it('angles: 45 deg, 45°, bare 45, 0.5 rad', () => {
    expect(value('45 deg', 'angle')).toBe(45);
    expect(value('45°', 'angle')).toBe(45);
    expect(value('45', 'angle')).toBe(45);
    expect(value('0.5 rad', 'angle')).toBeCloseTo(28.6478897565, 9);
  });
  it('decibels, with a Unicode minus', () => {
    expect(value('−10 dB', 'decibel')).toBe(-10);
    expect(value('-10', 'decibel')).toBe(-10);
    expect(value('30 dBi', 'decibel')).toBe(30);
  });
  it('power: 40 dBm = 10 W, 500 mW, 1 kW (dBm definition)', () => {
    expect(value('40 dBm', 'power')).toBeCloseTo(10, 12);
    expect(value('500 mW', 'power')).toBeCloseTo(0.5, 15);
    expect(value('1 kW', 'power')).toBe(1000);
  });
  it('power density: 1 mW/cm² = 10 W/m²', () => {
    expect(value('1 mW/cm²', 'powerDensity')).toBe(10);
  });
  it('counts must be whole', () => {
    expect(value('16', 'count')).toBe(16);
    expect(parseQuantity('16.5', 'count').ok).toBe(false);
  });
});

describe('parseQuantity: bad input gives a message, never a throw', () => {
  it('rejects empty, words, unknown units and overflow with messages', () => {
    for (const [text, pattern] of [
      ['', /Enter a value/],
      ['abc', /Not a number/],
      ['10 GHzz', /Unknown unit/],
      ['1e400', /too large/],
      ['NaN', /Not a number/],
      ['Infinity', /Not a number/],
      ['10 m', /Unknown unit/],
    ] as const) {
      const r = parseQuantity(text, 'frequency');
      expect(r.ok, text).toBe(false);
      expect(!r.ok && r.message, text).toMatch(pattern);
    }
  });
  it('property: arbitrary strings never throw and always give a finite value or a message (fast-check)', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 40 }), fc.constantFrom(...KINDS), (text, kind) => {
        const r = parseQuantity(text, kind, { wavelengthM: 0.03 });
        if (r.ok) expect(Number.isFinite(r.value)).toBe(true);
        else expect(r.message.length).toBeGreaterThan(0);
      }),
      { numRuns: 2000 },
    );
  });
  it('property: a parsed value re-parses from its canonical text to the same number', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.constantFrom('GHz', 'MHz', 'Hz', 'cm', 'mm', 'm', 'ft', 'deg', 'dB'), (x, unit) => {
        const kind: QuantityKind = ['GHz', 'MHz', 'Hz'].includes(unit) ? 'frequency' : ['cm', 'mm', 'm', 'ft'].includes(unit) ? 'length' : unit === 'deg' ? 'angle' : 'decibel';
        const first = parseQuantity(`${x} ${unit}`, kind);
        expect(first.ok).toBe(true);
        if (!first.ok) return;
        const second = parseQuantity(first.canonical, kind);
        expect(second.ok && second.value).toBe(first.value);
      }),
    );
  });
});

describe('parseQuantity: levels below the peak (dB relative to the peak, ≤ 0)', () => {
  it('reads "-30 dB", "−30" and "-30dB" as −30 dB, with no note', () => {
    for (const text of ['-30 dB', '−30', '-30dB']) {
      const r = parseQuantity(text, 'levelBelowPeak');
      expect(r.ok && r.value).toBe(-30);
      expect(r.ok && r.canonical).toBe('-30dB');
      expect(r.ok && r.note).toBeUndefined();
    }
  });
  it('accepts a depth written positive, stores −30 dB and says so (never flipped silently)', () => {
    const r = parseQuantity('30 dB', 'levelBelowPeak');
    expect(r.ok && r.value).toBe(-30);
    expect(r.ok && r.canonical).toBe('-30dB');
    expect(r.ok && r.note).toBe('30 dB entered as a depth: read as −30 dB');
    const zero = parseQuantity('0 dB', 'levelBelowPeak');
    expect(zero.ok && Object.is(zero.value, 0) && zero.canonical).toBe('0dB');
  });
  it('rejects dBi and other units with a message naming the convention', () => {
    const r = parseQuantity('30 dBi', 'levelBelowPeak');
    expect(r.ok).toBe(false);
    expect(!r.ok && r.message).toMatch(/dB relative to the peak, not "dBi"/);
    expect(parseQuantity('30 dBm', 'levelBelowPeak').ok).toBe(false);
  });
});
