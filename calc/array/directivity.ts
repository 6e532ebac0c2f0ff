import FFT from 'fft.js';
import { CalcInputError } from '../errors';
import { compositeGaussLegendre } from '../numeric/gaussLegendre';
import { isIsotropic } from './elementPattern';
import { forwardCosineKernel, forwardCosineKernelPoints } from './forwardCosineKernel';
import { arrayDiameterWavelengths } from './geometry';
import { sinc } from './linearDirectivity';
import { patternPowerAtDirections } from './patternPower';
import { directionCosines } from './steering';
import type { ArrayModel, DirectionDeg } from './types';

/** Largest element count for the O(N²) pair sum on arrays without a lattice index. */
export const MAX_PAIR_SUM_ELEMENTS = 16_384;

/** How a directivity was computed. */
export type DirectivityMethod = 'closedForm' | 'quadrature';

/** Directivity toward a direction, linear and in dBi, and the method used. */
export interface DirectivityResult {
  directivity: number;
  directivityDbi: number;
  method: DirectivityMethod;
  /** Number of directions sampled (quadrature) or pair terms summed (closed form). */
  evaluations: number;
}

const TWO_PI = 2 * Math.PI;

/** Pair kernel: the sphere average of e^{j2π Δr·û}·E²(û) for a separation of `distance` λ. */
type PairKernel = (distanceWavelengths: number) => number;

const isotropicKernel: PairKernel = (distance) => sinc(TWO_PI * distance);

/**
 * The pair kernel of the model's element, or null when the pair sum does not apply: isotropic
 * elements anywhere (sinc), or the forward cosⁿθ element with every element in the x–y plane and
 * no ground plane (forwardCosineKernel, cached per distance).
 */
function pairKernel(model: ArrayModel): PairKernel | null {
  if (isIsotropic(model.element)) return isotropicKernel;
  const element = model.element;
  if (element.kind !== 'cosine' || element.groundPlaneHeightWavelengths !== undefined) return null;
  if (!model.positionsWavelengths.z.every((value) => value === 0)) return null;
  const cache = new Map<number, number>();
  return (distance) => {
    const key = Math.round(distance * 1e9) / 1e9;
    let value = cache.get(key);
    if (value === undefined) { value = forwardCosineKernel(key, element.powerExponent); cache.set(key, value); }
    return value;
  };
}

/**
 * Cost of the exact pair sum in direct-summation units (kernel evaluations × quadrature points
 * for the cosⁿθ kernel), or null when it does not apply to this model.
 */
export function pairSumWork(model: ArrayModel): number | null {
  const count = model.weights.re.length;
  if (!model.lattice && count > MAX_PAIR_SUM_ELEMENTS) return null;
  if (isIsotropic(model.element)) return model.lattice ? 4 * count : (count * count) / 2;
  if (!pairKernel(model)) return null;
  const distinct = model.lattice ? model.lattice.columns * model.lattice.rows : (count * count) / 2;
  return (model.lattice ? 4 * count : (count * count) / 2) + distinct * forwardCosineKernelPoints(arrayDiameterWavelengths(model.positionsWavelengths)) * 3;
}

/** Σ_m Σ_n w_m w_n* K(|r_m − r_n|) (positions in λ): 1/(4π) × ∫|AF|²E² dΩ, K = sinc(2πr) for isotropic elements. */
function pairSum(model: ArrayModel, kernel: PairKernel): { value: number; terms: number } {
  const { x, y, z } = model.positionsWavelengths;
  const { re, im } = model.weights;
  const count = re.length;
  let total = 0;
  const self = kernel(0);
  for (let m = 0; m < count; m++) {
    total += (re[m] * re[m] + im[m] * im[m]) * self;
    for (let n = m + 1; n < count; n++) {
      const dx = x[m] - x[n], dy = y[m] - y[n], dz = z[m] - z[n];
      const correlation = re[m] * re[n] + im[m] * im[n]; // Re(w_m w_n*)
      total += 2 * correlation * kernel(Math.sqrt(dx * dx + dy * dy + dz * dz));
    }
  }
  return { value: total, terms: (count * (count + 1)) / 2 };
}

