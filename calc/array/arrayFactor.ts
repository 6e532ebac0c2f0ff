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
  let cRe = 0, cIm = 0;
  for (let i = 0; i < count; i++) {
    if (i % RESEED_INTERVAL === 0) {
      const phase = TWO_PI * (originWavelengths + i * pitchWavelengths) * directionCosine;
      cRe = Math.cos(phase);
      cIm = Math.sin(phase);
    }
    re[i] = cRe;
    im[i] = cIm;
    const nextRe = cRe * stepRe - cIm * stepIm;
    cIm = cRe * stepIm + cIm * stepRe;
    cRe = nextRe;
  }
}

/** Σ w_i e^{j2π(origin + i·pitch)s} of one line of weights, by recurrence; writes [re, im] into out. */
export function lineSum(weights: ComplexWeights, originWavelengths: number, pitchWavelengths: number, directionCosine: number, out: Float64Array): void {
  const wr = weights.re, wi = weights.im;
  const count = wr.length;
  const stepPhase = TWO_PI * pitchWavelengths * directionCosine;
  const stepRe = Math.cos(stepPhase);
  const stepIm = Math.sin(stepPhase);
  let sumRe = 0, sumIm = 0, cRe = 0, cIm = 0;
  for (let i = 0; i < count; i++) {
    if (i % RESEED_INTERVAL === 0) {
      const phase = TWO_PI * (originWavelengths + i * pitchWavelengths) * directionCosine;
      cRe = Math.cos(phase);
      cIm = Math.sin(phase);
    }
    sumRe += wr[i] * cRe - wi[i] * cIm;
    sumIm += wr[i] * cIm + wi[i] * cRe;
    const nextRe = cRe * stepRe - cIm * stepIm;
    cIm = cRe * stepIm + cIm * stepRe;
    cRe = nextRe;
  }
  out[0] = sumRe;
  out[1] = sumIm;
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
    const { column, row } = lattice;
    const exRe = new Float64Array(lattice.columns), exIm = new Float64Array(lattice.columns);
    const eyRe = new Float64Array(lattice.rows), eyIm = new Float64Array(lattice.rows);
    for (let i = 0; i < count; i++) {
      fillPhasorTable(exRe, exIm, lattice.columns, lattice.originXWavelengths, lattice.pitchXWavelengths, u[i]);
      fillPhasorTable(eyRe, eyIm, lattice.rows, lattice.originYWavelengths, lattice.pitchYWavelengths, v[i]);
      let sumRe = 0, sumIm = 0;
      for (let n = 0; n < elements; n++) {
        const c = column[n], r = row[n];
        const pr = exRe[c] * eyRe[r] - exIm[c] * eyIm[r];
        const pi = exRe[c] * eyIm[r] + exIm[c] * eyRe[r];
        sumRe += wr[n] * pr - wi[n] * pi;
        sumIm += wr[n] * pi + wi[n] * pr;
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
