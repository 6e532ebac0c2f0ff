/** Rows of the architecture-sizing table, formatted for the page and for Markdown (pure, tested). */
import type { SizingData } from '../../calc/calculators/architectureSizing';
import { formatCount, formatQuantity } from '../frame/format';

export interface SizingRow {
  id: string;
  name: string;
  chosen: boolean;
  size: string;
  area: string;
  depth: string;
  elements: string;
  steering: string;
  beamBroadside: string;
  beamEdge: string;
  gainBroadside: string;
  gainEdge: string;
  status: string;
  notes: string[];
}

const length = (m: number) => {
  const f = formatQuantity(m, 'length', 3);
  return `${f.text} ${f.unit}`;
};
const angle = (deg: number | null) => (deg === null ? '—' : `${formatQuantity(deg, 'angle', 3).text}°`);
const db = (v: number) => `${formatQuantity(v, 'decibel', 4).text} dBi`;

export function sizingRows(data: SizingData): SizingRow[] {
  return data.candidates.map((c) => {
    const [a, b] = c.hpbwBroadsideDeg;
    const elements =
      c.elementCountRectangular !== undefined && c.elementCountTriangular !== undefined
        ? `${formatCount(c.elementCountTriangular)} tri / ${formatCount(c.elementCountRectangular)} rect`
        : c.elementCount === null
          ? '—'
          : formatCount(c.elementCount);
    return {
      id: c.id,
      name: c.name,
      chosen: c.id === data.chosenId,
      size: length(c.sizeM),
      area: `${formatQuantity(c.areaM2, 'number', 3).text} m²`,
      depth: length(c.depthM),
      elements,
      steering: c.steering,
      beamBroadside: a !== null && b !== null && Math.abs(a - b) < 1e-3 * Math.max(a, b) ? angle(a) : `${angle(a)} × ${angle(b)}`,
      beamEdge: angle(c.hpbwEdgeDeg),
      gainBroadside: db(c.gainBroadsideDbi),
      gainEdge: db(c.gainEdgeDbi),
      status: c.flags.length === 0 ? (c.id === data.chosenId ? 'Fits — recommended (smallest area)' : 'Fits') : c.flags.join('; '),
      notes: c.notes,
    };
  });
}

const cell = (text: string) => text.replace(/\|/g, '\\|');

/** The whole table as Markdown, for design-review notes. */
export function sizingMarkdown(rows: SizingRow[]): string {
  const header = ['Architecture', 'Size', 'Area', 'Depth', 'Elements', 'Steering', 'HPBW broadside', 'HPBW at scan edge', 'Gain broadside', 'Gain at scan edge', 'Feasibility'];
  const lines = [`| ${header.join(' | ')} |`, `| ${header.map(() => '---').join(' | ')} |`];
  for (const r of rows) {
    lines.push(`| ${[r.chosen ? `**${r.name}** ★` : r.name, r.size, r.area, r.depth, r.elements, r.steering, r.beamBroadside, r.beamEdge, r.gainBroadside, r.gainEdge, r.status].map(cell).join(' | ')} |`);
  }
  return lines.join('\n');
}
