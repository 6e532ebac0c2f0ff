/**
 * End-fire length vs gain: how long an ordinary end-fire array, a Hansen–Woodyard array or a
 * Yagi–Uda must be for a gain (or what a length gives), against a broadside square aperture of
 * the same length, and what stacking Yagis adds.
 */
import type { CalcInputs, CalcResult, CalculatorDef } from '../calculator';
import type { TeamConventions } from '../teamConventions';
import { CalcInputError } from '../errors';
import { powerRatioToDb, dbToPowerRatio } from '../decibel';
import { radToDeg } from '../angle';
import { DIPOLE_DIRECTIVITY_DBI } from '../constants';
import { freeSpaceWavelengthM } from '../wavelength';
import { warning, type CalcWarning } from '../warnings';
import { frequencyDefaultText } from './defaultText';
import {
  HANSEN_WOODYARD_LONG_ARRAY_FACTOR,
  MAX_END_FIRE_ELEMENTS,
  NBS_YAGI_DESIGNS,
  YAGI_BOOM_LIMITS_WAVELENGTHS,
  endFireApproxDirectivity,
  endFireDirectivity,
  endFireElementCount,
  endFireHpbwDeg,
  endFireLengthForDirectivity,
  endFirePhaseStepRad,
  endFireSpacingLimitWavelengths,
  hpbwFromDirectivityDeg,
  squareApertureDirectivity,
  squareApertureSideForDirectivity,
  stackingDistanceWavelengths,
  stackingGainIncreaseDb,
  yagiBoomForGainWavelengths,
  yagiGainDbd,
  type EndFireArrayKind,
  type StackBays,
  type YagiEstimateKind,
} from '../endFire/index';
import {
  endFireDirectivityFormula,
  endFireElementCountFormula,
  endFirePhaseFormula,
  hansenWoodyardApproxFormula,
  hpbwFromDirectivityFormula,
  ordinaryEndFireApproxFormula,
  squareApertureFormula,
  stackingDistanceFormula,
  yagiGainFormula,
} from '../endFireFormulas';

export type EndFireStructure = EndFireArrayKind | 'yagi';

/** One length on the gain-vs-length chart (λ, dBi; null where a curve does not apply). */
export interface GainLengthPoint {
  lengthWavelengths: number;
  ordinaryDbi: number | null;
  hansenWoodyardDbi: number | null;
  /** Yagi–Uda within the published booms. */
  yagiDbi: number | null;
  /** Yagi–Uda outside the published booms (extrapolated). */
  yagiExtrapolatedDbi: number | null;
  apertureDbi: number;
}

export interface EndFireLengthData {
  curve: GainLengthPoint[];
  /** The design point (λ, dBi), null when it could not be found. */
  design: { lengthWavelengths: number; gainDbi: number } | null;
  structure: EndFireStructure;
  spacingWavelengths: number;
  /** Published table, for the figure's marks. */
  yagiTable: { boomWavelengths: number; gainDbd: number; gainDbi: number }[];
}

const STRUCTURE_LABEL: Record<EndFireStructure, string> = {
  ordinary: 'ordinary end-fire array',
  hansenWoodyard: 'Hansen–Woodyard array',
  yagi: 'Yagi–Uda',
};

/** Long-array advantage of Hansen–Woodyard over ordinary end-fire, dB (Balanis 4th ed. §6.4 (section number from memory)). */
const HW_LONG_ADVANTAGE_DB = 10 * Math.log10(HANSEN_WOODYARD_LONG_ARRAY_FACTOR);
/** Chart samples. */
const CURVE_SAMPLES = 90;
/** Aperture gap (dB) beyond which we say a broadside aperture is the better tool. */
const APERTURE_GAP_NOTE_DB = 10;
/** Length (λ) beyond which an end-fire structure is called very long. */
const VERY_LONG_WAVELENGTHS = 10;

function arrayDbi(kind: EndFireArrayKind, lengthWavelengths: number, spacingWavelengths: number): number | null {
  if (lengthWavelengths < spacingWavelengths) return null;
  const count = Math.floor(lengthWavelengths / spacingWavelengths + 1e-9) + 1;
  if (count > MAX_END_FIRE_ELEMENTS) return null;
  return powerRatioToDb(endFireDirectivity(kind, count, spacingWavelengths));
}

