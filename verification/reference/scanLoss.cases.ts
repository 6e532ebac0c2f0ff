import type { ReferenceGroup } from './referenceCase';
import { currentSheetReflectionMagnitude, projectedApertureLossDb, uniformLineHpbwDeg } from '../../calc/scanLoss';

/** HPBW (rad) × L/λ: the constant of HPBW ≈ k λ/L. */
const beamwidthTimesLengthRad = (hpbwDeg: number, lengthWavelengths: number) => ((hpbwDeg * Math.PI) / 180) * lengthWavelengths;
/** Ratio of two beamwidths (pure number). */
const beamwidthRatio = (hpbwDeg: number, referenceHpbwDeg: number) => hpbwDeg / referenceHpbwDeg;

export const scanLossCases: ReferenceGroup = {
  topic: 'Scan loss and beam broadening',
  modules: ['calc/scanLoss.ts'],
  cases: [
    { id: 'scan-projected-60', title: 'Projected-aperture loss at 60° scan: 10·log10(cos 60°)', source: 'Mailloux, Phased Array Antenna Handbook, 2nd ed., §2.1 (section number from memory)', expected: -3.0103, tolerance: 1e-4, quantity: 'dB', reads: 'projectedApertureLossDb', compute: () => projectedApertureLossDb(60) },
    { id: 'scan-current-sheet-60', title: 'Ideal current sheet |Γ| at 60° scan: tan²30°', source: 'Wheeler, IEEE Trans. Antennas Propag. AP-13 (1965)', expected: 1 / 3, tolerance: 1e-12, quantity: 'ratio', reads: 'currentSheetReflectionMagnitude', compute: () => currentSheetReflectionMagnitude(60) },
    { id: 'line-hpbw-0886', title: 'Long uniform line: HPBW (rad) × L/λ → 0.886', source: 'Balanis, Antenna Theory, 4th ed., §6.3 (section number from memory)', expected: 0.8859, tolerance: 1e-3, quantity: 'angleRad', reads: 'beamwidthTimesLengthRad', compute: () => beamwidthTimesLengthRad(uniformLineHpbwDeg(400, 0.5, 0)!, 200) },
    { id: 'line-broadening-60', title: 'Long uniform line scanned to 60°: HPBW ratio → 1/cos 60° = 2', source: 'Mailloux, Phased Array Antenna Handbook, 2nd ed., §1.1 (section number from memory)', expected: 2, tolerance: 0.01, quantity: 'ratio', reads: 'beamwidthRatio', compute: () => beamwidthRatio(uniformLineHpbwDeg(400, 0.5, 60)!, uniformLineHpbwDeg(400, 0.5, 0)!) },
  ],
};
