/**
 * Front-fed parabolic reflector: gain (or the diameter for a gain) from an efficiency budget
 * computed by integration over a cos^q ψ POWER-pattern feed, the far-field pattern by a Hankel
 * transform of the aperture field, the optimum edge taper, beam steering by a lateral feed offset
 * (and a focal-plane cluster), far-field distance and pointing tolerances.
 */
import { farFieldDistanceFormula } from '../aperture/formulas';
import type { CalcInputs, CalcResult, CalculatorDef } from '../calculator';
import type { TeamConventions } from '../teamConventions';
import { CalcInputError, requireInRange, requireInteger, requireNonNegative, requirePositive } from '../errors';
import { powerRatioToDb, powerRatioToDbFloored, dbToPowerRatio } from '../decibel';
import { degToRad, radToDeg } from '../angle';
import { SPEED_OF_LIGHT_M_PER_S } from '../constants';
import { freeSpaceWavelengthM } from '../wavelength';
import { warning, type CalcWarning } from '../warnings';
import { frequencyDefaultText } from './defaultText';
import { apertureGainDbi, circularApertureGain, diameterForGainM, farFieldDistanceM } from '../aperture/index';
import {
  apertureField,
  beamFigures,
  blockageEfficiency,
  centralBlockedFraction,
  dishDepthM,
  displacedFeedBeam,
  edgeTaperDb,
  feedAngleAtApertureRadiusRad,
  feedEdgeLevelDb,
  feedOffsetAngleRad,
  feedOffsetForTiltM,
  feedPowerPattern,
  focalLengthM,
  illuminationEfficiencies,
  loBeamDeviationFactor,
  optimumIllumination,
  pointingErrorForLossDeg,
  powerExponentForEdgeTaper,
  rimHalfAngleRad,
  ruzeEfficiency,
  ruzePeakGainWavelengthM,
  solveDiameterForGainM,
  spaceAttenuationDb,
  tabulateAperture,
} from '../reflector/index';
import {
  beamDeviationFormula,
  beamTiltFormula,
  centralBlockageFormula,
  dishDepthFormula,
  edgeTaperFormula,
  pointingFormula,
  reflectorGainFormula,
  rimHalfAngleFormula,
  ruzeFormula,
  spilloverFormula,
  taperFormula,
} from '../reflectorFormulas';

export type SolveFor = 'gain' | 'diameter';
export type FeedSpec = 'taper' | 'exponent';
export type OffsetSpec = 'length' | 'beamwidths';

export interface BudgetRow {
  key: string;
  label: string;
  /** Linear factor, 0…1. */
  efficiency: number;
  /** The same factor in per cent (100 × efficiency). */
  percent: number;
  /** 10·log10 of the factor (≤ 0). */
  decibels: number;
}

export interface PatternPoint {
  thetaDeg: number;
  /** Relative power, dB (floored at PATTERN_FLOOR_DB). */
  levelDb: number;
}

export interface ClusterBeam {
  /** Feed offset from the axis, m (signed). */
  feedOffsetM: number;
  /** Beam tilt by Lo's BDF, degrees (opposite sign to the feed offset). */
  beamTiltDeg: number;
  /** Beam peak by aperture integration, degrees (opposite sign to the feed offset). */
  beamPeakDeg: number;
  /** Peak gain lost to coma relative to the on-axis feed, dB (≥ 0). */
  scanLossDb: number;
}

export interface ReflectorData {
  /** Efficiency budget, top to bottom; the last row is the total aperture efficiency. */
  budget: BudgetRow[];
  /** Far-field pattern in a principal plane, on-axis feed (central blockage included, struts not). */
  pattern: PatternPoint[];
  /** One entry per feed of the cluster (a single entry for one feed). */
  beams: ClusterBeam[];
  /** Feed power-pattern exponent q used (cos^q ψ). */
  powerExponent: number;
  /** Angles off axis of the pattern's landmarks, degrees (null where the aperture is too small to have them). */
  halfPowerDeg: number | null;
  firstNullDeg: number | null;
  firstSidelobeDeg: number | null;
  /** Level of the first sidelobe relative to the peak, dB (null when it is not in visible space). */
  firstSidelobeDb: number | null;
  /** Angle and level of the highest sidelobe (searched to u = k a sin θ = 80 or the edge of visible space). */
  highestSidelobeDeg: number | null;
  highestSidelobeDb: number | null;
  /** True when the highest sidelobe is a later lobe than the first (a blockage or a strong taper can do this). */
  highestSidelobeIsLater: boolean;
  /** Lowest level the pattern is computed to, dB (values below are floored here). */
  patternFloorDb: number;
}

/** Floor of the pattern plot, dB. */
export const PATTERN_FLOOR_DB = -80;
const PATTERN_POINTS = 241;
/** Warning thresholds. */
const MIN_DIAMETER_WAVELENGTHS = 10;
const MAX_OFFSET_BEAMWIDTHS = 3;
const USUAL_FOCAL_RATIO = { min: 0.3, max: 1.0 };

