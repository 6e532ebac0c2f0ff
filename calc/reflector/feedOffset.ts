/**
 * Beam steering by a lateral feed offset in the focal plane of a front-fed paraboloid.
 *
 * Two estimates, kept side by side:
 * - the beam deviation factor (BDF) of Y. T. Lo, "On the beam deviation factor of a parabolic
 *   reflector", IRE Trans. Antennas Propag., AP-8, 1960: BDF = (1 + k (D/4f)²)/(1 + (D/4f)²),
 *   k ≈ 0.36 for typical tapers; beam tilt = BDF × feed offset angle atan(δ/f);
 * - an aperture-field integration with the exact path-length error of the displaced feed (rays
 *   from the feed at (δ, 0, f) to the reflector, then parallel to the axis to the focal plane),
 *   giving the beam peak direction and the gain lost to coma. Geometrical optics to the aperture:
 *   good for offsets of a few beamwidths; the feed illumination is kept as on axis (feed turned
 *   towards the vertex), and feed blockage by the cluster is ignored.
 */
import { requireFinite, requireInRange, requireInteger, requireNonNegative, requirePositive } from '../errors';
import { compositeGaussLegendre } from '../numeric/gaussLegendre';
import { scanThenMinimize } from '../numeric/goldenMinimize';
import { feedPowerPattern, MAX_POWER_EXPONENT } from './feedPattern';
import { rimHalfAngleRad } from './geometry';

/** Lo's typical-taper constant k in the beam deviation factor (Lo 1960). */
export const LO_TAPER_CONSTANT = 0.36;

/** Beam deviation factor by Lo's approximation: (1 + k(D/4f)²)/(1 + (D/4f)²). */
export function loBeamDeviationFactor(focalRatio: number, taperConstant = LO_TAPER_CONSTANT): number {
  requirePositive('focalRatio', focalRatio);
  requireInRange('taperConstant', taperConstant, 0, 1);
  const x = 1 / (4 * focalRatio);
  return (1 + taperConstant * x * x) / (1 + x * x);
}

/** Feed offset angle seen from the vertex, atan(δ/f), radians (signed like δ). */
export function feedOffsetAngleRad(offsetM: number, focalLengthM: number): number {
  requireFinite('offsetM', offsetM, 'm');
  requirePositive('focalLengthM', focalLengthM, 'm');
  return Math.atan(offsetM / focalLengthM);
}

/** Lateral feed offset δ = f·tan(θ_tilt / BDF) that tilts the beam by θ_tilt (radians), metres. */
export function feedOffsetForTiltM(beamTiltRad: number, focalLengthM: number, beamDeviationFactor: number): number {
  requireInRange('beamTiltRad', beamTiltRad, -Math.PI / 2, Math.PI / 2, 'rad');
  requirePositive('focalLengthM', focalLengthM, 'm');
  requirePositive('beamDeviationFactor', beamDeviationFactor);
  return focalLengthM * Math.tan(Math.min(Math.PI / 2 - 1e-9, Math.abs(beamTiltRad / beamDeviationFactor))) * Math.sign(beamTiltRad);
}

export interface DisplacedFeedInputs {
  /** Dish diameter in wavelengths D/λ. */
  diameterWavelengths: number;
  focalRatio: number;
  /** cos^q power-pattern exponent of the feed. */
  powerExponent: number;
  /** Central blockage diameter over dish diameter (0 for none). */
  blockedDiameterFraction: number;
  /** Lateral feed offset in wavelengths δ/λ (≥ 0; the beam moves to the other side). */
  offsetWavelengths: number;
}

export interface DisplacedFeedBeam {
  /** Angle of the beam peak from the axis, radians (on the side opposite the feed). */
  peakTiltRad: number;
  /** Peak gain drop relative to the on-axis feed, dB (≥ 0): coma (scan) loss. */
  scanLossDb: number;
}

/**
 * Beam peak and scan loss of a laterally displaced feed, by a two-dimensional aperture
 * integration (radial 16×`radialPanels` Gauss–Legendre nodes, azimuthal 32 over half the circle,
 * using the symmetry of the scan plane). The peak is searched around Lo's prediction in a window
 * of ±max(0.8 λ/D, half the predicted tilt), sampled every 0.1 λ/D, which doubles while the best
 * sample sits at its edge: far off axis the true peak lies several λ/D beyond Lo's prediction
 * (at f/D 0.3 and 12 beamwidths, 4° beyond 15.8°), and a narrow window reports its own edge or a
 * coma lobe instead.
 */
