import { describe, expect, it } from 'vitest';
import { defaultTexts, evaluate, safeCompute, unusedReason, validateField } from '../../components/frame/calculatorModel';
import { createWavelengthSpacingCalculator } from '../../calc/calculators/wavelengthSpacing';
import { createReflectorCalculator } from '../../calc/calculators/reflector';
import { calculatorFactories } from '../../calc/calculators/index';
import { teamConventions } from '../../site/conventions';
import type { CalculatorDef } from '../../calc/calculator';
import { CalcInputError } from '../../calc/errors';

const def = createWavelengthSpacingCalculator(teamConventions);

describe('evaluate: last good result stays visible, marked stale', () => {
  it('computes at defaults', () => {
    const ev = evaluate(def, defaultTexts(def), null);
    expect(ev.stale).toBe(false);
    expect(ev.result!.values.lambda0High).toBeCloseTo(0.0299792458, 12);
  });
  it('a bad field keeps the previous result and marks it stale, with a message at the field', () => {
    const good = evaluate(def, defaultTexts(def), null);
    const bad = evaluate(def, { ...defaultTexts(def), f: '10 GHzz' }, good.result);
    expect(bad.stale).toBe(true);
    expect(bad.result).toBe(good.result);
    expect(bad.fields.f.ok).toBe(false);
    expect(!bad.fields.f.ok && bad.fields.f.message).toMatch(/Unknown unit/);
  });
  it('out of range gives a message with the range and unit', () => {
    const status = validateField(def.params.find((p) => p.key === 'scan')!, '120 deg');
    expect(status.ok).toBe(false);
    expect(!status.ok && status.message).toMatch(/from 0 ° to 89 °/);
  });
  it('λ-relative spacing uses the highest frequency of the band', () => {
    const ev = evaluate(def, { ...defaultTexts(def), f: '8 GHz', fhi: '12 GHz', d: '0.5 λ' }, null);
    expect(ev.result!.values.chosenWavelengths).toBeCloseTo(0.5, 12);
  });
  it('a CalcInputError naming an input marks that field with the reason, keeps the last good result and says it in the banner', () => {
    const reflector = createReflectorCalculator(teamConventions);
    const good = evaluate(reflector, defaultTexts(reflector), null);
    const bad = evaluate(reflector, { ...defaultTexts(reflector), d: '1.2 m', blk: '1.5 m' }, good.result);
    expect(bad.stale).toBe(true);
    expect(bad.result).toBe(good.result);
    expect(bad.fields.blk.ok).toBe(false);
    expect(!bad.fields.blk.ok && bad.fields.blk.message).toMatch(/^Not possible with the other inputs: expected a blockage diameter smaller than the dish diameter 1\.2 m, got 1\.5 m\.$/);
    expect(bad.fields.d.ok).toBe(true);
    expect(bad.error).toMatch(/^Central blockage diameter: expected a blockage diameter smaller/);
  });
  it('a compute that throws or returns a non-finite value is caught, never shown', () => {
    const throwing = { ...def, compute: () => { throw new Error('boom'); } } as CalculatorDef<unknown>;
    expect(safeCompute(throwing, {})).toEqual({ ok: false, message: 'Cannot compute with these inputs: boom' });
    const nan = { ...def, compute: () => ({ values: { x: Number.NaN }, warnings: [], data: null }) } as CalculatorDef<unknown>;
    const r = safeCompute(nan, {});
    expect(r.ok).toBe(false);
  });
  it('a CalcInputError naming an input (by its calc/ name) is shown at that field, results stale', () => {
    const good = evaluate(def, defaultTexts(def), null);
    const rejecting = { ...def, compute: () => { throw new CalcInputError('scanMaxDeg', 'expected less scan for this lattice'); } } as CalculatorDef<unknown>;
    const ev = evaluate(rejecting, defaultTexts(def), good.result);
    expect(ev.stale).toBe(true);
    expect(ev.result).toBe(good.result);
    expect(ev.error).toBe('Maximum scan angle from broadside: expected less scan for this lattice.');
    expect(!ev.fields.scan.ok && ev.fields.scan.message).toBe('Not possible with the other inputs: expected less scan for this lattice.');
  });
});

