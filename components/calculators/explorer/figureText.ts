/**
 * Small display helpers of the array explorer's figures (kept out of the .svelte files so they
 * are tested: tests/explorer/figureText.test.ts).
 */

/** A number with fixed decimals and a true minus sign, or an em dash when missing or not finite. */
export function fixedOrDash(x: number | null | undefined, digits = 2): string {
  return x === null || x === undefined || !Number.isFinite(x) ? '—' : x.toFixed(digits).replace('-', '−');
}

/** Whether a cut at φ = cutPhiDeg lies in the steering plane φ = beamPhiDeg (same azimuth modulo 360°; then θ₀ is marked on it). */
export function cutInSteeringPlane(cutPhiDeg: number, beamPhiDeg: number): boolean {
  return Math.abs((((cutPhiDeg - beamPhiDeg) % 360) + 360) % 360) < 1e-9;
}
