/** One sized architecture, as the sizing table and the to-scale sketch show it. */
export type ArchitectureId = 'reflector' | 'endFire' | 'linearArray' | 'planarArray' | 'ringArray' | 'yArray';

/** Outline for the to-scale sketch, metres. */
export type CandidateOutline =
  | { kind: 'disc'; diameterM: number }
  | { kind: 'rectangle'; widthM: number; heightM: number }
  | { kind: 'boom'; lengthM: number; spanM: number }
  | { kind: 'ring'; diameterM: number }
  | { kind: 'y'; armM: number };

export interface Candidate {
  id: ArchitectureId;
  name: string;
  /** Largest dimension, m. */
  sizeM: number;
  /** Face or aperture area (mass proxy), m². */
  areaM2: number;
  /** Depth behind the face (dish depth, boom, radiating layer), m. */
  depthM: number;
  /** Element count (null where there are no array elements); for planar arrays on the chosen lattice. */
  elementCount: number | null;
  /** Planar arrays: counts on both lattices. */
  elementCountRectangular?: number;
  elementCountTriangular?: number;
  /** Element spacing, m, where there is one. */
  spacingM?: number;
  steering: string;
  gainBroadsideDbi: number;
  gainEdgeDbi: number;
  /** HPBW in the two principal planes at broadside, degrees (null when undefined). */
  hpbwBroadsideDeg: [number | null, number | null];
  /** HPBW in the scan plane at the scan edge, degrees. */
  hpbwEdgeDeg: number | null;
  /** Reasons this candidate does not meet the requirement or the limits; empty when it fits. */
  flags: string[];
  /** Further notes (not disqualifying). */
  notes: string[];
  outline: CandidateOutline;
}

/** The requirement and the assumptions every candidate is sized with. */
export interface SizingRequirement {
  frequencyLowHz: number;
  frequencyHighHz: number;
  kind: 'gain' | 'hpbw';
  /** Gain required at the scan edge, dBi (kind 'gain'). */
  gainEdgeDbi: number;
  /** Largest HPBW allowed at broadside, degrees (kind 'hpbw'). */
  hpbwDeg: number;
  scanAzimuthDeg: number;
  scanElevationDeg: number;
  limits: { maxSizeM: number | null; maxElements: number | null; maxDepthM: number | null };
  assumptions: {
    reflectorEfficiency: number;
    arrayRadiationEfficiency: number;
    cosineExponent: number;
    spacingMarginFraction: number;
    elementGainDbi: number;
  };
}

/** Adds the limit flags a candidate breaks. */
export function limitFlags(candidate: Candidate, requirement: SizingRequirement): string[] {
  const flags: string[] = [];
  const { maxSizeM, maxElements, maxDepthM } = requirement.limits;
  if (maxSizeM !== null && candidate.sizeM > maxSizeM) flags.push(`larger than the ${maxSizeM} m size limit`);
  if (maxElements !== null && candidate.elementCount !== null && candidate.elementCount > maxElements) flags.push(`more elements than the limit of ${maxElements}`);
  if (maxDepthM !== null && candidate.depthM > maxDepthM) flags.push(`deeper than the ${maxDepthM} m depth limit`);
  return flags;
}
