/**
 * Values transcribed into calc/ from a source (a table entry copied into the code). Comparing the
 * code with such a value checks nothing — the code returns what was typed — so they are not
 * reference cases: the Verification record lists them in their own section, with the digits the
 * source supports, and leaves them out of its pass count. What the code does with them
 * (interpolation, monotonicity, extrapolation flags) is checked in tests/calc/endFire/yagiGain.test.ts
 * and by the Yagi–Uda formula's worked example (an interpolated value).
 */
import { NBS_YAGI_DESIGNS } from '../../calc/endFire/index';
import { QUANTITY_UNITS, type Quantity } from './quantity';

export interface TranscribedValue {
  /** Stable id, unique across transcribed values and reference cases. */
  id: string;
  title: string;
  /** The publication and how the value was obtained (e.g. "from memory, not re-checked"). */
  source: string;
  value: number;
  quantity: Quantity;
  /** Decimal places shown: no more than the source and the model using it support. */
  decimals: number;
}

export interface TranscribedGroup {
  topic: string;
  /** The calc/ constant holding the values, as `file: NAME`; no reference case may read it. */
  constant: { file: string; name: string };
  /** One sentence on how far the values can be trusted and what is checked instead. */
  note: string;
  values: TranscribedValue[];
}

export const yagiTableTranscribed: TranscribedGroup = {
  topic: 'Yagi–Uda gain table (end-fire calculator, sizing)',
  constant: { file: 'calc/endFire/yagiGain.ts', name: 'NBS_YAGI_DESIGNS' },
  note:
    'Gains of the six optimised designs of NBS Technical Note 688, entered from memory and not re-checked against the publication; ' +
    'read them as ±0.5 dB at best. The code interpolates them linearly in log10(boom length); the interpolation, its monotonicity ' +
    'and the extrapolation flags are what the tests check.',
  values: NBS_YAGI_DESIGNS.map((row) => ({
    id: `yagi-nbs-${row.boomWavelengths}`,
    title: `Yagi–Uda, ${row.boomWavelengths} λ boom: gain of the optimised design`,
    source: 'Viezbicke, "Yagi Antenna Design", NBS Technical Note 688 (1976), table of optimised designs — transcribed, from memory',
    value: row.gainDbd,
    quantity: 'dBd' as const,
    decimals: 1,
  })),
};

export const transcribedGroups: TranscribedGroup[] = [yagiTableTranscribed];

/** A transcribed value as the record shows it: the supported decimals and the unit. */
export function formatTranscribed(v: TranscribedValue): string {
  const unit = QUANTITY_UNITS[v.quantity];
  return `${v.value.toFixed(v.decimals).replace('-', '−')}${unit ? ` ${unit}` : ''}`;
}
