import { describe, expect, it } from 'vitest';
import { computeArchitectureSizing, createArchitectureSizingCalculator } from '../../calc/calculators/architectureSizing';
import { defaultTexts, validateAll } from '../../components/frame/calculatorModel';
import { teamConventions } from '../../site/conventions';
import { SIZING_COLUMNS, coverageStatement, sizingMarkdown, sizingRows } from '../../components/calculators/sizingTable';
import { layoutSketch, outlineExtentM } from '../../components/plot/outlineSketchModel';

const def = createArchitectureSizingCalculator(teamConventions);
const data = computeArchitectureSizing(validateAll(def, { ...defaultTexts(def), g: '28 dBi' }).inputs!).data;

describe('sizing table rows', () => {
  it('has one row per candidate, marks the recommended one, and shows its reasons as the status', () => {
    const rows = sizingRows(data);
    expect(rows.map((r) => r.id)).toEqual(data.candidates.map((c) => c.id));
    expect(rows.filter((r) => r.chosen).map((r) => r.id)).toEqual([data.chosenId]);
    for (const [i, r] of rows.entries()) {
      const c = data.candidates[i];
      expect(r.fits).toBe(c.fits);
      expect(r.status.startsWith('Fits')).toBe(c.fits);
      for (const f of c.flags) expect(r.status).toContain(f.message);
      expect(`${r.size} ${r.gainEdge} ${r.footprint}`).not.toMatch(/NaN|Infinity/);
    }
  });
  it('every place a candidate’s size appears carries its flag: the sketch caption of one that does not fit has ✖', () => {
    const rows = sizingRows(data);
    expect(rows.some((r) => !r.fits)).toBe(true);
    for (const r of rows) expect(r.caption.endsWith('✖')).toBe(!r.fits);
  });
  it('precision follows the model: a table-based Yagi–Uda gain to 0.5 dB and its rule-of-thumb beam to two figures with ≈, computed numbers to three figures', () => {
    const rows = sizingRows(data);
    const yagi = rows.find((r) => r.id === 'endFire')!;
    expect(yagi.gainBroadside).toMatch(/^≈ \d+\.[05] dBi$/);
    expect(yagi.beamBroadside).toMatch(/^≈ \d{2}°$/); // e.g. ≈ 23° (√(41 253/77.6) = 23.05°)
    const dish = rows.find((r) => r.id === 'reflector')!;
    expect(dish.gainBroadside).toMatch(/^\d+\.\d dBi$/);
    expect(dish.beamBroadside).toMatch(/^\d\.\d{2}°$/); // e.g. 5.38°
    const ring = rows.find((r) => r.id === 'ringArray')!; // 28 dBi needs more ring elements than the sizing evaluates: no beams
    expect([ring.beamBroadside, ring.beamEdge]).toEqual(['—', '—']);
    const line = rows.find((r) => r.id === 'linearArray')!;
    expect(line.beamBroadside).toMatch(/^\d\.\d+° × ≈ 100°$/); // computed in-plane beam (three figures) × the 6 dBi element's fan, √(41 253/3.98) = 101.8° → 100° at two figures
  });
  it('states what coverage means for every candidate, with the corner angle (±45° × ±45° → 60°)', () => {
    const both = computeArchitectureSizing(validateAll(def, { ...defaultTexts(def), saz: '45 deg', sel: '45 deg' }).inputs!).data;
    expect(coverageStatement(both)).toContain('±45° in azimuth × ±45° in elevation');
    expect(coverageStatement(both)).toContain('60° from their normal');
    expect(sizingMarkdown(sizingRows(both), both.recommendationRule, coverageStatement(both)).split('\n')[0]).toBe(coverageStatement(both));
  });
  it('Markdown has the shared columns, one line per candidate, ✖ on those that do not fit, ★ on the recommended one, and the rule', () => {
    const md = sizingMarkdown(sizingRows(data), data.recommendationRule).split('\n');
    expect(md[0]).toBe(`| ${[...SIZING_COLUMNS, 'Feasibility'].join(' | ')} |`);
    const body = md.slice(2, 2 + data.candidates.length);
    expect(body.filter((l) => l.includes('★'))).toHaveLength(data.chosenId ? 1 : 0);
    expect(body.filter((l) => l.includes('✖'))).toHaveLength(data.candidates.filter((c) => !c.fits).length);
    expect(md[md.length - 1]).toBe(data.recommendationRule);
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
