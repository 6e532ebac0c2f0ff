import { describe, expect, it } from 'vitest';
import { computeArrayExplorer, createArrayExplorerCalculator } from '../../../calc/calculators/arrayExplorer';
import { teamConventions } from '../../../site/conventions';
import { explorerArray, inputsKey } from '../../../calc/explorer/explorerInputs';
import { buildArrayModel, directivity, principalPlaneMetrics, uniformLinearArrayDirectivity } from '../../../calc/array/index';
import { explorerDef, inputsFor } from './inputsFor';
import { safeCompute } from '../../../components/frame/calculatorModel';

function peakThetaDeg(cut: { thetaDeg: Float64Array; powerDb: Float64Array }, from = -90, to = 90): number {
  let best = -1;
  for (let i = 0; i < cut.thetaDeg.length; i++) {
    if (cut.thetaDeg[i] < from || cut.thetaDeg[i] > to) continue;
    if (best < 0 || cut.powerDb[i] > cut.powerDb[best]) best = i;
  }
  return cut.thetaDeg[best];
}

describe('explorerArray(inputs): inputs → ArraySpec', () => {
  it('spaces ring elements so neighbours are d apart (chord): R = d / (2 sin(π/N))', () => {
    const array = explorerArray(inputsFor({ geo: 'circular', nx: '48', d: '0.55 λ' }));
    expect(array.ringRadiusWavelengths).toBeCloseTo(0.55 / (2 * Math.sin(Math.PI / 48)), 12);
    const { x, y } = buildArrayModel(array.spec).positionsWavelengths;
    expect(Math.hypot(x[1] - x[0], y[1] - y[0])).toBeCloseTo(0.55, 12);
  });
  it('reads a spacing given in λ at the frequency, the pedestal in dB and an empty cut as the steering plane', () => {
    const array = explorerArray(inputsFor({ f: '28 GHz', d: '0.6 λ', tap: 'cosine', edge: '-20 dB', ph: '30 deg', cut: '' }));
    expect(array.spacingWavelengths).toBeCloseTo(0.6, 12);
    expect(array.spec.taper).toEqual({ kind: 'cosineOnPedestal', pedestal: 0.1, exponent: 2 });
    expect(array.cutPhiDeg).toBe(30);
  });
  it('treats 0 phase bits as continuous and keeps the ground plane in wavelengths', () => {
    const array = explorerArray(inputsFor({ bits: '0', gp: '0.25 λ', el: 'cosine', nexp: '3' }));
    expect(array.spec.phaseBits).toBeUndefined();
    expect(array.spec.element).toEqual({ kind: 'cosine', powerExponent: 3, groundPlaneHeightWavelengths: expect.closeTo(0.25, 12) });
  });
  it('rejects planar grids above 128 × 128 and lines or rings too short, naming the field', () => {
    expect(() => explorerArray(inputsFor({ geo: 'planar', nx: '200', ny: '100' }))).toThrow(/elements: .*128 × 128/);
    expect(() => explorerArray(inputsFor({ geo: 'linear', nx: '1' }))).toThrow(/at least 2/);
    expect(() => explorerArray(inputsFor({ geo: 'circular', nx: '2' }))).toThrow(/at least 3/);
  });
  it('keys equal inputs equally whatever their order', () => {
    expect(inputsKey({ a: 1, b: 'x' })).toBe(inputsKey({ b: 'x', a: 1 }));
    expect(inputsKey({ a: 1 })).not.toBe(inputsKey({ a: 2 }));
  });
});

