/** Requirement-to-architecture sizing: re-exports only. */
export * from './candidate';
export * from './coverage';
export * from './candidateChecks';
export * from './uniformSidelobe';
export * from './firstSidelobe';
export * from './reflectorCandidate';
export * from './planarCandidate';
export * from './lineCandidate';
export * from './ringCandidates';
export * from './endFireCandidate';
export * from './chooseCandidate';
