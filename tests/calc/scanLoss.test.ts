import { describe, expect, it } from 'vitest';
import { apertureGainFromArea } from '../../calc/aperture/index';
import fc from 'fast-check';
import {
  beamBroadeningFactor,
  cosineElementExtraLossDb,
  currentSheetMismatchLossDb,
  currentSheetReflectionMagnitude,
  projectedApertureLossDb,
  scanLossPartsDb,
  uniformLineHpbwDeg,
} from '../../calc/scanLoss';
import { buildArrayModel, principalPlaneMetrics } from '../../calc/array/index';
import { computeScanLoss } from '../../calc/calculators/scanLoss';
import { defaultTexts, validateAll } from '../../components/frame/calculatorModel';
import { createScanLossCalculator } from '../../calc/calculators/scanLoss';
import { decodeState } from '../../components/frame/urlState';
import { teamConventions } from '../../site/conventions';

describe('scan-loss parts', () => {
  it('projected aperture: −3.01 dB at 60° (cos 60° = ½; Mailloux §2.1 (section number from memory))', () => {
    expect(projectedApertureLossDb(60)).toBeCloseTo(-3.0103, 4);
    expect(projectedApertureLossDb(0)).toBe(0);
  });
  it('cosⁿ element: n = 1 adds nothing beyond cos θ; n = 1.5 at 45° adds 0.5·10·log10(cos 45°) = −0.753 dB', () => {
    expect(cosineElementExtraLossDb(45, 1)).toBeCloseTo(0, 14);
    expect(cosineElementExtraLossDb(45, 1.5)).toBeCloseTo(-0.75257, 5);
  });
  it('ideal current sheet: |Γ| = tan²(θ/2), 1/3 at 60° and 0.1716 at 45° (Wheeler, IEEE Trans. AP-13, 1965)', () => {
    expect(currentSheetReflectionMagnitude(60)).toBeCloseTo(1 / 3, 12);
    expect(currentSheetReflectionMagnitude(45)).toBeCloseTo(3 - 2 * Math.SQRT2, 12);
    expect(currentSheetMismatchLossDb(60)).toBeCloseTo(10 * Math.log10(8 / 9), 12);
  });
  it('total loss never rises with scan, and every part is finite (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 84, noNaN: true }), fc.double({ min: 0.1, max: 5, noNaN: true }), fc.constantFrom('cosine' as const, 'currentSheet' as const), fc.double({ min: 1, max: 4, noNaN: true }), (s, ds, model, n) => {
        const a = scanLossPartsDb(s, model, n);
        const b = scanLossPartsDb(s + ds, model, n);
        for (const v of Object.values(a)) expect(Number.isFinite(v)).toBe(true);
        expect(b.totalDb).toBeLessThanOrEqual(a.totalDb + 1e-12);
      }),
    );
  });
  it('broadening factor 1/cos θ: 2 at 60°', () => {
    expect(beamBroadeningFactor(60)).toBeCloseTo(2, 12);
  });
  it('aperture directivity 4πA/λ²: 1 m² at λ = 0.1 m is 1256.6 (31.0 dBi)', () => {
    expect(apertureGainFromArea(1, 0.1)).toBeCloseTo(400 * Math.PI, 9);
  });
  it('rejects scan angles at or beyond the horizon', () => {
    expect(() => projectedApertureLossDb(90)).toThrow(/scanDeg/);
  });
});

describe('uniformLineHpbwDeg (root-finding on the closed-form array factor)', () => {
  it('agrees with the array engine’s principalPlaneMetrics for several N, spacings and scans (independent implementation)', () => {
    for (const [n, d, s] of [[16, 0.5, 0], [16, 0.5, 30], [40, 0.7, 45], [9, 0.4, 60], [100, 0.5, 20]] as const) {
      const engine = principalPlaneMetrics(buildArrayModel({ geometry: { kind: 'linear', count: n, spacingWavelengths: d }, steering: { thetaDeg: s, phiDeg: 0 } })).theta.hpbwDeg!;
      expect(uniformLineHpbwDeg(n, d, s)).toBeCloseTo(engine, 6);
    }
  });
  it('approaches 0.886 λ/L rad for a long broadside line (uniform line source; Balanis 4th ed. §6.3 (section number from memory) / Table 6.2 (table number from memory))', () => {
    const n = 400;
    const hpbwRad = (uniformLineHpbwDeg(n, 0.5, 0)! * Math.PI) / 180;
    expect(hpbwRad * n * 0.5).toBeCloseTo(0.8859, 3);
  });
  it('broadens close to 1/cos θ0 for a long line away from end-fire (Mailloux §1.1 (section number from memory))', () => {
    const h0 = uniformLineHpbwDeg(200, 0.5, 0)!;
    for (const s of [20, 40, 60]) expect(uniformLineHpbwDeg(200, 0.5, s)! / h0).toBeCloseTo(1 / Math.cos((s * Math.PI) / 180), 2);
  });
  it('is null when the beam never falls to half power on one side (a short line near end-fire)', () => {
    expect(uniformLineHpbwDeg(3, 0.25, 85)).toBeNull();
  });
});

