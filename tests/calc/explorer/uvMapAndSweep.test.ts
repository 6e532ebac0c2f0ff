import { describe, expect, it } from 'vitest';
import { explorerUvMap, explorerUvPlan, uvLevelAt, uvMapOfModel, UV_FLOOR_DB } from '../../../calc/explorer/uvMap';
import { explorerScanSweep, sweepAngles } from '../../../calc/explorer/scanSweep';
import { buildArrayModel, canUseFftGrid } from '../../../calc/array/index';
import { explorerArray } from '../../../calc/explorer/explorerInputs';
import { runExplorerJob } from '../../../components/calculators/explorer/explorerJobs';
import { inputsFor } from './inputsFor';

describe('explorerUvMap(inputs, count)', () => {
  it('peaks at 0 dB at the steering direction (u0, v0), floors invisible space, and has no NaN', () => {
    const map = explorerUvMap(inputsFor({ geo: 'planar', lat: 'rectangular', nx: '16', ny: '16', th: '30 deg', ph: '60 deg' }), 128);
    expect(map.beam.u).toBeCloseTo(Math.sin(Math.PI / 6) * Math.cos(Math.PI / 3), 12);
    expect(map.beam.v).toBeCloseTo(Math.sin(Math.PI / 6) * Math.sin(Math.PI / 3), 12);
    expect(uvLevelAt(map, map.beam.u, map.beam.v)).toBeGreaterThan(-0.5);
    expect(Math.max(...map.powerDb)).toBe(0);
    expect(map.powerDb.every((x) => Number.isFinite(x) && x >= UV_FLOOR_DB)).toBe(true);
    expect(uvLevelAt(map, 0.95, 0.95)).toBe(UV_FLOOR_DB);
  });
  it('the FFT grid and row-band direct evaluation give the same map within 1e-6 dB above −50 dB', () => {
    const model = buildArrayModel(explorerArray(inputsFor({ geo: 'planar', lat: 'rectangular', nx: '10', ny: '6', th: '20 deg', ph: '10 deg', tap: 'taylor' })).spec);
    expect(canUseFftGrid(model, 64, 2 / 64, 2 / 64)).toBe(true);
    const fft = uvMapOfModel(model, 64);
    const direct = uvMapOfModel({ ...model, lattice: undefined, separable: undefined }, 64);
    expect(fft.path).toBe('fft');
    expect(direct.path).toBe('direct bands');
    for (let k = 0; k < fft.powerDb.length; k++) {
      if (fft.powerDb[k] > -50) expect(Math.abs(fft.powerDb[k] - direct.powerDb[k])).toBeLessThan(1e-6);
    }
  });
  it('marks the grating lobe of a 0.95 λ square lattice steered to 20° at u0 − λ/d, v = 0, near 0 dB on the map', () => {
    const map = explorerUvMap(inputsFor({ geo: 'planar', lat: 'rectangular', nx: '12', ny: '12', d: '0.95 λ', th: '20 deg', ph: '0 deg' }), 128);
    // û0 + (±λ/d, 0): only u0 − 1/0.95 = −0.710 fits in visible space with v = 0 (Mailloux §2.1 (section number from memory))
    const lobes = map.gratingLobes;
    expect(lobes.length).toBeGreaterThanOrEqual(1);
    const main = lobes.find((g) => Math.abs(g.v) < 1e-12)!;
    expect(main.u).toBeCloseTo(Math.sin(Math.PI / 9) - 1 / 0.95, 12);
    expect(main.levelDb).toBeGreaterThan(-3);
  });
  it('plans the main thread for cheap maps and a worker for large non-separable arrays', () => {
    expect(explorerUvPlan(inputsFor({ geo: 'planar', lat: 'rectangular', nx: '64', ny: '64' })).where).toBe('main');
    expect(explorerUvPlan(inputsFor({ geo: 'planar', lat: 'triangular', nx: '64', ny: '64' })).where).toBe('worker');
  });
  it('reports progress up to 1 when evaluating in bands', () => {
    const fractions: number[] = [];
    explorerUvMap(inputsFor({ geo: 'circular', nx: '24' }), 48, (f) => fractions.push(f));
    expect(fractions.at(-1)).toBe(1);
    expect(fractions.every((f, i) => i === 0 || f >= fractions[i - 1])).toBe(true);
  });
});

describe('explorerScanSweep(inputs)', () => {
  it('a 32-element λ/2 line widens roughly as 1/cos θ0 and most towards end-fire (Mailloux, "Phased Array Antenna Handbook", 2nd ed., ch. 1 (chapter number from memory))', () => {
    const sweep = explorerScanSweep(inputsFor({ geo: 'linear', nx: '32', d: '0.5 λ' }));
    expect(sweep.swept).toBe('theta');
    const at = (deg: number) => sweep.points.find((p) => p.angleDeg === deg)!.hpbwScanDeg!;
    expect(at(60) / at(0)).toBeGreaterThan(1.8);
    expect(Math.abs(at(30) / (at(0) / Math.cos(Math.PI / 6)) - 1)).toBeLessThan(0.03);
    expect(at(90)).toBeGreaterThan(3 * at(0));
  });
  it('a ring keeps its beamwidth within 2 % over azimuth (ring symmetry; common practice, no source)', () => {
    const sweep = explorerScanSweep(inputsFor({ geo: 'circular', nx: '36', d: '0.5 λ', th: '30 deg' }));
    expect(sweep.swept).toBe('phi');
    const widths = sweep.points.map((p) => p.hpbwScanDeg!);
    for (const w of widths) expect(Math.abs(w / widths[0] - 1)).toBeLessThan(0.02);
  });
  it('sweeps φ0 for rings and Y arms, θ0 for lines and lattices, and reports progress', () => {
    expect(sweepAngles(inputsFor({ geo: 'yArms' })).swept).toBe('phi');
    expect(sweepAngles(inputsFor({ geo: 'thinned' })).anglesDeg.at(-1)).toBe(85);
    const fractions: number[] = [];
    const result = runExplorerJob({ kind: 'sweep', inputs: inputsFor({ geo: 'yArms', nx: '4', th: '20 deg' }) }, (f) => fractions.push(f));
    expect(result.kind).toBe('sweep');
    expect(fractions.at(-1)).toBe(1);
  });
});
