import { describe, expect, it } from 'vitest';
import { preparePolarPlot, DEFAULT_POLAR_FRAME } from '../../components/plot/polarPlotModel';

const radius = DEFAULT_POLAR_FRAME.size / 2 - DEFAULT_POLAR_FRAME.margin;

describe('preparePolarPlot(series, options)', () => {
  it('puts 0 dB on the rim and the floor at the centre, θ = 0° at the top and +90° to the right', () => {
    const plot = preparePolarPlot([], { floorDb: -40 });
    expect(plot.radius).toBe(radius);
    const top = plot.at(0, 0);
    expect(top.x).toBeCloseTo(0, 12);
    expect(top.y).toBeCloseTo(-radius, 12);
    const right = plot.at(90, -20);
    expect(right.x).toBeCloseTo(radius / 2, 12);
    expect(right.y).toBeCloseTo(0, 12);
    expect(plot.at(45, -40)).toEqual({ x: 0, y: -0 });
  });
  it('clamps levels below the floor to the centre and above 0 dB to the rim', () => {
    const plot = preparePolarPlot([], { floorDb: -30 });
    expect(Math.hypot(plot.at(10, -300).x, plot.at(10, -300).y)).toBe(0);
    expect(Math.hypot(plot.at(10, 6).x, plot.at(10, 6).y)).toBeCloseTo(radius, 12);
  });
  it('labels rings every 10 dB from 0 to the floor and spokes every 30° over the whole circle', () => {
    const plot = preparePolarPlot([], { floorDb: -40 });
    expect(plot.rings.map((r) => r.db)).toEqual([0, -10, -20, -30, -40]);
    expect(plot.rings[0].label).toBe('0 dB');
    expect(plot.rings[1].label).toBe('−10');
    expect(plot.spokes.map((s) => s.angleDeg)).toEqual([-150, -120, -90, -60, -30, 0, 30, 60, 90, 120, 150, 180]);
    expect(plot.spokes.find((s) => s.angleDeg === -90)!.label).toBe('−90°');
  });
  it('draws a path through the points in the same place as at(), skipping non-finite points', () => {
    const points = [{ thetaDeg: 0, db: 0 }, { thetaDeg: 90, db: -20 }, { thetaDeg: 120, db: Number.NaN }, { thetaDeg: 180, db: -10 }];
    const plot = preparePolarPlot([{ id: 'a', label: 'A', points }], { floorDb: -40 });
    const d = plot.paths[0].d;
    expect(d).not.toMatch(/NaN/);
    const numbers = d.match(/-?\d+(\.\d+)?(e-?\d+)?/g)!.map(Number);
    expect(numbers[0]).toBeCloseTo(0, 9);
    expect(numbers[1]).toBeCloseTo(-radius, 9);
    expect(numbers[2]).toBeCloseTo(radius / 2, 9);
    expect(d.split('M').length - 1).toBe(2); // the NaN point breaks the line into two pieces
  });
  it('rejects a floor that is not a negative finite level', () => {
    expect(() => preparePolarPlot([], { floorDb: 0 })).toThrow(/floorDb/);
    expect(() => preparePolarPlot([], { floorDb: Number.NaN })).toThrow(/floorDb/);
  });
});