describe('wavelength & spacing results (values checked by hand)', () => {
  it('10 GHz, 45° scan, triangular: limit (2/√3)/(1 + sin 45°) = 0.6765 λ (Mailloux §2.1 (section number from memory)); 5 % team margin', () => {
    const ev = evaluate(def, { ...defaultTexts(def), f: '10 GHz', scan: '45 deg', lat: 'triangular' }, null);
    const v = ev.result!.values;
    expect(v.limitWavelengths).toBeCloseTo(2 / Math.sqrt(3) / (1 + Math.SQRT1_2), 12);
    expect(v.recommendedWavelengths).toBeCloseTo(v.limitWavelengths! * (1 - teamConventions.spacingMarginFraction), 12);
    expect(v.limitM).toBeCloseTo(v.limitWavelengths! * 0.0299792458, 14);
  });
  it('warns when a chosen spacing lets a grating lobe into the scan range', () => {
    const ev = evaluate(def, { ...defaultTexts(def), scan: '45 deg', lat: 'rectangular', d: '0.7 λ' }, null);
    expect(ev.result!.warnings.map((w) => w.code)).toContain('grating-lobe-in-scan-range');
  });
  it('element counts: triangular saves ≈13.4 % at each lattice’s own limit (Sharp 1961)', () => {
    const ev = evaluate(def, { ...defaultTexts(def), w: '2 m', h: '2 m' }, null);
    expect(ev.result!.values.savingPercent).toBeCloseTo(100 * (1 - Math.sqrt(3) / 2), 0);
  });
});

describe('unusedReason: fields the current choices leave unread', () => {
  const reflector = createReflectorCalculator(teamConventions);
  const spec = (key: string) => reflector.params.find((p) => p.key === key)!;
  it('names the choice and its shown option; null when the field is used or has no usedWhen', () => {
    const texts = defaultTexts(reflector);
    expect(unusedReason(reflector, spec('g'), texts)).toBe('Solve for is “Gain (diameter given)”');
    expect(unusedReason(reflector, spec('d'), texts)).toBeNull();
    expect(unusedReason(reflector, spec('d'), { ...texts, solve: 'diameter' })).toBe('Solve for is “Diameter (target gain given)”');
    expect(unusedReason(reflector, spec('f'), texts)).toBeNull();
  });
  it('an invalid choice text gives no reason (the choice field carries the error)', () => {
    expect(unusedReason(reflector, spec('g'), { ...defaultTexts(reflector), solve: 'both' })).toBeNull();
  });
  it('every usedWhen of every registered calculator names a choice field and values it offers', () => {
    for (const make of Object.values(calculatorFactories)) {
      const d = make(teamConventions);
      for (const p of d.params.filter((x) => x.usedWhen)) {
        const choice = d.params.find((x) => x.key === p.usedWhen!.key);
        expect(choice?.kind, `${d.id}.${p.key}`).toBe('choice');
        if (choice?.kind === 'choice') for (const v of p.usedWhen!.values) expect(choice.options.map((o) => o.value), `${d.id}.${p.key}`).toContain(v);
      }
    }
  });
});

describe('validateField: a level below the peak states its convention at the field', () => {
  const spec = { kind: 'levelBelowPeak' as const, key: 'sll', name: 'sidelobeDb', label: 'Design sidelobe level', defaultText: '-30 dB', min: -80, max: -13, description: '' };
  it('echoes −30 dB as "−30 dB, 30 dB below the peak"; a positive entry is read as the same level with a note', async () => {
    const { validateField } = await import('../../components/frame/calculatorModel');
    const a = validateField(spec, '-30 dB');
    expect(a.ok && a.parsedDisplay).toBe('−30 dB, 30 dB below the peak');
    const b = validateField(spec, '30 dB');
    expect(b.ok && b.value).toBe(-30);
    expect(b.ok && b.note).toMatch(/read as −30 dB/);
  });
  it('out of range names both forms', async () => {
    const { validateField } = await import('../../components/frame/calculatorModel');
    const r = validateField(spec, '-10 dB');
    expect(!r.ok && r.message).toBe('Out of range: expected a value from −80 to −13 dB (13 to 80 dB below the peak).');
  });
});
