import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { decodeState, encodeState } from '../../components/frame/urlState';
import { canonicalToFieldText } from '../../components/frame/format';
import type { CalculatorDef } from '../../calc/calculator';
import { defaultTexts, evaluate, validateAll } from '../../components/frame/calculatorModel';
import { calculatorFactories } from '../../calc/calculators';
import { createWavelengthSpacingCalculator } from '../../calc/calculators/wavelengthSpacing';
import { teamConventions } from '../../site/conventions';
import v1Links from '../fixtures/v1-links.json';

const def = createWavelengthSpacingCalculator(teamConventions);

describe('decodeState / encodeState (wavelength & spacing)', () => {
  it('an empty query gives defaults and no notices', () => {
    const d = decodeState(def, '');
    expect(d.texts).toEqual(defaultTexts(def));
    expect(d.notices).toEqual([]);
  });
  it('encodes readable keys with units and the version first', () => {
    const q = encodeState(def, { ...defaultTexts(def), f: '10 GHz', scan: '45 deg', d: '0.6 λ' });
    expect(q.startsWith('?v=1&f=10GHz')).toBe(true);
    expect(q).toContain('scan=45deg');
    expect(q).toContain('d=0.6lambda');
  });
  it('unknown keys, bad values and a missing version give notices and per-field defaults', () => {
    const d = decodeState(def, '?f=banana&scan=30deg&zz=1');
    expect(d.texts.f).toBe(defaultTexts(def).f);
    expect(d.texts.scan).toBe('30 deg');
    expect(d.notices.join('\n')).toMatch(/no version/);
    expect(d.notices.join('\n')).toMatch(/Unknown setting "zz"/);
    expect(d.notices.join('\n')).toMatch(/Frequency.*banana.*default/);
  });
  it('a newer version is read field by field with a notice', () => {
    const d = decodeState(def, '?v=7&f=3GHz');
    expect(d.texts.f).toBe('3 GHz');
    expect(d.notices.join('\n')).toMatch(/newer version/);
  });
  it('out-of-range values fall back with a notice naming the field', () => {
    const d = decodeState(def, '?v=1&scan=95deg');
    expect(d.texts.scan).toBe(defaultTexts(def).scan);
    expect(d.notices.join('\n')).toMatch(/Maximum scan angle/);
  });
  it('property: state → URL → state is identity for valid states (fast-check)', () => {
    const arbitraryState = fc.record({
      f: fc.double({ min: 0.01, max: 300, noNaN: true }).map((x) => `${x} GHz`),
      fhi: fc.option(fc.double({ min: 0.01, max: 300, noNaN: true }).map((x) => `${x} GHz`), { nil: '' }),
      er: fc.double({ min: 1, max: 100, noNaN: true }).map(String),
      scan: fc.double({ min: 0, max: 89, noNaN: true }).map((x) => `${x} deg`),
      lat: fc.constantFrom('rectangular', 'triangular'),
      d: fc.option(fc.double({ min: 0.05, max: 3, noNaN: true }).map((x) => `${x} λ`), { nil: '' }),
      w: fc.option(fc.double({ min: 0.01, max: 100, noNaN: true }).map((x) => `${x} m`), { nil: '' }),
      h: fc.option(fc.double({ min: 0.01, max: 100, noNaN: true }).map((x) => `${x} cm`), { nil: '' }),
      shape: fc.constantFrom('rectangle', 'ellipse'),
    });
    fc.assert(
      fc.property(arbitraryState, (texts) => {
        const before = validateAll(def, texts);
        expect(before.inputs).not.toBeNull();
        const decoded = decodeState(def, encodeState(def, texts));
        expect(decoded.notices).toEqual([]);
        const after = validateAll(def, decoded.texts);
        expect(after.inputs).toEqual(before.inputs);
        // and a second round trip is textually stable
        expect(encodeState(def, decoded.texts)).toBe(encodeState(def, texts));
      }),
      { numRuns: 300 },
    );
  });
  it('property: arbitrary query strings never throw, and give a valid state or notices', () => {
    const key = fc.constantFrom('v', 'f', 'fhi', 'er', 'scan', 'lat', 'd', 'w', 'h', 'shape', 'x', '');
    fc.assert(
      fc.property(fc.array(fc.tuple(key, fc.string({ unit: 'binary', maxLength: 20 })), { maxLength: 8 }), (pairs) => {
        const query = `?${pairs.map(([k, v]) => `${encodeURIComponent(k)}=${encodeURIComponent(v)}`).join('&')}`;
        const decoded = decodeState(def, query);
        const { inputs } = validateAll(def, decoded.texts);
        expect(inputs).not.toBeNull();
        const ev = evaluate(def, decoded.texts, null);
        expect(ev.stale).toBe(false);
        for (const v of Object.values(ev.result!.values)) if (v !== null) expect(Number.isFinite(v)).toBe(true);
      }),
      { numRuns: 500 },
    );
  });
  it('raw garbage (not even key=value) never throws', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 60 }), (raw) => {
        expect(() => decodeState(def, raw)).not.toThrow();
      }),
      { numRuns: 1000 },
    );
  });
});

/**
 * The texts a pinned version-1 link should open with today: the recorded texts, except that a key
 * a migration dropped or rewrote is expected in its upgraded form (the calculator's own
 * migrations applied to the link's query). Entries may pin the upgraded texts by hand as well
 * (expectTextsNow), which checks the migration itself.
 */
function textsExpectedNow(def: CalculatorDef<unknown>, query: string, recorded: Record<string, string | undefined>): Record<string, string | undefined> {
  const params = new URLSearchParams(query.replace(/^\?/, ''));
  let current: Record<string, string> = Object.fromEntries([...params].filter(([key]) => key !== 'v'));
  const expected = { ...recorded };
  for (let from = Number(params.get('v') ?? def.schemaVersion); from < def.schemaVersion; from++) {
    const migrate = def.migrations[from];
    if (!migrate) continue;
    const before = current;
    current = migrate({ ...before });
    for (const key of new Set([...Object.keys(before), ...Object.keys(current)])) {
      if (current[key] === before[key]) continue;
      if (current[key] === undefined) delete expected[key];
      else expected[key] = canonicalToFieldText(current[key]);
    }
  }
  return expected;
}

// Links made with version 1 of each calculator keep opening as the schema grows: each pinned link
// must decode without notices to the texts recorded when it was made (upgraded where a migration
// rewrote a key).
describe('pinned version-1 links keep opening', () => {
  for (const link of v1Links.links) {
    it(`${link.calculator}: ${link.query}`, () => {
      const factory = calculatorFactories[link.calculator];
      expect(factory, `calculator ${link.calculator} exists`).toBeDefined();
      const d = factory(teamConventions);
      const decoded = decodeState(d, link.query);
      expect(decoded.notices.filter((n) => !/upgraded to version/.test(n))).toEqual([]);
      for (const [key, text] of Object.entries(textsExpectedNow(d, link.query, link.expectTexts as Record<string, string | undefined>))) expect(decoded.texts[key], key).toBe(text);
      const pinnedNow = (link as { expectTextsNow?: Record<string, string> }).expectTextsNow ?? {};
      for (const [key, text] of Object.entries(pinnedNow)) expect(decoded.texts[key], `${key} after the upgrade`).toBe(text);
      expect(evaluate(d, decoded.texts, null).stale).toBe(false);
    });
  }
});
