/**
 * Gauss–Legendre nodes and weights on [−1, 1], computed by Newton iteration on P_n
 * (Golub–Welsch would do too; Newton from the Chebyshev-like initial guess cos(π(i−¼)/(n+½))
 * converges in a few steps). Results are cached per order.
 */
export interface QuadratureRule {
  nodes: Float64Array;
  weights: Float64Array;
}

const cache = new Map<number, QuadratureRule>();

/** Gauss–Legendre rule of the given order (1…4096) on [−1, 1]. */
export function gaussLegendreRule(order: number): QuadratureRule {
  if (!Number.isInteger(order) || order < 1 || order > 4096) {
    throw new RangeError(`gaussLegendreRule: order must be a whole number from 1 to 4096, got ${order}`);
  }
  const hit = cache.get(order);
  if (hit) return hit;
  const nodes = new Float64Array(order);
  const weights = new Float64Array(order);
  const half = Math.floor((order + 1) / 2);
  for (let i = 0; i < half; i++) {
    let x = Math.cos((Math.PI * (i + 0.75)) / (order + 0.5));
    let derivative = 0;
    for (let iteration = 0; iteration < 100; iteration++) {
      let p0 = 1;
      let p1 = x;
      for (let k = 2; k <= order; k++) {
        const p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
        p0 = p1;
        p1 = p2;
      }
      if (order === 1) { p1 = x; p0 = 1; }
      derivative = (order * (x * p1 - p0)) / (x * x - 1);
      const step = p1 / derivative;
      x -= step;
      if (Math.abs(step) < 1e-15) break;
    }
    // Recompute the derivative at the converged node for the weight.
    let p0 = 1;
    let p1 = x;
    for (let k = 2; k <= order; k++) {
      const p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
      p0 = p1;
      p1 = p2;
    }
    derivative = order === 1 ? 1 : (order * (x * p1 - p0)) / (x * x - 1);
    const w = 2 / ((1 - x * x) * derivative * derivative);
    nodes[i] = -x;
    nodes[order - 1 - i] = x;
    weights[i] = w;
    weights[order - 1 - i] = w;
  }
  if (order === 1) { nodes[0] = 0; weights[0] = 2; }
  const rule = { nodes, weights };
  cache.set(order, rule);
  return rule;
}

/**
 * Composite Gauss–Legendre integral of f over [a, b]: `panels` equal panels, each with an
 * `order`-point rule. Smooth integrands converge very fast; add panels for oscillatory ones.
 */
export function integrateGaussLegendre(
  f: (x: number) => number,
  a: number,
  b: number,
  order = 32,
  panels = 1,
): number {
  const { nodes, weights } = gaussLegendreRule(order);
  const width = (b - a) / panels;
  let total = 0;
  for (let p = 0; p < panels; p++) {
    const mid = a + (p + 0.5) * width;
    const halfWidth = width / 2;
    let sum = 0;
    for (let i = 0; i < order; i++) sum += weights[i] * f(mid + halfWidth * nodes[i]);
    total += sum * halfWidth;
  }
  return total;
}

/**
 * Nodes and weights of a composite rule on [a, b] (for tabulating an integrand once and reusing
 * it, e.g. over many observation angles).
 */
export function compositeGaussLegendre(a: number, b: number, order: number, panels: number): QuadratureRule {
  const base = gaussLegendreRule(order);
  const nodes = new Float64Array(order * panels);
  const weights = new Float64Array(order * panels);
  const width = (b - a) / panels;
  for (let p = 0; p < panels; p++) {
    const mid = a + (p + 0.5) * width;
    for (let i = 0; i < order; i++) {
      nodes[p * order + i] = mid + (width / 2) * base.nodes[i];
      weights[p * order + i] = (width / 2) * base.weights[i];
    }
  }
  return { nodes, weights };
}
