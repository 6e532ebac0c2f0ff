import type { ArrayModel, ComplexWeights } from './types';

const TWO_PI = 2 * Math.PI;
/** Recurrences are re-seeded with exact cos/sin every this many steps to bound round-off drift. */
const RESEED_INTERVAL = 64;

/**
 * Fills re/im with e^{j2π(origin + i·pitch)·s} for i = 0…count−1, by complex-multiplication
 * recurrence (one cos/sin per RESEED_INTERVAL entries).
 */
export function fillPhasorTable(re: Float64Array, im: Float64Array, count: number, originWavelengths: number, pitchWavelengths: number, directionCosine: number): void {
  const stepPhase = TWO_PI * pitchWavelengths * directionCosine;
  const stepRe = Math.cos(stepPhase);
  const stepIm = Math.sin(stepPhase);
  for (let start = 0; start < count; start += RESEED_INTERVAL) {
    const phase = TWO_PI * (originWavelengths + start * pitchWavelengths) * directionCosine;
    let cRe = Math.cos(phase), cIm = Math.sin(phase);
    const stop = Math.min(count, start + RESEED_INTERVAL);
    for (let i = start; i < stop; i++) {
      re[i] = cRe;
      im[i] = cIm;
      const nextRe = cRe * stepRe - cIm * stepIm;
      cIm = cRe * stepIm + cIm * stepRe;
      cRe = nextRe;
    }
  }
}

/** Σ w_i e^{j2π(origin + i·pitch)s} of one line of weights, by recurrence; writes [re, im] into out. */
export function lineSum(weights: ComplexWeights, originWavelengths: number, pitchWavelengths: number, directionCosine: number, out: Float64Array): void {
  const wr = weights.re, wi = weights.im;
  const count = wr.length;
  const stepPhase = TWO_PI * pitchWavelengths * directionCosine;
  const stepRe = Math.cos(stepPhase);
  const stepIm = Math.sin(stepPhase);
  let sumRe = 0, sumIm = 0;
  for (let start = 0; start < count; start += RESEED_INTERVAL) {
    const phase = TWO_PI * (originWavelengths + start * pitchWavelengths) * directionCosine;
    let cRe = Math.cos(phase), cIm = Math.sin(phase);
    const stop = Math.min(count, start + RESEED_INTERVAL);
    for (let i = start; i < stop; i++) {
      const a = wr[i], b = wi[i];
      sumRe += a * cRe - b * cIm;
      sumIm += a * cIm + b * cRe;
      const nextRe = cRe * stepRe - cIm * stepIm;
      cIm = cRe * stepIm + cIm * stepRe;
      cRe = nextRe;
    }
  }
  out[0] = sumRe;
  out[1] = sumIm;
}

interface DenseLattice { re: Float64Array; im: Float64Array; rowStart: Int32Array; rowStop: Int32Array }
const denseCache = new WeakMap<ArrayModel, DenseLattice>();

/** The model's weights laid out on its lattice (rows × columns, zeros at empty sites), cached per model. */
function denseLatticeWeights(model: ArrayModel): DenseLattice {
  const hit = denseCache.get(model);
  if (hit && hit.re.length === model.lattice!.rows * model.lattice!.columns) return hit;
  const { columns, rows, column, row } = model.lattice!;
  const re = new Float64Array(rows * columns), im = new Float64Array(rows * columns);
  const rowStart = new Int32Array(rows).fill(columns), rowStop = new Int32Array(rows);
  for (let n = 0; n < column.length; n++) {
    const k = row[n] * columns + column[n];
    re[k] += model.weights.re[n];
    im[k] += model.weights.im[n];
    rowStart[row[n]] = Math.min(rowStart[row[n]], column[n]);
    rowStop[row[n]] = Math.max(rowStop[row[n]], column[n] + 1);
  }
  const dense = { re, im, rowStart, rowStop };
  denseCache.set(model, dense);
  return dense;
}

/** Which algorithm evaluates a model's array factor at arbitrary directions. */
export type EvaluationPath = 'separable' | 'lattice' | 'direct';

