import { describe, expect, it } from 'vitest';
import { computeArrayExplorer } from '../../../calc/calculators/arrayExplorer';
import { BEAM_OUTPUT_KEYS, ELEMENT_NULL_DEPTH_DB, elementNullWarning, peakOffSteeringWarning, withoutBeamFigures } from '../../../calc/explorer/beamValidity';
import { buildArrayModel, principalPlaneMetrics, type PlaneMetrics } from '../../../calc/array/index';
import { safeCompute } from '../../../components/frame/calculatorModel';
import { explorerDef, inputsFor } from './inputsFor';

const codes = (r: { warnings: Array<{ code: string }> }) => r.warnings.map((w) => w.code);

describe('elementNullWarning(element, beam): beam figures toward an element null', () => {
  it(`warns (outside-validity, every beam output) when the element is more than ${ELEMENT_NULL_DEPTH_DB} dB below its peak toward θ0, stating the threshold`, () => {
    const cos = { kind: 'cosine', powerExponent: 2 } as const;
    const at85 = elementNullWarning(cos, { thetaDeg: 85, phiDeg: 0 })!; // 20 log10 cos 85° = −21.2 dB
    expect(at85.severity).toBe('outside-validity');
    expect(at85.outputs).toEqual([...BEAM_OUTPUT_KEYS]);
    expect(at85.message).toContain('21.2 dB below');
    expect(at85.message).toContain('more than 20 dB');
    expect(elementNullWarning(cos, { thetaDeg: 90, phiDeg: 0 })!.message).toContain('at a null');
    expect(elementNullWarning(cos, { thetaDeg: 80, phiDeg: 0 })).toBeNull(); // −15.2 dB
    expect(elementNullWarning({ kind: 'halfWaveDipole', axis: 'x' }, { thetaDeg: 90, phiDeg: 0 })).not.toBeNull();
    expect(elementNullWarning({ kind: 'halfWaveDipole', axis: 'x' }, { thetaDeg: 90, phiDeg: 90 })).toBeNull();
    expect(elementNullWarning({ kind: 'isotropic' }, { thetaDeg: 90, phiDeg: 0 })).toBeNull();
  });
  it('withoutBeamFigures empties exactly the beam outputs', () => {
    const values = { directivityDbi: 10, hpbwScanDeg: 5, sidelobeDb: -13, peakOffsetDeg: 0.1, elementCount: 8, gratingLobeCount: 0 };
    expect(withoutBeamFigures(values, true)).toEqual({ directivityDbi: null, hpbwScanDeg: null, sidelobeDb: null, peakOffsetDeg: null, elementCount: 8, gratingLobeCount: 0 });
    expect(withoutBeamFigures(values, false)).toBe(values);
  });
});

describe('peakOffSteeringWarning(planes): the found peak far from θ0', () => {
  const plane = (peakOffsetDeg: number, hpbwDeg?: number): PlaneMetrics => ({ plane: 'theta', peakOffsetDeg, hpbwDeg });
  it('flags the beam figures (not the offset itself) when the peak is more than half the HPBW from θ0, and says so with the numbers', () => {
    const w = peakOffSteeringWarning([{ metrics: plane(-12, 20), name: 'scan plane' }])!;
    expect(w.severity).toBe('outside-validity');
    expect(w.outputs).toContain('directivityDbi');
    expect(w.outputs).toContain('hpbwScanDeg');
    expect(w.outputs).not.toContain('peakOffsetDeg');
    expect(w.message).toContain('12° from θ₀ in the scan plane (half its HPBW is 10°)');
    expect(peakOffSteeringWarning([{ metrics: plane(-9.9, 20), name: 'scan plane' }])).toBeNull();
    expect(peakOffSteeringWarning([{ metrics: plane(-30), name: 'scan plane' }])).toBeNull(); // no HPBW: the no-half-power note covers it
  });
});

