import { computeReflector } from '../calculators/reflector';
import { diameterForGainM, apertureGainDbi } from '../reflector/gain';
import { dishDepthM, focalLengthM } from '../reflector/geometry';
import { freeSpaceWavelengthM } from '../wavelength';
import type { Candidate, SizingRequirement } from './candidate';

/** Typical front-fed design the sizing assumes: f/D 0.4, −10 dB edge taper, no blockage or surface error. */
export const SIZING_REFLECTOR_FOCAL_RATIO = 0.4;
export const SIZING_REFLECTOR_EDGE_TAPER_DB = -10;
/** Feed-cluster reach the sizing reports, in beamwidths (Lo's BDF holds well within this). */
export const FEED_CLUSTER_REACH_BEAMWIDTHS = 3;

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

/** Diameter of a front-fed dish meeting the requirement, with the team's aperture efficiency; beam from the reflector calculator's pattern. */
export function sizeReflector(requirement: SizingRequirement): Candidate {
  const f = requirement.frequencyLowHz;
  const lambda = freeSpaceWavelengthM(f);
  const eta = requirement.assumptions.reflectorEfficiency;
  let diameterM: number;
  if (requirement.kind === 'gain') {
    diameterM = diameterForGainM(requirement.gainEdgeDbi, eta, lambda);
  } else {
    const factor = reflectorRun(f, 100 * lambda, 0).hpbwFactorDeg as number; // HPBW·D/λ, degrees
    diameterM = (factor * lambda) / requirement.hpbwDeg;
  }
  const run = reflectorRun(f, diameterM, FEED_CLUSTER_REACH_BEAMWIDTHS);
  const gain = apertureGainDbi(eta, diameterM, lambda);
  const hpbw = run.hpbwDeg as number | null;
  const scan = Math.max(requirement.scanAzimuthDeg, requirement.scanElevationDeg);
  const notes: string[] = [];
  const reachDeg = run.beamTiltDeg as number | null;
  if (reachDeg !== null) {
    notes.push(`A focal-plane feed cluster reaches about ±${Math.abs(reachDeg).toFixed(2)}° (${FEED_CLUSTER_REACH_BEAMWIDTHS} beamwidths) electronically, with ${Math.abs(run.scanLossDb as number).toFixed(2)} dB coma loss at the edge.`);
  }
  return {
    id: 'reflector',
    name: 'Front-fed reflector',
    sizeM: diameterM,
    areaM2: (Math.PI * diameterM * diameterM) / 4,
    depthM: dishDepthM(diameterM, focalLengthM(diameterM, SIZING_REFLECTOR_FOCAL_RATIO)),
    elementCount: null,
    steering: scan > 0 ? `mechanical positioner over ±${requirement.scanAzimuthDeg}° az, ±${requirement.scanElevationDeg}° el` : 'fixed (none needed)',
    gainBroadsideDbi: gain,
    gainEdgeDbi: gain,
    hpbwBroadsideDeg: [hpbw, hpbw],
    hpbwEdgeDeg: hpbw,
    flags: [],
    notes,
    outline: { kind: 'disc', diameterM },
  };
}
