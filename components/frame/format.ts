/**
 * Display formatting of numbers with units: a precision that fits the quantity, units scaled
 * to read well (GHz, cm…). Formatting never produces "NaN" or "Infinity": non-finite values
 * format as an em dash (and the frame treats them as an error before they get here).
 */
import type { OutputSpec, QuantityKind } from '../../calc/calculator';

export interface Formatted {
  text: string;
  unit: string;
}

/**
 * Rounds to `digits` significant digits and drops trailing zeros; plain notation for 1e-4…1e9.
 * Negative numbers get a true minus sign (U+2212), as in decibels and plot ticks.
 */
export function formatSignificant(value: number, digits: number): string {
  if (!Number.isFinite(value)) return '—';
  if (value === 0) return '0';
  if (value < 0) return `−${formatSignificant(-value, digits)}`;
  const magnitude = Math.abs(value);
  if (magnitude >= 1e9 || magnitude < 1e-4) {
    const [mantissa, exponent] = value.toExponential(Math.max(0, digits - 1)).split('e');
    return `${trimZeros(mantissa)}×10${toSuperscript(Number(exponent))}`;
  }
  const rounded = Number(value.toPrecision(Math.max(1, digits)));
  const decimals = Math.max(0, digits - 1 - Math.floor(Math.log10(Math.abs(rounded) || 1)));
  return trimZeros(rounded.toFixed(Math.min(decimals, 12)));
}

const SUPERSCRIPT: Record<string, string> = { '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' };

function toSuperscript(exponent: number): string {
  return String(exponent)
    .split('')
    .map((c) => SUPERSCRIPT[c] ?? c)
    .join('');
}

function trimZeros(text: string): string {
  return text.includes('.') ? text.replace(/\.?0+$/, '') : text;
}

/** Groups a whole number with thin spaces (65 536). */
export function formatCount(value: number): string {
  if (!Number.isFinite(value)) return '—';
  return Math.round(value)
    .toString()
    .replace(/\B(?=(\d{3})+(?!\d))/g, '\u202f');
}

const FREQUENCY_STEPS: [number, string][] = [
  [1e12, 'THz'],
  [1e9, 'GHz'],
  [1e6, 'MHz'],
  [1e3, 'kHz'],
  [1, 'Hz'],
];

/** The frequency unit that reads best for values up to maxHz (for plot axes). */
export function pickFrequencyUnit(maxHz: number): { factor: number; unit: string } {
  const step = FREQUENCY_STEPS.find(([f]) => Math.abs(maxHz) >= f) ?? FREQUENCY_STEPS[FREQUENCY_STEPS.length - 1];
  return { factor: step[0], unit: step[1] };
}

/** Formats a value of a physical kind in a unit that reads well. */
export function formatQuantity(value: number, kind: QuantityKind | 'percent' | 'ratio', digits: number, unitOverride?: string, decimals = 2): Formatted {
  if (!Number.isFinite(value)) return { text: '—', unit: '' };
  switch (kind) {
    case 'frequency': {
      const step = FREQUENCY_STEPS.find(([f]) => Math.abs(value) >= f) ?? FREQUENCY_STEPS[FREQUENCY_STEPS.length - 1];
      return { text: formatSignificant(value / step[0], digits), unit: step[1] };
    }
    case 'length': {
      const magnitude = Math.abs(value);
      if (magnitude >= 10_000) return { text: formatSignificant(value / 1000, digits), unit: 'km' };
      if (magnitude >= 1 || magnitude === 0) return { text: formatSignificant(value, digits), unit: 'm' };
      if (magnitude >= 0.01) return { text: formatSignificant(value * 100, digits), unit: 'cm' };
      if (magnitude >= 1e-4) return { text: formatSignificant(value * 1000, digits), unit: 'mm' };
      return { text: formatSignificant(value * 1e6, digits), unit: 'µm' };
    }
    case 'angle':
      return { text: formatSignificant(value, digits), unit: unitOverride ?? '°' };
    case 'decibel':
      return { text: formatFixedDb(value, decimals), unit: unitOverride ?? 'dB' };
    case 'levelBelowPeak':
      return { text: formatSignificant(-Math.abs(value), Math.max(digits, 1)), unit: 'dB' };
    case 'power': {
      if (unitOverride === 'dBm' || (value > 0 && value < 1e-6)) return { text: formatFixedDb(10 * Math.log10(value) + 30), unit: 'dBm' };
      if (Math.abs(value) >= 1e3) return { text: formatSignificant(value / 1e3, digits), unit: 'kW' };
      if (Math.abs(value) >= 1 || value === 0) return { text: formatSignificant(value, digits), unit: 'W' };
      if (Math.abs(value) >= 1e-3) return { text: formatSignificant(value * 1e3, digits), unit: 'mW' };
      return { text: formatSignificant(value * 1e6, digits), unit: 'µW' };
    }
    case 'powerDensity':
      return { text: formatSignificant(value, digits), unit: 'W/m²' };
    case 'percent':
      return { text: formatSignificant(value, digits), unit: '%' };
    case 'count':
      return { text: formatCount(value), unit: unitOverride ?? '' };
    case 'ratio':
    case 'number':
    default:
      return { text: formatSignificant(value, digits), unit: unitOverride ?? '' };
  }
}

/** Decibels read best with fixed decimals, two by default (−13.26 dB, 35.21 dBi). */
function formatFixedDb(value: number, decimals = 2): string {
  if (!Number.isFinite(value)) return '—';
  const text = value.toFixed(decimals);
  return /^-0(\.0*)?$/.test(text) ? text.slice(1) : text.replace('-', '−');
}

/** A value whose magnitude is below `resolution` (numerical noise) as exactly 0. */
export function belowResolutionAsZero(value: number, resolution: number | undefined): number {
  return resolution !== undefined && Math.abs(value) < resolution ? 0 : value;
}

/** Formats an output by its spec (noise below the output's resolution shows as 0). */
export function formatOutput(spec: OutputSpec & { unit?: string }, value: number): Formatted {
  return formatQuantity(belowResolutionAsZero(value, spec.resolution), spec.kind, spec.digits, spec.unit, spec.decimals);
}

/** "10 GHz" from a canonical "10GHz"; "0.5 λ" from "0.5lambda". */
export function canonicalToFieldText(canonical: string): string {
  const match = /^([+-]?[\d.]+(?:e[+-]?\d+)?)(.*)$/i.exec(canonical);
  if (!match || match[2] === '') return canonical;
  const unit = match[2] === 'lambda' ? 'λ' : match[2] === 'W/m2' ? 'W/m²' : match[2] === 'mW/cm2' ? 'mW/cm²' : match[2] === 'uW/cm2' ? 'µW/cm²' : match[2];
  return `${match[1]} ${unit}`;
}
