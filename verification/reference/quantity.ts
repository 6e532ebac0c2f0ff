/**
 * What a reference case compares, and the unit that follows from it. A case names its quantity;
 * the unit on the Verification record is derived from it, never typed beside the number.
 * tests/reference/quantity.test.ts checks each case's quantity against what its compute reads:
 * the unit suffix of the calc/ name it reads (the project names values with their units:
 * `hpbwDeg`, `spacingM`, `directivityDbi`), or the OutputSpec of the calculator output a
 * formula is linked to.
 */
import type { OutputSpec } from '../../calc/calculator';

export type Quantity =
  | 'lengthM'
  | 'lengthWavelengths'
  | 'frequencyHz'
  | 'angleDeg'
  | 'angleRad'
  | 'dB'
  | 'dBi'
  | 'dBd'
  | 'dBm'
  | 'dBmPerHz'
  | 'dBHz'
  | 'dBPerK'
  | 'temperatureK'
  | 'powerW'
  | 'powerDensityWPerM2'
  | 'percent'
  | 'count'
  | 'ratio';

/** Unit shown for each quantity ('' for a pure number). */
export const QUANTITY_UNITS: Record<Quantity, string> = {
  lengthM: 'm',
  lengthWavelengths: 'λ',
  frequencyHz: 'Hz',
  angleDeg: '°',
  angleRad: 'rad',
  dB: 'dB',
  dBi: 'dBi',
  dBd: 'dBd',
  dBm: 'dBm',
  dBmPerHz: 'dBm/Hz',
  dBHz: 'dB·Hz',
  dBPerK: 'dB/K',
  temperatureK: 'K',
  powerW: 'W',
  powerDensityWPerM2: 'W/m²',
  percent: '%',
  count: '',
  ratio: '',
};

/** Unit suffixes of calc/ names, most specific first; a name without one is a pure number. */
const SUFFIXES: [RegExp, Quantity][] = [
  [/WPerM2$/, 'powerDensityWPerM2'],
  [/DbPerK$/, 'dBPerK'],
  [/Dbi$/, 'dBi'],
  [/Dbd$/, 'dBd'],
  [/Dbm$/, 'dBm'],
  [/DbmPerHz$/, 'dBmPerHz'],
  [/DbHz$/, 'dBHz'],
  [/(Db|_DB)$/, 'dB'],
  [/(Deg|_DEG)$/, 'angleDeg'],
  [/Rad$/, 'angleRad'],
  [/Wavelengths$/, 'lengthWavelengths'],
  [/Hz$/, 'frequencyHz'],
  [/Percent$/, 'percent'],
  [/(Count|^count)$/, 'count'],
  [/Watts$/, 'powerW'],
  [/[a-z0-9]M$/, 'lengthM'],
  [/[a-z0-9]K$/, 'temperatureK'],
];

/** The quantity a calc/ name declares by its unit suffix (`onsetDeg` → angleDeg); 'ratio' without one. */
export function quantityFromName(name: string): Quantity {
  for (const [pattern, quantity] of SUFFIXES) if (pattern.test(name)) return quantity;
  return 'ratio';
}

/** True when a calc/ name carries a unit suffix at all. */
export function hasUnitSuffix(name: string): boolean {
  return SUFFIXES.some(([pattern]) => pattern.test(name));
}

/** Decibel outputs by display unit; any other unit (or none) is a plain dB. */
const DECIBEL_UNITS: Record<string, Quantity> = { dBi: 'dBi', dBd: 'dBd', dBm: 'dBm', 'dB·Hz': 'dBHz', 'dB/K': 'dBPerK' };

/** The quantity a calculator output holds, from its OutputSpec kind and display unit. */
export function quantityOfOutput(spec: Pick<OutputSpec, 'kind' | 'unit'>): Quantity {
  switch (spec.kind) {
    case 'frequency':
      return 'frequencyHz';
    case 'length':
      return 'lengthM';
    case 'angle':
      return 'angleDeg';
    case 'levelBelowPeak':
      return 'dB';
    case 'decibel':
      return DECIBEL_UNITS[spec.unit ?? ''] ?? 'dB';
    case 'power':
      return 'powerW';
    case 'powerDensity':
      return 'powerDensityWPerM2';
    case 'percent':
      return 'percent';
    case 'count':
      return 'count';
    case 'ratio':
    case 'number':
      return spec.unit === 'λ' || spec.unit === 'λ₀' ? 'lengthWavelengths' : spec.unit === 'K' ? 'temperatureK' : 'ratio';
  }
}