describe('computeArrayExplorer: no beam figures where the array forms no beam', () => {
  it('a ring of cos θ elements steered to θ0 = 90° (into the element null) shows no directivity, beamwidth, sidelobe level or peak offset, with an outside-validity warning (before: −303 dBi, HPBW 21.6°, peak offset −27.6°, no warning)', () => {
    const r = computeArrayExplorer(inputsFor({ geo: 'circular', nx: '16', d: '0.5 λ', el: 'cosine', th: '90 deg', ph: '0 deg' }), 'complete');
    for (const key of BEAM_OUTPUT_KEYS) expect(r.values[key], key).toBeNull();
    const w = r.warnings.find((x) => x.code === 'beam-in-element-null')!;
    expect(w.severity).toBe('outside-validity');
    expect(w.outputs).toEqual(expect.arrayContaining(['directivityDbi', 'hpbwScanDeg', 'peakOffsetDeg']));
    expect(r.values.elementCount).toBe(16); // the rest still shows
    const framed = safeCompute(explorerDef, inputsFor({ geo: 'circular', nx: '16', el: 'cosine', th: '90 deg' }));
    expect(framed.ok).toBe(true);
  });
  it('a line of x-directed dipoles steered along its own axis (θ0 = 90°, φ0 = 0°) likewise', () => {
    const r = computeArrayExplorer(inputsFor({ geo: 'linear', nx: '8', d: '0.5 λ', el: 'dipoleX', th: '90 deg', ph: '0 deg' }), 'complete');
    expect(r.values.directivityDbi).toBeNull();
    expect(codes(r)).toContain('beam-in-element-null');
  });
  it('a 4-element λ/2 line of x-dipoles steered to 70° keeps its figures but flags them: its peak is about 19.6° from θ0, beyond half its 28.7° HPBW (computed here by the engine)', () => {
    const inputs = inputsFor({ geo: 'linear', nx: '4', d: '0.5 λ', el: 'dipoleX', th: '70 deg', ph: '0 deg' });
    const r = computeArrayExplorer(inputs, 'complete');
    const w = r.warnings.find((x) => x.code === 'beam-peak-off-steering')!;
    expect(w.severity).toBe('outside-validity');
    expect(Math.abs(r.values.peakOffsetDeg!)).toBeGreaterThan(r.values.hpbwScanDeg! / 2);
    expect(Number.isFinite(r.values.directivityDbi)).toBe(true);
    expect(w.outputs).toContain('directivityDbi');
  });
  it('an 8-element λ/2 line of x-dipoles steered to 60° is not flagged: its peak moves about 5.6°, less than half its 19.2° HPBW', () => {
    const r = computeArrayExplorer(inputsFor({ geo: 'linear', nx: '8', d: '0.5 λ', el: 'dipoleX', th: '60 deg', ph: '0 deg' }), 'complete');
    expect(Math.abs(r.values.peakOffsetDeg!)).toBeGreaterThan(1);
    expect(codes(r)).not.toContain('beam-peak-off-steering');
    expect(codes(r)).not.toContain('beam-in-element-null');
  });
  it('isotropic elements never trigger either check, even steered to the horizon', () => {
    const r = computeArrayExplorer(inputsFor({ geo: 'circular', nx: '24', d: '0.5 λ', el: 'isotropic', th: '90 deg' }), 'complete');
    expect(codes(r)).not.toContain('beam-in-element-null');
    expect(Number.isFinite(r.values.directivityDbi)).toBe(true);
  });
});

describe('computeArrayExplorer: grating lobes reported apart from sidelobes', () => {
  const power = (n: number, d: number, du: number) => (Math.sin(n * Math.PI * d * du) / (n * Math.sin(Math.PI * d * du))) ** 2;
  it('an 8-element 1 λ line at broadside: 2 grating lobes on the horizon at 0 dB as "Highest grating lobe level", the peak sidelobe the −12.80 dB first sidelobe, and the caution names the level (before: sidelobe −12.8 dB, no grating-lobe level)', () => {
    const r = computeArrayExplorer(inputsFor({ geo: 'linear', nx: '8', d: '1 λ', th: '0 deg', el: 'isotropic' }), 'complete');
    expect(r.values.gratingLobeCount).toBe(2);
    expect(r.values.gratingLobeDb!).toBeCloseTo(0, 9); // array factor periodic in u (Mailloux, "Phased Array Antenna Handbook", 2nd ed., §2.1 (section number from memory))
    expect(r.values.sidelobeDb!).toBeCloseTo(-12.797, 3); // uniform 8-element first sidelobe (Balanis, "Antenna Theory", 4th ed., §6.3 (section number from memory))
    const w = r.warnings.find((x) => x.code === 'grating-lobe-visible')!;
    expect(w.outputs).toContain('gratingLobeDb');
    expect(w.message).toContain('the highest at 0.0 dB');
  });
  it('a lobe centred just outside visible space (8 × 0.98 λ) gets its own caution with the level at the horizon, |AF(u = 1)|² = −0.36 dB (Balanis §6.3 (section number from memory) formula), to 1e-9 dB', () => {
    const r = computeArrayExplorer(inputsFor({ geo: 'linear', nx: '8', d: '0.98 λ', th: '0 deg', el: 'isotropic' }), 'complete');
    expect(r.values.gratingLobeCount).toBe(0);
    expect(r.values.gratingLobeDb!).toBeCloseTo(10 * Math.log10(power(8, 0.98, 1)), 9);
    const w = r.warnings.find((x) => x.code === 'grating-lobe-at-horizon')!;
    expect(w.message).toContain('−0.4 dB');
    expect(w.severity).toBe('caution'); // above the −12.8 dB sidelobes
  });
  it('an 8-element λ/2 line steered to 50°: the edge of the lobe centred at u = sin 50° − 2 reaches the horizon at |AF(u = −1)|² ≈ −23 dB, below the sidelobes, so only a note (Balanis §6.3 (section number from memory) formula, to 1e-9 dB)', () => {
    const r = computeArrayExplorer(inputsFor({ geo: 'linear', nx: '8', d: '0.5 λ', th: '50 deg', ph: '0 deg', el: 'isotropic' }), 'complete');
    const du = -1 - Math.sin((50 * Math.PI) / 180);
    expect(r.values.gratingLobeCount).toBe(0);
    expect(r.values.gratingLobeDb!).toBeCloseTo(10 * Math.log10(power(8, 0.5, du)), 9);
    expect(r.values.gratingLobeDb!).toBeLessThan(r.values.sidelobeDb!);
    expect(r.warnings.find((x) => x.code === 'grating-lobe-at-horizon')?.severity).toBe('note');
  });
  it('a 4 × 4 square lattice at 1 λ: four lobes at 0 dB; at λ/2 none and no level (null)', () => {
    const wide = computeArrayExplorer(inputsFor({ geo: 'planar', lat: 'rectangular', out: 'rectangle', nx: '4', ny: '4', d: '1 λ', el: 'isotropic', th: '0 deg' }), 'complete');
    expect(wide.values.gratingLobeCount).toBe(4);
    expect(wide.values.gratingLobeDb!).toBeCloseTo(0, 9);
    const tight = computeArrayExplorer(inputsFor({ geo: 'planar', lat: 'rectangular', out: 'rectangle', nx: '4', ny: '4', d: '0.5 λ', el: 'isotropic', th: '0 deg' }), 'complete');
    expect(tight.values.gratingLobeDb).toBeNull();
  });
  it('rings and Y arrays (no lattice) have no grating-lobe level', () => {
    const r = computeArrayExplorer(inputsFor({ geo: 'circular', nx: '16', d: '1 λ', el: 'isotropic' }), 'complete');
    expect(r.values.gratingLobeDb).toBeNull();
  });
});

