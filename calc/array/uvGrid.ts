import FFT from 'fft.js';
import { CalcInputError, requireInRange, requireInteger } from '../errors';
import type { EvaluationPath } from './arrayFactor';
import { elementFieldAt, isIsotropic } from './elementPattern';
import { patternPowerAtDirections } from './patternPower';
import type { ArrayModel } from './types';

/** Options of a u–v grid (direction cosines, forward hemisphere w ≥ 0). */
export interface UvGridOptions {
  /** Samples per axis, 2…4096 (default 256). u_i = uMin + i·(uMax − uMin)/count, i = 0…count−1. */
  count?: number;
  uMin?: number;
  uMax?: number;
  vMin?: number;
  vMax?: number;
  /** 'fft', a direct path, or undefined for automatic (FFT when the lattice and grid allow it). */
  path?: 'fft' | EvaluationPath;
}

/** A u–v grid: u and v samples, power[j·count + i] at (u_i, v_j) (linear; 0 outside visible space), visible flags. */
export interface UvGrid {
  u: Float64Array;
  v: Float64Array;
  power: Float64Array;
  visible: Uint8Array;
  /** The algorithm actually used. */
  path: 'fft' | EvaluationPath;
}

function fftSizeFor(pitchWavelengths: number, step: number): number | undefined {
  const size = 1 / (pitchWavelengths * step);
  const rounded = Math.round(size);
  if (Math.abs(size - rounded) > 1e-9 * size || rounded < 2 || (rounded & (rounded - 1)) !== 0 || rounded > 1 << 22) return undefined;
  return rounded;
}

/** True when the FFT path can evaluate this model on this grid (planar lattice, sample steps matching a power-of-two transform). */
export function canUseFftGrid(model: ArrayModel, count: number, uStep: number, vStep: number): boolean {
  const lattice = model.lattice;
  if (!lattice) return false;
  if (fftSizeFor(lattice.pitchXWavelengths, uStep) === undefined) return false;
  return lattice.rows === 1 || fftSizeFor(lattice.pitchYWavelengths, vStep) !== undefined;
}

/**
 * |AF|² on the u–v grid by FFT (fft.js): with u_i = uMin + i/(P·px), the lattice sum
 * Σ w e^{j2π(c·px·u + r·py·v)} is a length-P DFT of the weights pre-multiplied by
 * e^{j2π(c·px·uMin + r·py·vMin)} (columns folded modulo P); the origin phase has unit modulus.
 */
function fftArrayFactorPower(model: ArrayModel, count: number, uMin: number, uStep: number, vMin: number, vStep: number): Float64Array {
  const lattice = model.lattice!;
  const px = fftSizeFor(lattice.pitchXWavelengths, uStep)!;
  const singleRow = lattice.rows === 1;
  const py = singleRow ? 1 : fftSizeFor(lattice.pitchYWavelengths, vStep)!;
  const rowsUsed = lattice.rows;
  const data = new Float64Array(rowsUsed * 2 * px);
  const { re, im } = model.weights;
  const uPhase = 2 * Math.PI * lattice.pitchXWavelengths * uMin;
  const vPhase = 2 * Math.PI * lattice.pitchYWavelengths * vMin;
  for (let n = 0; n < re.length; n++) {
    const c = lattice.column[n], r = lattice.row[n];
    const phase = c * uPhase + r * vPhase;
    const cr = Math.cos(phase), ci = Math.sin(phase);
    const k = r * 2 * px + 2 * (c % px);
    data[k] += re[n] * cr - im[n] * ci;
    data[k + 1] += re[n] * ci + im[n] * cr;
  }
  const fftX = new FFT(px);
  const rowIn = new Float64Array(2 * px), rowOut = new Float64Array(2 * px);
  const transformed = new Float64Array(rowsUsed * 2 * px);
  for (let r = 0; r < rowsUsed; r++) {
    rowIn.set(data.subarray(r * 2 * px, (r + 1) * 2 * px));
    fftX.inverseTransform(rowOut, rowIn); // +j kernel, divided by px
    transformed.set(rowOut, r * 2 * px);
  }
  const power = new Float64Array(count * count);
  if (singleRow) {
    for (let i = 0; i < count; i++) {
      const k = 2 * (i % px);
      const value = (transformed[k] ** 2 + transformed[k + 1] ** 2) * px * px;
      for (let j = 0; j < count; j++) power[j * count + i] = value;
    }
    return power;
  }
  const fftY = new FFT(py);
  const colIn = new Float64Array(2 * py), colOut = new Float64Array(2 * py);
  const scale = px * px * py * py;
  for (let i = 0; i < Math.min(count, px); i++) {
    colIn.fill(0);
    for (let r = 0; r < rowsUsed; r++) {
      const k = 2 * (r % py);
      colIn[k] += transformed[r * 2 * px + 2 * i];
      colIn[k + 1] += transformed[r * 2 * px + 2 * i + 1];
    }
    fftY.inverseTransform(colOut, colIn);
    for (let j = 0; j < count; j++) {
      const k = 2 * (j % py);
      const value = (colOut[k] ** 2 + colOut[k + 1] ** 2) * scale;
      for (let ii = i; ii < count; ii += px) power[j * count + ii] = value;
    }
  }
  return power;
}

