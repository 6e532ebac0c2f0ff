import { describe, expect, it } from 'vitest';
import { buildArrayModel, figuresOfMerit, uniformLinearArrayDirectivity } from '../../../calc/array/index';

describe('figuresOfMerit(model)', () => {
  it('collects directivity (closed form, to 1e-9 dB), beamwidths and a grating-lobe warning at 0.9 λ scanned 40° (d/λ > 1/(1 + sin θ0), Mailloux §2.1 (section number from memory))', () => {
    const model = buildArrayModel({ geometry: { kind: 'linear', count: 20, spacingWavelengths: 0.9 }, steering: { thetaDeg: 40, phiDeg: 0 } });
    const f = figuresOfMerit(model);
    expect(Math.abs(f.directivity.directivityDbi - 10 * Math.log10(uniformLinearArrayDirectivity(20, 0.9, 40)))).toBeLessThan(1e-9);
    expect(f.theta.hpbwDeg).toBeGreaterThan(0);
    expect(f.gratingLobes.length).toBe(1);
    expect(f.warnings.map((w) => w.code)).toContain('grating-lobe-visible');
    expect(f.taperEfficiency).toBeCloseTo(1, 14);
  });
  it('no grating-lobe warning at λ/2', () => {
    const f = figuresOfMerit(buildArrayModel({ geometry: { kind: 'planar', lattice: 'rectangular', columns: 8, rows: 8, spacingXWavelengths: 0.5 }, steering: { thetaDeg: 60, phiDeg: 30 } }));
    expect(f.warnings.map((w) => w.code)).not.toContain('grating-lobe-visible');
  });
});