/** Gain against length for the three kinds and the square aperture, log-spaced lengths (λ). */
export function gainLengthCurve(spacingWavelengths: number, lowWavelengths: number, highWavelengths: number, samples = CURVE_SAMPLES): GainLengthPoint[] {
  const points: GainLengthPoint[] = [];
  const { min, max } = YAGI_BOOM_LIMITS_WAVELENGTHS;
  const first = NBS_YAGI_DESIGNS[0].boomWavelengths;
  const last = NBS_YAGI_DESIGNS[NBS_YAGI_DESIGNS.length - 1].boomWavelengths;
  const grid = new Set<number>();
  for (let i = 0; i < samples; i++) grid.add(lowWavelengths * (highWavelengths / lowWavelengths) ** (i / (samples - 1)));
  for (const row of NBS_YAGI_DESIGNS) if (row.boomWavelengths >= lowWavelengths && row.boomWavelengths <= highWavelengths) grid.add(row.boomWavelengths);
  for (const L of [...grid].sort((a, b) => a - b)) {
    const inYagiRange = L >= min && L <= max;
    const yagi = inYagiRange ? yagiGainDbd(L).gainDbd + DIPOLE_DIRECTIVITY_DBI : null;
    const published = L >= first && L <= last;
    points.push({
      lengthWavelengths: L,
      ordinaryDbi: arrayDbi('ordinary', L, spacingWavelengths),
      hansenWoodyardDbi: arrayDbi('hansenWoodyard', L, spacingWavelengths),
      yagiDbi: published ? yagi : null,
      // the extrapolated curve also takes the end points of the table so the two lines meet
      yagiExtrapolatedDbi: !published || L === first || L === last ? yagi : null,
      apertureDbi: powerRatioToDb(squareApertureDirectivity(L)),
    });
  }
  return points;
}

