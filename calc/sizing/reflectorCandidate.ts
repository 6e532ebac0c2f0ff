import { computeReflector } from '../calculators/reflector';
import { diameterForGainM, apertureGainDbi } from '../aperture/index';
import { dishDepthM, focalLengthM } from '../reflector/geometry';
import { brentRoot } from '../numeric/brentRoot';
import { freeSpaceWavelengthM } from '../wavelength';
import { degToRad } from '../angle';
import { enclosingDiscAreaM2, type Candidate, type SizingRequirement } from './candidate';

/** Typical front-fed design the sizing assumes: f/D 0.4, −10 dB edge taper, no blockage or surface error. */
export const SIZING_REFLECTOR_FOCAL_RATIO = 0.4;
export const SIZING_REFLECTOR_EDGE_TAPER_DB = -10;
/** Feed-cluster reach the sizing reports, in beamwidths (Lo's BDF holds well within this). */
export const FEED_CLUSTER_REACH_BEAMWIDTHS = 3;
/** Smallest D/λ for which the reflector calculator's aperture-field (physical-optics) model holds (the same bound it warns at). */
export const SIZING_REFLECTOR_MIN_DIAMETER_WAVELENGTHS = 10;

function reflectorRun(frequencyHz: number, diameterM: number, offsetBeamwidths: number) {
  return computeReflector({
    frequencyHz,
    solveFor: 'gain',
    diameterM,
    targetGainDbi: 0,
    focalRatio: SIZING_REFLECTOR_FOCAL_RATIO,
    feedSpec: 'taper',
    edgeTaperDb: SIZING_REFLECTOR_EDGE_TAPER_DB,
    powerExponent: 2,
    rmsSurfaceErrorM: 0,
    blockageDiameterM: 0,
    strutBlockedFraction: 0,
    otherLossDb: 0,
    offsetSpec: 'beamwidths',
    feedOffsetM: 0,
    beamTiltBeamwidths: offsetBeamwidths,
    feedCount: 1,
  }).values;
}

/** HPBW of the sizing dish (the reflector calculator's pattern), degrees; 180 when the pattern has no half-power point. */
export function sizingReflectorHpbwDeg(frequencyHz: number, diameterM: number): number {
  return (reflectorRun(frequencyHz, diameterM, 0).hpbwDeg as number | null) ?? 180;
}

/** Reference diameter for the first guess, wavelengths (inside the model's validity). */
const REFERENCE_DIAMETER_WAVELENGTHS = 20;

/**
 * Diameter whose computed HPBW equals hpbwDeg, m: Brent's root of HPBW(D)/requirement − 1, with
 * HPBW(D) from the reflector calculator's own aperture pattern (it falls monotonically as D grows).
 * The bracket starts ±0.1 % around a first guess: the aperture-field pattern is a function of
 * u = π(D/λ) sin θ only, so sin(HPBW/2) ∝ 1/D from one reference run; the bracket widens by 1.5×
 * steps if the guess is off. Null when no bracket is found.
 */
export function reflectorDiameterForHpbwM(frequencyHz: number, hpbwDeg: number): number | null {
  const lambda = freeSpaceWavelengthM(frequencyHz);
  const excess = (diameterM: number) => sizingReflectorHpbwDeg(frequencyHz, diameterM) / hpbwDeg - 1;
  const referenceM = REFERENCE_DIAMETER_WAVELENGTHS * lambda;
  const referenceHalfRad = degToRad(sizingReflectorHpbwDeg(frequencyHz, referenceM)) / 2;
  const guess = (referenceM * Math.sin(referenceHalfRad)) / Math.sin(degToRad(Math.min(hpbwDeg, 179.9)) / 2);
  let lo = guess * (1 - 1e-3);
  let hi = guess * (1 + 1e-3);
  for (let k = 0; excess(lo) <= 0; k++) {
    if (k > 40) return null;
    lo /= 1.5;
  }
  for (let k = 0; excess(hi) > 0; k++) {
    if (k > 40) return null;
    hi *= 1.5;
  }
  return brentRoot(excess, lo, hi, lambda * 1e-9);
}

