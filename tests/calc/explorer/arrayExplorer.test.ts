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
  it('a uniform λ/2 line has directivity N (Balanis, "Antenna Theory", 4th ed., §6.3), to 1e-9 dB', () => {
    const r = computeArrayExplorer(inputsFor({ geo: 'linear', nx: '16', d: '0.5 λ', el: 'isotropic', th: '30 deg' }));
    expect(r.values.directivityDbi!).toBeCloseTo(10 * Math.log10(uniformLinearArrayDirectivity(16, 0.5, 30)), 9);
    expect(r.values.directivityDbi!).toBeCloseTo(10 * Math.log10(16), 9);
    expect(r.values.hpbwCrossDeg).toBeNull(); // a line's beam is a cone: no orthogonal-plane width
  });
  it('leaves directivity with a non-isotropic element to the background in interactive mode when the quadrature does not fit the budget (16 × 16), and computes it in complete mode', () => {
    const inputs = inputsFor({ geo: 'planar', lat: 'rectangular', nx: '16', ny: '16', el: 'cosine', nexp: '2' });
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
  it('warns of a grating lobe past the spacing limit: 0.9 λ line steered to 35° (onset asin(1/0.9 − 1) = 6.38°, Mailloux §2.1)', () => {
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
    const inputs = inputsFor({ el: 'cosine', nx: '16', ny: '16' });
    const complete = computeArrayExplorer(inputs, 'complete');
    const defWith = createArrayExplorerCalculator(teamConventions, { background: (i) => (complete.data.key === inputsKey(i) ? complete : undefined) });
    expect(defWith.compute(inputs)).toBe(complete);
    expect(defWith.compute(inputsFor({ el: 'cosine', nx: '16', ny: '16', th: '10 deg' })).data.pending).toEqual(['directivity']);
  });
});

describe('computeArrayExplorer: directivity too costly to integrate', () => {
  it('a 64 × 64 triangular array with a cosine element skips the quadrature with a caution instead of computing for minutes', () => {
    const r = computeArrayExplorer(inputsFor({ geo: 'planar', lat: 'triangular', nx: '64', ny: '64', el: 'cosine' }), 'interactive');
    expect(r.data.pending).not.toContain('directivity');
    expect(r.values.directivityDbi).toBeNull();
    expect(r.warnings.find((w) => w.code === 'directivity-too-costly')?.severity).toBe('caution');
  });
});