/** Pure computation from validated inputs (Hz, m, dBi, choices). */
export function computeEndFireLength(inputs: CalcInputs): CalcResult<EndFireLengthData> {
  const frequencyHz = inputs.frequencyHz as number;
  const structure = inputs.structure as EndFireStructure;
  const solveFor = inputs.solveFor as 'gain' | 'length';
  const lambda = freeSpaceWavelengthM(frequencyHz);
  const spacingWavelengths = (inputs.spacingM as number) / lambda;
  const bays = Number(inputs.bays) as StackBays;
  const warnings: CalcWarning[] = [];
  const isArray = structure !== 'yagi';

  let lengthWavelengths: number | null = null;
  let gainDbi: number | null = null;
  let count: number | null = null;
  let phaseDeg: number | null = null;
  let approxDbi: number | null = null;
  let hwAdvantageDb: number | null = null;
  let hpbwDeg: number | null = null;
  let yagiKind: YagiEstimateKind | null = null;

  if (isArray) {
    const kind = structure as EndFireArrayKind;
    if (solveFor === 'gain') {
      lengthWavelengths = (inputs.lengthM as number) / lambda;
      if (lengthWavelengths < spacingWavelengths * (1 - 1e-9)) {
        throw new CalcInputError('lengthM', `expected a length of at least one element spacing (${(spacingWavelengths * lambda).toPrecision(4)} m) for an array`);
      }
      try {
        count = endFireElementCount(lengthWavelengths, spacingWavelengths);
      } catch {
        throw new CalcInputError('lengthM', `expected at most ${MAX_END_FIRE_ELEMENTS} elements (length ÷ spacing); shorten the array or widen the spacing`);
      }
      gainDbi = powerRatioToDb(endFireDirectivity(kind, count, spacingWavelengths));
    } else {
      const target = inputs.targetGainDbi as number;
      const solution = endFireLengthForDirectivity(kind, spacingWavelengths, dbToPowerRatio(target));
      if (solution && solution.count >= 2) {
        count = solution.count;
        lengthWavelengths = solution.lengthWavelengths;
        gainDbi = powerRatioToDb(solution.directivity);
        warnings.push(warning('whole-elements', 'note', `Arrays have whole elements: ${count} elements at this spacing are the fewest that reach ${target} dBi, so the array gives ${gainDbi.toFixed(2)} dBi at length (N − 1)d.`, ['lengthWavelengths', 'gainDbi']));
      } else if (solution) {
        throw new CalcInputError('targetGainDbi', 'expected a target above the directivity of a single isotropic element (0 dBi)');
      } else {
        warnings.push(warning('target-out-of-reach', 'caution', `Even ${MAX_END_FIRE_ELEMENTS} elements at this spacing do not reach ${target} dBi with a ${STRUCTURE_LABEL[structure]}; a broadside aperture is the practical way to that gain.`, ['gainDbi', 'lengthWavelengths']));
      }
    }
    if (count !== null && lengthWavelengths !== null) {
      phaseDeg = radToDeg(endFirePhaseStepRad(kind, count, spacingWavelengths));
      approxDbi = lengthWavelengths > 0 ? powerRatioToDb(endFireApproxDirectivity(kind, lengthWavelengths)) : null;
      hwAdvantageDb = powerRatioToDb(endFireDirectivity('hansenWoodyard', count, spacingWavelengths)) - powerRatioToDb(endFireDirectivity('ordinary', count, spacingWavelengths));
      hpbwDeg = endFireHpbwDeg(kind, count, spacingWavelengths);
      if (hpbwDeg === null) warnings.push(warning('no-half-power-point', 'note', 'The pattern never falls to half power, so there is no HPBW (a very short array).', ['hpbwDeg']));
      const limit = endFireSpacingLimitWavelengths(kind, count);
      if (kind === 'ordinary' && spacingWavelengths >= limit) {
        warnings.push(warning('end-fire-spacing', 'caution', `Spacing ${spacingWavelengths.toFixed(3)} λ is at or beyond λ/2: an ordinary end-fire array then radiates a second, equal beam backward (a grating lobe at θ = 180° from the beam); keep d < λ/2.`, ['gainDbi', 'hpbwDeg']));
      } else if (kind === 'hansenWoodyard' && spacingWavelengths > limit * (1 + 1e-9)) {
        warnings.push(warning('end-fire-spacing', spacingWavelengths > 0.25 ? 'caution' : 'note', `Spacing ${spacingWavelengths.toFixed(3)} λ exceeds the Hansen–Woodyard condition d ≤ (N − 1)λ/(4N) = ${limit.toFixed(3)} λ: the back lobe grows and the extra directivity is lost (the value shown is computed, not assumed).`, ['gainDbi', 'hpbwDeg']));
      }
      if (kind === 'hansenWoodyard' && Math.abs(hwAdvantageDb - HW_LONG_ADVANTAGE_DB) > 0.5) {
        warnings.push(warning('hansen-woodyard-short', 'note', `For ${count} elements the Hansen–Woodyard phase gives ${hwAdvantageDb.toFixed(2)} dB over ordinary end-fire, not the long-array ${HW_LONG_ADVANTAGE_DB.toFixed(2)} dB; the long-array formula does not apply here.`, ['hwAdvantageDb', 'approxDbi']));
      }
    }
  } else {
    if (solveFor === 'gain') {
      lengthWavelengths = (inputs.lengthM as number) / lambda;
      const { min, max } = YAGI_BOOM_LIMITS_WAVELENGTHS;
      if (lengthWavelengths < min || lengthWavelengths > max) {
        throw new CalcInputError('lengthM', `expected a boom from ${min} λ to ${max} λ (${(min * lambda).toPrecision(3)} m to ${(max * lambda).toPrecision(3)} m here) for the Yagi–Uda estimate`);
      }
      const estimate = yagiGainDbd(lengthWavelengths);
      yagiKind = estimate.kind;
      gainDbi = estimate.gainDbd + DIPOLE_DIRECTIVITY_DBI;
    } else {
      const target = inputs.targetGainDbi as number;
      const boom = yagiBoomForGainWavelengths(target - DIPOLE_DIRECTIVITY_DBI);
      if (boom === null) {
        const { min, max } = YAGI_BOOM_LIMITS_WAVELENGTHS;
        const top = yagiGainDbd(max).gainDbd + DIPOLE_DIRECTIVITY_DBI;
        const bottom = yagiGainDbd(min).gainDbd + DIPOLE_DIRECTIVITY_DBI;
        warnings.push(
          target > top
            ? warning('target-out-of-reach', 'caution', `${target} dBi is beyond a single Yagi–Uda even extrapolated to a ${max} λ boom (${top.toFixed(1)} dBi); stack bays or use a broadside aperture.`, ['gainDbi', 'lengthWavelengths'])
            : warning('target-out-of-reach', 'caution', `${target} dBi is below what the shortest boom considered (${min} λ) gives (${bottom.toFixed(1)} dBi); a dipole or a two-element beam will do.`, ['gainDbi', 'lengthWavelengths']),
        );
      } else {
        lengthWavelengths = boom;
        const estimate = yagiGainDbd(boom);
        yagiKind = estimate.kind;
        gainDbi = estimate.gainDbd + DIPOLE_DIRECTIVITY_DBI;
      }
    }
    if (gainDbi !== null) {
      hpbwDeg = hpbwFromDirectivityDeg(dbToPowerRatio(gainDbi));
      warnings.push(warning('yagi-data-from-memory', 'note', 'Yagi–Uda gains come from the NBS Technical Note 688 table (Viezbicke, 1976) of optimised designs; the six table values were entered from memory and should be checked against the publication. The HPBW is an estimate from the gain (equal E- and H-plane widths).', ['gainDbi', 'hpbwDeg']));
    }
    if (yagiKind === 'extrapolatedLong') {
      warnings.push(warning('yagi-extrapolated-long', 'outside-validity', `Boom longer than the longest published design (${NBS_YAGI_DESIGNS[NBS_YAGI_DESIGNS.length - 1].boomWavelengths} λ): the gain is extrapolated along the last segment of the table and is not a published figure.`, ['gainDbi', 'gainDbd', 'lengthWavelengths']));
    } else if (yagiKind === 'extrapolatedShort') {
      warnings.push(warning('yagi-extrapolated-short', 'outside-validity', `Boom shorter than the shortest published design (${NBS_YAGI_DESIGNS[0].boomWavelengths} λ): the gain is extrapolated along the first segment of the table and is not a published figure.`, ['gainDbi', 'gainDbd', 'lengthWavelengths']));
    } else if (yagiKind === 'interpolated') {
      warnings.push(warning('yagi-interpolated', 'note', 'Between published booms: the gain is interpolated linearly in log10(boom length).', ['gainDbi']));
    }
  }

  // Comparison with a broadside square aperture of side L.
  let apertureDbi: number | null = null;
  let apertureGapDb: number | null = null;
  let apertureSideWavelengths: number | null = null;
  if (lengthWavelengths !== null && lengthWavelengths > 0 && gainDbi !== null) {
    apertureDbi = powerRatioToDb(squareApertureDirectivity(lengthWavelengths));
    apertureGapDb = apertureDbi - gainDbi;
    apertureSideWavelengths = squareApertureSideForDirectivity(dbToPowerRatio(gainDbi));
    if (apertureGapDb >= APERTURE_GAP_NOTE_DB) {
      warnings.push(warning('aperture-wins', 'caution', `A broadside square aperture of the same length gives ${apertureGapDb.toFixed(1)} dB more; a ${STRUCTURE_LABEL[structure]} this long is an impractical way to this gain (an aperture ${apertureSideWavelengths.toFixed(2)} λ square matches it).`, ['apertureGapDb', 'apertureDbi']));
    }
    if (lengthWavelengths > VERY_LONG_WAVELENGTHS) {
      warnings.push(warning('very-long-end-fire', 'caution', `At ${lengthWavelengths.toFixed(1)} λ this end-fire structure is very long: its gain grows only in proportion to length, while losses, tolerances and bandwidth all get worse.`, ['lengthWavelengths', 'gainDbi']));
    }
  }

  // Stacking identical Yagis (common practice).
  let stackLowDbi: number | null = null;
  let stackHighDbi: number | null = null;
  let stackDistanceWavelengths: number | null = null;
  if (structure === 'yagi' && gainDbi !== null && hpbwDeg !== null && bays > 1) {
    const increase = stackingGainIncreaseDb(bays);
    stackLowDbi = gainDbi + increase.low;
    stackHighDbi = gainDbi + increase.high;
    stackDistanceWavelengths = stackingDistanceWavelengths(hpbwDeg);
    warnings.push(warning('stacking-practice', 'note', `Stacking figures are common practice, not a published source: ${bays === 2 ? '+2.5 to +3 dB for two bays' : '+5 to +6 dB for four bays (2 × 2)'}, spaced λ/(2 sin(HPBW/2)) in each stacking plane, fed in phase with equal cables.`, ['stackLowDbi', 'stackHighDbi', 'stackDistanceWavelengths']));
  } else if (structure !== 'yagi' && bays > 1) {
    warnings.push(warning('stacking-yagi-only', 'note', 'Stacking figures are given for Yagi–Uda antennas only.', []));
  }

  const curveHigh = Math.max(12, 1.6 * (lengthWavelengths ?? 1));
  const curveLow = Math.min(0.2, 0.8 * (lengthWavelengths ?? 1));
  return {
    values: {
      lengthWavelengths,
      lengthM: lengthWavelengths === null ? null : lengthWavelengths * lambda,
      elementCount: count,
      phaseStepDeg: phaseDeg,
      gainDbi,
      gainDbd: gainDbi === null ? null : gainDbi - DIPOLE_DIRECTIVITY_DBI,
      approxDbi,
      hwAdvantageDb,
      hpbwDeg,
      apertureDbi,
      apertureGapDb,
      apertureSideM: apertureSideWavelengths === null ? null : apertureSideWavelengths * lambda,
      stackLowDbi,
      stackHighDbi,
      stackDistanceWavelengths,
      stackDistanceM: stackDistanceWavelengths === null ? null : stackDistanceWavelengths * lambda,
    },
    warnings,
    data: {
      curve: gainLengthCurve(spacingWavelengths, curveLow, curveHigh),
      design: lengthWavelengths !== null && lengthWavelengths > 0 && gainDbi !== null ? { lengthWavelengths, gainDbi } : null,
      structure,
      spacingWavelengths,
      yagiTable: NBS_YAGI_DESIGNS.map((row) => ({ boomWavelengths: row.boomWavelengths, gainDbd: row.gainDbd, gainDbi: row.gainDbd + DIPOLE_DIRECTIVITY_DBI })),
    },
  };
}

