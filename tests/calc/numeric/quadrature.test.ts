import { describe, expect, it } from 'vitest';
import { gaussLegendreRule, integrateGaussLegendre } from '../../../calc/numeric/gaussLegendre';
import { brentRoot } from '../../../calc/numeric/brentRoot';
import { goldenMinimize, scanThenMinimize } from '../../../calc/numeric/goldenMinimize';

describe('gaussLegendreRule', () => {
  it('weights sum to 2 and integrate polynomials up to degree 2n−1 exactly (Gauss quadrature, any numerical-analysis text)', () => {
    for (const n of [1, 2, 5, 16, 64, 257]) {
      const { nodes, weights } = gaussLegendreRule(n);
      expect(weights.reduce((a, b) => a + b, 0)).toBeCloseTo(2, 12);
      const degree = 2 * n - 1;
      let integral = 0;
      for (let i = 0; i < n; i++) integral += weights[i] * nodes[i] ** (degree - 1);
      // ∫ x^(2n−2) dx over [−1,1] = 2/(2n−1)
      expect(integral).toBeCloseTo(2 / degree, 11);
    }
  });
  it('rejects a bad order', () => {
    expect(() => gaussLegendreRule(0)).toThrow(/order/);
    expect(() => gaussLegendreRule(2.5)).toThrow(/order/);
  });
  it('integrates sin over [0, π] to 2', () => {
    expect(integrateGaussLegendre(Math.sin, 0, Math.PI, 16)).toBeCloseTo(2, 13);
    expect(integrateGaussLegendre(Math.sin, 0, Math.PI, 8, 10)).toBeCloseTo(2, 13);
  });
});

describe('brentRoot', () => {
  it('finds √2 as the root of x² − 2', () => {
    expect(brentRoot((x) => x * x - 2, 0, 2)).toBeCloseTo(Math.SQRT2, 12);
  });
  it('finds the root of cos x − x (Dottie number 0.7390851332151607, from memory)', () => {
    expect(brentRoot((x) => Math.cos(x) - x, 0, 1)).toBeCloseTo(0.7390851332151607, 12);
  });
  it('throws when the bracket holds no sign change', () => {
    expect(() => brentRoot((x) => x * x + 1, -1, 1)).toThrow(/differ in sign/);
  });
});

describe('goldenMinimize / scanThenMinimize', () => {
  it('finds the minimum of (x − 1.3)²', () => {
    expect(goldenMinimize((x) => (x - 1.3) ** 2, 0, 5)).toBeCloseTo(1.3, 7);
  });
  it('finds the global minimum of a function with two local minima', () => {
    const f = (x: number) => Math.sin(3 * x) - 0.1 * x; // minima near π/2 and 7π/6; the second is lower
    const x = scanThenMinimize(f, 0, 4);
    expect(f(x)).toBeLessThan(f(x + 0.01));
    expect(f(x)).toBeLessThan(f(x - 0.01));
    expect(x).toBeGreaterThan(3.5);
  });
});