/** Pure computation from validated inputs (Hz, m, dB, degrees). */
export function computeReflector(inputs: CalcInputs): CalcResult<ReflectorData> {
  const frequencyHz = requirePositive('frequencyHz', inputs.frequencyHz as number, 'Hz');
  const solveFor = inputs.solveFor as SolveFor;
  const focalRatio = requireInRange('focalRatio', inputs.focalRatio as number, 0.25 + 1e-9, 100);
  const feedSpec = inputs.feedSpec as FeedSpec;
  const rmsM = requireNonNegative('rmsSurfaceErrorM', (inputs.rmsSurfaceErrorM as number | null) ?? 0, 'm');
  const blockageM = requireNonNegative('blockageDiameterM', (inputs.blockageDiameterM as number | null) ?? 0, 'm');
  const strutFraction = requireInRange('strutBlockedFraction', (inputs.strutBlockedFraction as number | null) ?? 0, 0, 0.9);
  const otherLossDb = requireInRange('otherLossDb', (inputs.otherLossDb as number | null) ?? 0, 0, 100, 'dB');
  const offsetSpec = inputs.offsetSpec as OffsetSpec;
  const feedCount = requireInteger('feedCount', (inputs.feedCount as number | null) ?? 1, 1, 99);
  if (solveFor !== 'gain' && solveFor !== 'diameter') throw new CalcInputError('solveFor', `expected 'gain' or 'diameter', got ${JSON.stringify(solveFor)}`);
  if (feedSpec !== 'taper' && feedSpec !== 'exponent') throw new CalcInputError('feedSpec', `expected 'taper' or 'exponent', got ${JSON.stringify(feedSpec)}`);
  if (offsetSpec !== 'length' && offsetSpec !== 'beamwidths') throw new CalcInputError('offsetSpec', `expected 'length' or 'beamwidths', got ${JSON.stringify(offsetSpec)}`);
  const warnings: CalcWarning[] = [];
  const lambda = freeSpaceWavelengthM(frequencyHz);

  // Feed and illumination: depend on f/D only.
  const psi0 = rimHalfAngleRad(focalRatio);
  const q = feedSpec === 'taper'
    ? powerExponentForEdgeTaper(requireInRange('edgeTaperDb', inputs.edgeTaperDb as number, -200, 0, 'dB'), psi0)
    : requireInRange('powerExponent', inputs.powerExponent as number, 0, 1000);
  const illumination = illuminationEfficiencies(q, psi0);
  const surface = ruzeEfficiency(rmsM, lambda);
  const strut = blockageEfficiency(strutFraction);
  const other = dbToPowerRatio(-otherLossDb);
  const fixedEfficiency = illumination.aperture * surface * strut * other;
  const centralBlockage = (diameterM: number) =>
    blockageM === 0 ? 1 : blockageEfficiency(centralBlockedFraction(q, psi0, feedAngleAtApertureRadiusRad(focalRatio * diameterM, blockageM / 2)));

  // Diameter: given, or solved for the target gain.
  let diameterM: number;
  if (solveFor === 'gain') {
    diameterM = requirePositive('diameterM', inputs.diameterM as number, 'm');
    if (blockageM >= diameterM) throw new CalcInputError('blockageDiameterM', `expected a blockage diameter smaller than the dish diameter ${diameterM} m, got ${blockageM} m`);
  } else {
    const target = requireInRange('targetGainDbi', inputs.targetGainDbi as number, -50, 120, 'dBi');
    const unblocked = diameterForGainM(target, fixedEfficiency, lambda);
    diameterM = blockageM === 0
      ? unblocked
      : solveDiameterForGainM(target, (d) => powerRatioToDbFloored(fixedEfficiency * centralBlockage(d) * circularApertureGain(d, lambda)), blockageM * (1 + 1e-9), unblocked);
  }
  const central = centralBlockage(diameterM);
  const apertureEfficiency = fixedEfficiency * central;
  const gainDbi = apertureGainDbi(apertureEfficiency, diameterM, lambda);
  const diameterWavelengths = diameterM / lambda;

  // Geometry.
  const focalM = focalLengthM(diameterM, focalRatio);
  const innerFraction = blockageM / diameterM;

  // Pattern of the on-axis feed, central blockage removed.
  const halfTan = Math.tan(psi0 / 2);
  const amplitude = (t: number) => {
    const psi = 2 * Math.atan(t * halfTan);
    const c = Math.cos(psi / 2);
    return Math.sqrt(feedPowerPattern(q, psi)) * c * c;
  };
  const table = tabulateAperture(amplitude, innerFraction);
  const ka = Math.PI * diameterWavelengths;
  const figures = beamFigures(table, undefined, ka);
  const uToDeg = (u: number | null) => (u === null || u > ka ? null : radToDeg(Math.asin(u / ka)));
  const halfPowerDeg = figures ? uToDeg(figures.halfPowerU) : null;
  const firstNullDeg = figures ? uToDeg(figures.firstNullU) : null;
  const hpbwDeg = halfPowerDeg === null ? null : 2 * halfPowerDeg;
  const fnbwDeg = firstNullDeg === null ? null : 2 * firstNullDeg;
  const firstSidelobeDb = figures && figures.firstSidelobeU !== null && figures.firstSidelobeU <= ka ? figures.firstSidelobeDb : null;
  const highestSidelobeDb = figures && figures.highestSidelobeU !== null && figures.highestSidelobeU <= ka ? figures.highestSidelobeDb : null;
  // Five first-null widths, and far enough to show the highest sidelobe.
  const uMax = Math.min(ka, figures ? Math.max(5 * figures.firstNullU, 1.2 * (figures.highestSidelobeU ?? 0)) : 20);
  const thetaMaxRad = Math.asin(Math.min(1, uMax / ka));
  const pattern: PatternPoint[] = [];
  for (let i = 0; i < PATTERN_POINTS; i++) {
    const theta = (thetaMaxRad * i) / (PATTERN_POINTS - 1);
    const field = apertureField(table, ka * Math.sin(theta));
    pattern.push({ thetaDeg: radToDeg(theta), levelDb: powerRatioToDbFloored(field * field, PATTERN_FLOOR_DB) });
  }

  // Optimum illumination for this f/D.
  const optimum = optimumIllumination(psi0);

  // Feed offset and cluster.
  const bdf = loBeamDeviationFactor(focalRatio);
  let offsetM: number;
  let steeringAvailable = true;
  if (offsetSpec === 'length') {
    offsetM = requireNonNegative('feedOffsetM', (inputs.feedOffsetM as number | null) ?? 0, 'm');
  } else {
    const tiltBeamwidths = requireNonNegative('beamTiltBeamwidths', (inputs.beamTiltBeamwidths as number | null) ?? 0);
    if (hpbwDeg === null && tiltBeamwidths > 0) {
      steeringAvailable = false;
      warnings.push(warning('no-beamwidth-for-offset', 'outside-validity', 'This aperture is too small to have a half-power beamwidth, so a tilt in beamwidths has no meaning; give the feed offset as a length.', ['feedOffsetM', 'beamTiltDeg']));
    }
    const tiltDeg = steeringAvailable ? tiltBeamwidths * (hpbwDeg as number) : 0;
    if (tiltDeg / bdf >= 80) {
      steeringAvailable = false;
      warnings.push(warning('tilt-out-of-reach', 'outside-validity', `A tilt of ${tiltDeg.toFixed(0)}° needs a feed offset angle beyond 80°: far outside what a lateral feed offset can do.`, ['feedOffsetM', 'beamTiltDeg']));
    }
    offsetM = tiltBeamwidths === 0 || !steeringAvailable ? 0 : feedOffsetForTiltM(degToRad(tiltDeg), focalM, bdf);
  }
  const offsetAngleDeg = radToDeg(feedOffsetAngleRad(offsetM, focalM));
  const beamTiltDeg = bdf * offsetAngleDeg;
  const beamTiltBeamwidths = hpbwDeg === null ? null : beamTiltDeg / hpbwDeg;
  const scan = (offset: number) =>
    displacedFeedBeam({ diameterWavelengths, focalRatio, powerExponent: q, blockedDiameterFraction: innerFraction, offsetWavelengths: offset / lambda });
  // Feeds at ±δ give mirror-image beams: integrate once per distinct |δ|.
  const scanCache = new Map<number, { peakTiltRad: number; scanLossDb: number }>();
  const scanAt = (offset: number) => {
    const key = Math.abs(offset);
    let beam = scanCache.get(key);
    if (!beam) {
      beam = key > 0 ? scan(key) : { peakTiltRad: 0, scanLossDb: 0 };
      scanCache.set(key, beam);
    }
    return beam;
  };
  const single = scanAt(offsetM);
  const isCluster = feedCount > 1;
  const outerOffsetM = ((feedCount - 1) / 2) * offsetM;
  const outer = isCluster && outerOffsetM > 0 ? scanAt(outerOffsetM) : null;
  const beamSpacingDeg = isCluster ? beamTiltDeg : null;
  let crossoverDb: number | null = null;
  if (isCluster && beamSpacingDeg !== null && offsetM > 0) {
    const field = apertureField(table, ka * Math.sin(degToRad(beamSpacingDeg / 2)));
    crossoverDb = powerRatioToDbFloored(field * field, PATTERN_FLOOR_DB);
  }
  const beams: ClusterBeam[] = [];
  for (let i = 0; i < feedCount; i++) {
    const position = (i - (feedCount - 1) / 2) * offsetM;
    const positionForSingle = feedCount === 1 ? offsetM : position;
    const beam = steeringAvailable ? scanAt(positionForSingle) : { peakTiltRad: 0, scanLossDb: 0 };
    beams.push({
      feedOffsetM: positionForSingle,
      beamTiltDeg: -bdf * radToDeg(feedOffsetAngleRad(positionForSingle, focalM)),
      beamPeakDeg: -Math.sign(positionForSingle) * radToDeg(beam.peakTiltRad),
      scanLossDb: beam.scanLossDb,
    });
  }

  // Measurement and pointing.
  const farFieldM = farFieldDistanceM(diameterM, lambda);
  const pointingTenthDeg = hpbwDeg === null ? null : pointingErrorForLossDeg(0.1, hpbwDeg);
  const pointingOneDeg = hpbwDeg === null ? null : pointingErrorForLossDeg(1, hpbwDeg);

  // Warnings.
  if (diameterWavelengths < MIN_DIAMETER_WAVELENGTHS) {
    warnings.push(warning('small-aperture', 'outside-validity', `The dish is only ${diameterWavelengths.toFixed(1)} wavelengths across: the aperture-field (physical-optics) model behind gain, efficiencies and pattern needs D/λ of about ${MIN_DIAMETER_WAVELENGTHS} or more, and the feed is no longer small against the dish.`, ['gainDbi', 'hpbwDeg', 'fnbwDeg', 'firstSidelobeDb', 'highestSidelobeDb', 'apertureEfficiencyPercent']));
  }
  if (focalRatio < USUAL_FOCAL_RATIO.min || focalRatio > USUAL_FOCAL_RATIO.max) {
    warnings.push(warning('unusual-focal-ratio', 'note', `f/D = ${focalRatio} is outside the usual ${USUAL_FOCAL_RATIO.min}–${USUAL_FOCAL_RATIO.max} of front-fed dishes: ${focalRatio < USUAL_FOCAL_RATIO.min ? 'a deep dish needs a very wide feed pattern, and real feeds are not cos^q ψ that far out' : 'a shallow dish needs a large, narrow-beam feed that blocks more of the aperture'}.`, ['focalRatio', 'rimHalfAngleDeg']));
  }
  if (rmsM > lambda / 16) {
    warnings.push(warning('large-surface-error', 'caution', `RMS surface error ${(rmsM / lambda).toFixed(3)} λ is beyond λ/16: the Ruze loss (${(-powerRatioToDb(surface)).toFixed(1)} dB) is no longer a small correction, scattered power fills the sidelobes, and the gain falls with rising frequency.`, ['surfaceEfficiencyPercent', 'surfaceDb', 'gainDbi']));
  }
  if (innerFraction > 0.25) {
    warnings.push(warning('large-blockage', 'caution', `The central blockage is ${(innerFraction * 100).toFixed(0)} % of the diameter: the (1 − C)² estimate ignores diffraction around it, and near sidelobes rise well above the unblocked pattern.`, ['centralBlockageDb', 'firstSidelobeDb', 'highestSidelobeDb']));
  }
  if (strutFraction > 0.1) {
    warnings.push(warning('large-strut-blockage', 'note', 'Struts shading more than 10 % of the aperture: the area-fraction model ignores the spherical-wave shadow on the dish and strut scattering; the pattern omits struts.', ['strutDb']));
  }
  const largestTiltBw = hpbwDeg === null ? null : (bdf * radToDeg(feedOffsetAngleRad(Math.max(offsetM, outerOffsetM), focalM))) / hpbwDeg;
  if (largestTiltBw !== null && largestTiltBw > MAX_OFFSET_BEAMWIDTHS) {
    warnings.push(warning('large-feed-offset', 'outside-validity', `A beam is steered ${largestTiltBw.toFixed(1)} beamwidths off axis: beyond about ${MAX_OFFSET_BEAMWIDTHS} beamwidths coma grows quickly, Lo's beam deviation factor drifts, and the scan-loss estimate (aperture integration with the feed kept pointed as on axis) becomes rough.`, ['beamTiltDeg', 'scanLossDb', 'outerScanLossDb']));
  }
  if (isCluster && offsetM > 0 && offsetM < lambda) {
    warnings.push(warning('close-feeds', 'caution', `Feeds ${(offsetM / lambda).toFixed(2)} λ apart cannot be built with this illumination: a feed giving a ${edgeTaperDb(q, psi0).toFixed(0).replace('-', '−')} dB edge taper is wider than that.`, ['beamSpacingDeg', 'crossoverDb']));
  }

  const row = (key: string, label: string, efficiency: number): BudgetRow => ({ key, label, efficiency, percent: 100 * efficiency, decibels: powerRatioToDb(efficiency) });
  const budget = [
    row('spillover', 'Spillover', illumination.spillover),
    row('taper', 'Taper (illumination)', illumination.taper),
    row('surface', 'Surface error (Ruze)', surface),
    row('centralBlockage', 'Central blockage', central),
    row('strut', 'Strut blockage', strut),
    row('other', 'Other losses', other),
    row('aperture', 'Aperture efficiency (product)', apertureEfficiency),
  ];
  const percent = (x: number) => 100 * x;

  const steering = (value: number | null) => (steeringAvailable ? value : null);
  return {
    values: {
      gainDbi,
      diameterM,
      wavelengthM: lambda,
      diameterWavelengths,
      apertureEfficiencyPercent: percent(apertureEfficiency),
      apertureEfficiencyDb: powerRatioToDb(apertureEfficiency),
      spilloverPercent: percent(illumination.spillover),
      spilloverDb: powerRatioToDb(illumination.spillover),
      taperPercent: percent(illumination.taper),
      taperDb: powerRatioToDb(illumination.taper),
      illuminationPercent: percent(illumination.aperture),
      illuminationDb: powerRatioToDb(illumination.aperture),
      surfaceEfficiencyPercent: percent(surface),
      surfaceDb: powerRatioToDb(surface),
      centralBlockagePercent: percent(central),
      centralBlockageDb: powerRatioToDb(central),
      strutPercent: percent(strut),
      strutDb: powerRatioToDb(strut),
      otherPercent: percent(other),
      otherDb: -otherLossDb,
      ruzePeakFrequencyHz: rmsM > 0 && Number.isFinite(SPEED_OF_LIGHT_M_PER_S / rmsM) ? SPEED_OF_LIGHT_M_PER_S / ruzePeakGainWavelengthM(rmsM) : null,
      focalLengthM: focalM,
      depthM: dishDepthM(diameterM, focalM),
      rimHalfAngleDeg: radToDeg(psi0),
      powerExponent: q,
      feedEdgeLevelDb: feedEdgeLevelDb(q, psi0),
      spaceAttenuationDb: spaceAttenuationDb(psi0),
      edgeTaperDb: edgeTaperDb(q, psi0),
      hpbwDeg,
      hpbwFactorDeg: hpbwDeg === null ? null : hpbwDeg * diameterWavelengths,
      fnbwDeg,
      firstSidelobeDb,
      highestSidelobeDb,
      optimumEdgeTaperDb: optimum.edgeTaperDb,
      optimumPowerExponent: optimum.powerExponent,
      optimumIlluminationPercent: percent(optimum.efficiency),
      farFieldDistanceM: farFieldM,
      pointingTenthDbDeg: pointingTenthDeg,
      pointingOneDbDeg: pointingOneDeg,
      beamDeviationFactor: bdf,
      feedOffsetM: steering(offsetM),
      feedOffsetAngleDeg: steering(offsetAngleDeg),
      beamTiltDeg: steering(beamTiltDeg),
      beamTiltBeamwidths: steering(beamTiltBeamwidths),
      beamPeakDeg: steering(radToDeg(single.peakTiltRad)),
      scanLossDb: steering(single.scanLossDb),
      beamSpacingDeg: steering(beamSpacingDeg),
      beamSpacingBeamwidths: beamSpacingDeg === null || hpbwDeg === null ? null : beamSpacingDeg / hpbwDeg,
      crossoverDb: steering(crossoverDb),
      outerBeamTiltDeg: isCluster && steeringAvailable ? bdf * radToDeg(feedOffsetAngleRad(outerOffsetM, focalM)) : null,
      outerScanLossDb: outer ? outer.scanLossDb : isCluster && steeringAvailable ? 0 : null,
    },
    warnings,
    data: {
      budget,
      pattern,
      beams,
      powerExponent: q,
      halfPowerDeg,
      firstNullDeg,
      firstSidelobeDeg: firstSidelobeDb === null || figures?.firstSidelobeU == null ? null : uToDeg(figures.firstSidelobeU),
      firstSidelobeDb,
      highestSidelobeDeg: highestSidelobeDb === null || figures?.highestSidelobeU == null ? null : uToDeg(figures.highestSidelobeU),
      highestSidelobeDb,
      highestSidelobeIsLater: highestSidelobeDb !== null && figures !== null && figures.highestSidelobeU !== figures.firstSidelobeU,
      patternFloorDb: PATTERN_FLOOR_DB,
    },
  };
}

