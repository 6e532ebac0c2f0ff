/**
 * Prints the numbers quoted in the onboarding guide (site/pages/guide/), computed with calc/, so a
 * writer can re-run it after a calc/ change and update the prose. Usage: npx tsx scripts/guideNumbers.ts
 */
import { calculatorFactories } from '../calc/calculators/index';
import { teamConventions } from '../site/conventions';
import { decodeState } from '../components/frame/urlState';
import { validateAll } from '../components/frame/calculatorModel';
import {
  buildArrayModel,
  figuresOfMerit,
  groundPlaneImageFactor,
  hansenWoodyardPhaseStepRad,
  ordinaryEndFirePhaseStepRad,
  phaseQuantizationEffect,
  uniformLinearArrayDirectivity,
  type ArraySpec,
} from '../calc/array/index';
import { freeSpaceWavelengthM } from '../calc/wavelength';

const dB = (x: number) => (10 * Math.log10(x)).toFixed(2);
const show = (title: string, spec: ArraySpec) => {
  const m = figuresOfMerit(buildArrayModel(spec));
  const f = (x?: number) => (x === undefined ? '—' : x.toFixed(2));
  console.log(`${title}: D = ${m.directivity.directivityDbi.toFixed(2)} dBi; θ-plane HPBW ${f(m.theta.hpbwDeg)}°, FNBW ${f(m.theta.fnbwDeg)}°, SLL ${f(m.theta.peakSidelobeDb)} dB; φ-plane HPBW ${f(m.phi.hpbwDeg)}°, SLL ${f(m.phi.peakSidelobeDb)} dB; grating lobes ${m.gratingLobes.length}`);
};

function calculator(id: string, query: string) {
  const def = calculatorFactories[id](teamConventions);
  const { texts, notices } = decodeState(def, query);
  if (notices.length) throw new Error(`${id}: ${notices.join('; ')}`);
  const { inputs } = validateAll(def, texts);
  const result = def.compute(inputs!);
  console.log(`\n${id} ${query}`);
  for (const o of def.outputs) console.log(`  ${o.key} = ${result.values[o.key]}`);
  for (const w of result.warnings) console.log(`  warning ${w.code}: ${w.message}`);
}

console.log('## Reflectors');
calculator('front-fed-reflector', '?v=1&f=8.2GHz&solve=gain&d=3.7m&fd=0.38&feed=taper&et=-11dB&rms=0.6mm&blk=28cm&strut=0.025&loss=0.4dB&offby=length&off=0cm&n=1');

calculator('scan-loss', '?v=1&f=10GHz&d=0.6lambda&lat=triangular&by=width&w=0.4m&scan=60deg&el=cosine&nexp=1.3&eta=0.8');

calculator('end-fire-length', '?v=1&f=433MHz&type=ordinary&solve=gain&len=2.75lambda&d=0.25lambda');
calculator('end-fire-length', '?v=1&f=433MHz&type=hansenWoodyard&solve=gain&len=2.75lambda&d=0.25lambda');
calculator('backplane-spacing', '?v=1&f=5.8GHz&flo=4.9GHz&fhi=6.7GHz&er=1&scan=30deg&el=halfWave&h=12.9mm');
calculator('array-explorer', '?v=2&geo=yArms&nx=8&d=0.7lambda&f=1.42GHz&tap=uniform&el=isotropic&th=0deg&ph=0deg');
calculator('array-explorer', '?v=2&geo=thinned&lat=rectangular&out=rectangle&nx=24&ny=24&d=0.5lambda&f=10GHz&fill=0.25&seed=7&tap=uniform&el=cosine&nexp=2&th=0deg&ph=0deg');
calculator('architecture-sizing', '?v=1&f=9GHz&fhi=10GHz&req=gain&g=32dBi&saz=50deg&sel=0deg&uaz=no&maxsize=1.3m&eta=0.6&etar=0.8&nexp=1.3&margin=0.05&lat=triangular&ge=6dBi');

console.log('\n## End-fire (12 elements, 0.25 λ)');
for (const [name, step] of [['ordinary', ordinaryEndFirePhaseStepRad(0.25)], ['Hansen–Woodyard', hansenWoodyardPhaseStepRad(12, 0.25)]] as const) {
  show(`${name} end-fire, step ${((step * 180) / Math.PI).toFixed(1)}°`, { geometry: { kind: 'linear', count: 12, spacingWavelengths: 0.25 }, phaseStepRad: step, beam: { thetaDeg: 90, phiDeg: 0 } });
}

console.log('\n## Broadside line, 16 elements');
for (const d of [0.5, 0.7, 0.9, 1.0]) console.log(`  uniform, d = ${d} λ: D = ${dB(uniformLinearArrayDirectivity(16, d, 0))} dBi`);
show('16 × 0.5 λ uniform', { geometry: { kind: 'linear', count: 16, spacingWavelengths: 0.5 } });
show('16 × 0.5 λ Taylor 30 dB n̄ 5', { geometry: { kind: 'linear', count: 16, spacingWavelengths: 0.5 }, taper: { kind: 'taylor', nbar: 5, sidelobeDb: 30 } });
show('16 × 0.5 λ Chebyshev 30 dB', { geometry: { kind: 'linear', count: 16, spacingWavelengths: 0.5 }, taper: { kind: 'chebyshev', sidelobeDb: 30 } });

