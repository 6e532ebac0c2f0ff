import { CalcInputError, requireInteger, requirePositive } from '../errors';
import type { ArrayGeometry } from './geometry';
import { emptyPositions } from './geometry';
import { MAX_ARRAY_ELEMENTS } from './limits';

/** Outline that selects lattice sites: the whole columns × rows block, or the inscribed circle or ellipse. */
export type PlanarOutline = 'rectangle' | 'circle' | 'ellipse';

/** Inputs of a planar lattice array (spacings in wavelengths). */
export interface PlanarLatticeSpec {
  /** 'rectangular' (spacings dx, dy) or 'triangular' (equilateral, nearest-neighbour spacing dx, rows √3/2·dx apart, odd rows shifted dx/2). */
  lattice: 'rectangular' | 'triangular';
  columns: number;
  rows: number;
  spacingXWavelengths: number;
  /** Row spacing for a rectangular lattice (defaults to spacingXWavelengths); ignored for triangular. */
  spacingYWavelengths?: number;
  outline?: PlanarOutline;
}

/**
 * Planar array in the x–y plane on a rectangular or equilateral triangular lattice, centred on
 * the origin, keeping the sites inside the outline: rectangle (all), circle of radius
 * min(a, b) or ellipse with semi-axes a = columns·dx/2, b = rows·dy/2 (λ).
 */
export function planarLatticeGeometry(spec: PlanarLatticeSpec): ArrayGeometry {
  const { lattice, columns, rows } = spec;
  const outline = spec.outline ?? 'rectangle';
  requireInteger('columns', columns, 1, MAX_ARRAY_ELEMENTS);
  requireInteger('rows', rows, 1, MAX_ARRAY_ELEMENTS);
  const d = requirePositive('spacingXWavelengths', spec.spacingXWavelengths, 'λ');
  const triangular = lattice === 'triangular';
  const dy = triangular ? (d * Math.sqrt(3)) / 2 : requirePositive('spacingYWavelengths', spec.spacingYWavelengths ?? d, 'λ');
  if (columns * rows > MAX_ARRAY_ELEMENTS) {
    throw new CalcInputError('columns×rows', `expected at most ${MAX_ARRAY_ELEMENTS} lattice sites, got ${columns * rows}`);
  }
  const pitchX = triangular ? d / 2 : d;
  const gridColumns = triangular ? 2 * columns : columns;
  const centreX = ((columns - 1) * d + (triangular && rows > 1 ? d / 2 : 0)) / 2;
  const centreY = ((rows - 1) * dy) / 2;
  let a = (columns * d) / 2;
  let b = (rows * dy) / 2;
  if (outline === 'circle') a = b = Math.min(a, b);
  const xs: number[] = [], ys: number[] = [], cs: number[] = [], rs: number[] = [];
  for (let r = 0; r < rows; r++) {
    const shift = triangular && r % 2 === 1 ? 1 : 0;
    for (let c = 0; c < columns; c++) {
      const gridColumn = triangular ? 2 * c + shift : c;
      const x = gridColumn * pitchX - centreX;
      const y = r * dy - centreY;
      if (outline !== 'rectangle' && (x / a) ** 2 + (y / b) ** 2 > 1 + 1e-12) continue;
      xs.push(x); ys.push(y); cs.push(gridColumn); rs.push(r);
    }
  }
  if (xs.length === 0) throw new CalcInputError('outline', 'expected at least one lattice site inside the outline, got none');
  const positions = emptyPositions(xs.length);
  positions.x.set(xs);
  positions.y.set(ys);
  return {
    positionsWavelengths: positions,
    lattice: {
      kind: triangular ? 'triangular' : 'rectangular',
      pitchXWavelengths: pitchX, pitchYWavelengths: dy,
      originXWavelengths: -centreX, originYWavelengths: -centreY,
      columns: gridColumns, rows, column: Int32Array.from(cs), row: Int32Array.from(rs),
      vectorsWavelengths: triangular ? [[d, 0], [d / 2, dy]] : [[d, 0], [0, dy]],
    },
    fullGrid: !triangular && outline === 'rectangle',
    apertureHalfXWavelengths: a,
    apertureHalfYWavelengths: b,
  };
}
