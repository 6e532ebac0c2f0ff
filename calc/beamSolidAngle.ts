/**
 * The one beam-area constant every page uses to turn a directivity into a beamwidth (or back).
 *
 * A beam with all its power inside a solid angle Ω_A has directivity D = 4π/Ω_A. Approximating
 * Ω_A by the product of the two principal-plane half-power beamwidths θ₁θ₂ (radians) gives
 * D ≈ 4π/(θ₁θ₂), i.e. D ≈ 41 253/(θ₁°θ₂°) with the angles in degrees, because
 * 4π (180/π)² = 41 252.96 deg² is the whole sphere in square degrees.
 * Kraus, "Antennas", 2nd ed., §2-13 (section number from memory) (beam area); Balanis, "Antenna Theory", 4th ed., §2.7 (section number from memory)
 * (Kraus's approximation). It is the ideal pencil-beam relation: real antennas with sidelobes put
 * part of their power outside the main beam and are narrower for the same directivity (the
 * empirical constants 32 400 or 26 000 quoted for them are not used anywhere in Dirigo).
 */
import { DEG_PER_RAD } from './constants';

/** Square degrees in the whole sphere, 4π (180/π)² ≈ 41 253: the beam-area constant (deg²). */
export const SPHERE_SQUARE_DEG = 4 * Math.PI * DEG_PER_RAD * DEG_PER_RAD;
