import { describe, expect, it } from 'vitest';
import { calculatorFactories, calculatorsInNavOrder } from '../../../calc/calculators/index';
import { teamConventions } from '../../../calc/teamConventions';

// The registry is the one place a calculator's listing lives (title, summary, navigation place,
// safety note, embed flag, worked examples); these checks keep each entry complete and consistent.
const defs = calculatorsInNavOrder(teamConventions);

describe('calculator registry (calc/calculators/index.ts)', () => {
  it('calculatorsInNavOrder lists every registered calculator once, each under its own id', () => {
    expect(defs.map((d) => d.id).sort()).toEqual(Object.keys(calculatorFactories).sort());
    for (const [id, make] of Object.entries(calculatorFactories)) expect(make(teamConventions).id).toBe(id);
  });

  it('lists them by nav.order, and no two calculators share a place', () => {
    const orders = defs.map((d) => d.nav.order);
    expect(orders).toEqual([...orders].sort((a, b) => a - b));
    expect(new Set(orders).size).toBe(orders.length);
  });

  for (const def of defs) {
    describe(def.id, () => {
      it('has a title, a one-line summary and a purpose, each trimmed and different', () => {
        for (const text of [def.title, def.summary, def.purpose, def.nav.label ?? def.title]) {
          expect(text.length).toBeGreaterThan(0);
          expect(text).toBe(text.trim());
        }
        expect(def.summary).not.toBe(def.title);
        expect(def.summary).not.toBe(def.purpose);
      });

      it('names each shared caution of its safety note at most once, after a lead that is empty or ends a sentence', () => {
        expect(new Set(def.safety.cautions).size).toBe(def.safety.cautions.length);
        expect(def.safety.lead === '' || /[.:]$/.test(def.safety.lead), def.safety.lead).toBe(true);
      });

      it(`has worked examples, each titled and written for link version ${def.schemaVersion}`, () => {
        expect(def.examples.length).toBeGreaterThan(0);
        for (const e of def.examples) {
          expect(e.title.trim().length, e.query).toBeGreaterThan(0);
          expect(e.query.startsWith(`?v=${def.schemaVersion}&`), e.query).toBe(true);
        }
      });
    });
  }
});
