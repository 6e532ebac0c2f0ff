import { describe, expect, it } from 'vitest';
import { minMaxDecimate } from '../../components/plot/decimate';

describe('minMaxDecimate(xs, ys, xMin, xMax, bins)', () => {
  const xs = Float64Array.from({ length: 10_001 }, (_, i) => -180 + (360 * i) / 10_000);
  const ys = Float64Array.from(xs, (x) => 20 * Math.log10(Math.abs(Math.sin((x * Math.PI) / 7.3)) + 1e-6));
  const thinned = minMaxDecimate(xs, ys, -90, 90, 600);
  it('keeps at most two points per bin, in x order, only inside [xMin, xMax]', () => {
    expect(thinned.length).toBeLessThanOrEqual(1200);
    for (let i = 1; i < thinned.length; i++) expect(thinned[i].x).toBeGreaterThan(thinned[i - 1].x);
    expect(thinned[0].x).toBeGreaterThanOrEqual(-90);
    expect(thinned.at(-1)!.x).toBeLessThanOrEqual(90);
  });
  it('keeps the highest and the lowest sample of the range exactly', () => {
    let max = -Infinity, min = Infinity;
    xs.forEach((x, i) => { if (x >= -90 && x <= 90) { max = Math.max(max, ys[i]); min = Math.min(min, ys[i]); } });
    expect(Math.max(...thinned.map((p) => p.y))).toBe(max);
    expect(Math.min(...thinned.map((p) => p.y))).toBe(min);
  });
  it('returns sparse input unchanged and skips non-finite levels', () => {
    expect(minMaxDecimate([0, 1, 2], [0, Number.NaN, -3], 0, 2, 100)).toEqual([{ x: 0, y: 0 }, { x: 2, y: -3 }]);
  });
});