describe('computeArrayExplorer: Taylor n̄ too small', () => {
  it('n̄ = 2 for 30 dB on a 64-element line: a caution on the sidelobe level with the reached level and the rule (the line reaches −25.7 dB; before: no warning)', () => {
    const r = computeArrayExplorer(inputsFor({ geo: 'linear', nx: '64', d: '0.5 λ', tap: 'taylor', sll: '30 dB', nbar: '2', el: 'isotropic' }), 'complete');
    expect(r.values.sidelobeDb!).toBeCloseTo(-25.7, 0);
    const w = r.warnings.find((x) => x.code === 'taylor-nbar-too-small')!;
    expect(w.outputs).toEqual(['sidelobeDb']);
    expect(w.message).toMatch(/n̄ = 2 is too small for 30 dB.*−25\.7 dB.*n̄ ≥ 4/);
  });
  it('n̄ = 5 for 30 dB, or another taper, gives no such caution', () => {
    expect(codes(computeArrayExplorer(inputsFor({ geo: 'linear', nx: '64', d: '0.5 λ', tap: 'taylor', sll: '30 dB', nbar: '5', el: 'isotropic' }), 'complete'))).not.toContain('taylor-nbar-too-small');
    expect(codes(computeArrayExplorer(inputsFor({ geo: 'linear', nx: '64', d: '0.5 λ', tap: 'chebyshev', sll: '30 dB', nbar: '1', el: 'isotropic' }), 'complete'))).not.toContain('taylor-nbar-too-small');
  });
});

describe('computeArrayExplorer: clean peak offset', () => {
  it('is exactly 0 at broadside for symmetric arrays (before: 1.54e-7° for the 8 × 8 triangular planar array)', () => {
    const cases: Array<Record<string, string>> = [{ geo: 'planar', lat: 'triangular', out: 'rectangle', nx: '8', ny: '8' }, { geo: 'planar', lat: 'rectangular', out: 'rectangle', nx: '16', ny: '12' }, { geo: 'linear', nx: '16' }];
    for (const texts of cases) {
      const r = computeArrayExplorer(inputsFor({ ...texts, el: 'isotropic', th: '0 deg', d: '0.5 λ' }), 'complete');
      expect(r.values.peakOffsetDeg, JSON.stringify(texts)).toBe(0);
    }
  });
  it('matches the engine on the same model when steered (principalPlaneMetrics)', () => {
    const inputs = inputsFor({ geo: 'planar', lat: 'rectangular', out: 'rectangle', nx: '10', ny: '10', d: '0.5 λ', el: 'isotropic', th: '30 deg', ph: '10 deg' });
    const r = computeArrayExplorer(inputs, 'complete');
    expect(Math.abs(r.values.peakOffsetDeg!)).toBeLessThan(1e-9);
    expect(principalPlaneMetrics(buildArrayModel({ geometry: { kind: 'planar', lattice: 'rectangular', columns: 10, rows: 10, spacingXWavelengths: 0.5 }, steering: { thetaDeg: 30, phiDeg: 10 } })).theta.peakOffsetDeg).toBe(r.values.peakOffsetDeg);
  });
});

describe('explorer outputs: numerical noise below an output\'s resolution shows as 0', () => {
  it('the peak offset has a stated resolution, and an offset of 1.54e-7° (the old broadside figure) is shown as 0', async () => {
    const { formatOutput } = await import('../../../components/frame/format');
    const spec = explorerDef.outputs.find((o) => o.key === 'peakOffsetDeg')!;
    expect(spec.resolution).toBe(1e-4);
    expect(formatOutput(spec, 1.54e-7).text).toBe('0');
    expect(formatOutput(spec, 0.25).text).toBe('0.25');
  });
});