const DIAMETER_OUTPUT_NOTE = 'Given, or solved for the target gain (Brent root of gain(D) − target; the central blockage makes η depend on D).';

/** The calculator definition, with defaults taken from the team conventions. */
export function createReflectorCalculator(conventions: TeamConventions): CalculatorDef<ReflectorData> {
  return {
    id: 'front-fed-reflector',
    title: 'Front-fed parabolic reflector',
    summary: 'Gain or diameter from an efficiency budget (spillover, taper, surface, blockage), the far-field pattern, the best edge taper, and beam steering by feed offset.',
    nav: { order: 3 },
    safety: { lead: 'A high-gain transmitting dish concentrates RF power along its beam, most strongly in the near field in front of the aperture. Never stand in front of an energised dish.', cautions: ['rfExposure', 'sunOnFeed', 'workAtHeight'] },
    embed: true,
    purpose:
      'What gain, beamwidth and sidelobes does a prime-focus dish give with a given feed taper, surface and blockage — or how large must it be for a gain — and how far can a feed offset steer its beam?',
    schemaVersion: 1,
    migrations: {},
    params: [
      { kind: 'frequency', key: 'f', name: 'frequencyHz', label: 'Frequency', defaultText: frequencyDefaultText(conventions.designFrequencyHz), min: 1e6, max: 1e13, minExclusive: true, description: 'Operating frequency.' },
      { kind: 'choice', key: 'solve', name: 'solveFor', label: 'Solve for', options: [ { value: 'gain', label: 'Gain (diameter given)' }, { value: 'diameter', label: 'Diameter (target gain given)' } ], defaultText: 'gain', description: 'Compute the gain of a given dish, or the diameter that reaches a target gain with the same f/D, feed, surface and blockage.' },
      { kind: 'length', key: 'd', name: 'diameterM', label: 'Diameter D', defaultText: '1.2 m', min: 1e-3, max: 1e3, minExclusive: true, wavelengthFrom: 'design', usedWhen: { key: 'solve', values: ['gain'] }, description: 'Projected aperture diameter; used when solving for gain.' },
      { kind: 'decibel', key: 'g', name: 'targetGainDbi', label: 'Target gain (dBi)', defaultText: '40 dB', min: -50, max: 120, usedWhen: { key: 'solve', values: ['diameter'] }, description: 'Gain over isotropic to reach; used when solving for the diameter.' },
      { kind: 'number', key: 'fd', name: 'focalRatio', label: 'Focal ratio f/D', defaultText: '0.4', min: 0.25, max: 100, minExclusive: true, description: 'Focal length over diameter. Front-fed dishes usually have 0.3 to 0.6; at 0.25 the focus lies in the rim plane.' },
      { kind: 'choice', key: 'feed', name: 'feedSpec', label: 'Feed pattern given as', options: [ { value: 'taper', label: 'Edge taper (dB)' }, { value: 'exponent', label: 'Feed power pattern cos^q ψ, q' } ], defaultText: 'taper', description: 'The feed is a rotationally symmetric POWER pattern cos^q ψ; give q, or the edge taper it produces at the rim.' },
      { kind: 'levelBelowPeak', key: 'et', name: 'edgeTaperDb', label: 'Edge taper, dB relative to the centre, including space attenuation', defaultText: '-10 dB', min: -200, max: 0, usedWhen: { key: 'feed', values: ['taper'] }, description: 'Aperture power density at the rim relative to the centre (feed fall-off plus space attenuation ((1 + cos ψ0)/2)²), negative dB; a positive depth such as 10 dB is read as the same level.' },
      { kind: 'number', key: 'q', name: 'powerExponent', label: 'Feed power pattern cos^q ψ, q', defaultText: '2', min: 0, max: 1000, usedWhen: { key: 'feed', values: ['exponent'] }, description: 'q in the feed power pattern cos^q ψ (the field pattern is cos^(q/2) ψ).' },
      { kind: 'length', key: 'rms', name: 'rmsSurfaceErrorM', label: 'RMS surface error', defaultText: '0.5 mm', min: 0, max: 10, wavelengthFrom: 'design', description: 'RMS deviation of the surface from the paraboloid, normal to the surface (Ruze equation).' },
      { kind: 'length', key: 'blk', name: 'blockageDiameterM', label: 'Central blockage diameter', defaultText: '10 cm', min: 0, max: 1e3, wavelengthFrom: 'design', description: 'Diameter of the feed (or subreflector) shadow on the aperture; 0 for none. Must be smaller than D.' },
      { kind: 'number', key: 'strut', name: 'strutBlockedFraction', label: 'Strut blockage (fraction of aperture area)', defaultText: '0.03', min: 0, max: 0.9, description: 'Projected area of the feed-support struts over the aperture area.' },
      { kind: 'decibel', key: 'loss', name: 'otherLossDb', label: 'Other losses', defaultText: '0.3 dB', min: 0, max: 100, description: 'Ohmic, mismatch, radome and other losses, as a positive number of dB.' },
      { kind: 'choice', key: 'offby', name: 'offsetSpec', label: 'Feed offset given as', options: [ { value: 'length', label: 'Length in the focal plane' }, { value: 'beamwidths', label: 'Beam tilt in beamwidths' } ], defaultText: 'length', description: 'Give the lateral feed offset as a distance, or as the beam tilt it should produce in half-power beamwidths.' },
      { kind: 'length', key: 'off', name: 'feedOffsetM', label: 'Lateral feed offset (feed spacing for a cluster)', defaultText: '0 cm', min: 0, max: 1e3, wavelengthFrom: 'design', usedWhen: { key: 'offby', values: ['length'] }, description: 'Feed displacement from the focus across the axis; with several feeds, the centre-to-centre spacing of neighbours.' },
      { kind: 'number', key: 'offbw', name: 'beamTiltBeamwidths', label: 'Beam tilt (or beam spacing for a cluster), in beamwidths', defaultText: '1', min: 0, max: 50, usedWhen: { key: 'offby', values: ['beamwidths'] }, description: 'Wanted beam tilt in HPBWs; with several feeds, the spacing of neighbouring beams.' },
      { kind: 'count', key: 'n', name: 'feedCount', label: 'Feeds side by side', defaultText: '1', min: 1, max: 99, description: 'Number of feeds in a row across the focal plane, centred on the axis.' },
    ],
    outputs: [
      { key: 'gainDbi', label: 'Gain', kind: 'decibel', digits: 4, unit: 'dBi', description: '10·log10(η (πD/λ)²), dBi' },
      { key: 'diameterM', label: 'Diameter D', kind: 'length', digits: 4, description: DIAMETER_OUTPUT_NOTE },
      { key: 'wavelengthM', label: 'Wavelength λ', kind: 'length', digits: 5 },
      { key: 'diameterWavelengths', label: 'Diameter in wavelengths D/λ', kind: 'ratio', digits: 4, unit: 'λ' },
      { key: 'apertureEfficiencyPercent', label: 'Aperture efficiency η (all factors)', kind: 'percent', digits: 3 },
      { key: 'apertureEfficiencyDb', label: 'Aperture efficiency η', kind: 'decibel', digits: 3 },
      { key: 'spilloverPercent', label: 'Spillover efficiency', kind: 'percent', digits: 4, description: 'Numerical integration over the feed pattern' },
      { key: 'spilloverDb', label: 'Spillover efficiency', kind: 'decibel', digits: 3 },
      { key: 'taperPercent', label: 'Taper (illumination) efficiency', kind: 'percent', digits: 4, description: 'Numerical integration over the feed pattern' },
      { key: 'taperDb', label: 'Taper efficiency', kind: 'decibel', digits: 3 },
      { key: 'illuminationPercent', label: 'Spillover × taper', kind: 'percent', digits: 4 },
      { key: 'illuminationDb', label: 'Spillover × taper', kind: 'decibel', digits: 3 },
      { key: 'surfaceEfficiencyPercent', label: 'Surface efficiency (Ruze)', kind: 'percent', digits: 4 },
      { key: 'surfaceDb', label: 'Surface efficiency (Ruze)', kind: 'decibel', digits: 3 },
      { key: 'centralBlockagePercent', label: 'Central blockage efficiency', kind: 'percent', digits: 4, description: '(1 − C_b)², C_b the illumination-weighted blocked share' },
      { key: 'centralBlockageDb', label: 'Central blockage efficiency', kind: 'decibel', digits: 3 },
      { key: 'strutPercent', label: 'Strut blockage efficiency', kind: 'percent', digits: 4, description: '(1 − s)², s the strut area fraction' },
      { key: 'strutDb', label: 'Strut blockage efficiency', kind: 'decibel', digits: 3 },
      { key: 'otherPercent', label: 'Other losses', kind: 'percent', digits: 4 },
      { key: 'otherDb', label: 'Other losses', kind: 'decibel', digits: 3 },
      { key: 'ruzePeakFrequencyHz', label: 'Frequency of peak gain for this surface', kind: 'frequency', digits: 3, description: 'c/(4π ε): above it the Ruze loss outgrows the (πD/λ)² rise' },
      { key: 'focalLengthM', label: 'Focal length f', kind: 'length', digits: 4 },
      { key: 'depthM', label: 'Dish depth D²/(16f)', kind: 'length', digits: 4 },
      { key: 'rimHalfAngleDeg', label: 'Rim half-angle ψ0 at the focus', kind: 'angle', digits: 4 },
      { key: 'powerExponent', label: 'Feed power pattern cos^q ψ, q', kind: 'number', digits: 4 },
      { key: 'feedEdgeLevelDb', label: 'Feed fall-off at the rim', kind: 'decibel', digits: 3 },
      { key: 'spaceAttenuationDb', label: 'Space attenuation at the rim', kind: 'decibel', digits: 3 },
      { key: 'edgeTaperDb', label: 'Edge taper (feed + space attenuation)', kind: 'decibel', digits: 3 },
      { key: 'hpbwDeg', label: 'Half-power beamwidth', kind: 'angle', digits: 4, description: 'Brent root of the computed pattern at −3 dB' },
      { key: 'hpbwFactorDeg', label: 'Beamwidth factor HPBW·D/λ', kind: 'angle', digits: 3, description: 'The k in HPBW ≈ k λ/D degrees' },
      { key: 'fnbwDeg', label: 'First-null beamwidth', kind: 'angle', digits: 4 },
      { key: 'firstSidelobeDb', label: 'First sidelobe level', kind: 'decibel', digits: 3, description: 'First local maximum of the pattern after the first null; rotationally symmetric pattern, struts and feed scattering not included' },
      { key: 'highestSidelobeDb', label: 'Highest sidelobe level', kind: 'decibel', digits: 3, description: 'Highest local maximum past the first null, within sin θ ≤ 80/(πD/λ) (about 25 λ/D); with a central blockage it need not be the first' },
      { key: 'optimumEdgeTaperDb', label: 'Edge taper for maximum spillover × taper at this f/D', kind: 'decibel', digits: 3 },
      { key: 'optimumPowerExponent', label: 'Feed power pattern cos^q ψ, q at that optimum', kind: 'number', digits: 4 },
      { key: 'optimumIlluminationPercent', label: 'Spillover × taper at the optimum', kind: 'percent', digits: 4 },
      { key: 'farFieldDistanceM', label: 'Far-field distance 2D²/λ', kind: 'length', digits: 3 },
      { key: 'pointingTenthDbDeg', label: 'Pointing error for 0.1 dB loss', kind: 'angle', digits: 2, description: 'Gaussian-beam rule 12 (Δθ/HPBW)² dB (common practice)' },
      { key: 'pointingOneDbDeg', label: 'Pointing error for 1 dB loss', kind: 'angle', digits: 2, description: 'Gaussian-beam rule 12 (Δθ/HPBW)² dB (common practice)' },
      { key: 'beamDeviationFactor', label: 'Beam deviation factor (Lo)', kind: 'ratio', digits: 2, description: "Lo's approximation with k = 0.36; about 3 % from the integrated value at f/D 0.3, so two digits" },
      { key: 'feedOffsetM', label: 'Lateral feed offset (or feed spacing)', kind: 'length', digits: 3 },
      { key: 'feedOffsetAngleDeg', label: 'Feed offset angle atan(δ/f)', kind: 'angle', digits: 4 },
      { key: 'beamTiltDeg', label: 'Beam tilt (BDF × offset angle)', kind: 'angle', digits: 2, description: 'Two digits, as the beam deviation factor; the aperture-integration peak below is the finer figure' },
      { key: 'beamTiltBeamwidths', label: 'Beam tilt in beamwidths', kind: 'ratio', digits: 2, unit: 'HPBW' },
      { key: 'beamPeakDeg', label: 'Beam peak by aperture integration', kind: 'angle', digits: 4, description: 'Peak of the displaced-feed pattern with the exact path-length error' },
      { key: 'scanLossDb', label: 'Scan (coma) loss at this offset', kind: 'decibel', digits: 3, description: 'Aperture integration; rough beyond about 3 beamwidths' },
      { key: 'beamSpacingDeg', label: 'Spacing of neighbouring beams', kind: 'angle', digits: 2 },
      { key: 'beamSpacingBeamwidths', label: 'Beam spacing in beamwidths', kind: 'ratio', digits: 2, unit: 'HPBW' },
      { key: 'crossoverDb', label: 'Crossover level of neighbouring beams', kind: 'decibel', digits: 3, description: 'On-axis pattern at half the beam spacing (coma neglected)' },
      { key: 'outerBeamTiltDeg', label: 'Tilt of the outermost beam', kind: 'angle', digits: 2 },
      { key: 'outerScanLossDb', label: 'Scan loss of the outermost beam', kind: 'decibel', digits: 3 },
    ],
    formulas: [
      { formula: reflectorGainFormula, output: 'gainDbi', args: (i, v) => ({ apertureEfficiency: (v.apertureEfficiencyPercent as number) / 100, diameterM: v.diameterM as number, frequencyHz: i.frequencyHz as number }) },
      { formula: rimHalfAngleFormula, output: 'rimHalfAngleDeg', args: (i) => ({ focalRatio: i.focalRatio as number }) },
      { formula: dishDepthFormula, output: 'depthM', args: (_i, v) => ({ diameterM: v.diameterM as number, focalLengthM: v.focalLengthM as number }) },
      { formula: edgeTaperFormula, output: 'edgeTaperDb', args: (_i, v) => ({ powerExponent: v.powerExponent as number, rimHalfAngleDeg: v.rimHalfAngleDeg as number }) },
      { formula: spilloverFormula, output: 'spilloverDb', args: (i, v) => ({ powerExponent: v.powerExponent as number, focalRatio: i.focalRatio as number }) },
      { formula: taperFormula, output: 'taperDb', args: (i, v) => ({ powerExponent: v.powerExponent as number, focalRatio: i.focalRatio as number }) },
      { formula: ruzeFormula, output: 'surfaceDb', args: (i) => ({ rmsSurfaceErrorM: (i.rmsSurfaceErrorM as number | null) ?? 0, frequencyHz: i.frequencyHz as number }) },
      {
        formula: centralBlockageFormula,
        output: 'centralBlockageDb',
        args: (i, v) => ({ powerExponent: v.powerExponent as number, focalRatio: i.focalRatio as number, blockedDiameterFraction: ((i.blockageDiameterM as number | null) ?? 0) / (v.diameterM as number) }),
      },
      { formula: beamDeviationFormula, output: 'beamDeviationFactor', args: (i) => ({ focalRatio: i.focalRatio as number }) },
      { formula: beamTiltFormula, output: 'beamTiltDeg', args: (i, v) => ({ offsetM: v.feedOffsetM as number, focalLengthM: v.focalLengthM as number, focalRatio: i.focalRatio as number }) },
      { formula: farFieldDistanceFormula, output: 'farFieldDistanceM', args: (i, v) => ({ apertureDiameterM: v.diameterM as number, frequencyHz: i.frequencyHz as number }) },
      { formula: pointingFormula, output: 'pointingOneDbDeg', args: (_i, v) => (v.hpbwDeg === null ? null : { lossDb: 1, hpbwDeg: v.hpbwDeg }) },
    ],
    assumptions: [
      'The feed is rotationally symmetric with the POWER pattern cos^q ψ (field cos^(q/2) ψ), its phase centre at the focus, and no radiation behind it (ψ > 90°).',
      'Edge taper means the aperture power density at the rim relative to the centre, including the space attenuation ((1 + cos ψ0)/2)².',
      'Spillover, taper and central-blockage figures are integrals over the feed pattern (Gauss–Legendre); the pattern is a Hankel transform of the aperture field with the blocked centre removed.',
      'Aperture-field (physical-optics) model: reliable for dishes many wavelengths across (D/λ ≳ 10), near the main beam; no obliquity factor, edge diffraction, feed scattering or cross-polarization.',
      'Struts enter the gain as (1 − s)² of their area fraction s and are left out of the pattern; central blockage and struts are treated as independent factors.',
      'The Ruze equation assumes random, spatially uncorrelated surface errors; beyond about λ/16 it is no longer a small correction.',
      'Beam tilt uses Lo\'s beam deviation factor with k = 0.36; the scan (coma) loss is an aperture integration with the exact path error of the displaced feed, its illumination kept as on axis; both are rough beyond about 3 beamwidths.',
      'Crossover of neighbouring cluster beams reads the on-axis pattern at half the beam spacing; feeds must physically fit at that spacing.',
      'Pointing tolerances use the Gaussian-beam rule loss ≈ 12 (Δθ/HPBW)² dB (common practice).',
      'Safety: a transmitting dish concentrates power far along its beam, and inside 2D²/λ far-field power-density formulas do not hold; exposure is assessed under local regulations by a qualified person.',
    ],
    references: [
      'C. A. Balanis, Antenna Theory: Analysis and Design, 4th ed., Wiley, 2016, §15.4 (section number from memory; front-fed paraboloid: geometry, spillover, taper and aperture efficiency).',
      'J. Ruze, "Antenna tolerance theory — a review", Proc. IEEE 54(4), 1966.',
      'Y. T. Lo, "On the beam deviation factor of a parabolic reflector", IRE Trans. Antennas Propag., AP-8, 1960.',
      'J. Ruze, "Lateral-feed displacement in a paraboloid", IEEE Trans. Antennas Propag., AP-13, 1965.',
      'W. L. Stutzman and G. A. Thiele, Antenna Theory and Design, 3rd ed., Wiley, 2012 (reflector antennas, aperture blockage).',
      'IEEE Std 145 (definitions of terms for antennas); IEEE Std 149-2021, IEEE Recommended Practice for Antenna Measurements (far-field distance).',
    ],
    examples: [
      { title: 'Ground-station dish for a polar-orbit downlink, 8.2 GHz, 3.7 m, f/D 0.38', query: '?v=1&f=8.2GHz&solve=gain&d=3.7m&fd=0.38&feed=taper&et=-11dB&rms=0.6mm&blk=28cm&strut=0.025&loss=0.4dB&offby=length&off=0cm&n=1' },
      { title: 'Radio-astronomy outreach dish sized for 38 dBi at 1.42 GHz', query: '?v=1&f=1.42GHz&solve=diameter&g=38dB&fd=0.45&feed=exponent&q=2.4&rms=2mm&blk=35cm&strut=0.04&loss=0.5dB&offby=length&off=0cm&n=1' },
      { title: 'Three-beam feed cluster for a coastal weather radar, 5.6 GHz, 4.2 m, beams 1.1 HPBW apart', query: '?v=1&f=5.6GHz&solve=gain&d=4.2m&fd=0.42&feed=taper&et=-12dB&rms=0.4mm&blk=30cm&strut=0.03&loss=0.3dB&offby=beamwidths&offbw=1.1&n=3' },
    ],
    sourcePath: 'calc/calculators/reflector.ts',
    compute: computeReflector,
  };
}
