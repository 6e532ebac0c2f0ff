import { freeSpaceWavelengthM } from '../wavelength';
import { apertureGainFromArea } from '../aperture/index';
import { uniformLineHpbwDeg } from '../scanLoss';
import { hpbwFromDirectivityDeg } from '../endFire/stacking';
import { enclosingDiscAreaM2, type Candidate, type SizingRequirement } from './candidate';
import { cornerScanLossDb, lineCountForHpbw, MAX_LINE_BEAM_ELEMENTS, sizingSpacingM } from './planarCandidate';
import { UNIFORM_FIRST_SIDELOBE_DB } from './uniformSidelobe';

/**
 * Beamwidth of an element of gain G (linear) with equal principal-plane beamwidths, degrees, by
 * the beam-area estimate θ ≈ √(41 253/G) (SPHERE_SQUARE_DEG in calc/beamSolidAngle.ts; Kraus,
 * Antennas, 2nd ed., §2-13 (section number from memory)) — the same relation the end-fire stacking code uses.
 */
export function elementBeamwidthDeg(elementGainDbi: number): number {
  return hpbwFromDirectivityDeg(10 ** (elementGainDbi / 10));
}

/**
 * Height across the line of an element of gain G at λ/2 spacing when it fills its cell:
 * G = 4π (λ/2) h / λ² gives h = G λ / (2π), m.
 */
export function lineElementHeightM(elementGainDbi: number, wavelengthM: number): number {
  return (10 ** (elementGainDbi / 10) * wavelengthM) / (2 * Math.PI);
}

/**
 * A uniform linear array (a fan beam) lying horizontally, scanning electronically in azimuth only.
 * Same element model as the planar face: each element fills its cell (spacing d × height h), so
 * the line of length L is a face of area L·h and directivity 4πLh/λ² = 2GL/λ, with G the element
 * gain at λ/2 spacing. Its length therefore depends on the gain and the scan loss, not on the spacing.
 */
export function sizeLinearArray(requirement: SizingRequirement): Candidate {
  const lambda = freeSpaceWavelengthM(requirement.frequencyLowHz);
  const { arrayRadiationEfficiency: eta, elementGainDbi } = requirement.assumptions;
  const scan = Math.min(requirement.scanAzimuthDeg, 89.9);
  const loss = cornerScanLossDb(requirement, scan, 0);
  const d = sizingSpacingM(requirement, 'rectangular', scan, 0);
  const heightM = lineElementHeightM(elementGainDbi, lambda);
  const directivityPerMetre = apertureGainFromArea(heightM, lambda); // a strip of height h, per metre of length
  let count: number;
  if (requirement.kind === 'gain') {
    const lengthNeededM = 10 ** ((requirement.gainEdgeDbi - 10 * Math.log10(eta) - loss) / 10) / directivityPerMetre;
    count = Math.max(2, Math.ceil(lengthNeededM / d * (1 - 1e-12)));
  } else {
    count = lineCountForHpbw(d / lambda, requirement.hpbwDeg);
  }
  const lengthM = count * d;
  const gainBroadside = 10 * Math.log10(eta * directivityPerMetre * lengthM);
  const cellGainDbi = 10 * Math.log10(apertureGainFromArea(d * heightM, lambda));
  const fan = elementBeamwidthDeg(elementGainDbi);
  const flags: Candidate['flags'] = [];
  const beamComputable = count <= MAX_LINE_BEAM_ELEMENTS;
  if (!beamComputable) flags.push({ code: 'line-too-long', kind: 'practical', message: `impractical: needs ${count.toExponential(2)} elements, more than the ${MAX_LINE_BEAM_ELEMENTS.toExponential(0)} whose beam the sizing computes` });
  if (requirement.scanElevationDeg > 0) flags.push({ code: 'one-plane-scan', kind: 'coverage', message: 'scans electronically in azimuth only; the elevation range needs a mechanical tilt' });
  const sizeM = Math.max(lengthM, heightM);
  const enclosingDiameterM = Math.hypot(lengthM, heightM);
  return {
    id: 'linearArray',
    name: 'Uniform linear array (fan beam)',
    sizeM,
    enclosingDiameterM,
    footprintM2: enclosingDiscAreaM2(enclosingDiameterM),
    depthM: lambda / 4,
    elementCount: count,
    spacingM: d,
    elementGainDbi: cellGainDbi,
    model: `Face of length L and element height h = Gλ/2π (G = ${elementGainDbi} dBi, the element gain at λ/2 spacing), each element filling its cell: directivity 4πLh/λ² × radiation efficiency, cosⁿθ element power pattern at the azimuth edge; uniform excitation.`,
    steering: scan > 0 ? `electronic, ±${requirement.scanAzimuthDeg}° in azimuth only` : 'electronic in azimuth (fixed beam possible)',
    gainBroadsideDbi: gainBroadside,
    gainEdgeDbi: gainBroadside + loss,
    gainPrecision: 'computed',
    hpbwBroadsideDeg: [beamComputable ? uniformLineHpbwDeg(count, d / lambda, 0) : null, fan],
    hpbwEdgeDeg: beamComputable ? uniformLineHpbwDeg(count, d / lambda, scan) : null,
    // The in-plane beam is computed; the fan across the line is the beam-area estimate (the table shows it to two figures).
    beamPrecision: 'computed',
    firstSidelobeDb: UNIFORM_FIRST_SIDELOBE_DB,
    flags,
    fits: true,
    notes: [`Elements ${Number(heightM.toPrecision(2))} m tall across the line; at this spacing each fills a ${(d / lambda).toFixed(2)} λ cell and must reach ${cellGainDbi.toFixed(1)} dBi. The beam across the line is the element's, about ${fan.toFixed(0)}° (beam-area estimate √(41 253/G)).`],
    outline: { kind: 'rectangle', widthM: lengthM, heightM },
  };
}