function nextPowerOfTwo(n: number): number {
  let p = 2;
  while (p < n) p *= 2;
  return p;
}

/** The same pair sum on a lattice: Σ_Δ R(Δ) K(|Δr|), with the weight autocorrelation R by 2-D FFT (fft.js). */
function latticePairSum(model: ArrayModel, kernel: PairKernel): { value: number; terms: number } {
  const lattice = model.lattice!;
  const px = nextPowerOfTwo(2 * lattice.columns - 1);
  const py = lattice.rows === 1 ? 1 : nextPowerOfTwo(2 * lattice.rows - 1);
  const grid = new Float64Array(2 * px * py);
  const { re, im } = model.weights;
  for (let n = 0; n < re.length; n++) {
    const k = 2 * (lattice.row[n] * px + lattice.column[n]);
    grid[k] += re[n];
    grid[k + 1] += im[n];
  }
  const transformRows = (data: Float64Array, inverse: boolean) => {
    const fft = new FFT(px);
    const input = new Float64Array(2 * px), output = new Float64Array(2 * px);
    for (let r = 0; r < py; r++) {
      input.set(data.subarray(2 * r * px, 2 * (r + 1) * px));
      if (inverse) fft.inverseTransform(output, input); else fft.transform(output, input);
      data.set(output, 2 * r * px);
    }
  };
  const transformColumns = (data: Float64Array, inverse: boolean) => {
    if (py === 1) return;
    const fft = new FFT(py);
    const input = new Float64Array(2 * py), output = new Float64Array(2 * py);
    for (let c = 0; c < px; c++) {
      for (let r = 0; r < py; r++) { input[2 * r] = data[2 * (r * px + c)]; input[2 * r + 1] = data[2 * (r * px + c) + 1]; }
      if (inverse) fft.inverseTransform(output, input); else fft.transform(output, input);
      for (let r = 0; r < py; r++) { data[2 * (r * px + c)] = output[2 * r]; data[2 * (r * px + c) + 1] = output[2 * r + 1]; }
    }
  };
  transformRows(grid, false);
  transformColumns(grid, false);
  for (let k = 0; k < grid.length; k += 2) { grid[k] = grid[k] * grid[k] + grid[k + 1] * grid[k + 1]; grid[k + 1] = 0; }
  transformColumns(grid, true);
  transformRows(grid, true);
  // grid now holds R(Δc, Δr) = Σ w_{n+Δ} w_n* at circular index (Δc mod px, Δr mod py).
  let total = 0;
  for (let r = 0; r < py; r++) {
    const dr = r < py / 2 || py === 1 ? r : r - py;
    if (Math.abs(dr) >= lattice.rows) continue;
    for (let c = 0; c < px; c++) {
      const dc = c < px / 2 ? c : c - px;
      if (Math.abs(dc) >= lattice.columns) continue;
      const distance = Math.hypot(dc * lattice.pitchXWavelengths, dr * lattice.pitchYWavelengths);
      total += grid[2 * (r * px + c)] * kernel(distance);
    }
  }
  return { value: total, terms: px * py };
}

function peakPower(model: ArrayModel, direction: DirectionDeg): number {
  const [u, v, w] = directionCosines(direction.thetaDeg, direction.phiDeg);
  return patternPowerAtDirections(model, [u], [v], [w])[0];
}

function evenAtLeast(n: number): number {
  const k = Math.ceil(n);
  return k % 2 === 0 ? k : k + 1;
}