console.log('\n## Ground plane (horizontal element: broadside power factor |2 sin(2πh/λ)|²)');
for (const h of [0.1, 0.15, 0.2, 0.25, 0.3, 0.4, 0.5]) console.log(`  h = ${h} λ: ${dB(groundPlaneImageFactor(h, 1, 'horizontal') ** 2)} dB`);
show('8 × 0.5 λ dipoles (y) in free space', { geometry: { kind: 'linear', count: 8, spacingWavelengths: 0.5 }, element: { kind: 'halfWaveDipole', axis: 'y' } });
show('8 × 0.5 λ dipoles (y) 0.25 λ over ground', { geometry: { kind: 'linear', count: 8, spacingWavelengths: 0.5 }, element: { kind: 'halfWaveDipole', axis: 'y', groundPlaneHeightWavelengths: 0.25 } });

console.log('\n## Steering, 32 × 0.5 λ line');
for (const s of [0, 30, 45, 60]) show(`scan ${s}°`, { geometry: { kind: 'linear', count: 32, spacingWavelengths: 0.5 }, steering: { thetaDeg: s, phiDeg: 0 } });
for (const b of [3, 4, 5]) {
  const q = phaseQuantizationEffect({ geometry: { kind: 'linear', count: 32, spacingWavelengths: 0.5 }, steering: { thetaDeg: 20, phiDeg: 0 } }, b);
  console.log(`  ${b} bits at 20°: step ${q.phaseStepDeg}°, pointing error ${q.pointingErrorDeg.toFixed(3)}°, SLL ${q.peakSidelobeDb?.toFixed(2)} → ${q.quantizedPeakSidelobeDb?.toFixed(2)} dB`);
}
console.log(`  scan loss cos^${teamConventions.elementPowerExponent}(60°) = ${dB(Math.cos(Math.PI / 3) ** teamConventions.elementPowerExponent)} dB`);

console.log('\n## Circular and Y');
show('circular 24 elements, radius 2 λ', { geometry: { kind: 'circular', count: 24, radiusWavelengths: 2 } });
show('circular 24 elements, radius 2 λ, steered θ 30°', { geometry: { kind: 'circular', count: 24, radiusWavelengths: 2 }, steering: { thetaDeg: 30, phiDeg: 0 } });
show('Y 3 × 8 arms, 0.7 λ', { geometry: { kind: 'yShaped', elementsPerArm: 8, spacingWavelengths: 0.7, includeCentre: true } });

console.log('\n## Planar: harbour panel 1.2 m × 0.4 m at 10 GHz');
const lambda = freeSpaceWavelengthM(10e9);
console.log(`  4πA/λ² = ${dB((4 * Math.PI * 1.2 * 0.4) / lambda ** 2)} dBi`);
calculator('wavelength-spacing', '?v=1&f=9GHz&fhi=10GHz&er=1&scan=50deg&lat=triangular&d=16mm&w=1.2m&h=0.4m&shape=rectangle');
show('planar 16 × 16 square 0.5 λ isotropic', { geometry: { kind: 'planar', lattice: 'rectangular', columns: 16, rows: 16, spacingXWavelengths: 0.5 } });
show('planar 16 × 16 square 0.5 λ cos²θ power-pattern element', { geometry: { kind: 'planar', lattice: 'rectangular', columns: 16, rows: 16, spacingXWavelengths: 0.5 }, element: { kind: 'cosine', powerExponent: 2 } });
console.log(`  4π(8 λ)²/λ² = ${dB(4 * Math.PI * 64)} dBi`);

console.log('\n## Sparse');
show('random 64 in 20 λ × 20 λ', { geometry: { kind: 'random', count: 64, extentXWavelengths: 20, extentYWavelengths: 20, minSeparationWavelengths: 1, seed: 7 }, element: { kind: 'cosine', powerExponent: 2 } });
show('filled 40 × 40 at 0.5 λ (same 20 λ aperture)', { geometry: { kind: 'planar', lattice: 'rectangular', columns: 40, rows: 40, spacingXWavelengths: 0.5 }, element: { kind: 'cosine', powerExponent: 2 } });
show('volumetric 4 × 4 × 4 at 0.5 λ', { geometry: { kind: 'volumetric', countX: 4, countY: 4, countZ: 4, spacingWavelengths: 0.5 } });
show('planar 8 × 8 square 0.5 λ isotropic (same count as the cube)', { geometry: { kind: 'planar', lattice: 'rectangular', columns: 8, rows: 8, spacingXWavelengths: 0.5 } });
console.log('\n## Distributed: one-way random phase error e^{-(2πε/λ)²}');
for (const f of [20, 10, 4]) console.log(`  ε = λ/${f}: ${dB(Math.exp(-(((2 * Math.PI) / f) ** 2)))} dB`);
