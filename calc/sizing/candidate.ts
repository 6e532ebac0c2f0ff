/** One sized architecture, as the sizing table and the to-scale sketch show it. */
export type ArchitectureId = 'reflector' | 'endFire' | 'linearArray' | 'planarArray' | 'ringArray' | 'yArray';

/** Outline for the to-scale sketch, metres. */
export type CandidateOutline =
  | { kind: 'disc'; diameterM: number }
  | { kind: 'rectangle'; widthM: number; heightM: number }
  | { kind: 'boom'; lengthM: number; spanM: number }
  | { kind: 'ring'; diameterM: number }
  | { kind: 'y'; armM: number };

/**
 * Why a candidate does not fit: 'requirement' (misses the gain, beamwidth, sidelobe or
 * uniform-beam requirement), 'coverage' (cannot reach part of the scan region), 'limit' (breaks a
 * size, element-count or depth limit), 'model' (outside the validity of the model that sized it),
 * 'practical' (beyond anything practical to build, e.g. past the published Yagi–Uda designs).
 */
export type ReasonKind = 'requirement' | 'coverage' | 'limit' | 'model' | 'practical';

/** One reason a candidate does not fit, as data. */
export interface CandidateReason {
  /** Stable identifier, e.g. 'gain-below-requirement'. */
  code: string;
  kind: ReasonKind;
  /** One sentence for an engineer. */
  message: string;
}

/** How far a number can be trusted: 'computed' from a pattern or exact formula, 'estimate' from a rule of thumb or a transcribed table. */
export type Precision = 'computed' | 'estimate';

export interface Candidate {
  id: ArchitectureId;
  name: string;
  /** Largest dimension of the antenna, m (what the size limit is checked against). */
  sizeM: number;
  /** Diameter of the smallest circle enclosing the antenna in its largest view, m. */
  enclosingDiameterM: number;
  /** Footprint compared across candidates: area of that enclosing circle, π/4 · enclosingDiameterM², m². */
  footprintM2: number;
  /** Depth behind the face (dish depth, boom, radiating layer), m. */
  depthM: number;
  /** Element count (null where there are no array elements); for planar arrays on the chosen lattice. */
  elementCount: number | null;
  /** Planar arrays: counts on both lattices. */
  elementCountRectangular?: number;
  elementCountTriangular?: number;
  /** Element spacing, m, where there is one. */
  spacingM?: number;
  /** Broadside gain each array element is assumed to have, dBi (null: not an array). */
  elementGainDbi: number | null;
  /** The model that sized it, in one sentence (its assumptions, stated in the same terms for every candidate). */
  model: string;
  steering: string;
  gainBroadsideDbi: number;
  /** Gain at the coverage corner (electronic scan) or anywhere in the region (mechanical steering), dBi. */
  gainEdgeDbi: number;
  gainPrecision: Precision;
  /** HPBW at broadside, degrees: [plane of scan through the corner, the plane across it] (null when undefined). */
  hpbwBroadsideDeg: [number | null, number | null];
  /** HPBW in the plane of scan at the coverage corner, degrees. */
  hpbwEdgeDeg: number | null;
  beamPrecision: Precision;
  /** Highest first sidelobe at broadside relative to the peak, dB (null when the model does not give one). */
  firstSidelobeDb: number | null;
  /** Every reason it does not fit; empty when it fits. */
  flags: CandidateReason[];
  /** True when flags is empty: meets every stated requirement and limit within its model's validity. */
  fits: boolean;
  /** Further notes (not disqualifying). */
  notes: string[];
  outline: CandidateOutline;
}

/** The requirement and the assumptions every candidate is sized with. */
export interface SizingRequirement {
  frequencyLowHz: number;
  frequencyHighHz: number;
  kind: 'gain' | 'hpbw';
  /** Gain required at the scan edge (the coverage corner), dBi (kind 'gain'). */
  gainEdgeDbi: number;
  /** Largest HPBW allowed at broadside, degrees (kind 'hpbw'). */
  hpbwDeg: number;
  /** Coverage region ±az × ±el about the boresight, degrees (calc/sizing/coverage.ts). */
  scanAzimuthDeg: number;
  scanElevationDeg: number;
  /** The beam at the coverage corner may be at most UNIFORM_BEAM_TOLERANCE wider than at broadside. */
  uniformBeam: boolean;
  /** Highest first sidelobe allowed, dB (negative), or null for no requirement. */
  maxSidelobeDb: number | null;
  limits: { maxSizeM: number | null; maxElements: number | null; maxDepthM: number | null };
  assumptions: {
    reflectorEfficiency: number;
    arrayRadiationEfficiency: number;
    /** Exponent n of the element power pattern cosⁿθ (teamConventions.elementPowerExponent). */
    cosineExponent: number;
    spacingMarginFraction: number;
    /** Gain of one line-array element at λ/2 spacing, dBi. */
    elementGainDbi: number;
  };
}

/** Area of a circle of the given diameter, m². */
export function enclosingDiscAreaM2(diameterM: number): number {
  return (Math.PI / 4) * diameterM * diameterM;
}
