import { freeSpaceWavelengthM } from '../wavelength';
import { scanLossPartsDb, uniformLineHpbwDeg } from '../scanLoss';
import type { Candidate, SizingRequirement } from './candidate';
import { lineCountForHpbw, sizingSpacingM } from './planarCandidate';

/**
 * Beamwidth of an element of gain G (linear) with equal principal-plane beamwidths, degrees, by
 * the rule G ≈ 32 400/(θ₁θ₂) (common practice for real antennas; Stutzman & Thiele, Antenna
 * Theory and Design, 3rd ed., §2.4 (section number from memory) give 32 400 as the practical constant).
 */
export function elementBeamwidthDeg(elementGainDbi: number): number {
  return Math.sqrt(32_400 / 10 ** (elementGainDbi / 10));
}

/** A uniform linear array (a fan beam), scanning in azimuth only. */
export function sizeLinearArray(requirement: SizingRequirement): Candidate {
  const lambda = freeSpaceWavelengthM(requirement.frequencyLowHz);
  const { arrayRadiationEfficiency: eta, cosineExponent: n, elementGainDbi } = requirement.assumptions;
  const scan = requirement.scanAzimuthDeg;
  const loss = scanLossPartsDb(Math.min(scan, 89.9), 'cosine', n).totalDb;
  const d = sizingSpacingM(requirement, 'rectangular', scan);
  let count: number;
  if (requirement.kind === 'gain') {
    // Array gain N·G_element for spacings of λ/2 or more (common practice, no source).
    count = Math.max(2, Math.ceil(10 ** ((requirement.gainEdgeDbi - elementGainDbi - 10 * Math.log10(eta) - loss) / 10)));
  } else {
    count = lineCountForHpbw(d / lambda, requirement.hpbwDeg);
  }
  const gainBroadside = 10 * Math.log10(eta * count) + elementGainDbi;
  const fan = elementBeamwidthDeg(elementGainDbi);
  const flags: string[] = [];
  if (requirement.scanElevationDeg > 0) flags.push('scans electronically in one plane only; elevation scan needs a mechanical tilt');
  if (requirement.kind === 'hpbw' && fan > requirement.hpbwDeg) flags.push(`fan beam: ${fan.toFixed(0)}° wide in the plane across the array`);
  const lengthM = count * d;
  return {
    id: 'linearArray',
    name: 'Uniform linear array (fan beam)',
    sizeM: lengthM,
    areaM2: lengthM * lambda / 2,
    depthM: lambda / 4,
    elementCount: count,
    spacingM: d,
    steering: scan > 0 ? `electronic, ±${scan}° in azimuth` : 'electronic in azimuth (fixed beam possible)',
    gainBroadsideDbi: gainBroadside,
    gainEdgeDbi: gainBroadside + loss,
    hpbwBroadsideDeg: [uniformLineHpbwDeg(count, d / lambda, 0), fan],
    hpbwEdgeDeg: uniformLineHpbwDeg(count, d / lambda, Math.min(scan, 89.9)),
    flags,
    notes: [`Elements of ${elementGainDbi} dBi (an assumption you can change); the beam across the array is the element’s, about ${fan.toFixed(0)}°.`],
    outline: { kind: 'rectangle', widthM: lengthM, heightM: lambda / 2 },
  };
}