export function displacedFeedBeam(inputs: DisplacedFeedInputs, radialPanels = 3): DisplacedFeedBeam {
  const { diameterWavelengths, focalRatio, powerExponent, blockedDiameterFraction, offsetWavelengths } = inputs;
  requirePositive('diameterWavelengths', diameterWavelengths);
  requireInRange('focalRatio', focalRatio, 0.25 + 1e-9, 100);
  requireInRange('powerExponent', powerExponent, 0, MAX_POWER_EXPONENT);
  requireInRange('blockedDiameterFraction', blockedDiameterFraction, 0, 1 - 1e-9);
  requireNonNegative('offsetWavelengths', offsetWavelengths);
  requireInteger('radialPanels', radialPanels, 1, 64);
  const k = 2 * Math.PI;
  const a = diameterWavelengths / 2;
  const f = focalRatio * diameterWavelengths;
  const delta = offsetWavelengths;
  const halfTan = Math.tan(rimHalfAngleRad(focalRatio) / 2);
  const radial = compositeGaussLegendre(blockedDiameterFraction, 1, 16, radialPanels);
  const azimuth = compositeGaussLegendre(0, Math.PI, 16, 2);
  const n = radial.nodes.length * azimuth.nodes.length;
  const weight = new Float64Array(n);
  const phaseError = new Float64Array(n);
  const tiltPhasePerS = new Float64Array(n);
  let onAxis = 0;
  let index = 0;
  for (let i = 0; i < radial.nodes.length; i++) {
    const t = radial.nodes[i];
    const psi = 2 * Math.atan(t * halfTan);
    const c = Math.cos(psi / 2);
    const amplitude = Math.sqrt(feedPowerPattern(powerExponent, psi)) * c * c;
    const rho = a * t;
    const r = f + (rho * rho) / (4 * f);
    for (let j = 0; j < azimuth.nodes.length; j++) {
      const cosPhi = Math.cos(azimuth.nodes[j]);
      const w = 2 * amplitude * rho * a * radial.weights[i] * azimuth.weights[j];
      const squaredDifference = delta * delta - 2 * delta * rho * cosPhi; // r'² − r²
      const rDisplaced = Math.sqrt(r * r + squaredDifference);
      weight[index] = w;
      phaseError[index] = (k * squaredDifference) / (rDisplaced + r);
      tiltPhasePerS[index] = k * rho * cosPhi;
      onAxis += w;
      index++;
    }
  }
  const power = (s: number) => {
    let re = 0;
    let im = 0;
    for (let m = 0; m < n; m++) {
      const phase = tiltPhasePerS[m] * s - phaseError[m];
      re += weight[m] * Math.cos(phase);
      im += weight[m] * Math.sin(phase);
    }
    return (re * re + im * im) / (onAxis * onAxis);
  };
  if (delta === 0) return { peakTiltRad: 0, scanLossDb: 0 };
  const predicted = loBeamDeviationFactor(focalRatio) * Math.atan(delta / f);
  const sPredicted = -Math.sin(Math.min(predicted, Math.PI / 2));
  const sampleStep = SEARCH_STEP_LAMBDA_OVER_D / diameterWavelengths;
  const halfWidth = Math.max(MIN_HALF_WINDOW_LAMBDA_OVER_D / diameterWavelengths, HALF_WINDOW_FRACTION_OF_TILT * Math.abs(sPredicted));
  const sPeak = peakInWidenedWindow(power, sPredicted, halfWidth, sampleStep, 1e-4 / diameterWavelengths);
  const peak = power(sPeak);
  return { peakTiltRad: Math.asin(-sPeak), scanLossDb: Math.max(0, -10 * Math.log10(peak)) };
}

/** Smallest half-width of the search window around Lo's prediction, in λ/D. */
const MIN_HALF_WINDOW_LAMBDA_OVER_D = 0.8;
/** Half-width of the search window as a fraction of the predicted tilt (in sin θ). */
const HALF_WINDOW_FRACTION_OF_TILT = 0.5;
/** Sampling step of the search, in λ/D (about a twelfth of a beamwidth). */
const SEARCH_STEP_LAMBDA_OVER_D = 0.1;

/**
 * Maximum of power(s) for s = sin θ in [−1, 1]: power is sampled every `step` in the window
 * sCentre ± halfWidth, the best sample refined by golden-section search; the window doubles while
 * the best sample sits at an edge that is not the edge of visible space. Returns s of the maximum.
 */
export function peakInWidenedWindow(power: (s: number) => number, sCentre: number, halfWidth: number, step: number, tolerance: number): number {
  requireInRange('sCentre', sCentre, -1, 1);
  requirePositive('halfWidth', halfWidth);
  requirePositive('step', step);
  let width = halfWidth;
  for (;;) {
    const lo = Math.max(-1, sCentre - width);
    const hi = Math.min(1, sCentre + width);
    const samples = Math.max(2, Math.ceil((hi - lo) / step));
    const actualStep = (hi - lo) / samples;
    const s = scanThenMinimize((x) => -power(x), lo, hi, samples, tolerance);
    const clippedLow = lo > -1 && s - lo < actualStep;
    const clippedHigh = hi < 1 && hi - s < actualStep;
    if ((!clippedLow && !clippedHigh) || (lo === -1 && hi === 1)) return s;
    width *= 2;
  }
}
