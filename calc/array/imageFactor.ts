/**
 * Ground-plane image factor (field amplitude) for an element at height h above an infinite
 * perfectly conducting plane, observed at cos θ = w (θ from the plane normal +z):
 * horizontal element: 2j·sin(kh cos θ) → returns 2·sin(2π h w); vertical element:
 * 2·cos(kh cos θ). Zero below the plane (θ > 90°). Image theory, e.g. Balanis, "Antenna
 * Theory", 4th ed., §4.7 (section number from memory; vertical and horizontal dipoles above a ground plane).
 * The constant factor j of the horizontal case is dropped (it does not change |E|).
 */
export function groundPlaneImageFactor(heightWavelengths: number, cosTheta: number, orientation: 'horizontal' | 'vertical'): number {
  if (cosTheta < 0) return 0;
  const phase = 2 * Math.PI * heightWavelengths * cosTheta;
  return orientation === 'horizontal' ? 2 * Math.sin(phase) : 2 * Math.cos(phase);
}
