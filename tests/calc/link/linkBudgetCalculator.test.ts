import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import fixture from '../../../verification/fixtures/link-budget.json';
import { computeLinkBudget, createLinkBudgetCalculator } from '../../../calc/calculators/linkBudget';
import { defaultTexts, safeCompute, validateAll } from '../../../components/frame/calculatorModel';
import { teamConventions } from '../../../site/conventions';
import type { CalcInputs } from '../../../calc/calculator';
import { freeSpacePathLossDb } from '../../../calc/link/friis';

const def = createLinkBudgetCalculator(teamConventions);

/** Validated inputs from the defaults with some fields retyped (key → text). */
function inputsWith(texts: Record<string, string> = {}): CalcInputs {
  const { inputs, fields } = validateAll(def, { ...defaultTexts(def), ...texts });
  if (!inputs) throw new Error(JSON.stringify(Object.fromEntries(Object.entries(fields).filter(([, s]) => !s.ok))));
  return inputs;
}

type FixtureInputs = (typeof fixture.budgets)[number]['inputs'];
function textsFromFixture(c: FixtureInputs): Record<string, string> {
  return {
    f: `${c.f} Hz`, r: `${c.r} m`, tx: 'single', pt: `${c.ptW} W`, lft: `${c.lft} dB`, gt: `${c.gt} dBi`, vswrt: String(c.vswrt), radt: `${c.radt} dB`,
    bwt: c.bwt === null ? '' : `${c.bwt} deg`, pet: `${c.pet} deg`, atm: `${c.atm} dB`, rain: `${c.rain} dB`, art: `${c.art} dB`, arr: `${c.arr} dB`,
    sense: c.same ? 'same' : 'opposite', tilt: `${c.tilt} deg`, gr: `${c.gr} dBi`, vswrr: String(c.vswrr), radr: `${c.radr} dB`,
    bwr: c.bwr === null ? '' : `${c.bwr} deg`, per: `${c.per} deg`, tsky: String(c.tsky), gfr: String(c.gfr), tgnd: String(c.tgnd), lfr: `${c.lfr} dB`,
    tphys: String(c.tphys), nf: `${c.nf} dB`, bw: `${c.bw} Hz`, cnreq: `${c.cnreq} dB`, mkeep: `${c.mkeep} dB`,
  };
}

describe('computeLinkBudget against the term-by-term budget in scripts/fixtures/link_budget.py (SciPy brentq for the range)', () => {
  fixture.budgets.forEach((b, k) => {
    it(`budget ${k + 1} (${b.inputs.f / 1e9} GHz, ${b.inputs.r / 1e3} km): margin, EIRP, T_sys, G/T, C/N₀ and largest range, 1e-9 relative`, () => {
      const v = computeLinkBudget(inputsWith(textsFromFixture(b.inputs))).values;
      const close = (a: number | null, e: number) => expect(Math.abs((a as number) - e)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(e)));
      close(v.marginDb, b.marginDb);
      close(v.eirpDbw, b.eirpDbw);
      close(v.receivedPowerDbm, b.receivedPowerDbm);
      close(v.systemNoiseTemperatureK, b.systemNoiseTemperatureK);
      close(v.gOverTDbPerK, b.gOverTDbPerK);
      close(v.carrierToNoiseDensityDbHz, b.carrierToNoiseDensityDbHz);
      expect(Math.abs((v.maxRangeM as number) / b.maxRangeM - 1)).toBeLessThan(1e-9);
    });
  });
});

