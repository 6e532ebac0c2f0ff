import type { Candidate } from './candidate';

/**
 * The candidate to recommend: among those with no flags, the one with the smallest area (our
 * mass proxy); null when every candidate is flagged.
 */
export function chooseCandidate(candidates: Candidate[]): Candidate | null {
  const fitting = candidates.filter((c) => c.flags.length === 0);
  if (fitting.length === 0) return null;
  return fitting.reduce((best, c) => (c.areaM2 < best.areaM2 ? c : best));
}
