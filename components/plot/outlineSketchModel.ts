/**
 * Layout of a to-scale sketch: every candidate's outline drawn side by side at one common scale
 * (pure, tested). Shapes are in SVG user units; `metresPerUnit` is the same for all.
 */
import type { CandidateOutline } from '../../calc/sizing/candidate';

export interface SketchItem {
  id: string;
  label: string;
  outline: CandidateOutline;
  highlight: boolean;
}

export type SketchShape =
  | { kind: 'circle'; cx: number; cy: number; r: number; fill: boolean }
  | { kind: 'rect'; x: number; y: number; width: number; height: number }
  | { kind: 'line'; x1: number; y1: number; x2: number; y2: number };

export interface SketchCell {
  id: string;
  label: string;
  highlight: boolean;
  x: number;
  width: number;
  shapes: SketchShape[];
  sizeText: string;
}

/** Width and height of an outline in metres. */
export function outlineExtentM(outline: CandidateOutline): { width: number; height: number } {
  switch (outline.kind) {
    case 'disc':
    case 'ring':
      return { width: outline.diameterM, height: outline.diameterM };
    case 'rectangle':
      return { width: outline.widthM, height: outline.heightM };
    case 'boom':
      return { width: outline.lengthM, height: outline.spanM };
    case 'y':
      return { width: 2 * outline.armM * Math.cos(Math.PI / 6), height: 1.5 * outline.armM };
  }
}

/**
 * Lays the items out in equal slots across `width` units; one scale for all, set so that the
 * largest outline fills its slot. Also returns a scale bar of a round length.
 */
export function layoutSketch(items: SketchItem[], width = 720, height = 220, gap = 14): { cells: SketchCell[]; metresPerUnit: number; scaleBar: { lengthM: number; units: number } } {
  const extents = items.map((i) => outlineExtentM(i.outline));
  const slot = width / Math.max(items.length, 1);
  const drawHeight = height - 56;
  const metresPerUnit = Math.max(...extents.map((e) => Math.max(e.width / (slot - gap), e.height / drawHeight)), 1e-12);
  const cy = 12 + drawHeight / 2;
  const cells: SketchCell[] = items.map((item, index) => {
    const e = extents[index];
    const w = e.width / metresPerUnit;
    const h = e.height / metresPerUnit;
    const cx = slot * index + slot / 2;
    const x = cx - w / 2;
    const shapes: SketchShape[] = [];
    const o = item.outline;
    if (o.kind === 'disc' || o.kind === 'ring') shapes.push({ kind: 'circle', cx, cy, r: Math.max(w / 2, 0.5), fill: o.kind === 'disc' });
    else if (o.kind === 'rectangle') shapes.push({ kind: 'rect', x, y: cy - Math.max(h, 1) / 2, width: Math.max(w, 1), height: Math.max(h, 1) });
    else if (o.kind === 'boom') {
      shapes.push({ kind: 'line', x1: x, y1: cy, x2: x + w, y2: cy });
      const span = Math.max(h, 3);
      for (let k = 0; k <= 6; k++) shapes.push({ kind: 'line', x1: x + (w * k) / 6, y1: cy - span / 2, x2: x + (w * k) / 6, y2: cy + span / 2 });
    } else {
      const arm = o.armM / metresPerUnit;
      const centreY = cy + h / 2 - arm; // arms at 90°, 210°, 330°: the top arm points up
      for (const angle of [90, 210, 330]) {
        const a = (angle * Math.PI) / 180;
        shapes.push({ kind: 'line', x1: cx, y1: centreY, x2: cx + arm * Math.cos(a), y2: centreY - arm * Math.sin(a) });
      }
    }
    return { id: item.id, label: item.label, highlight: item.highlight, x: slot * index, width: slot, shapes, sizeText: '' };
  });
  // Scale bar: a 1-2-5 length near a quarter of a slot.
  const target = (slot / 2) * metresPerUnit;
  const power = 10 ** Math.floor(Math.log10(target));
  const lengthM = [5, 2, 1].map((k) => k * power).find((l) => l <= target) ?? power;
  return { cells, metresPerUnit, scaleBar: { lengthM, units: lengthM / metresPerUnit } };
}