describe('scan-loss calculator', () => {
  const def = createScanLossCalculator(teamConventions);
  const inputs = (over: Record<string, string> = {}) => validateAll(def, { ...defaultTexts(def), ...over }).inputs!;
  it('gain at the edge = broadside gain + total loss; target growth closes the gap exactly', () => {
    const r = computeScanLoss(inputs({ gt: '36 dB', w: '0.5 m' })).values;
    expect(r.gainEdgeDbi).toBeCloseTo(r.gainBroadsideDbi! + r.totalScanLossDb!, 12);
    expect(r.gainEdgeDbi! + 10 * Math.log10(r.areaGrowth!)).toBeCloseTo(36, 9);
  });
  it('warns when a grating lobe enters inside the scan range', () => {
    const r = computeScanLoss(inputs({ d: '0.8 λ', lat: 'rectangular', scan: '45 deg' }));
    expect(r.warnings.map((w) => w.code)).toContain('grating-lobe-in-scan');
  });
  // Bound: the embedded element gain of a large array is at most 4π·(cell area)·cos θ/λ² (P. W. Hannan,
  // "The element-gain paradox for a phased-array antenna", IEEE Trans. Antennas Propag. AP-12, 1964),
  // so the realized gain scanned to θ0 is at most 4πA·cos θ0/λ² and the power exponent needs n ≥ 1.
  it('n below 1 gives an outside-validity warning naming the bound n ≥ 1 and the positive element "loss"; n ≥ 1 gives none', () => {
    const low = computeScanLoss(inputs({ el: 'cosine', nexp: '0.5', scan: '60 deg' }));
    expect(low.values.elementDb!).toBeCloseTo(-0.5 * 10 * Math.log10(0.5), 9); // +1.51 dB
    const w = low.warnings.find((x) => x.code === 'element-exponent-below-one');
    expect(w?.severity).toBe('outside-validity');
    expect(w?.message).toMatch(/n ≥ 1/);
    expect(w?.message).toMatch(/\+?1\.51 dB/);
    expect(w?.outputs).toContain('elementDb');
    for (const n of ['1', '1.3']) expect(computeScanLoss(inputs({ el: 'cosine', nexp: n, scan: '60 deg' })).warnings.map((x) => x.code)).not.toContain('element-exponent-below-one');
    expect(computeScanLoss(inputs({ el: 'currentSheet', nexp: '0.5' })).warnings.map((x) => x.code)).not.toContain('element-exponent-below-one');
  });
  it('an old link with n in [0.5, 1) still opens (a warning, not a rejection)', () => {
    const decoded = decodeState(def, '?v=1&f=10GHz&el=cosine&nexp=0.7&scan=60deg');
    expect(decoded.notices).toEqual([]);
    expect(decoded.texts.nexp).toBe('0.7');
  });
  it('the exponent is read only with the cosine element model (usedWhen el = cosine)', () => {
    expect(def.params.find((p) => p.key === 'nexp')!.usedWhen).toEqual({ key: 'el', values: ['cosine'] });
    const a = computeScanLoss(inputs({ el: 'currentSheet', nexp: '1.3' }));
    const b = computeScanLoss(inputs({ el: 'currentSheet', nexp: '4' }));
    expect(b.values).toEqual(a.values);
  });
  it('bigger apertures never give less gain at the edge (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.05, max: 3, noNaN: true }), fc.double({ min: 1.01, max: 3, noNaN: true }), (w, k) => {
        const a = computeScanLoss(inputs({ w: `${w} m` })).values.gainEdgeDbi!;
        const b = computeScanLoss(inputs({ w: `${w * k} m` })).values.gainEdgeDbi!;
        expect(b).toBeGreaterThan(a);
      }),
      { numRuns: 40 },
    );
  });
});
