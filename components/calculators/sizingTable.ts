/** Rows of the architecture-sizing table, formatted for the page and for Markdown (pure, tested). */
import type { SizingData } from '../../calc/calculators/architectureSizing';
import type { Candidate } from '../../calc/sizing/candidate';
import { coverageCornerScanDeg } from '../../calc/sizing/coverage';
import { formatCount, formatQuantity } from '../frame/format';

export interface SizingRow {
  id: string;
  name: string;
  chosen: boolean;
  fits: boolean;
  size: string;
  footprint: string;
  depth: string;
  elements: string;
  elementGain: string;
  steering: string;
  beamBroadside: string;
  beamEdge: string;
  gainBroadside: string;
  gainEdge: string;
  sidelobe: string;
  status: string;
  /** Text under the candidate in the to-scale sketch: its size, and ✖ when it does not fit. */
  caption: string;
  notes: string[];
}

/** Significant figures: computed numbers get three, rules of thumb and transcribed table values two. */
const FIGURES = { computed: 3, estimate: 2 } as const;

const length = (m: number, digits = 3) => {
  const f = formatQuantity(m, 'length', digits);
  return `${f.text} ${f.unit}`;
};
const angle = (deg: number | null, digits: number) => (deg === null ? '—' : `${formatQuantity(deg, 'angle', digits).text}°`);
const minus = (text: string) => text.replace('-', '−');
/** Gains to 0.1 dB when computed (the efficiencies assumed are not known better), to 0.5 dB from a table. */
const gain = (dbi: number, precision: Candidate['gainPrecision']) =>
  precision === 'computed' ? `${minus(dbi.toFixed(1))} dBi` : `≈ ${minus((Math.round(dbi * 2) / 2).toFixed(1))} dBi`;

/** What coverage means for every row of the table, stated once above it. */
export function coverageStatement(data: SizingData): string {
  const { scanAzimuthDeg: az, scanElevationDeg: el } = data.requirement;
  const corner = coverageCornerScanDeg(az, el);
  const angle = (deg: number) => formatQuantity(deg, 'angle', 3).text;
  if (corner === 0) return 'Coverage for every candidate: a fixed beam at the boresight.';
  return `Coverage for every candidate: ±${angle(az)}° in azimuth × ±${angle(el)}° in elevation about the boresight. Faces, rings and Y arrays look at the boresight and are judged at the region's corner, ${angle(corner)}° from their normal (acos(cos az · cos el)); the reflector and the Yagi–Uda are turned mechanically and keep their beam.`;
}

/** The reasons as one sentence, or how it fits. */
export function candidateStatus(c: Candidate, chosenId: string | null): string {
  if (c.fits) return c.id === chosenId ? 'Fits — recommended (smallest footprint of those that fit)' : 'Fits';
  return `Does not fit: ${c.flags.map((f) => f.message).join('; ')}`;
}

export function sizingRows(data: SizingData): SizingRow[] {
  return data.candidates.map((c) => {
    const [a, b] = c.hpbwBroadsideDeg;
    const figures = FIGURES[c.beamPrecision];
    const elements =
      c.elementCountRectangular !== undefined && c.elementCountTriangular !== undefined
        ? `${formatCount(c.elementCountTriangular)} tri / ${formatCount(c.elementCountRectangular)} rect`
        : c.elementCount === null
          ? '—'
          : formatCount(c.elementCount);
    const approx = c.beamPrecision === 'estimate' ? '≈ ' : '';
    const size = length(c.sizeM);
    return {
      id: c.id,
      name: c.name,
      chosen: c.id === data.chosenId,
      fits: c.fits,
      size,
      footprint: `${formatQuantity(c.footprintM2, 'number', 2).text} m²`,
      depth: length(c.depthM),
      elements,
      elementGain: c.elementGainDbi === null ? '—' : `${minus(c.elementGainDbi.toFixed(1))} dBi`,
      steering: c.steering,
      beamBroadside: a === null && b === null
        ? '—'
        : a !== null && b !== null && Math.abs(a - b) < 1e-3 * Math.max(a, b)
        ? `${approx}${angle(a, figures)}`
        : c.id === 'linearArray'
          ? `${angle(a, figures)} × ≈ ${angle(b, FIGURES.estimate)}` // the fan across the line is the beam-area estimate
          : `${approx}${angle(a, figures)} × ${angle(b, figures)}`,
      beamEdge: c.hpbwEdgeDeg === null ? '—' : `${approx}${angle(c.hpbwEdgeDeg, figures)}`,
      gainBroadside: gain(c.gainBroadsideDbi, c.gainPrecision),
      gainEdge: gain(c.gainEdgeDbi, c.gainPrecision),
      sidelobe: c.firstSidelobeDb === null ? 'not modelled' : `${minus(c.firstSidelobeDb.toFixed(1))} dB`,
      status: candidateStatus(c, data.chosenId),
      caption: c.fits ? size : `${size} ✖`,
      notes: [c.model, ...c.notes],
    };
  });
}

const cell = (text: string) => text.replace(/\|/g, '\\|');

/** The table's column headings, shared by the page and the Markdown. */
export const SIZING_COLUMNS = ['Architecture', 'Largest dimension', 'Footprint (enclosing circle)', 'Depth', 'Elements', 'Element gain', 'Steering', 'HPBW broadside', 'HPBW at coverage corner', 'Gain broadside', 'Gain at coverage corner', 'First sidelobe'] as const;

/** The whole table as Markdown, for design-review notes: the coverage above it, the recommendation rule under it. */
export function sizingMarkdown(rows: SizingRow[], rule?: string, coverage?: string): string {
  const header = [...SIZING_COLUMNS, 'Feasibility'];
  const lines = [...(coverage ? [coverage, ''] : []), `| ${header.join(' | ')} |`, `| ${header.map(() => '---').join(' | ')} |`];
  for (const r of rows) {
    const name = r.chosen ? `**${r.name}** ★` : r.fits ? r.name : `${r.name} ✖`;
    lines.push(`| ${[name, r.size, r.footprint, r.depth, r.elements, r.elementGain, r.steering, r.beamBroadside, r.beamEdge, r.gainBroadside, r.gainEdge, r.sidelobe, r.status].map(cell).join(' | ')} |`);
  }
  if (rule) lines.push('', rule);
  return lines.join('\n');
}
