import { requireInRange } from '../errors';
import { warning, type CalcWarning } from '../warnings';
import { taylorLineSourceSidelobeDb, taylorParameterA } from './taylorLineSource';

/**
 * The usual smallest n̄ for a Taylor taper of design level sidelobeDb (positive dB):
 * n̄ ≥ 2A² + ½ with A = acosh(10^(sidelobeDb/20))/π (T. T. Taylor, IRE Trans. AP-3, 1955;
 * R. C. Hansen, "Phased Array Antennas", 2nd ed., ch. 3 (chapter number from memory)). Checked against computed
 * line-source patterns (tests/calc/array/taylorNbar.test.ts, SciPy fixture): from 20 to 50 dB this
 * n̄ always reaches the design level within 0.5 dB, and is 1 to 2 above the smallest n̄ that does
 * (30 dB: rule 4, smallest 3). It is a safe choice, not a bound: a smaller n̄ may still work.
 */
export function taylorNbarRuleMinimum(sidelobeDb: number): number {
  requireInRange('sidelobeDb', sidelobeDb, 0, 200, 'dB');
  const a = taylorParameterA(sidelobeDb);
  return Math.max(1, Math.ceil(2 * a * a + 0.5 - 1e-12));
}

/** How far (dB) the reached sidelobe level may lie above the design level before n̄ counts as too small. */
export const TAYLOR_LEVEL_TOLERANCE_DB = 0.5;

/**
 * A caution when n̄ is too small for the design level: the Taylor line source with this n̄ reaches
 * a highest sidelobe more than TAYLOR_LEVEL_TOLERANCE_DB above −sidelobeDb (n̄ = 2 for 30 dB
 * reaches about −25.7 dB). Null when n̄ is enough. outputs names the output keys it concerns.
 */
export function taylorNbarWarning(nbar: number, sidelobeDb: number, outputs: string[]): CalcWarning | null {
  const reachedDb = taylorLineSourceSidelobeDb(nbar, sidelobeDb);
  if (reachedDb <= -sidelobeDb + TAYLOR_LEVEL_TOLERANCE_DB) return null;
  const design = Number(sidelobeDb.toPrecision(4));
  return warning(
    'taylor-nbar-too-small',
    'caution',
    `Taylor n̄ = ${nbar} is too small for ${design} dB: with this n̄ the highest sidelobe of a Taylor line source is about ${reachedDb.toFixed(1).replace('-', '−')} dB, not −${design} dB (more than ${TAYLOR_LEVEL_TOLERANCE_DB} dB above). Use n̄ ≥ ${taylorNbarRuleMinimum(sidelobeDb)}, the usual rule n̄ ≥ 2A² + ½ with A = acosh(10^(SLL/20))/π.`,
    outputs,
  );
}
