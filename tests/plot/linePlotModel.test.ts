import { describe, expect, it } from 'vitest';
import { prepareLinePlot } from '../../components/plot/linePlotModel';

describe('prepareLinePlot', () => {
  it('log x axis: ticks read as plain numbers (0.2, 0.5, 2), not SI prefixes such as 200m', () => {
    const plot = prepareLinePlot([{ id: 'a', label: 'a', points: [{ x: 0.2, y: 1 }, { x: 20, y: 2 }] }], { xLog: true });
    const labels = plot.xTicks.map((t) => t.label).filter((l) => l !== '');
    expect(labels.some((l) => /m$/.test(l))).toBe(false);
    expect(labels).toContain('0.2');
    expect(labels).toContain('10');
  });
  it('non-finite points break the line instead of producing NaN in the path', () => {
    const plot = prepareLinePlot([{ id: 'a', label: 'a', points: [{ x: 1, y: 1 }, { x: 2, y: Number.NaN }, { x: 3, y: 2 }, { x: 4, y: 3 }] }]);
    expect(plot.paths[0].d).not.toMatch(/NaN/);
    expect(plot.paths[0].d.match(/M/g)!.length).toBe(2);
  });
});
