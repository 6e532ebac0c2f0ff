/**
 * Pair kernel of the directivity integral for elements in one plane (z = 0) with the forward
 * element power pattern cosⁿθ (zero behind): the average over the sphere of e^{j2π Δr·û} cosⁿθ
 * for an in-plane separation Δr of length ρ (λ). Integrating φ first gives J0, so
 *   K(ρ) = (1/4π) ∫_{z ≥ 0} e^{j2π Δr·û} cosⁿθ dΩ = ½ ∫₀¹ J0(2πρ√(1 − t²)) tⁿ dt,  t = cos θ
 * (the integral representation of J0: Abramowitz & Stegun 9.1.18 (equation number from memory)).
 * K(0) = 1/(2(n + 1)). With it the directivity of a flat array of such elements is an exact pair
 * sum, like sin(kr)/(kr) for isotropic elements; checked against SciPy quad
 * (scripts/fixtures/cosine_kernel.py) and against quadrature over the sphere.
 */
import { besselJ0 } from '../numeric/besselJ';
import { compositeGaussLegendre } from '../numeric/gaussLegendre';
import { requireInRange, requireNonNegative } from '../errors';

/** Gauss–Legendre points the kernel uses at separation ρ (λ): 16 per panel, 2 panels per λ plus 4. */
export function forwardCosineKernelPoints(rhoWavelengths: number): number {
  return 16 * (Math.ceil(2 * rhoWavelengths) + 4);
}

/** K(ρ) = ½ ∫₀¹ J0(2πρ√(1 − t²)) tⁿ dt for the forward cosⁿθ power pattern (ρ in λ). */
export function forwardCosineKernel(rhoWavelengths: number, powerExponent: number): number {
  requireNonNegative('rhoWavelengths', rhoWavelengths, 'λ');
  requireInRange('powerExponent', powerExponent, 0, 1000);
  if (rhoWavelengths === 0) return 1 / (2 * (powerExponent + 1));
  // In θ = (π/2)(1 − w²), w ∈ [0, 1]: the J0 argument a·sin θ = a·cos(πw²/2) changes at a rate
  // of at most πa (no crowding of oscillations at the pole), and cosⁿθ = sinⁿ(πw²/2) ~ w^(2n) is
  // smooth at the horizon for any n. dθ = π w dw; t = cos θ, so tⁿ dt = cosⁿθ sin θ dθ.
  const rule = compositeGaussLegendre(0, 1, 16, Math.ceil(2 * rhoWavelengths) + 4);
  const a = 2 * Math.PI * rhoWavelengths;
  let sum = 0;
  for (let i = 0; i < rule.nodes.length; i++) {
    const w = rule.nodes[i];
    const half = (Math.PI * w * w) / 2;
    const sinTheta = Math.cos(half);
    const cosTheta = Math.sin(half);
    sum += rule.weights[i] * besselJ0(a * sinTheta) * cosTheta ** powerExponent * sinTheta * Math.PI * w;
  }
  return sum / 2;
}
