/**
 * The explorer's u–v map: total pattern on a count × count grid of direction cosines over the
 * forward hemisphere, in dB relative to its peak, with the beam and grating-lobe positions.
 * Uses the engine's FFT grid when the lattice allows it, else row bands of direct evaluation
 * (reporting progress so a worker can show it).
 */
import type { CalcInputs } from '../calculator';
import { buildArrayModel, canUseFftGrid, directionCosines, gratingLobeDirections, patternPowerAtDirections, patternUvGrid, type ArrayModel } from '../array/index';
import { explorerArray } from './explorerInputs';
import { uvMapWork, SYNC_BUDGET_EVALUATIONS } from './workEstimate';

export interface UvMap {
  count: number;
  /** u_i = −1 + 2i/count and v_j = −1 + 2j/count. */
  u: Float64Array;
  v: Float64Array;
  /** dB relative to the map's peak at (u_i, v_j), index j·count + i; floorDb where nothing radiates; outside visible space also floorDb. */
  powerDb: Float32Array;
  visible: Uint8Array;
  floorDb: number;
  beam: { u: number; v: number };
  /** Grating lobes in visible space, with the map's level at each (dB). */
  gratingLobes: { u: number; v: number; thetaDeg: number; phiDeg: number; levelDb: number }[];
  path: string;
}

/** Lowest level the map keeps, dB. */
export const UV_FLOOR_DB = -60;

function gridStep(count: number): number {
  return 2 / count;
}

/** True when a count × count map of this model is cheap enough for the main thread (FFT grid or a small sum). */
export function uvMapIsCheap(model: ArrayModel, count: number): boolean {
  return canUseFftGrid(model, count, gridStep(count), gridStep(count)) || uvMapWork(model, count) <= SYNC_BUDGET_EVALUATIONS;
}

/** Level (dB) of the map at the sample nearest to (u, v). */
export function uvLevelAt(map: Pick<UvMap, 'count' | 'powerDb' | 'floorDb'>, u: number, v: number): number {
  const i = Math.round(((u + 1) * map.count) / 2), j = Math.round(((v + 1) * map.count) / 2);
  if (i < 0 || j < 0 || i >= map.count || j >= map.count) return map.floorDb;
  return map.powerDb[j * map.count + i];
}

/** Builds the u–v map for the explorer's inputs (count samples per axis, 2…1024). */
export function explorerUvMap(inputs: CalcInputs, count: number, onProgress?: (fraction: number) => void): UvMap {
  const model = buildArrayModel(explorerArray(inputs).spec);
  return uvMapOfModel(model, count, onProgress);
}

/** The same for a model already built. */
export function uvMapOfModel(model: ArrayModel, count: number, onProgress?: (fraction: number) => void): UvMap {
  const step = gridStep(count);
  let power: Float64Array, visible: Uint8Array, u: Float64Array, v: Float64Array, path: string;
  if (canUseFftGrid(model, count, step, step)) {
    const grid = patternUvGrid(model, { count, path: 'fft' });
    ({ power, visible, u, v } = grid);
    path = grid.path;
  } else {
    u = Float64Array.from({ length: count }, (_, i) => -1 + i * step);
    v = Float64Array.from({ length: count }, (_, j) => -1 + j * step);
    power = new Float64Array(count * count);
    visible = new Uint8Array(count * count);
    const band = Math.max(1, Math.floor(count / 16));
    for (let j0 = 0; j0 < count; j0 += band) {
      const us: number[] = [], vs: number[] = [], ws: number[] = [], at: number[] = [];
      for (let j = j0; j < Math.min(count, j0 + band); j++) {
        for (let i = 0; i < count; i++) {
          const r2 = u[i] * u[i] + v[j] * v[j];
          if (r2 > 1) continue;
          visible[j * count + i] = 1;
          us.push(u[i]); vs.push(v[j]); ws.push(Math.sqrt(1 - r2)); at.push(j * count + i);
        }
      }
      const p = patternPowerAtDirections(model, us, vs, ws);
      at.forEach((k, n) => { power[k] = p[n]; });
      onProgress?.(Math.min(1, (j0 + band) / count));
    }
    path = 'direct bands';
  }
  let peak = 0;
  for (let k = 0; k < power.length; k++) if (visible[k] && power[k] > peak) peak = power[k];
  const powerDb = new Float32Array(count * count);
  for (let k = 0; k < power.length; k++) {
    powerDb[k] = visible[k] && peak > 0 && power[k] > 0 ? Math.max(UV_FLOOR_DB, 10 * Math.log10(power[k] / peak)) : UV_FLOOR_DB;
  }
  const [u0, v0] = directionCosines(model.beam.thetaDeg, model.beam.phiDeg);
  const map: UvMap = { count, u, v, powerDb, visible, floorDb: UV_FLOOR_DB, beam: { u: u0, v: v0 }, gratingLobes: [], path };
  const lobes = model.lattice && model.lattice.kind !== 'line' ? gratingLobeDirections(model.lattice.vectorsWavelengths, model.beam) : [];
  map.gratingLobes = lobes.map((g) => ({ u: g.u, v: g.v, thetaDeg: g.thetaDeg, phiDeg: g.phiDeg, levelDb: uvLevelAt(map, g.u, g.v) }));
  onProgress?.(1);
  return map;
}

/** Samples per axis of the map drawn on the main thread, and of the finer one a worker draws. */
export const UV_COUNT_MAIN = 128;
export const UV_COUNT_WORKER = 192;

/** Where to draw the map for these inputs: on the main thread when cheap, else in a worker. */
export function explorerUvPlan(inputs: CalcInputs): { where: 'main' | 'worker'; count: number } {
  const model = buildArrayModel(explorerArray(inputs).spec);
  return uvMapIsCheap(model, UV_COUNT_MAIN) ? { where: 'main', count: UV_COUNT_MAIN } : { where: 'worker', count: UV_COUNT_WORKER };
}
