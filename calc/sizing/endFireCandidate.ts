import { DIPOLE_DIRECTIVITY_DBI } from '../constants';
import { freeSpaceWavelengthM } from '../wavelength';
import { NBS_YAGI_DESIGNS, YAGI_BOOM_LIMITS_WAVELENGTHS, yagiBoomForGainWavelengths, yagiGainDbd } from '../endFire/yagiGain';
import { hpbwFromDirectivityDeg } from '../endFire/stacking';
import type { Candidate, SizingRequirement } from './candidate';

/** Longest boom in the published Yagi–Uda table, λ. */
const LONGEST_PUBLISHED_BOOM = NBS_YAGI_DESIGNS[NBS_YAGI_DESIGNS.length - 1].boomWavelengths;

/**
 * A single Yagi–Uda (the practical end-fire antenna) sized from the published gain-versus-boom
 * table; flagged impractical past the longest published boom. Steered by rotating it.
 */
export function sizeEndFire(requirement: SizingRequirement): Candidate {
  const lambda = freeSpaceWavelengthM(requirement.frequencyLowHz);
  const scan = Math.max(requirement.scanAzimuthDeg, requirement.scanElevationDeg);
  const flags: string[] = [];
  const notes: string[] = ['Gain from the NBS TN 688 table of optimised Yagi–Uda designs (values from memory; see the end-fire page); the beamwidth is the gain-based estimate with equal planes.'];
  let targetDbi: number;
  if (requirement.kind === 'gain') {
    targetDbi = requirement.gainEdgeDbi;
  } else {
    // Directivity whose equal-plane beam has the required HPBW: D = 41 253/θ² (Kraus, beam-area estimate).
    targetDbi = 10 * Math.log10((4 * Math.PI * (180 / Math.PI) ** 2) / (requirement.hpbwDeg * requirement.hpbwDeg));
  }
  let boom = yagiBoomForGainWavelengths(targetDbi - DIPOLE_DIRECTIVITY_DBI);
  if (boom === null) {
    const tooShort = targetDbi - DIPOLE_DIRECTIVITY_DBI < yagiGainDbd(YAGI_BOOM_LIMITS_WAVELENGTHS.min).gainDbd;
    boom = tooShort ? YAGI_BOOM_LIMITS_WAVELENGTHS.min : YAGI_BOOM_LIMITS_WAVELENGTHS.max;
    if (!tooShort) flags.push(`impractical: needs ${(targetDbi).toFixed(1)} dBi, beyond any single Yagi–Uda (the estimate stops at a ${YAGI_BOOM_LIMITS_WAVELENGTHS.max} λ boom)`);
  } else if (boom > LONGEST_PUBLISHED_BOOM) {
    flags.push(`impractical: a ${boom.toFixed(1)} λ boom is past the longest published design (${LONGEST_PUBLISHED_BOOM} λ); the gain there is an extrapolation`);
  }
  const gainDbi = yagiGainDbd(boom).gainDbd + DIPOLE_DIRECTIVITY_DBI;
  const hpbw = hpbwFromDirectivityDeg(10 ** (gainDbi / 10));
  const lengthM = boom * lambda;
  return {
    id: 'endFire',
    name: 'Yagi–Uda (end-fire)',
    sizeM: lengthM,
    areaM2: lengthM * (lambda / 2),
    depthM: lengthM,
    elementCount: null,
    steering: scan > 0 ? `mechanical rotator over ±${requirement.scanAzimuthDeg}° az, ±${requirement.scanElevationDeg}° el` : 'fixed (none needed)',
    gainBroadsideDbi: gainDbi,
    gainEdgeDbi: gainDbi,
    hpbwBroadsideDeg: [hpbw, hpbw],
    hpbwEdgeDeg: hpbw,
    flags,
    notes,
    outline: { kind: 'boom', lengthM, spanM: lambda / 2 },
  };
}
