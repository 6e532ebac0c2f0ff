/**
 * Scan sweep: beamwidths and directivity against steering angle. Lines and lattices sweep θ0
 * (0…85°, lines to 90°, end-fire) in the φ0 plane; rings and Y arms sweep φ0 (0…360°) at θ0,
 * where their beam keeps nearly the same width while a line's widens as it scans.
 */
import type { CalcInputs } from '../calculator';
import { buildArrayModel, directivity, principalPlaneMetrics } from '../array/index';
import { explorerArray } from './explorerInputs';

export interface ScanSweepPoint {
  /** The swept angle, degrees (θ0 or φ0). */
  angleDeg: number;
  hpbwScanDeg: number | null;
  hpbwCrossDeg: number | null;
  directivityDbi: number;
}

export interface ScanSweep {
  /** Which steering angle was swept. */
  swept: 'theta' | 'phi';
  /** The other steering angle, held fixed, degrees. */
  fixedDeg: number;
  points: ScanSweepPoint[];
}

/** The angles a sweep visits for these inputs. */
export function sweepAngles(inputs: CalcInputs): { swept: 'theta' | 'phi'; anglesDeg: number[] } {
  const geometry = inputs.geometry;
  if (geometry === 'circular' || geometry === 'yArms') return { swept: 'phi', anglesDeg: Array.from({ length: 25 }, (_, i) => i * 15) };
  const last = geometry === 'linear' ? 90 : 85;
  return { swept: 'theta', anglesDeg: Array.from({ length: last / 5 + 1 }, (_, i) => i * 5) };
}

/** Runs the sweep; onProgress receives the fraction done after each angle. */
export function explorerScanSweep(inputs: CalcInputs, onProgress?: (fraction: number) => void): ScanSweep {
  const { swept, anglesDeg } = sweepAngles(inputs);
  const base = explorerArray(inputs).spec;
  const isLine = inputs.geometry === 'linear';
  const fixedDeg = (swept === 'theta' ? inputs.phiDeg : inputs.thetaDeg) as number;
  const points: ScanSweepPoint[] = [];
  anglesDeg.forEach((angleDeg, n) => {
    const steering = swept === 'theta' ? { thetaDeg: angleDeg, phiDeg: fixedDeg } : { thetaDeg: fixedDeg, phiDeg: angleDeg };
    const model = buildArrayModel({ ...base, steering });
    const planes = principalPlaneMetrics(model);
    points.push({
      angleDeg,
      hpbwScanDeg: planes.theta.hpbwDeg ?? null,
      hpbwCrossDeg: isLine ? null : planes.phi.hpbwDeg ?? null,
      directivityDbi: directivity(model).directivityDbi,
    });
    onProgress?.((n + 1) / anglesDeg.length);
  });
  return { swept, fixedDeg, points };
}
