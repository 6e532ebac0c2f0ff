/**
 * The checks applied to every candidate alike, on its own numbers: the stated requirement
 * (gain at the coverage corner, broadside beamwidth, sidelobe level, uniform beam over the
 * coverage) and the stated limits. Checks that only one architecture can fail (a line cannot scan
 * in elevation, a Yagi past the published designs) are added by that candidate.
 */
import type { Candidate, CandidateReason, SizingRequirement } from './candidate';

/** The beam at the coverage corner may be this fraction wider than at broadside and still count as uniform (team choice, no source). */
export const UNIFORM_BEAM_TOLERANCE = 0.1;

/** Relative slack for comparing a sized number with the requirement it was solved for (rounding of root-finders). */
const SOLVED_SLACK = 1e-6;

const fmt = (value: number, digits = 3) => Number(value.toPrecision(digits)).toString().replace('-', '−');
const db = (value: number) => value.toFixed(1).replace('-', '−');

/** Reasons a candidate misses the stated requirement (gain, beamwidth, sidelobes, uniform beam). */
export function requirementReasons(c: Candidate, r: SizingRequirement): CandidateReason[] {
  const reasons: CandidateReason[] = [];
  if (r.kind === 'gain' && c.gainEdgeDbi < r.gainEdgeDbi - SOLVED_SLACK) {
    reasons.push({ code: 'gain-below-requirement', kind: 'requirement', message: `gain at the coverage edge ${db(c.gainEdgeDbi)} dBi, below the required ${fmt(r.gainEdgeDbi)} dBi` });
  }
  if (r.kind === 'hpbw') {
    const [a, b] = c.hpbwBroadsideDeg;
    if (a === null || b === null) {
      reasons.push({ code: 'no-half-power-beamwidth', kind: 'model', message: 'its pattern has no half-power beamwidth in one plane, so the beamwidth requirement cannot be checked' });
    } else if (Math.max(a, b) > r.hpbwDeg * (1 + SOLVED_SLACK)) {
      reasons.push({ code: 'beam-wider-than-required', kind: 'requirement', message: `beam ${fmt(Math.max(a, b), 2)}° wide in one plane, wider than the required ${fmt(r.hpbwDeg)}°` });
    }
  }
  if (r.maxSidelobeDb !== null && c.firstSidelobeDb !== null && c.firstSidelobeDb > r.maxSidelobeDb) {
    reasons.push({ code: 'sidelobes-above-requirement', kind: 'requirement', message: `first sidelobe ${db(c.firstSidelobeDb)} dB, above the allowed ${fmt(r.maxSidelobeDb)} dB` });
  }
  if (r.uniformBeam) {
    const broadside = c.hpbwBroadsideDeg[0];
    if (broadside !== null && c.hpbwEdgeDeg !== null && c.hpbwEdgeDeg > broadside * (1 + UNIFORM_BEAM_TOLERANCE)) {
      reasons.push({ code: 'beam-broadens-with-scan', kind: 'requirement', message: `beam broadens with scan: ${fmt(broadside, 2)}° at broadside, ${fmt(c.hpbwEdgeDeg, 2)}° at the coverage corner (×${(c.hpbwEdgeDeg / broadside).toFixed(2)}), more than the ${UNIFORM_BEAM_TOLERANCE * 100} % allowed for a uniform beam` });
    } else if (c.hpbwEdgeDeg === null && broadside !== null) {
      reasons.push({ code: 'no-edge-beamwidth', kind: 'model', message: 'no half-power beamwidth at the coverage corner, so the uniform-beam requirement cannot be checked' });
    }
  }
  return reasons;
}

/** Reasons a candidate breaks a stated limit. */
export function limitReasons(c: Candidate, r: SizingRequirement): CandidateReason[] {
  const reasons: CandidateReason[] = [];
  const { maxSizeM, maxElements, maxDepthM } = r.limits;
  if (maxSizeM !== null && c.sizeM > maxSizeM) reasons.push({ code: 'over-size-limit', kind: 'limit', message: `larger than the ${fmt(maxSizeM)} m size limit` });
  if (maxElements !== null && c.elementCount !== null && c.elementCount > maxElements) reasons.push({ code: 'over-element-limit', kind: 'limit', message: `more elements than the limit of ${maxElements}` });
  if (maxDepthM !== null && c.depthM > maxDepthM) reasons.push({ code: 'over-depth-limit', kind: 'limit', message: `deeper than the ${fmt(maxDepthM)} m depth limit` });
  return reasons;
}

/** Adds the shared checks to the candidate's own reasons and sets `fits`. */
export function checkCandidate(c: Candidate, r: SizingRequirement): Candidate {
  const flags = [...c.flags, ...requirementReasons(c, r), ...limitReasons(c, r)];
  return { ...c, flags, fits: flags.length === 0 };
}
