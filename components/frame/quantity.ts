/**
 * Unit-aware parsing of field text, and the canonical text form used in links.
 * A field's text is parsed into a number in internal units (Hz, m, degrees, dB, W, W/m²).
 * Parsing never throws: it returns { ok: false, message } for anything it cannot read.
 */
import type { QuantityKind } from '../../calc/calculator';
import { M_PER_FT, M_PER_IN } from '../../calc/constants';

export type ParseResult =
  | { ok: true; value: number; canonical: string; note?: string }
  | { ok: false; message: string };

interface UnitDef {
  /** Canonical spelling, used in links. */
  canonical: string;
  /** Accepted spellings (compared case-sensitively unless the kind is case-insensitive). */
  spellings: string[];
  /** Internal value = number × factor + offset, or a custom conversion. */
  toInternal: (x: number, context: ParseContext) => number | null;
}

export interface ParseContext {
  /** Wavelength in metres for length entries given in λ; undefined when none is defined. */
  wavelengthM?: number;
}

const scale = (factor: number) => (x: number) => x * factor;

const UNITS: Record<QuantityKind, { units: UnitDef[]; bare: string; caseInsensitive: boolean; example: string }> = {
  frequency: {
    bare: 'Hz',
    caseInsensitive: true,
    example: '10 GHz, 10e9 or 10000 MHz',
    units: [
      { canonical: 'Hz', spellings: ['hz'], toInternal: scale(1) },
      { canonical: 'kHz', spellings: ['khz'], toInternal: scale(1e3) },
      { canonical: 'MHz', spellings: ['mhz'], toInternal: scale(1e6) },
      { canonical: 'GHz', spellings: ['ghz'], toInternal: scale(1e9) },
      { canonical: 'THz', spellings: ['thz'], toInternal: scale(1e12) },
    ],
  },
  length: {
    bare: 'm',
    caseInsensitive: true,
    example: '1.2 m, 30 cm, 4 ft or 0.5 λ',
    units: [
      { canonical: 'm', spellings: ['m', 'metre', 'metres', 'meter', 'meters'], toInternal: scale(1) },
      { canonical: 'km', spellings: ['km'], toInternal: scale(1e3) },
      { canonical: 'cm', spellings: ['cm'], toInternal: scale(1e-2) },
      { canonical: 'mm', spellings: ['mm'], toInternal: scale(1e-3) },
      { canonical: 'um', spellings: ['um', 'µm', 'μm'], toInternal: scale(1e-6) },
      { canonical: 'ft', spellings: ['ft', 'feet', 'foot', "'"], toInternal: scale(M_PER_FT) },
      { canonical: 'in', spellings: ['in', 'inch', 'inches', '"'], toInternal: scale(M_PER_IN) },
      {
        canonical: 'lambda',
        spellings: ['λ', 'lambda', 'wl', 'wavelength', 'wavelengths', 'lambdas'],
        toInternal: (x, context) => (context.wavelengthM && context.wavelengthM > 0 ? x * context.wavelengthM : null),
      },
    ],
  },
  angle: {
    bare: 'deg',
    caseInsensitive: true,
    example: '45 deg, 45° or 0.785 rad',
    units: [
      { canonical: 'deg', spellings: ['deg', '°', 'degree', 'degrees', 'd'], toInternal: scale(1) },
      { canonical: 'rad', spellings: ['rad', 'radian', 'radians'], toInternal: scale(180 / Math.PI) },
      { canonical: 'mrad', spellings: ['mrad'], toInternal: scale(0.18 / Math.PI) },
    ],
  },
  decibel: {
    bare: 'dB',
    caseInsensitive: true,
    example: '-10 dB or 30 dBi',
    units: [
      { canonical: 'dB', spellings: ['db'], toInternal: scale(1) },
      { canonical: 'dBi', spellings: ['dbi'], toInternal: scale(1) },
    ],
  },
  levelBelowPeak: {
    bare: 'dB',
    caseInsensitive: true,
    example: '-30 dB',
    units: [{ canonical: 'dB', spellings: ['db'], toInternal: (x) => -Math.abs(x) }],
  },
  power: {
    bare: 'W',
    caseInsensitive: false,
    example: '10 W, 500 mW or 40 dBm',
    units: [
      { canonical: 'W', spellings: ['W', 'w'], toInternal: scale(1) },
      { canonical: 'mW', spellings: ['mW'], toInternal: scale(1e-3) },
      { canonical: 'kW', spellings: ['kW'], toInternal: scale(1e3) },
      { canonical: 'MW', spellings: ['MW'], toInternal: scale(1e6) },
      { canonical: 'dBm', spellings: ['dBm', 'dbm'], toInternal: (x) => 10 ** ((x - 30) / 10) },
      { canonical: 'dBW', spellings: ['dBW', 'dbw'], toInternal: (x) => 10 ** (x / 10) },
    ],
  },
  powerDensity: {
    bare: 'W/m2',
    caseInsensitive: false,
    example: '10 W/m² or 1 mW/cm²',
    units: [
      { canonical: 'W/m2', spellings: ['W/m2', 'W/m²', 'W/m^2', 'w/m2', 'w/m²'], toInternal: scale(1) },
      { canonical: 'mW/cm2', spellings: ['mW/cm2', 'mW/cm²', 'mW/cm^2', 'mw/cm2'], toInternal: scale(10) },
      { canonical: 'uW/cm2', spellings: ['uW/cm2', 'µW/cm2', 'μW/cm2', 'uW/cm²', 'µW/cm²'], toInternal: scale(1e-2) },
    ],
  },
  number: { bare: '', caseInsensitive: true, example: '1.5', units: [] },
  count: { bare: '', caseInsensitive: true, example: '16', units: [] },
};