describe('computeArrayExplorer(inputs, mode)', () => {
  it('steering moves the peak of the plotted cut to θ0 (linear and planar, within one cut sample)', () => {
    for (const [geo, th, ph] of [['linear', 40, 0], ['planar', 25, 30], ['planar', 50, 0]] as const) {
      const r = computeArrayExplorer(inputsFor({ geo, lat: 'rectangular', nx: '16', ny: '16', el: 'isotropic', th: `${th} deg`, ph: `${ph} deg` }), 'interactive');
      const step = r.data.cut!.thetaDeg[1] - r.data.cut!.thetaDeg[0];
      expect(Math.abs(peakThetaDeg(r.data.cut!) - th), `${geo} θ0=${th}`).toBeLessThanOrEqual(step / 2 + 1e-9);
    }
  });
  it('equals the engine on the same model: directivity, HPBW and sidelobe level', () => {
    const inputs = inputsFor({ geo: 'planar', lat: 'rectangular', nx: '12', ny: '10', tap: 'taylor', sll: '30 dB', nbar: '4', th: '20 deg', ph: '45 deg' });
    const r = computeArrayExplorer(inputs);
    const model = buildArrayModel(explorerArray(inputs).spec);
    const planes = principalPlaneMetrics(model);
    expect(r.values.directivityDbi).toBe(directivity(model).directivityDbi);
    expect(r.values.hpbwScanDeg).toBe(planes.theta.hpbwDeg);
    expect(r.values.hpbwCrossDeg).toBe(planes.phi.hpbwDeg);
    expect(r.values.sidelobeDb).toBe(Math.max(planes.theta.peakSidelobeDb!, planes.phi.peakSidelobeDb!));
  });
  it('a uniform λ/2 line has directivity N (Balanis, "Antenna Theory", 4th ed., §6.3 (section number from memory)), to 1e-9 dB', () => {
    const r = computeArrayExplorer(inputsFor({ geo: 'linear', nx: '16', d: '0.5 λ', el: 'isotropic', th: '30 deg' }));
    expect(r.values.directivityDbi!).toBeCloseTo(10 * Math.log10(uniformLinearArrayDirectivity(16, 0.5, 30)), 9);
    expect(r.values.directivityDbi!).toBeCloseTo(10 * Math.log10(16), 9);
    expect(r.values.hpbwCrossDeg).toBeNull(); // a line's beam is a cone: no orthogonal-plane width
  });
  it('computes directivity with the cosⁿθ element at once (exact pair sum), as the page loads', () => {
    const quick = computeArrayExplorer(inputsFor({ geo: 'planar', lat: 'rectangular', nx: '8', ny: '8', el: 'cosine', nexp: '2' }), 'interactive');
    expect(quick.data.pending).toEqual([]);
    expect(Number.isFinite(quick.values.directivityDbi)).toBe(true);
  });
  it('leaves directivity that needs quadrature (a dipole element) to the background in interactive mode, and computes it in complete mode', () => {
    const inputs = inputsFor({ geo: 'planar', lat: 'rectangular', nx: '8', ny: '8', el: 'dipoleX' });
    const quick = computeArrayExplorer(inputs, 'interactive');
    expect(quick.data.pending).toEqual(['directivity']);
    expect(quick.values.directivityDbi).toBeNull();
    expect(quick.warnings.map((w) => w.code)).toContain('computing-in-background');
    const full = computeArrayExplorer(inputs, 'complete');
    expect(full.data.pending).toEqual([]);
    expect(Number.isFinite(full.values.directivityDbi)).toBe(true);
    expect(full.values.hpbwScanDeg).toBe(quick.values.hpbwScanDeg);
  });
  it('defers the cut and beam metrics of a large non-separable array (64 × 64 triangular) but not of a 64 × 64 square grid', () => {
    const tri = computeArrayExplorer(inputsFor({ geo: 'planar', lat: 'triangular', nx: '64', ny: '64' }), 'interactive');
    expect(tri.data.pending).toContain('pattern');
    expect(tri.data.cut).toBeNull();
    expect(tri.values.hpbwScanDeg).toBeNull();
    const square = computeArrayExplorer(inputsFor({ geo: 'planar', lat: 'rectangular', nx: '64', ny: '64', el: 'isotropic' }), 'interactive');
    expect(square.data.pending).toEqual([]);
  });
  it('warns of a grating lobe past the spacing limit: 0.9 λ line steered to 35° (onset asin(1/0.9 − 1) = 6.38°, Mailloux §2.1 (section number from memory))', () => {
    const r = computeArrayExplorer(inputsFor({ geo: 'linear', nx: '12', d: '0.9 λ', th: '35 deg' }));
    expect(r.values.gratingLobeCount).toBe(1);
    expect(r.values.onsetDeg!).toBeCloseTo((Math.asin(1 / 0.9 - 1) * 180) / Math.PI, 9);
    expect(r.warnings.find((w) => w.code === 'grating-lobe-visible')?.severity).toBe('caution');
    // the grating lobe at sin θ = sin 35° − 1/0.9 is in the plotted cut, at full level
    const lobeDeg = (Math.asin(Math.sin((35 * Math.PI) / 180) - 1 / 0.9) * 180) / Math.PI;
    expect(Math.abs(peakThetaDeg(r.data.cut!, -90, 0) - lobeDeg)).toBeLessThan(0.3);
  });
  it('through the frame: the defaults and every worked example give finite values and no error', () => {
    for (const query of ['', ...explorerDef.examples.map((e) => e.query)]) {
      const params = Object.fromEntries(new URLSearchParams(query.replace(/^\?/, '')));
      delete params.v;
      const texts = Object.fromEntries(Object.entries(params).map(([k, v]) => [k, v.replace(/lambda$/, ' λ')]));
      const computed = safeCompute(explorerDef, inputsFor(texts));
      expect(computed.ok, query).toBe(true);
    }
  });
  it('uses the background lookup when it holds a result for exactly these inputs', () => {
    const inputs = inputsFor({ el: 'dipoleX' });
    const complete = computeArrayExplorer(inputs, 'complete');
    const defWith = createArrayExplorerCalculator(teamConventions, { background: (i) => (complete.data.key === inputsKey(i) ? complete : undefined) });
    expect(defWith.compute(inputs)).toBe(complete);
    expect(defWith.compute(inputsFor({ el: 'dipoleX', th: '10 deg' })).data.pending).toEqual(['directivity']);
  });
});

