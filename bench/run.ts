/**
 * npm run bench: median times of the array engine on five workloads, the same computations in
 * plain NumPy (bench/numpy_reference.py, when python3 with NumPy is available) on the same
 * machine in the same run, a check that the results agree, and the ratio ours/NumPy.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { buildArrayModel, directivity, patternCut, patternThetaPhiGrid, patternUvGrid } from '../calc/array/index';
import type { ArrayModel } from '../calc/array/index';

interface Workload {
  name: string;
  label: string;
  repeats: number;
  run: () => Float64Array;
  /** Inputs for the NumPy version. */
  input: Record<string, unknown>;
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

function timeMedian(run: () => Float64Array, repeats: number): { ms: number; result: Float64Array } {
  let result = run(); // warm-up (JIT)
  const times: number[] = [];
  for (let i = 0; i < repeats; i++) {
    const t0 = performance.now();
    result = run();
    times.push(performance.now() - t0);
  }
  return { ms: median(times), result };
}

const list = (a: ArrayLike<number>) => Array.from(a);
const modelInput = (m: ArrayModel) => ({
  x: list(m.positionsWavelengths.x), y: list(m.positionsWavelengths.y), z: list(m.positionsWavelengths.z),
  re: list(m.weights.re), im: list(m.weights.im),
});

// (1) 1,024-element linear array, 8,192 angles (Taylor taper, scanned 20°).
const linear = buildArrayModel({ geometry: { kind: 'linear', count: 1024, spacingWavelengths: 0.5 }, taper: { kind: 'taylor', nbar: 5, sidelobeDb: 35 }, steering: { thetaDeg: 20, phiDeg: 0 } });
const linearTheta = Float64Array.from({ length: 8192 }, (_, i) => -90 + (180 * i) / 8191);
// (2) 64 × 64 planar array on a 512 × 512 u–v grid (FFT path).
const planar64 = buildArrayModel({ geometry: { kind: 'planar', lattice: 'rectangular', columns: 64, rows: 64, spacingXWavelengths: 0.5 }, taper: { kind: 'taylor', nbar: 4, sidelobeDb: 30 }, steering: { thetaDeg: 25, phiDeg: 30 } });
const uv = Float64Array.from({ length: 512 }, (_, i) => -1 + (2 * i) / 512);
// (3) 1,000-element random 3-D array on a 181 × 361 θ–φ grid.
const random = buildArrayModel({ geometry: { kind: 'random', count: 1000, extentXWavelengths: 20, extentYWavelengths: 20, extentZWavelengths: 4, seed: 12345 }, steering: { thetaDeg: 30, phiDeg: 60 } });
const gridTheta = Float64Array.from({ length: 181 }, (_, i) => i);
const gridPhi = Float64Array.from({ length: 361 }, (_, j) => j);
// (4) directivity and (5) a 721-point cut of a 32 × 32 planar array (quantized 4-bit phases, so no separable shortcut).
const planar32 = buildArrayModel({ geometry: { kind: 'planar', lattice: 'rectangular', columns: 32, rows: 32, spacingXWavelengths: 0.5 }, steering: { thetaDeg: 20, phiDeg: 0 }, phaseBits: 4 });
const cutTheta = Float64Array.from({ length: 721 }, (_, i) => -90 + (180 * i) / 720);

const workloads: Workload[] = [
  { name: 'linearCut', label: '(1) 1,024-element linear array, 8,192 angles', repeats: 9,
    run: () => patternCut(linear, { count: 8192 }).power, input: { ...modelInput(linear), thetaDeg: list(linearTheta) } },
  { name: 'uvGrid', label: '(2) 64×64 planar array, 512×512 u–v grid', repeats: 7,
    run: () => patternUvGrid(planar64, { count: 512 }).power,
    input: { re: list(planar64.weights.re), im: list(planar64.weights.im), u: list(uv), v: list(uv),
      xGrid: Array.from({ length: 64 }, (_, c) => planar64.lattice!.originXWavelengths + c * 0.5),
      yGrid: Array.from({ length: 64 }, (_, r) => planar64.lattice!.originYWavelengths + r * 0.5) } },
  { name: 'thetaPhiGrid', label: '(3) 1,000-element random array, 181×361 θ–φ grid', repeats: 5,
    run: () => patternThetaPhiGrid(random, 181, 361).power, input: { ...modelInput(random), thetaDeg: list(gridTheta), phiDeg: list(gridPhi) } },
  { name: 'planarDirectivity', label: '(4) directivity of a 32×32 planar array', repeats: 9,
    run: () => Float64Array.of(directivity(planar32).directivity), input: { ...modelInput(planar32), u0: Math.sin((20 * Math.PI) / 180), v0: 0 } },
  { name: 'planarCut', label: '(5) 32×32 planar array, 721-point cut', repeats: 21,
    run: () => patternCut(planar32, { count: 721, phiDeg: 0 }).power, input: { ...modelInput(planar32), thetaDeg: list(cutTheta), phiDeg: 0 } },
];

const ours = workloads.map((w) => ({ ...w, ...timeMedian(w.run, w.repeats) }));

let numpy: Record<string, { medianMs: number; values: number[] }> | undefined;
let numpyVersion = '';
try {
  const dir = mkdtempSync(join(tmpdir(), 'dirigo-bench-'));
  const inputPath = join(dir, 'input.json'), outputPath = join(dir, 'output.json');
  writeFileSync(inputPath, JSON.stringify(workloads.map((w) => ({ name: w.name, repeats: Math.min(w.repeats, 7), ...w.input }))));
  execFileSync('python3', [join(import.meta.dirname ?? 'bench', 'numpy_reference.py'), inputPath, outputPath], { stdio: ['ignore', 'ignore', 'inherit'] });
  const parsed = JSON.parse(readFileSync(outputPath, 'utf8'));
  numpyVersion = parsed.numpy;
  numpy = parsed;
} catch (error) {
  console.log(`NumPy reference skipped (python3 with NumPy not available: ${(error as Error).message.split('\n')[0]})`);
}

console.log(`Array engine bench, Node ${process.version}${numpy ? `, NumPy ${numpyVersion}` : ''}; median of repeated runs`);
for (const w of ours) {
  let line = `${w.label}: ours ${w.ms.toFixed(2)} ms`;
  const reference = numpy?.[w.name];
  if (reference) {
    let peak = 0, maxDifference = 0;
    for (let i = 0; i < reference.values.length; i++) {
      peak = Math.max(peak, Math.abs(reference.values[i]));
      maxDifference = Math.max(maxDifference, Math.abs(reference.values[i] - w.result[i]));
    }
    const agree = reference.values.length === w.result.length && maxDifference <= 1e-9 * peak;
    line += ` | NumPy ${reference.medianMs.toFixed(2)} ms | ratio ours/NumPy ${(w.ms / reference.medianMs).toFixed(3)}`;
    line += ` | max |diff|/peak ${(maxDifference / peak).toExponential(2)} ${agree ? 'agree' : 'DISAGREE'}`;
  }
  console.log(line);
}
const cut = ours.find((w) => w.name === 'planarCut')!;
console.log(`32×32 cut budget: ${cut.ms.toFixed(2)} ms of 16 ms (${cut.ms < 16 ? 'within' : 'OVER'} budget)`);