/** The calculator definition, with defaults taken from the team conventions. */
export function createEndFireLengthCalculator(conventions: TeamConventions): CalculatorDef<EndFireLengthData> {
  return {
    id: 'end-fire-length',
    title: 'End-fire length vs gain',
    summary: 'Length of an ordinary or Hansen–Woodyard end-fire array or a Yagi–Uda for a gain, against a broadside aperture of the same length; stacking Yagis.',
    nav: { order: 4 },
    safety: { lead: 'Yagi–Uda antennas and stacked bays go on masts and towers.', cautions: ['workAtHeight', 'rfExposure'] },
    embed: true,
    purpose: 'How long must an end-fire antenna (ordinary or Hansen–Woodyard array, or Yagi–Uda) be for a given gain, and where does a broadside aperture of the same length become the better answer?',
    schemaVersion: 1,
    migrations: {},
    params: [
      { kind: 'frequency', key: 'f', name: 'frequencyHz', label: 'Frequency', defaultText: frequencyDefaultText(conventions.designFrequencyHz), min: 1e3, max: 1e13, description: 'Operating frequency; lengths given in λ use its free-space wavelength.' },
      { kind: 'choice', key: 'type', name: 'structure', label: 'Structure', options: [ { value: 'ordinary', label: 'Ordinary end-fire array' }, { value: 'hansenWoodyard', label: 'Hansen–Woodyard array' }, { value: 'yagi', label: 'Yagi–Uda (published designs)' } ], defaultText: 'yagi', description: 'Uniform line of isotropic elements with the ordinary (−kd) or Hansen–Woodyard (−kd − 2.92/N) phase, or a Yagi–Uda from the NBS table of optimised designs.' },
      { kind: 'choice', key: 'solve', name: 'solveFor', label: 'Solve for', options: [ { value: 'gain', label: 'Gain, from the length' }, { value: 'length', label: 'Length, from a target gain' } ], defaultText: 'gain', description: 'Given a length (or boom), find the gain; or given a target gain, find the length.' },
      { kind: 'length', key: 'len', name: 'lengthM', label: 'Length (array) or boom (Yagi–Uda)', defaultText: '2.2 λ', min: 1e-6, max: 1e4, wavelengthFrom: 'design', description: 'First to last element; may be given in wavelengths (e.g. 2.2 λ). Used when solving for gain.' },
      { kind: 'decibel', key: 'g', name: 'targetGainDbi', label: 'Target gain (dBi)', defaultText: '15 dBi', min: -20, max: 60, description: 'Gain over isotropic to reach; used when solving for length.' },
      { kind: 'length', key: 'd', name: 'spacingM', label: 'Element spacing (arrays)', defaultText: '0.25 λ', min: 1e-6, max: 1e3, wavelengthFrom: 'design', description: 'Spacing between neighbouring elements of the arrays; may be given in wavelengths. Not used for the Yagi–Uda.' },
      { kind: 'choice', key: 'bays', name: 'bays', label: 'Stacked Yagi–Uda bays', options: [ { value: '1', label: 'One antenna' }, { value: '2', label: 'Two bays' }, { value: '4', label: 'Four bays (2 × 2)' } ], defaultText: '1', description: 'Identical Yagis stacked and fed in phase; rule-of-thumb gain and spacing.' },
    ],
    outputs: [
      { key: 'lengthWavelengths', label: 'Length', kind: 'ratio', digits: 4, unit: 'λ', description: 'Array: (N − 1)d when solving for length; boom length for the Yagi–Uda' },
      { key: 'lengthM', label: 'Length', kind: 'length', digits: 4 },
      { key: 'elementCount', label: 'Elements N', kind: 'count', digits: 0, description: 'N = ⌊L/d⌋ + 1' },
      { key: 'phaseStepDeg', label: 'Phase step per element', kind: 'angle', digits: 5, description: 'Phase of each element relative to the one before it' },
      { key: 'gainDbi', label: 'Directivity (arrays, isotropic elements, no losses) or gain (Yagi–Uda, published table)', kind: 'decibel', digits: 4, unit: 'dBi', description: 'Arrays: directivity by the exact pattern integral (no losses counted, so gain equals it only for a lossless array); Yagi–Uda: the published gain + 2.15 dB' },
      { key: 'gainDbd', label: 'Same, over a half-wave dipole', kind: 'decibel', digits: 4, unit: 'dBd' },
      { key: 'approxDbi', label: 'Long-array approximation (4L/λ or 1.805·4L/λ)', kind: 'decibel', digits: 4, unit: 'dBi' },
      { key: 'hwAdvantageDb', label: 'Hansen–Woodyard over ordinary, same N and d', kind: 'decibel', digits: 4, unit: 'dB', description: 'Both exact; the long-array value is 2.56 dB' },
      { key: 'hpbwDeg', label: 'Half-power beamwidth', kind: 'angle', digits: 4, description: 'Arrays: −3 dB points by root-finding; Yagi–Uda: estimate from the gain' },
      { key: 'apertureDbi', label: 'Broadside square aperture L × L', kind: 'decibel', digits: 4, unit: 'dBi', description: '4πL²/λ², uniform illumination' },
      { key: 'apertureGapDb', label: 'Aperture advantage over this end-fire structure', kind: 'decibel', digits: 4, unit: 'dB' },
      { key: 'apertureSideM', label: 'Side of a square aperture with the same gain', kind: 'length', digits: 4 },
      { key: 'stackLowDbi', label: 'Stacked gain, lower rule-of-thumb figure', kind: 'decibel', digits: 2, decimals: 1, unit: 'dBi' },
      { key: 'stackHighDbi', label: 'Stacked gain, upper rule-of-thumb figure', kind: 'decibel', digits: 2, decimals: 1, unit: 'dBi' },
      { key: 'stackDistanceWavelengths', label: 'Stacking distance', kind: 'ratio', digits: 4, unit: 'λ' },
      { key: 'stackDistanceM', label: 'Stacking distance', kind: 'length', digits: 4 },
    ],
    formulas: [
      { formula: endFireElementCountFormula, output: 'elementCount', args: (i, v) => (i.structure !== 'yagi' && i.solveFor === 'gain' && v.lengthWavelengths !== null ? { lengthWavelengths: v.lengthWavelengths, spacingWavelengths: spacing(i) } : null) },
      { formula: endFirePhaseFormula, output: 'phaseStepDeg', args: (i, v) => (v.elementCount === null || i.structure === 'yagi' ? null : { count: v.elementCount, spacingWavelengths: spacing(i), hansenWoodyard: i.structure === 'hansenWoodyard' ? 1 : 0 }) },
      { formula: endFireDirectivityFormula, output: 'gainDbi', args: (i, v) => (v.elementCount === null || i.structure === 'yagi' ? null : { count: v.elementCount, spacingWavelengths: spacing(i), hansenWoodyard: i.structure === 'hansenWoodyard' ? 1 : 0 }) },
      { formula: ordinaryEndFireApproxFormula, output: 'approxDbi', args: (i, v) => (i.structure === 'ordinary' && v.approxDbi !== null ? { lengthWavelengths: v.lengthWavelengths as number } : null) },
      { formula: hansenWoodyardApproxFormula, output: 'approxDbi', args: (i, v) => (i.structure === 'hansenWoodyard' && v.approxDbi !== null ? { lengthWavelengths: v.lengthWavelengths as number } : null) },
      { formula: yagiGainFormula, output: 'gainDbd', args: (i, v) => (i.structure === 'yagi' && v.lengthWavelengths !== null ? { boomWavelengths: v.lengthWavelengths } : null) },
      { formula: squareApertureFormula, output: 'apertureDbi', args: (_i, v) => (v.apertureDbi === null ? null : { lengthWavelengths: v.lengthWavelengths as number }) },
      { formula: hpbwFromDirectivityFormula, output: 'hpbwDeg', args: (i, v) => (i.structure === 'yagi' && v.gainDbi !== null ? { directivity: dbToPowerRatio(v.gainDbi) } : null) },
      { formula: stackingDistanceFormula, output: 'stackDistanceWavelengths', args: (_i, v) => (v.stackDistanceWavelengths === null ? null : { hpbwDeg: v.hpbwDeg as number }) },
    ],
    assumptions: [
      'Arrays: uniform amplitudes, isotropic elements, no mutual coupling and no losses, so the directivity shown is also the gain. Real elements (dipoles across the axis) add a little directivity and coupling changes the currents.',
      'Array element count: N = ⌊L/d⌋ + 1, so the array fits the length; when solving for length, the fewest whole elements that reach the target, and the length is (N − 1)d.',
      'Directivity of the arrays is the exact integral of the array pattern over the sphere (closed form), not the long-array approximation, which is shown beside it.',
      'Hansen–Woodyard uses the excess phase 2.92/N; its advantage over ordinary end-fire approaches 2.56 dB only for long arrays, and it needs d ≤ (N − 1)λ/(4N).',
      'Yagi–Uda gain: the NBS Technical Note 688 optimised designs (boom 0.4 λ to 4.2 λ, element diameter about 0.0085 λ), interpolated linearly in log10(boom); outside that range the end segments are extended and flagged, and booms are limited to 0.2 λ–10 λ. The six table values were entered from memory.',
      'Yagi–Uda HPBW is an estimate from the gain with equal E- and H-plane widths; stacking gains and distances are common practice, not a published source.',
      'The broadside comparison is a uniformly illuminated square aperture of side L (100 % efficiency): its directivity grows as L², the end-fire structures only as L.',
    ],
    references: [
      'C. A. Balanis, Antenna Theory: Analysis and Design, 4th ed., Wiley, 2016, §6.3 (section number from memory; ordinary end-fire), §6.4 (section number from memory; Hansen–Woodyard end-fire), §2.7 (section number from memory; directivity from beamwidths), ch. 12 (chapter number from memory; apertures).',
      'W. W. Hansen and J. R. Woodyard, "A new principle in directional antenna design", Proc. IRE, 26, 1938.',
      'P. P. Viezbicke, "Yagi Antenna Design", NBS Technical Note 688, National Bureau of Standards, 1976.',
      'IEEE Std 145-2013, IEEE Standard for Definitions of Terms for Antennas (directivity, gain, HPBW).',
    ],
    examples: [
      { title: 'Glider-club telemetry Yagi at 433 MHz, 1.2 m boom, two bays', query: '?v=1&f=433MHz&type=yagi&solve=gain&len=1.2m&bays=2' },
      { title: 'Ordinary end-fire line of patches for a rail-side beacon, 5.8 GHz, 18 dBi wanted', query: '?v=1&f=5.8GHz&type=ordinary&solve=length&g=18dBi&d=0.3lambda' },
      { title: 'Hansen–Woodyard feeder for a 2.45 GHz drying-tunnel sensor, 40 cm long', query: '?v=1&f=2.45GHz&type=hansenWoodyard&solve=gain&len=40cm&d=0.22lambda' },
      { title: 'Balloon-ground-station Yagi at 145 MHz for 16 dBi, four bays', query: '?v=1&f=145MHz&type=yagi&solve=length&g=16dBi&bays=4' },
    ],
    sourcePath: 'calc/calculators/endFireLength.ts',
    compute: computeEndFireLength,
  };
}

function spacing(inputs: CalcInputs): number {
  return (inputs.spacingM as number) / freeSpaceWavelengthM(inputs.frequencyHz as number);
}
