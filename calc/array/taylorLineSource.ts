import { requireInRange, requireInteger } from '../errors';
import { goldenMinimize } from '../numeric/goldenMinimize';

/** Taylor's parameter A = acosh(10^(sidelobeDb/20))/π for a design sidelobe level in positive dB (Taylor 1955). */
export function taylorParameterA(sidelobeDb: number): number {
  requireInRange('sidelobeDb', sidelobeDb, 0, 200, 'dB');
  return Math.acosh(10 ** (sidelobeDb / 20)) / Math.PI;
}

/**
 * Pattern zeros u_n (in units of the uniform line's sidelobe spacing, u = (L/λ) sin θ) of the
 * Taylor line source: σ·√(A² + (n − ½)²) for n < n̄, then n (T. T. Taylor, "Design of line-source
 * antennas for narrow beamwidth and low side lobes", IRE Trans. AP-3, 1955).
 */
function taylorZero(n: number, nbar: number, a: number): number {
  const sigma = nbar / Math.sqrt(a * a + (nbar - 0.5) ** 2);
  return n < nbar ? sigma * Math.sqrt(a * a + (n - 0.5) ** 2) : n;
}

/**
 * Field of the continuous Taylor line source at u (same units), 1 at u = 0:
 * sinc(u)·Π_{n<n̄}(1 − u²/u_n²)/(1 − u²/n²). At u = 1 … n̄ − 1 the sinc's zero cancels a
 * denominator; there the smooth function is evaluated 1e-7 away (relative error below 1e-6).
 */
export function taylorLineSourceField(nbar: number, sidelobeDb: number, u: number): number {
  requireInteger('nbar', nbar, 1, 100);
  const a = taylorParameterA(sidelobeDb);
  const nearest = Math.round(Math.abs(u));
  const x = nearest >= 1 && nearest < nbar && Math.abs(Math.abs(u) - nearest) < 1e-9 ? Math.abs(u) + 1e-7 : Math.abs(u);
  let field = x < 1e-12 ? 1 : Math.sin(Math.PI * x) / (Math.PI * x);
  for (let n = 1; n < nbar; n++) {
    const zero = taylorZero(n, nbar, a);
    field *= (1 - (x * x) / (zero * zero)) / (1 - (x * x) / (n * n));
  }
  return field;
}

/**
 * Highest sidelobe (negative dB relative to the peak) that the continuous Taylor line source with
 * this n̄ actually reaches for the design level sidelobeDb: the largest |F| between consecutive
 * pattern zeros up to n̄ + 10 (beyond that the sidelobes fall like the uniform line's), found by
 * golden-section search. For n̄ too small it lies above the design level (n̄ = 1 is the uniform
 * line, −13.26 dB).
 */
export function taylorLineSourceSidelobeDb(nbar: number, sidelobeDb: number): number {
  requireInteger('nbar', nbar, 1, 100);
  const a = taylorParameterA(sidelobeDb);
  const magnitude = (u: number) => Math.abs(taylorLineSourceField(nbar, sidelobeDb, u));
  let highest = 0;
  for (let n = 1; n <= nbar + 10; n++) {
    const lo = taylorZero(n, nbar, a), hi = taylorZero(n + 1, nbar, a);
    const u = goldenMinimize((x) => -magnitude(x), lo, hi, 1e-12);
    highest = Math.max(highest, magnitude(u));
  }
  return 20 * Math.log10(highest);
}
