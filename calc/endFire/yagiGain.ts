/**
 * Yagi–Uda gain against boom length from published optimised designs:
 * P. P. Viezbicke, "Yagi Antenna Design", NBS Technical Note 688, National Bureau of Standards,
 * 1976, table of optimised element lengths for six Yagi–Uda antennas (boom 0.4 λ to 4.2 λ).
 * The six gain values below are FROM MEMORY (as the table is commonly reproduced, e.g. in
 * Balanis, "Antenna Theory", ch. 10 (chapter number from memory)); they were not re-checked against the publication here.
 * Between the tabulated booms the gain is interpolated linearly in log10(boom length); outside
 * them the end segment's slope is extended and the result is flagged as an extrapolation.
 */
import { CalcInputError, requireInRange, requirePositive } from '../errors';
import { brentRoot } from '../numeric/brentRoot';

/** One row of the published table: boom length (λ) and gain over a half-wave dipole (dBd). */
export interface YagiDesignPoint {
  boomWavelengths: number;
  gainDbd: number;
}

/** NBS Technical Note 688 (Viezbicke, 1976): boom length vs gain of the six optimised designs (values from memory). */
export const NBS_YAGI_DESIGNS: readonly YagiDesignPoint[] = Object.freeze([
  { boomWavelengths: 0.4, gainDbd: 7.1 },
  { boomWavelengths: 0.8, gainDbd: 9.2 },
  { boomWavelengths: 1.2, gainDbd: 10.2 },
  { boomWavelengths: 2.2, gainDbd: 12.25 },
  { boomWavelengths: 3.2, gainDbd: 13.4 },
  { boomWavelengths: 4.2, gainDbd: 14.2 },
]);

/** Shortest and longest boom (λ) this module will estimate at, extrapolation included. */
export const YAGI_BOOM_LIMITS_WAVELENGTHS = { min: 0.2, max: 10 } as const;

/** How a Yagi gain estimate was obtained. */
export type YagiEstimateKind = 'tabulated' | 'interpolated' | 'extrapolatedShort' | 'extrapolatedLong';

export interface YagiGainEstimate {
  gainDbd: number;
  kind: YagiEstimateKind;
}

function segmentValue(a: YagiDesignPoint, b: YagiDesignPoint, boomWavelengths: number): number {
  const t = Math.log10(boomWavelengths / a.boomWavelengths) / Math.log10(b.boomWavelengths / a.boomWavelengths);
  return a.gainDbd + t * (b.gainDbd - a.gainDbd);
}

/**
 * Gain (dBd) of an optimised Yagi–Uda with the given boom length (λ), from the NBS TN 688 table:
 * linear in log10(boom) between rows, the end segment extended outside them (flagged).
 * Booms from 0.2 λ to 10 λ; throws CalcInputError outside.
 */
export function yagiGainDbd(boomWavelengths: number): YagiGainEstimate {
  requirePositive('boomWavelengths', boomWavelengths, 'λ');
  const { min, max } = YAGI_BOOM_LIMITS_WAVELENGTHS;
  if (boomWavelengths < min || boomWavelengths > max) {
    throw new CalcInputError('boomWavelengths', `expected a boom from ${min} λ to ${max} λ for the Yagi–Uda estimate, got ${boomWavelengths.toPrecision(4)} λ`);
  }
  const table = NBS_YAGI_DESIGNS;
  const last = table.length - 1;
  const exact = table.find((row) => Math.abs(row.boomWavelengths - boomWavelengths) <= 1e-12 * row.boomWavelengths);
  if (exact) return { gainDbd: exact.gainDbd, kind: 'tabulated' };
  if (boomWavelengths < table[0].boomWavelengths) return { gainDbd: segmentValue(table[0], table[1], boomWavelengths), kind: 'extrapolatedShort' };
  if (boomWavelengths > table[last].boomWavelengths) return { gainDbd: segmentValue(table[last - 1], table[last], boomWavelengths), kind: 'extrapolatedLong' };
  let i = 0;
  while (table[i + 1].boomWavelengths < boomWavelengths) i++;
  return { gainDbd: segmentValue(table[i], table[i + 1], boomWavelengths), kind: 'interpolated' };
}

/**
 * Boom length (λ) at which the NBS-table estimate reaches targetGainDbd: Brent's root of the
 * monotone gain-vs-log(boom) relation. Null when the target lies outside the gains of the
 * 0.2 λ to 10 λ range (the caller reports it).
 */
export function yagiBoomForGainWavelengths(targetGainDbd: number): number | null {
  requireInRange('targetGainDbd', targetGainDbd, -100, 100, 'dBd');
  const { min, max } = YAGI_BOOM_LIMITS_WAVELENGTHS;
  const f = (logBoom: number) => yagiGainDbd(Math.min(max, Math.max(min, 10 ** logBoom))).gainDbd - targetGainDbd;
  const a = Math.log10(min), b = Math.log10(max);
  if (f(a) > 0 || f(b) < 0) return null;
  return Math.min(max, Math.max(min, 10 ** brentRoot(f, a, b, 1e-14)));
}