describe('link-budget calculator', () => {
  it('keeps exactly the margin asked for at the largest range it finds', () => {
    const inputs = inputsWith({ mkeep: '10 dB' });
    const r = computeLinkBudget(inputs).values.maxRangeM as number;
    expect(computeLinkBudget({ ...inputs, rangeM: r }).values.marginDb).toBeCloseTo(10, 9);
  });
  it('the budget table adds up: each line’s running total is the one before plus its value, EIRP and margin are subtotals', () => {
    const res = computeLinkBudget(inputsWith({ bwt: '3 deg', pet: '0.5 deg', rain: '4 dB' }));
    let total = 0;
    for (const line of res.data.lines) {
      if (!line.subtotal) total += line.valueDb;
      expect(line.totalDb).toBeCloseTo(total, 9);
    }
    expect(res.data.lines.find((l) => l.id === 'eirp')!.totalDb).toBeCloseTo(res.values.eirpDbw as number, 12);
    expect(res.data.lines.find((l) => l.id === 'received-power')!.totalDb + 30).toBeCloseTo(res.values.receivedPowerDbm as number, 12);
    expect(res.data.lines.at(-1)!.id).toBe('margin');
    expect(res.data.lines.at(-1)!.totalDb).toBeCloseTo(res.values.marginDb as number, 9);
  });
  it('more loss anywhere never raises the margin (property)', () => {
    const base = inputsWith({ bwt: '3 deg', bwr: '3 deg' });
    const lossNames = ['transmitFeederLossDb', 'transmitRadomeLossDb', 'atmosphericLossDb', 'rainLossDb', 'receiveRadomeLossDb', 'receiveFeederLossDb', 'receiverNoiseFigureDb', 'transmitPointingErrorDeg', 'receivePointingErrorDeg'];
    fc.assert(
      fc.property(fc.constantFrom(...lossNames), fc.double({ min: 0, max: 10, noNaN: true }), fc.double({ min: 0, max: 10, noNaN: true }), (name, a, extra) => {
        const low = computeLinkBudget({ ...base, [name]: a }).values;
        const high = computeLinkBudget({ ...base, [name]: a + extra }).values;
        expect(high.marginDb as number).toBeLessThanOrEqual((low.marginDb as number) + 1e-9);
        // no range at all (null) counts as the shortest
        expect(high.maxRangeM ?? 0).toBeLessThanOrEqual((low.maxRangeM ?? 0) * (1 + 1e-9));
      }),
    );
  });
  it('a worse match (VSWR) or a longer range never raises the margin (property)', () => {
    const base = inputsWith();
    fc.assert(
      fc.property(fc.double({ min: 1, max: 20, noNaN: true }), fc.double({ min: 0, max: 20, noNaN: true }), (s, ds) => {
        expect(computeLinkBudget({ ...base, receiveVswr: s + ds }).values.marginDb as number).toBeLessThanOrEqual((computeLinkBudget({ ...base, receiveVswr: s }).values.marginDb as number) + 1e-12);
      }),
    );
    expect(computeLinkBudget({ ...base, rangeM: 2 * (base.rangeM as number) }).values.marginDb as number).toBeCloseTo((computeLinkBudget(base).values.marginDb as number) - 20 * Math.log10(2), 9);
  });
  it('an active array: EIRP = N²·P_el·G_el with total radiated power N·P_el, and at the scan edge the element gain there', () => {
    const v = computeLinkBudget(inputsWith({ tx: 'array', n: '64', pel: '0.1 W', gel: '5 dBi', gele: '2 dBi', vswrt: '1', radt: '0 dB' })).values;
    expect(v.totalRadiatedPowerW).toBeCloseTo(6.4, 12);
    expect(v.eirpDbw).toBeCloseTo(10 * Math.log10(64 * 64 * 0.1) + 5, 9);
    expect((v.eirpDbw as number) - (v.eirpEdgeDbw as number)).toBeCloseTo(3, 9);
    expect(v.transmitRealizedGainDbi).toBeNull();
  });
  it('ignores the fields of the other transmitter kind (usedWhen)', () => {
    const single = computeLinkBudget(inputsWith()).values;
    expect(computeLinkBudget(inputsWith({ n: '256', pel: '3 W', gel: '9 dBi', gele: '1 dBi' })).values).toEqual(single);
    const array = computeLinkBudget(inputsWith({ tx: 'array' })).values;
    expect(computeLinkBudget(inputsWith({ tx: 'array', pt: '400 W', lft: '7 dB', gt: '44 dBi' })).values).toEqual(array);
  });
  it('warns when the margin is negative, the range is beyond the radio horizon or inside the far field, and when polarizations are crossed', () => {
    const codes = (texts: Record<string, string>) => computeLinkBudget(inputsWith(texts)).warnings.map((w) => w.code);
    expect(codes({ r: '50000 km' })).toContain('negative-margin');
    expect(codes({ ht: '10 m', hr: '10 m', r: '40 km' })).toContain('beyond-radio-horizon');
    expect(codes({ ht: '10 m', hr: '10 m', r: '20 km' })).not.toContain('beyond-radio-horizon');
    expect(codes({ ht: '10 m', hr: '10 m', r: '20 km' })).toContain('max-range-beyond-horizon');
    expect(codes({ dmax: '3 m', r: '100 m' })).toContain('inside-far-field');
    expect(codes({ art: '0 dB', arr: '0 dB', sense: 'opposite' })).toContain('cross-polarized');
    expect(codes({})).toContain('exposure-caution');
  });
  it('says so, instead of a number, when no range keeps the margin', () => {
    const res = computeLinkBudget(inputsWith({ pt: '1e-9 W', gt: '-20 dBi', gr: '-20 dBi', bw: '100 GHz', cnreq: '60 dB' }));
    expect(res.values.maxRangeM).toBeNull();
    expect(res.warnings.map((w) => w.code)).toContain('no-range-at-margin');
  });
  it('free-space loss in the table is the exact form; the P.525 form is shown beside it', () => {
    const v = computeLinkBudget(inputsWith()).values;
    expect(v.fsplDb).toBe(freeSpacePathLossDb(40e3, 10e9));
    expect(Math.abs((v.fsplDb as number) - (v.p525LossDb as number))).toBeLessThan(0.05);
  });
});