/** Diameter of a front-fed dish meeting the requirement, with the team's aperture efficiency; beam from the reflector calculator's pattern. */
export function sizeReflector(requirement: SizingRequirement): Candidate {
  const f = requirement.frequencyLowHz;
  const lambda = freeSpaceWavelengthM(f);
  const eta = requirement.assumptions.reflectorEfficiency;
  const flags: Candidate['flags'] = [];
  let diameterM: number;
  if (requirement.kind === 'gain') {
    diameterM = diameterForGainM(requirement.gainEdgeDbi, eta, lambda);
  } else {
    const solved = reflectorDiameterForHpbwM(f, requirement.hpbwDeg);
    if (solved === null) flags.push({ code: 'no-half-power-beamwidth', kind: 'model', message: `no dish diameter gives a ${requirement.hpbwDeg}° half-power beamwidth in the aperture-field model` });
    diameterM = solved ?? (70 * lambda) / requirement.hpbwDeg;
  }
  const diameterWavelengths = diameterM / lambda;
  if (diameterWavelengths < SIZING_REFLECTOR_MIN_DIAMETER_WAVELENGTHS) {
    flags.push({ code: 'small-dish', kind: 'model', message: `only ${diameterWavelengths.toFixed(1)} λ across: the aperture-field model behind its gain and beam needs D/λ ≥ ${SIZING_REFLECTOR_MIN_DIAMETER_WAVELENGTHS}, and the feed is no longer small against the dish` });
  }
  const run = reflectorRun(f, diameterM, FEED_CLUSTER_REACH_BEAMWIDTHS);
  const gain = apertureGainDbi(eta, diameterM, lambda);
  const hpbw = run.hpbwDeg as number | null;
  const scan = Math.max(requirement.scanAzimuthDeg, requirement.scanElevationDeg);
  const notes: string[] = [];
  const reachDeg = run.beamTiltDeg as number | null;
  if (reachDeg !== null) {
    notes.push(`A focal-plane feed cluster reaches about ±${Math.abs(reachDeg).toPrecision(2)}° (${FEED_CLUSTER_REACH_BEAMWIDTHS} beamwidths) electronically, with ${Math.abs(run.scanLossDb as number).toPrecision(2)} dB coma loss at the edge.`);
  }
  const sidelobe = run.firstSidelobeDb as number | null;
  return {
    id: 'reflector',
    name: 'Front-fed reflector',
    sizeM: diameterM,
    enclosingDiameterM: diameterM,
    footprintM2: enclosingDiscAreaM2(diameterM),
    depthM: dishDepthM(diameterM, focalLengthM(diameterM, SIZING_REFLECTOR_FOCAL_RATIO)),
    elementCount: null,
    elementGainDbi: null,
    model: `Front-fed dish, f/D ${SIZING_REFLECTOR_FOCAL_RATIO}, ${SIZING_REFLECTOR_EDGE_TAPER_DB} dB edge taper: gain η(πD/λ)² with the assumed aperture efficiency; beam and sidelobe from the reflector calculator's aperture pattern (diameter solved by root-finding for a beamwidth requirement); steered mechanically, so the beam is the same over the region.`,
    steering: scan > 0 ? `mechanical positioner over ±${requirement.scanAzimuthDeg}° az, ±${requirement.scanElevationDeg}° el` : 'fixed (none needed)',
    gainBroadsideDbi: gain,
    gainEdgeDbi: gain,
    gainPrecision: 'computed',
    hpbwBroadsideDeg: [hpbw, hpbw],
    hpbwEdgeDeg: hpbw,
    beamPrecision: 'computed',
    firstSidelobeDb: sidelobe,
    flags,
    fits: true,
    notes,
    outline: { kind: 'disc', diameterM },
  };
}
