/**
 * Minimum of a unimodal function on [a, b] by golden-section search (Kiefer 1953).
 * Returns the abscissa of the minimum. To maximize g, minimize −g.
 */
export function goldenMinimize(f: (x: number) => number, a: number, b: number, tolerance = 1e-10, maxIterations = 300): number {
  const invPhi = (Math.sqrt(5) - 1) / 2;
  let x1 = b - invPhi * (b - a);
  let x2 = a + invPhi * (b - a);
  let f1 = f(x1);
  let f2 = f(x2);
  for (let i = 0; i < maxIterations && Math.abs(b - a) > tolerance * (1 + Math.abs(a) + Math.abs(b)); i++) {
    if (f1 < f2) {
      b = x2; x2 = x1; f2 = f1;
      x1 = b - invPhi * (b - a); f1 = f(x1);
    } else {
      a = x1; x1 = x2; f1 = f2;
      x2 = a + invPhi * (b - a); f2 = f(x2);
    }
  }
  return (a + b) / 2;
}

/**
 * Global-ish minimum on [a, b]: scan `samples` points, then refine the best bracket with
 * golden-section search. For functions with a few local minima.
 */
export function scanThenMinimize(f: (x: number) => number, a: number, b: number, samples = 64, tolerance = 1e-10): number {
  let bestIndex = 0;
  let best = Infinity;
  const step = (b - a) / samples;
  for (let i = 0; i <= samples; i++) {
    const value = f(a + i * step);
    if (value < best) { best = value; bestIndex = i; }
  }
  const lo = a + Math.max(0, bestIndex - 1) * step;
  const hi = a + Math.min(samples, bestIndex + 1) * step;
  return goldenMinimize(f, lo, hi, tolerance);
}
