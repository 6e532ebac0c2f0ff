import { CalcInputError, requireInRange, requireNonNegative, requirePositive } from '../errors';
import type { ArrayGeometry } from './geometry';
import { emptyPositions } from './geometry';
import { requireElementCount } from './limits';
import { seededRandom } from './seededRandom';

/** Inputs of a random array (lengths in wavelengths). */
export interface RandomArraySpec {
  count: number;
  /** Full side lengths of the box the elements are drawn in, λ (use 0 for z to stay planar). */
  extentXWavelengths: number;
  extentYWavelengths: number;
  extentZWavelengths?: number;
  /** Minimum distance between any two elements, λ (e.g. several λ for a widely spaced array). */
  minSeparationWavelengths?: number;
  seed: number;
}

/**
 * Random array: count elements drawn uniformly in a box centred on the origin with a seeded
 * generator, rejecting draws closer than minSeparation to an earlier element. Throws when the
 * box cannot hold that many elements at that separation (after 200 tries per element).
 */
export function randomGeometry(spec: RandomArraySpec): ArrayGeometry {
  const count = requireElementCount('count', spec.count);
  const ex = requirePositive('extentXWavelengths', spec.extentXWavelengths, 'λ');
  const ey = requirePositive('extentYWavelengths', spec.extentYWavelengths, 'λ');
  const ez = requireNonNegative('extentZWavelengths', spec.extentZWavelengths ?? 0, 'λ');
  const minSeparation = requireNonNegative('minSeparationWavelengths', spec.minSeparationWavelengths ?? 0, 'λ');
  const random = seededRandom(requireInRange('seed', spec.seed, 0, 2 ** 32 - 1));
  const positions = emptyPositions(count);
  const min2 = minSeparation * minSeparation;
  for (let n = 0; n < count; n++) {
    let placed = false;
    for (let attempt = 0; attempt < 200 && !placed; attempt++) {
      const x = (random() - 0.5) * ex, y = (random() - 0.5) * ey, z = (random() - 0.5) * ez;
      let ok = true;
      for (let m = 0; m < n && ok && min2 > 0; m++) {
        const dx = positions.x[m] - x, dy = positions.y[m] - y, dz = positions.z[m] - z;
        ok = dx * dx + dy * dy + dz * dz >= min2;
      }
      if (ok) { positions.x[n] = x; positions.y[n] = y; positions.z[n] = z; placed = true; }
    }
    if (!placed) {
      throw new CalcInputError('minSeparationWavelengths', `expected a separation that lets ${count} elements fit in the box, could place only ${n}`);
    }
  }
  return { positionsWavelengths: positions, fullGrid: false, apertureHalfXWavelengths: ex / 2, apertureHalfYWavelengths: ey / 2 };
}

/**
 * Randomly thinned copy of a geometry: each element is kept with probability fillFraction
 * (seeded, reproducible); at least one element is always kept. The lattice index is kept for
 * the surviving sites.
 */
export function thinnedGeometry(geometry: ArrayGeometry, fillFraction: number, seed: number): ArrayGeometry {
  requireInRange('fillFraction', fillFraction, 0, 1);
  const random = seededRandom(requireInRange('seed', seed, 0, 2 ** 32 - 1));
  const source = geometry.positionsWavelengths;
  const keep: number[] = [];
  for (let n = 0; n < source.x.length; n++) if (random() < fillFraction) keep.push(n);
  if (keep.length === 0) keep.push(0);
  const positions = emptyPositions(keep.length);
  keep.forEach((n, i) => { positions.x[i] = source.x[n]; positions.y[i] = source.y[n]; positions.z[i] = source.z[n]; });
  const lattice = geometry.lattice && {
    ...geometry.lattice,
    column: Int32Array.from(keep, (n) => geometry.lattice!.column[n]),
    row: Int32Array.from(keep, (n) => geometry.lattice!.row[n]),
  };
  return { ...geometry, positionsWavelengths: positions, lattice, fullGrid: geometry.fullGrid && keep.length === source.x.length };
}
