import { describe, expect, it } from 'vitest';
import { computeRangeExposure, createRangeExposureCalculator, GAIN_AGREEMENT_DB } from '../../../calc/calculators/rangeExposure';
import { apertureDistanceToLimitM, farFieldPowerDensityWPerM2 } from '../../../calc/exposure/powerDensity';
import { apertureGainDbi, efficiencyForGain } from '../../../calc/aperture/apertureGain';
import { freeSpaceWavelengthM } from '../../../calc/wavelength';
import { CalcInputError } from '../../../calc/errors';
import { teamConventions } from '../../../site/conventions';
import { validateAll } from '../../../components/frame/calculatorModel';
import { decodeState } from '../../../components/frame/urlState';

// A 0.5 m transmit dish at 5.8 GHz: at η = 0.55 the aperture gives 27.06 dBi; the antenna's gain is entered as 24.5 dBi.
const base = {
  frequencyHz: 5.8e9,
  solveFor: 'range',
  transmitPowerW: 10,
  transmitGainDbi: 24.5,
  receiveGainDbi: 20,
  requiredPowerW: 1e-12,
  otherLossDb: 3,
  rangeM: 20_000,
  apertureDiameterM: 0.5 as number | null,
  apertureEfficiency: 0.55,
  limitSet: 'icnirp2020-public',
  customLimitWPerM2: null,
};
const lambda = freeSpaceWavelengthM(5.8e9);

describe('range & exposure: one antenna description', () => {
  it('the aperture model uses the entered gain (efficiency G/(πD/λ)², not the η field): its distance to the limit is the OET-65 model at that efficiency', () => {
    const r = computeRangeExposure(base);
    const implied = efficiencyForGain(24.5, 0.5, lambda);
    expect(r.values.impliedEfficiencyPercent as number).toBeCloseTo(100 * implied, 10);
    expect(r.values.apertureDistanceToLimitM as number).toBeCloseTo(apertureDistanceToLimitM(10, 0.5, implied, 5.8e9, 10), 10);
  });
  it('beyond 0.6 D²/λ the aperture model and the far-field formula give the same density (one antenna; the old model, at η = 0.55, was 2.6 dB higher)', () => {
    const r = computeRangeExposure(base);
    const farStart = (0.6 * 0.5 * 0.5) / lambda;
    const far = r.data.density.filter((p) => p.distanceM > farStart * 1.01);
    expect(far.length).toBeGreaterThan(10);
    for (const p of far) expect(p.apertureModelWPerM2! / p.farFieldWPerM2).toBeCloseTo(1, 10);
    expect(r.values.apertureDensityAtRangeWPerM2 as number).toBeCloseTo(farFieldPowerDensityWPerM2(10 * 10 ** 2.45, 20_000), 15);
  });
  it('shows the cross-check beside: gain η(πD/λ)² at the η entered and the aperture-model distance with that η', () => {
    const r = computeRangeExposure(base);
    expect(r.values.apertureGainAtEtaDbi as number).toBeCloseTo(apertureGainDbi(0.55, 0.5, lambda), 12);
    expect(r.values.apertureGainAtEtaDbi as number).toBeCloseTo(27.06, 2);
    expect(r.values.apertureDistanceToLimitAtEtaM as number).toBeCloseTo(apertureDistanceToLimitM(10, 0.5, 0.55, 5.8e9, 10), 10);
    expect(r.values.apertureDistanceToLimitAtEtaM as number).toBeGreaterThan(r.values.apertureDistanceToLimitM as number);
  });
  it(`flags a gain–aperture difference above ${GAIN_AGREEMENT_DB} dB (27.06 vs 24.5 dBi, 2.6 dB: a caution, since the η entered would mean more exposure), and says which the results use`, () => {
    const w = computeRangeExposure(base).warnings.find((x) => x.code === 'gain-aperture-mismatch')!;
    expect(w.severity).toBe('caution');
    expect(w.message).toMatch(/use the entered gain/);
    expect(w.message).toMatch(/0\.5 dB/);
  });
  it('no flag within 0.5 dB, a flag just beyond it, and a note (not a caution) when the η entered gives less gain', () => {
    const gainAtEta = apertureGainDbi(0.55, 0.5, lambda);
    const flagged = (gt: number) => computeRangeExposure({ ...base, transmitGainDbi: gt }).warnings.find((x) => x.code === 'gain-aperture-mismatch');
    expect(flagged(gainAtEta - 0.45)).toBeUndefined();
    expect(flagged(gainAtEta + 0.45)).toBeUndefined();
    expect(flagged(gainAtEta - 0.55)?.severity).toBe('caution');
    expect(flagged(gainAtEta + 0.55)?.severity).toBe('note');
  });
  it('rejects a gain above what the diameter gives at η = 1, at the diameter field', () => {
    const max = apertureGainDbi(1, 0.5, lambda);
    try {
      computeRangeExposure({ ...base, transmitGainDbi: max + 0.1 });
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(CalcInputError);
      expect((e as CalcInputError).parameter).toBe('apertureDiameterM');
      expect((e as Error).message).toMatch(/at most 29\.65 dBi/);
    }
    expect(() => computeRangeExposure({ ...base, transmitGainDbi: max - 1e-9 })).not.toThrow();
  });
  it('without a diameter the η field is not used and no aperture figures appear', () => {
    const a = computeRangeExposure({ ...base, apertureDiameterM: null });
    const b = computeRangeExposure({ ...base, apertureDiameterM: null, apertureEfficiency: 0.2 });
    expect(a.values).toEqual(b.values);
    expect(a.values.impliedEfficiencyPercent).toBeNull();
    expect(a.values.apertureGainAtEtaDbi).toBeNull();
  });
  it('no output is NaN or infinite over a grid of gains and diameters (including a tiny implied efficiency)', () => {
    for (const gt of [-10, 0, 20, 35]) {
      for (const d of [0.3, 1, 4]) {
        if (gt > apertureGainDbi(1, d, lambda)) continue;
        const r = computeRangeExposure({ ...base, transmitGainDbi: gt, apertureDiameterM: d });
        for (const v of Object.values(r.values)) if (v !== null) expect(Number.isFinite(v)).toBe(true);
      }
    }
  });
  it('its worked examples describe one antenna: where a diameter is given, the entered gain and η(πD/λ)² agree within 0.5 dB (no mismatch flag)', () => {
    const def = createRangeExposureCalculator(teamConventions);
    for (const example of def.examples) {
      const { inputs } = validateAll(def, decodeState(def, example.query).texts);
      const r = def.compute(inputs!);
      expect(r.warnings.map((w) => w.code), example.title).not.toContain('gain-aperture-mismatch');
    }
  });
});