/** ∫ P dΩ over the sphere by composite Gauss–Legendre in both angles of a frame whose pole is the array axis (line) or z. */
function integratePower(model: ArrayModel, samplesPerWavelength: number): { integral: number; evaluations: number } {
  const { y, z } = model.positionsWavelengths;
  const isLine = y.every((value) => value === 0) && z.every((value) => value === 0);
  const diameter = arrayDiameterWavelengths(model.positionsWavelengths);
  const perpendicular = isLine ? 0 : diameter;
  const h = model.element.groundPlaneHeightWavelengths ?? 0;
  const order = 16;
  const alphaPanels = evenAtLeast(samplesPerWavelength * diameter + 8 * h + 8);
  const betaPanels = evenAtLeast(samplesPerWavelength * perpendicular + 8 * h + 8);
  const alpha = compositeGaussLegendre(0, Math.PI, order, alphaPanels);
  const beta = compositeGaussLegendre(0, TWO_PI, order, betaPanels);
  const ringSize = beta.nodes.length;
  const u = new Float64Array(ringSize), v = new Float64Array(ringSize), w = new Float64Array(ringSize);
  const cosBeta = beta.nodes.map(Math.cos), sinBeta = beta.nodes.map(Math.sin);
  let integral = 0;
  for (let i = 0; i < alpha.nodes.length; i++) {
    const s = Math.sin(alpha.nodes[i]), c = Math.cos(alpha.nodes[i]);
    for (let j = 0; j < ringSize; j++) {
      const a = s * cosBeta[j], b = s * sinBeta[j];
      if (isLine) { u[j] = c; v[j] = a; w[j] = b; } else { u[j] = a; v[j] = b; w[j] = c; }
    }
    const power = patternPowerAtDirections(model, u, v, w);
    let ring = 0;
    for (let j = 0; j < ringSize; j++) ring += beta.weights[j] * power[j];
    integral += alpha.weights[i] * s * ring;
  }
  return { integral, evaluations: alpha.nodes.length * ringSize };
}

/** Options of directivity(). */
export interface DirectivityOptions {
  /** Direction, degrees (default the model's beam direction). */
  direction?: DirectionDeg;
  /** 'closedForm' (isotropic elements, or forward cosⁿθ elements in the x–y plane without a ground plane), 'quadrature', or automatic (default: closed form where it applies). */
  method?: DirectivityMethod;
  /** Quadrature panels per wavelength of array size (default 2.5; each panel has 16 Gauss–Legendre nodes). */
  panelsPerWavelength?: number;
}

/**
 * Directivity D = 4π·P(û)/∫P dΩ of the total pattern (element × array factor) toward a direction
 * (IEEE Std 145 definition). Isotropic elements: exact pair sum Σ w_m w_n* sin(kr_mn)/(kr_mn)
 * (by FFT autocorrelation on lattices); forward cosⁿθ elements in the x–y plane: the same sum
 * with the kernel of forwardCosineKernel.ts. Otherwise: Gauss–Legendre quadrature over the sphere
 * with the sin θ weight and panel counts scaled by the array's electrical size.
 */
export function directivity(model: ArrayModel, options: DirectivityOptions = {}): DirectivityResult {
  const direction = options.direction ?? model.beam;
  const kernel = pairKernel(model);
  const method = options.method ?? (kernel ? 'closedForm' : 'quadrature');
  if (method === 'closedForm' && !kernel) {
    throw new CalcInputError('method', 'expected isotropic elements, or forward cosⁿθ elements in the x–y plane, without a ground plane for the closed form; use quadrature');
  }
  const peak = peakPower(model, direction);
  let average: number;
  let evaluations: number;
  const count = model.weights.re.length;
  if (method === 'closedForm' && (model.lattice || count <= MAX_PAIR_SUM_ELEMENTS)) {
    const sum = model.lattice ? latticePairSum(model, kernel!) : pairSum(model, kernel!);
    average = sum.value;
    evaluations = sum.terms;
  } else {
    const result = integratePower(model, options.panelsPerWavelength ?? 2.5);
    average = result.integral / (4 * Math.PI);
    evaluations = result.evaluations;
  }
  if (!(average > 0)) throw new CalcInputError('weights', 'expected an array that radiates (all weights are zero or the pattern vanishes)');
  const d = peak / average;
  return { directivity: d, directivityDbi: 10 * Math.log10(Math.max(d, 1e-300)), method: method === 'closedForm' && (model.lattice || count <= MAX_PAIR_SUM_ELEMENTS) ? 'closedForm' : 'quadrature', evaluations };
}