describe('link-budget bad input: a message at the field, never NaN', () => {
  const fieldError = (key: string, text: string) => validateAll(def, { ...defaultTexts(def), [key]: text }).fields[key];
  it.each([
    ['tsky', '-5', 'negative sky temperature'],
    ['tphys', '-1', 'negative feeder temperature'],
    ['nf', '-0.5 dB', 'noise figure below 0 dB'],
    ['art', '-1 dB', 'axial ratio below 0 dB'],
    ['vswrt', '0.9', 'VSWR below 1'],
    ['bw', '0 Hz', 'bandwidth 0'],
    ['rb', '0', 'bit rate 0'],
  ])('%s = %s (%s) is out of range at the field', (key, text) => {
    const status = fieldError(key, text);
    expect(status.ok).toBe(false);
    if (!status.ok) expect(status.message).toMatch(/Out of range/);
  });
  it('a system noise temperature of 0 K is reported at the sky-temperature field', () => {
    const out = safeCompute(def, inputsWith({ tsky: '0', tgnd: '0', gfr: '0', nf: '0 dB', lfr: '0 dB' }));
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.parameter).toBe('skyTemperatureK');
  });
  it('every output is finite or null over random valid inputs (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-3, max: 1e9, noNaN: true }),
        fc.double({ min: 0, max: 100, noNaN: true }),
        fc.double({ min: 1, max: 100, noNaN: true }),
        fc.double({ min: 0, max: 1e5, noNaN: true }),
        fc.double({ min: 0, max: 40, noNaN: true }),
        (r, ar, vswr, tsky, nf) => {
          const out = safeCompute(def, { ...inputsWith(), rangeM: r, receiveAxialRatioDb: ar, transmitVswr: vswr, skyTemperatureK: tsky, receiverNoiseFigureDb: nf });
          expect(out.ok).toBe(true);
          if (out.ok) for (const x of Object.values(out.result.values)) if (x !== null) expect(Number.isFinite(x)).toBe(true);
        },
      ),
      { numRuns: 200 },
    );
  });
});

describe('link-budget: the smallest receive antenna that keeps the margin', () => {
  it('with the receive gain it reports, the margin is exactly the margin to keep; the dish gives that gain at the η entered', async () => {
    const { apertureGainDbi } = await import('../../../calc/aperture/apertureGain');
    const inputs = inputsWith({ r: '2000 km', mkeep: '10 dB', etar: '0.55' });
    const v = computeLinkBudget(inputs).values;
    expect(computeLinkBudget({ ...inputs, receiveGainDbi: v.requiredReceiveGainDbi }).values.marginDb).toBeCloseTo(10, 9);
    expect(apertureGainDbi(0.55, v.smallestReceiveDishM as number, 299_792_458 / 10e9)).toBeCloseTo(v.requiredReceiveGainDbi as number, 9);
  });
  it('gives no diameter, with a note, when the gain needed is below what a one-wavelength aperture gives', () => {
    const res = computeLinkBudget(inputsWith({ r: '10 m', mkeep: '0 dB' }));
    expect(res.values.smallestReceiveDishM).toBeNull();
    expect(res.warnings.map((w) => w.code)).toContain('dish-below-wavelength');
  });
});