const NUMBER_PATTERN = /^([+-]?(?:\d+(?:[.,]\d*)?|[.,]\d+)(?:e[+-]?\d+)?)\s*(.*)$/i;

/** Example entries for a kind, for messages and hints. */
export function exampleFor(kind: QuantityKind): string {
  return UNITS[kind].example;
}

/** Units a kind accepts, canonical spellings, for hints. */
export function unitsFor(kind: QuantityKind): string[] {
  const shown: Record<string, string> = { lambda: 'λ', um: 'µm', 'W/m2': 'W/m²', 'mW/cm2': 'mW/cm²', 'uW/cm2': 'µW/cm²' };
  return UNITS[kind].units.map((u) => shown[u.canonical] ?? u.canonical);
}

/** Parses text of a given kind into internal units. Never throws. */
export function parseQuantity(text: string, kind: QuantityKind, context: ParseContext = {}): ParseResult {
  if (typeof text !== 'string') return { ok: false, message: 'Expected text.' };
  const cleaned = text.replace(/\u2212/g, '-').replace(/[\s\u00a0\u202f]+/g, ' ').trim();
  if (cleaned === '') return { ok: false, message: 'Enter a value.' };
  const spec = UNITS[kind];
  const match = NUMBER_PATTERN.exec(cleaned);
  if (!match) return { ok: false, message: `Not a number. Expected e.g. ${spec.example}.` };
  const numberText = match[1].replace(',', '.');
  const x = Number(numberText);
  if (!Number.isFinite(x)) return { ok: false, message: 'The number is too large.' };
  const unitText = match[2].trim();
  let unit: UnitDef | undefined;
  if (unitText === '') {
    if (kind === 'number' || kind === 'count') {
      unit = { canonical: '', spellings: [], toInternal: scale(1) };
    } else {
      unit = spec.units.find((u) => u.canonical === spec.bare);
    }
  } else {
    const needle = spec.caseInsensitive ? unitText.toLowerCase() : unitText;
    unit = spec.units.find((u) => u.spellings.some((s) => (spec.caseInsensitive ? s.toLowerCase() : s) === needle));
    if (!unit && kind === 'levelBelowPeak') {
      return { ok: false, message: `A level below the peak is in dB relative to the peak, not "${unitText}": e.g. −30 dB.` };
    }
    if (!unit) {
      const accepted = unitsFor(kind);
      return {
        ok: false,
        message: accepted.length
          ? `Unknown unit "${unitText}". Use ${accepted.join(', ')}.`
          : `Expected a plain number (e.g. ${spec.example}), not "${unitText}".`,
      };
    }
  }
  const value = unit!.toInternal(x, context);
  if (value === null) return { ok: false, message: 'A length in wavelengths needs a valid frequency first.' };
  if (!Number.isFinite(value)) return { ok: false, message: 'The value is too large.' };
  if (kind === 'count' && !Number.isInteger(value)) return { ok: false, message: 'Expected a whole number.' };
  if (kind === 'levelBelowPeak') return levelBelowPeakResult(x, value);
  const normalizedNumber = numberText.replace(/^\+/, '');
  return { ok: true, value: value === 0 ? 0 : value, canonical: `${normalizedNumber}${unit!.canonical}` };
}

/**
 * A level below the peak is a negative number of dB relative to the peak (−30 dB: 30 dB below
 * it), the sign outputs use too. A positive entry means the same level written as a depth: it
 * is accepted, stored negative, and the note says how it was read, so no sign flips silently.
 */
function levelBelowPeakResult(typed: number, levelDb: number): ParseResult {
  const depth = String(-levelDb);
  const value = levelDb === 0 ? 0 : levelDb;
  const canonical = value === 0 ? '0dB' : `-${depth}dB`;
  if (typed <= 0) return { ok: true, value, canonical };
  return { ok: true, value, canonical, note: `${depth} dB entered as a depth: read as −${depth} dB` };
}