/** Total pattern (element × array factor) on a u–v grid over the forward hemisphere; FFT when possible. */
export function patternUvGrid(model: ArrayModel, options: UvGridOptions = {}): UvGrid {
  const count = requireInteger('count', options.count ?? 256, 2, 4096);
  const uMin = requireInRange('uMin', options.uMin ?? -1, -1, 1);
  const uMax = requireInRange('uMax', options.uMax ?? 1, -1, 1);
  const vMin = requireInRange('vMin', options.vMin ?? -1, -1, 1);
  const vMax = requireInRange('vMax', options.vMax ?? 1, -1, 1);
  if (!(uMax > uMin)) throw new CalcInputError('uMax', `expected uMax > uMin, got ${uMin}…${uMax}`);
  if (!(vMax > vMin)) throw new CalcInputError('vMax', `expected vMax > vMin, got ${vMin}…${vMax}`);
  const uStep = (uMax - uMin) / count, vStep = (vMax - vMin) / count;
  const u = Float64Array.from({ length: count }, (_, i) => uMin + i * uStep);
  const v = Float64Array.from({ length: count }, (_, j) => vMin + j * vStep);
  const visible = new Uint8Array(count * count);
  for (let j = 0; j < count; j++) for (let i = 0; i < count; i++) visible[j * count + i] = u[i] * u[i] + v[j] * v[j] <= 1 ? 1 : 0;
  const fftPossible = canUseFftGrid(model, count, uStep, vStep);
  if (options.path === 'fft' && !fftPossible) {
    throw new CalcInputError('path', 'expected a planar lattice and grid steps 1/(P·pitch) with P a power of two for the FFT path');
  }
  const path = options.path ?? (fftPossible ? 'fft' : undefined);
  let power: Float64Array;
  if (path === 'fft') {
    power = fftArrayFactorPower(model, count, uMin, uStep, vMin, vStep);
    const isotropic = isIsotropic(model.element);
    for (let k = 0; k < power.length; k++) {
      if (!visible[k]) { power[k] = 0; continue; }
      if (isotropic) continue;
      const uu = u[k % count], vv = v[Math.floor(k / count)];
      const e = elementFieldAt(model.element, uu, vv, Math.sqrt(Math.max(0, 1 - uu * uu - vv * vv)));
      power[k] *= e * e;
    }
  } else {
    const indices: number[] = [];
    for (let k = 0; k < visible.length; k++) if (visible[k]) indices.push(k);
    const us = Float64Array.from(indices, (k) => u[k % count]);
    const vs = Float64Array.from(indices, (k) => v[Math.floor(k / count)]);
    const ws = Float64Array.from(indices, (_, i) => Math.sqrt(Math.max(0, 1 - us[i] * us[i] - vs[i] * vs[i])));
    const visiblePower = patternPowerAtDirections(model, us, vs, ws, path);
    power = new Float64Array(count * count);
    indices.forEach((k, i) => { power[k] = visiblePower[i]; });
  }
  return { u, v, power, visible, path: path ?? (model.separable ? 'separable' : model.lattice ? 'lattice' : 'direct') };
}
