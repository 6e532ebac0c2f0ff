import type { Candidate } from './candidate';

/** The recommendation rule, as the page states it. */
export const RECOMMENDATION_RULE =
  'A candidate fits when it has no reasons against it: it meets the gain or beamwidth requirement, the sidelobe and uniform-beam requirements where set, reaches the whole coverage region, keeps within every limit, and stays inside the validity of the model that sized it. Among the candidates that fit, the one with the smallest footprint (the area of the smallest circle enclosing the antenna in its largest view) is recommended; on a tie, the shallower. When none fits, none is recommended.';

/** The candidate to recommend by RECOMMENDATION_RULE; null when no candidate fits. */
export function chooseCandidate(candidates: Candidate[]): Candidate | null {
  const fitting = candidates.filter((c) => c.fits);
  if (fitting.length === 0) return null;
  return fitting.reduce((best, c) => (c.footprintM2 < best.footprintM2 || (c.footprintM2 === best.footprintM2 && c.depthM < best.depthM) ? c : best));
}
