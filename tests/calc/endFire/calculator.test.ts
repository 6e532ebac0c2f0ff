import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeEndFireLength, createEndFireLengthCalculator } from '../../../calc/calculators/endFireLength';
import { CalcInputError } from '../../../calc/errors';
import { defaultTexts, evaluate, validateAll } from '../../../components/frame/calculatorModel';
import { teamConventions } from '../../../site/conventions';

const def = createEndFireLengthCalculator(teamConventions);
const C = 299_792_458;
const base = { frequencyHz: 1e9, structure: 'ordinary', solveFor: 'gain', lengthM: 3 * (C / 1e9), targetGainDbi: 15, spacingM: 0.25 * (C / 1e9), bays: '1' };
const codes = (r: { warnings: { code: string }[] }) => r.warnings.map((w) => w.code);

describe('computeEndFireLength', () => {
  it('ordinary, 3 λ at λ/4: 13 elements, −90° per element, D = 13 (11.14 dBi), 4L/λ = 12 beside it', () => {
    const r = computeEndFireLength(base);
    expect(r.values.elementCount).toBe(13);
    expect(r.values.phaseStepDeg).toBeCloseTo(-90, 12);
    expect(r.values.gainDbi).toBeCloseTo(10 * Math.log10(13), 9);
    expect(r.values.gainDbd).toBeCloseTo(10 * Math.log10(13) - 2.15, 9);
    expect(r.values.approxDbi).toBeCloseTo(10 * Math.log10(12), 12);
    expect(r.values.apertureDbi).toBeCloseTo(10 * Math.log10(4 * Math.PI * 9), 12);
  });
  it('solving for length gives a length whose gain reaches the target (inverse round trip through the calculator)', () => {
    const solved = computeEndFireLength({ ...base, structure: 'hansenWoodyard', solveFor: 'length', targetGainDbi: 17 });
    expect(solved.values.gainDbi!).toBeGreaterThanOrEqual(17);
    expect(codes(solved)).toContain('whole-elements');
    const forward = computeEndFireLength({ ...base, structure: 'hansenWoodyard', lengthM: solved.values.lengthM! });
    expect(forward.values.elementCount).toBe(solved.values.elementCount);
    expect(forward.values.gainDbi).toBeCloseTo(solved.values.gainDbi!, 12);
  });
  it('Yagi–Uda: tabulated boom gives the table gain + 2.15 dBi, with the from-memory note; stacking adds its range', () => {
    const r = computeEndFireLength({ ...base, structure: 'yagi', lengthM: 2.2 * (C / 1e9), bays: '2' });
    expect(r.values.gainDbd).toBeCloseTo(12.25, 12);
    expect(r.values.gainDbi).toBeCloseTo(14.4, 12);
    expect(r.values.stackLowDbi).toBeCloseTo(16.9, 12);
    expect(r.values.stackHighDbi).toBeCloseTo(17.4, 12);
    expect(r.values.stackDistanceWavelengths).toBeGreaterThan(1);
    expect(codes(r)).toEqual(expect.arrayContaining(['yagi-data-from-memory', 'stacking-practice']));
    expect(r.values.elementCount).toBeNull();
  });
  it('Yagi–Uda round trip: target gain → boom → gain', () => {
    const solved = computeEndFireLength({ ...base, structure: 'yagi', solveFor: 'length', targetGainDbi: 13 });
    const forward = computeEndFireLength({ ...base, structure: 'yagi', lengthM: solved.values.lengthM! });
    expect(forward.values.gainDbi).toBeCloseTo(13, 9);
  });
  it('flags Yagi extrapolation beyond 4.2 λ and below 0.4 λ', () => {
    expect(codes(computeEndFireLength({ ...base, structure: 'yagi', lengthM: 6 * (C / 1e9) }))).toContain('yagi-extrapolated-long');
    expect(codes(computeEndFireLength({ ...base, structure: 'yagi', lengthM: 0.3 * (C / 1e9) }))).toContain('yagi-extrapolated-short');
  });
  it('warns: spacing ≥ λ/2 for ordinary end-fire; short Hansen–Woodyard; very long; aperture much better', () => {
    expect(codes(computeEndFireLength({ ...base, spacingM: 0.5 * (C / 1e9) }))).toContain('end-fire-spacing');
    expect(codes(computeEndFireLength({ ...base, structure: 'hansenWoodyard', lengthM: 0.25 * (C / 1e9) }))).toContain('hansen-woodyard-short') // N = 2: 1.80 dB;
    const long = computeEndFireLength({ ...base, lengthM: 30 * (C / 1e9) });
    expect(codes(long)).toEqual(expect.arrayContaining(['very-long-end-fire', 'aperture-wins']));
  });
  it('a target beyond any Yagi gives a caution and null outputs, not an error', () => {
    const r = computeEndFireLength({ ...base, structure: 'yagi', solveFor: 'length', targetGainDbi: 40 });
    expect(r.values.gainDbi).toBeNull();
    expect(codes(r)).toContain('target-out-of-reach');
  });
  it('throws CalcInputError naming the length for an array shorter than one spacing or a boom outside 0.2–10 λ', () => {
    expect(() => computeEndFireLength({ ...base, lengthM: 0.1 * (C / 1e9) })).toThrow(CalcInputError);
    expect(() => computeEndFireLength({ ...base, structure: 'yagi', lengthM: 20 * (C / 1e9) })).toThrow(/lengthM/);
  });
  it('the chart has the three kinds and the aperture on a log-spaced length axis, aperture rising as L² (20 dB/decade) and end-fire as L (10 dB/decade)', () => {
    const { curve } = computeEndFireLength(base).data;
    const a = curve.find((p) => Math.abs(p.lengthWavelengths - 1.2) < 1e-12)!; // a tabulated boom is always on the grid
    const b = curve.find((p) => Math.abs(p.lengthWavelengths - 4.2) < 1e-12)!;
    expect(a.yagiDbi).toBeCloseTo(10.2 + 2.15, 12);
    const decades = Math.log10(4.2 / 1.2);
    expect((b.apertureDbi - a.apertureDbi) / decades).toBeCloseTo(20, 9);
    expect(curve.every((p) => p.ordinaryDbi === null || Number.isFinite(p.ordinaryDbi))).toBe(true);
  });
  it('property: every output is finite or null over random valid inputs (fast-check)', () => {
    fc.assert(fc.property(
      fc.constantFrom('ordinary', 'hansenWoodyard', 'yagi'), fc.constantFrom('gain', 'length'), fc.double({ min: 0.4, max: 60, noNaN: true }),
      fc.double({ min: 0, max: 35, noNaN: true }), fc.double({ min: 0.05, max: 0.7, noNaN: true }), fc.constantFrom('1', '2', '4'),
      (structure, solveFor, lengthWl, target, spacingWl, bays) => {
        const lambda = C / 1e9;
        try {
          const r = computeEndFireLength({ frequencyHz: 1e9, structure, solveFor, lengthM: lengthWl * lambda, targetGainDbi: target, spacingM: spacingWl * lambda, bays });
          return Object.values(r.values).every((v) => v === null || Number.isFinite(v));
        } catch (e) {
          return e instanceof CalcInputError;
        }
      }), { numRuns: 60, seed: 17 });
  });
});

describe('end-fire calculator in the frame', () => {
  it('defaults validate and compute', () => {
    const ev = evaluate(def, defaultTexts(def), null);
    expect(ev.stale).toBe(false);
    expect(ev.result!.values.gainDbi).toBeCloseTo(14.4, 9);
  });
  it('a boom outside the data range gives a message at the length field and stale results', () => {
    const good = evaluate(def, defaultTexts(def), null);
    const ev = evaluate(def, { ...defaultTexts(def), len: '30 lambda' }, good.result);
    expect(ev.stale).toBe(true);
    expect(ev.fields.len.ok).toBe(false);
    expect((ev.fields.len as { message: string }).message).toMatch(/boom from 0\.2 λ to 10 λ/);
    expect(validateAll(def, defaultTexts(def)).inputs).not.toBeNull();
  });
});