describe('computeArrayExplorer: directivity too costly to integrate', () => {
  it('a 64 × 64 triangular array of cosⁿθ elements over a ground plane skips the quadrature with a caution instead of computing for minutes', () => {
    const r = computeArrayExplorer(inputsFor({ geo: 'planar', lat: 'triangular', nx: '64', ny: '64', el: 'cosine', gp: '0.25 λ' }), 'interactive');
    expect(r.data.pending).not.toContain('directivity');
    expect(r.values.directivityDbi).toBeNull();
    expect(r.warnings.find((w) => w.code === 'directivity-too-costly')?.severity).toBe('caution');
  });
});

describe('the default element is the team element, and directivity is compared with 4πA/λ²', () => {
  const db = (x: number) => 10 * Math.log10(x);
  it('defaults to the cosine element with the team\'s power exponent (site/conventions.ts)', () => {
    const array = explorerArray(inputsFor({}));
    expect(array.spec.element).toEqual({ kind: 'cosine', powerExponent: teamConventions.elementPowerExponent });
  });
  // Lower bound, derived: the array factor is periodic on the reciprocal lattice, and by Parseval
  // its |AF|² integrates over one cell to N / (lattice cell in λ²) for unit weights. At 0.5 λ on the
  // triangular lattice the visible disk u² + v² ≤ 1 lies inside the central (hexagonal) cell, whose
  // inscribed radius is 1/(√3·0.5) = 1.155; with dΩ = du dv / cos θ and a power pattern cosⁿθ,
  // n ≥ 1, ∫|AF|² cosⁿθ dΩ ≤ N / cell, so D(0) ≥ 4π·N·cell/λ² = 4πA/λ². Upper bound: the edge-effect
  // allowance 10·log10(1 + 0.5 λ/L_min) used in tests/calc/array/properties.test.ts (common practice,
  // no source), L_min = 8 rows × 0.433 λ = 3.46 λ → 0.59 dB. Computed excess: +0.18 dB.
  it('the default (8 × 8 filled triangular planar at 0.5 λ, broadside, team element n = 1.3) lies between 4πA/λ² and 4πA/λ² + the edge allowance', () => {
    const inputs = inputsFor({});
    const r = computeArrayExplorer(inputs, 'interactive'); // exact pair sum: nothing left to the background
    expect(r.data.pending).toEqual([]);
    const aperture = db(4 * Math.PI * 64 * (Math.sqrt(3) / 2) * 0.25);
    expect(r.values.filledApertureDirectivityDbi!).toBeCloseTo(aperture, 12);
    const excess = r.values.directivityDbi! - aperture;
    expect(excess).toBeGreaterThan(0);
    expect(excess).toBeLessThan(10 * Math.log10(1 + 0.5 / (8 * 0.5 * Math.sqrt(3) / 2)));
    expect(r.warnings.map((w) => w.code)).not.toContain('isotropic-mirror-beam');
  });
  it('the same 8 × 8 on a square lattice at λ/2 (period 2 in u and v holds the disk): within [0, 0.1] dB of 4πA/λ² (computed +0.067 dB)', () => {
    const r = computeArrayExplorer(inputsFor({ lat: 'rectangular' }), 'complete');
    const excess = r.values.directivityDbi! - db(4 * Math.PI * 64 * 0.25);
    expect(excess).toBeGreaterThan(-1e-3);
    expect(excess).toBeLessThan(0.1);
  });
  // Derived: isotropic elements in the plane z = 0 radiate the same at θ and 180° − θ, so for the
  // same peak the sphere average doubles against a forward element: 10·log10 2 = 3.01 dB, ± the edge
  // effects of an 8 × 8 (computed 3.22 dB).
  it('isotropic elements with no ground plane: a note names the ≈ 3 dB mirror-beam gap, and the directivity is 2.5–3.5 dB below 4πA/λ²', () => {
    const r = computeArrayExplorer(inputsFor({ el: 'isotropic' }), 'interactive');
    const note = r.warnings.find((w) => w.code === 'isotropic-mirror-beam');
    expect(note?.message).toMatch(/3 dB below 4πA\/λ²/);
    expect(note?.outputs).toContain('directivityDbi');
    const gap = r.values.filledApertureDirectivityDbi! - r.values.directivityDbi!;
    expect(gap).toBeGreaterThan(2.5);
    expect(gap).toBeLessThan(3.5);
    const grounded = computeArrayExplorer(inputsFor({ el: 'isotropic', gp: '0.25 λ' }), 'complete');
    expect(grounded.warnings.map((w) => w.code)).not.toContain('isotropic-mirror-beam');
  });
  it('the filled-aperture reference follows the projected aperture cos θ₀ and the lattice cell, and is absent for lines, rings and thinned arrays', () => {
    const tri = computeArrayExplorer(inputsFor({ lat: 'triangular', d: '0.6 λ', th: '40 deg' }), 'interactive');
    expect(tri.values.filledApertureDirectivityDbi!).toBeCloseTo(db(4 * Math.PI * 64 * (Math.sqrt(3) / 2) * 0.36 * Math.cos((40 * Math.PI) / 180)), 12);
    for (const geo of ['linear', 'circular', 'thinned']) {
      expect(computeArrayExplorer(inputsFor({ geo, el: 'isotropic' }), 'interactive').values.filledApertureDirectivityDbi, geo).toBeNull();
    }
  });
  it('the exponent is read only for the cosine element (usedWhen el = cosine)', () => {
    const spec = explorerDef.params.find((p) => p.key === 'nexp')!;
    expect(spec.usedWhen).toEqual({ key: 'el', values: ['cosine'] });
    expect(spec.label).toBe('Element power pattern cosⁿθ, n');
    const a = computeArrayExplorer(inputsFor({ el: 'isotropic', nexp: '1.3' }), 'interactive');
    const b = computeArrayExplorer(inputsFor({ el: 'isotropic', nexp: '7' }), 'interactive');
    expect(b.values).toEqual(a.values);
  });
});
