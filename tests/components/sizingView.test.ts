import { describe, expect, it } from 'vitest';
import { computeArchitectureSizing, createArchitectureSizingCalculator } from '../../calc/calculators/architectureSizing';
import { defaultTexts, validateAll } from '../../components/frame/calculatorModel';
import { teamConventions } from '../../site/conventions';
import { sizingMarkdown, sizingRows } from '../../components/calculators/sizingTable';
import { layoutSketch, outlineExtentM } from '../../components/plot/outlineSketchModel';

const def = createArchitectureSizingCalculator(teamConventions);
const data = computeArchitectureSizing(validateAll(def, { ...defaultTexts(def), g: '28 dBi' }).inputs!).data;

describe('sizing table rows', () => {
  it('has one row per candidate, marks the recommended one, and shows flags as the status', () => {
    const rows = sizingRows(data);
    expect(rows.map((r) => r.id)).toEqual(data.candidates.map((c) => c.id));
    expect(rows.filter((r) => r.chosen).map((r) => r.id)).toEqual([data.chosenId]);
    for (const [i, r] of rows.entries()) {
      const c = data.candidates[i];
      expect(r.status.startsWith('Fits')).toBe(c.flags.length === 0);
      expect(`${r.size} ${r.gainEdge}`).not.toMatch(/NaN|Infinity/);
    }
  });
  it('Markdown has a header, one line per candidate and the ★ on the recommended one', () => {
    const md = sizingMarkdown(sizingRows(data)).split('\n');
    expect(md).toHaveLength(2 + data.candidates.length);
    expect(md.filter((l) => l.includes('★'))).toHaveLength(data.chosenId ? 1 : 0);
  });
});

describe('to-scale sketch layout', () => {
  it('draws every outline at one scale: drawn size ÷ metres is the same for all', () => {
    const items = data.candidates.map((c) => ({ id: c.id, label: c.name, outline: c.outline, highlight: false }));
    const { cells, metresPerUnit } = layoutSketch(items);
    for (const [i, cell] of cells.entries()) {
      const extent = outlineExtentM(items[i].outline);
      const shape = cell.shapes[0];
      const drawn = shape.kind === 'circle' ? 2 * shape.r : shape.kind === 'rect' ? shape.width : Math.hypot(shape.x2 - shape.x1, shape.y2 - shape.y1);
      const expected = items[i].outline.kind === 'y' ? (items[i].outline as { armM: number }).armM / metresPerUnit : extent.width / metresPerUnit;
      if (drawn > 2) expect(drawn).toBeCloseTo(expected, 6);
    }
  });
  it('the largest outline fits its slot', () => {
    const items = data.candidates.map((c) => ({ id: c.id, label: c.name, outline: c.outline, highlight: false }));
    const { metresPerUnit } = layoutSketch(items, 720, 230);
    const widest = Math.max(...items.map((i) => outlineExtentM(i.outline).width));
    expect(widest / metresPerUnit).toBeLessThanOrEqual(720 / items.length);
  });
});