/** The fastest valid path for a model: separable weights, else a planar lattice index, else direct summation. */
export function evaluationPath(model: ArrayModel): EvaluationPath {
  if (model.separable) return 'separable';
  if (model.lattice) return 'lattice';
  return 'direct';
}

/**
 * Array factor AF(û) = Σ w_n e^{j2π r_n·û} (positions in λ) at each direction (u[i], v[i], w[i]),
 * written as [re, im] pairs into out (length 2·count). path selects the algorithm; all paths
 * give the same result to round-off.
 */
export function arrayFactorAtDirections(model: ArrayModel, u: ArrayLike<number>, v: ArrayLike<number>, w: ArrayLike<number>, out: Float64Array, path: EvaluationPath = evaluationPath(model)): void {
  const count = u.length;
  if (path === 'separable' && model.separable && model.lattice) {
    const { x, y } = model.separable;
    const lattice = model.lattice;
    const ax = new Float64Array(2), ay = new Float64Array(2);
    const singleRow = y.re.length === 1;
    for (let i = 0; i < count; i++) {
      lineSum(x, lattice.originXWavelengths, lattice.pitchXWavelengths, u[i], ax);
      if (singleRow) {
        const yr = y.re[0], yi = y.im[0];
        const phase = TWO_PI * lattice.originYWavelengths * v[i];
        const cr = Math.cos(phase), ci = Math.sin(phase);
        ay[0] = yr * cr - yi * ci; ay[1] = yr * ci + yi * cr;
      } else {
        lineSum(y, lattice.originYWavelengths, lattice.pitchYWavelengths, v[i], ay);
      }
      out[2 * i] = ax[0] * ay[0] - ax[1] * ay[1];
      out[2 * i + 1] = ax[0] * ay[1] + ax[1] * ay[0];
    }
    return;
  }
  const wr = model.weights.re, wi = model.weights.im;
  const elements = wr.length;
  if (path !== 'direct' && model.lattice) {
    const lattice = model.lattice;
    const columns = lattice.columns, rows = lattice.rows;
    const dense = denseLatticeWeights(model);
    const exRe = new Float64Array(columns), exIm = new Float64Array(columns);
    const eyRe = new Float64Array(rows), eyIm = new Float64Array(rows);
    const { re: gRe, im: gIm, rowStart, rowStop } = dense;
    for (let i = 0; i < count; i++) {
      fillPhasorTable(exRe, exIm, columns, lattice.originXWavelengths, lattice.pitchXWavelengths, u[i]);
      fillPhasorTable(eyRe, eyIm, rows, lattice.originYWavelengths, lattice.pitchYWavelengths, v[i]);
      let sumRe = 0, sumIm = 0;
      for (let r = 0; r < rows; r++) {
        // Row sum S_r = Σ_c W[r, c]·e^{j2π x_c u}, then Σ_r S_r·e^{j2π y_r v}.
        let rowRe = 0, rowIm = 0;
        const base = r * columns;
        for (let c = rowStart[r]; c < rowStop[r]; c++) {
          const a = gRe[base + c], b = gIm[base + c], er = exRe[c], ei = exIm[c];
          rowRe += a * er - b * ei;
          rowIm += a * ei + b * er;
        }
        sumRe += rowRe * eyRe[r] - rowIm * eyIm[r];
        sumIm += rowRe * eyIm[r] + rowIm * eyRe[r];
      }
      out[2 * i] = sumRe;
      out[2 * i + 1] = sumIm;
    }
    return;
  }
  const { x, y, z } = model.positionsWavelengths;
  for (let i = 0; i < count; i++) {
    const ku = TWO_PI * u[i], kv = TWO_PI * v[i], kw = TWO_PI * w[i];
    let sumRe = 0, sumIm = 0;
    for (let n = 0; n < elements; n++) {
      const phase = ku * x[n] + kv * y[n] + kw * z[n];
      const c = Math.cos(phase), s = Math.sin(phase);
      sumRe += wr[n] * c - wi[n] * s;
      sumIm += wr[n] * s + wi[n] * c;
    }
    out[2 * i] = sumRe;
    out[2 * i + 1] = sumIm;
  }
}
