import { DIPOLE_DIRECTIVITY_DBI } from '../constants';
import { freeSpaceWavelengthM } from '../wavelength';
import { NBS_YAGI_DESIGNS, YAGI_BOOM_LIMITS_WAVELENGTHS, yagiBoomForGainWavelengths, yagiGainDbd } from '../endFire/yagiGain';
import { directivityForEqualPlaneHpbw, hpbwFromDirectivityDeg } from '../endFire/stacking';
import { endFireLengthForDirectivity } from '../endFire/endFireArray';
import { enclosingDiscAreaM2, type Candidate, type SizingRequirement } from './candidate';

/** End-fire lines are described beside the Yagi up to this gain (beyond it they are hundreds of λ long). */
const MAX_END_FIRE_LINE_NOTE_DBI = 22;
const END_FIRE_LINE_SPACING_WAVELENGTHS = 0.25;

/** Longest boom in the published Yagi–Uda table, λ. */
const LONGEST_PUBLISHED_BOOM = NBS_YAGI_DESIGNS[NBS_YAGI_DESIGNS.length - 1].boomWavelengths;

/**
 * A single Yagi–Uda (the practical end-fire antenna) sized from the published gain-versus-boom
 * table; flagged impractical past the longest published boom. Steered by rotating it.
 */
export function sizeEndFire(requirement: SizingRequirement): Candidate {
  const lambda = freeSpaceWavelengthM(requirement.frequencyLowHz);
  const scan = Math.max(requirement.scanAzimuthDeg, requirement.scanElevationDeg);
  const flags: Candidate['flags'] = [];
  const notes: string[] = ['Gain from the NBS TN 688 table of optimised Yagi–Uda designs (values from memory; see the end-fire page), so it is shown to 0.5 dB; the beamwidth is the beam-area estimate √(41 253/G) with equal planes, shown to two figures. The sidelobes of the published designs are not modelled here: check the design you pick.'];
  let targetDbi: number;
  if (requirement.kind === 'gain') {
    targetDbi = requirement.gainEdgeDbi;
  } else {
    targetDbi = 10 * Math.log10(directivityForEqualPlaneHpbw(requirement.hpbwDeg));
  }
  let boom = yagiBoomForGainWavelengths(targetDbi - DIPOLE_DIRECTIVITY_DBI);
  if (boom === null) {
    const tooShort = targetDbi - DIPOLE_DIRECTIVITY_DBI < yagiGainDbd(YAGI_BOOM_LIMITS_WAVELENGTHS.min).gainDbd;
    boom = tooShort ? YAGI_BOOM_LIMITS_WAVELENGTHS.min : YAGI_BOOM_LIMITS_WAVELENGTHS.max;
    if (!tooShort) flags.push({ code: 'beyond-yagi', kind: 'practical', message: `impractical: needs ${targetDbi.toFixed(1)} dBi, beyond any single Yagi–Uda (the estimate stops at a ${YAGI_BOOM_LIMITS_WAVELENGTHS.max} λ boom)` });
  } else if (boom > LONGEST_PUBLISHED_BOOM) {
    flags.push({ code: 'past-published-yagi', kind: 'practical', message: `impractical: a ${boom.toFixed(1)} λ boom is past the longest published design (${LONGEST_PUBLISHED_BOOM} λ); the gain there is an extrapolation` });
  }
  const gainDbi = yagiGainDbd(boom).gainDbd + DIPOLE_DIRECTIVITY_DBI;
  if (targetDbi <= MAX_END_FIRE_LINE_NOTE_DBI) {
    const line = endFireLengthForDirectivity('hansenWoodyard', END_FIRE_LINE_SPACING_WAVELENGTHS, 10 ** (targetDbi / 10));
    if (line) notes.push(`A Hansen–Woodyard line of isotropic elements at λ/4 would need ${line.count} elements, ${(line.lengthWavelengths * lambda).toPrecision(3)} m (${line.lengthWavelengths.toFixed(1)} λ), from the engine's exact directivity.`);
  } else {
    notes.push(`Any end-fire line for ${targetDbi.toFixed(1)} dBi would be hundreds of wavelengths long; not worth computing.`);
  }
  const hpbw = hpbwFromDirectivityDeg(10 ** (gainDbi / 10));
  const lengthM = boom * lambda;
  const spanM = lambda / 2;
  const sizeM = Math.max(lengthM, spanM);
  return {
    id: 'endFire',
    name: 'Yagi–Uda (end-fire)',
    sizeM,
    enclosingDiameterM: sizeM,
    footprintM2: enclosingDiscAreaM2(sizeM),
    depthM: lengthM,
    elementCount: null,
    elementGainDbi: null,
    model: 'A single Yagi–Uda from the published gain-versus-boom table (about λ/2 element span), rotated to steer, so the beam is the same over the region; beamwidth from the beam-area estimate.',
    steering: scan > 0 ? `mechanical rotator over ±${requirement.scanAzimuthDeg}° az, ±${requirement.scanElevationDeg}° el` : 'fixed (none needed)',
    gainBroadsideDbi: gainDbi,
    gainEdgeDbi: gainDbi,
    gainPrecision: 'estimate',
    hpbwBroadsideDeg: [hpbw, hpbw],
    hpbwEdgeDeg: hpbw,
    beamPrecision: 'estimate',
    firstSidelobeDb: null,
    flags,
    fits: true,
    notes,
    outline: { kind: 'boom', lengthM, spanM },
  };
}
