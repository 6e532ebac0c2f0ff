import { describe, expect, it } from 'vitest';
import { taylorLineSourceField, taylorLineSourceSidelobeDb, taylorParameterA } from '../../../calc/array/taylorLineSource';
import { taylorNbarRuleMinimum, taylorNbarWarning } from '../../../calc/array/taylorNbar';
import { CalcInputError } from '../../../calc/errors';
import fixture from '../../fixtures/taylor-nbar.json';

describe('taylorLineSourceSidelobeDb(nbar, sidelobeDb): the level a Taylor line source actually reaches', () => {
  it(`equals the highest sidelobe of SciPy's Taylor weights on a long line within 0.01 dB (${fixture.source}; scripts/fixtures/taylor_nbar.py)`, () => {
    for (const c of fixture.cases) {
      expect(Math.abs(taylorLineSourceSidelobeDb(c.nbar, c.sidelobeDb) - c.achievedDb), `n̄=${c.nbar} SLL=${c.sidelobeDb}`).toBeLessThan(0.01);
    }
  });
  it('n̄ = 1 is the uniform line source: −13.26 dB whatever the design level (Balanis, "Antenna Theory", 4th ed., ch. 12 (chapter number from memory)), within 0.005 dB', () => {
    for (const sll of [20, 30, 45]) expect(taylorLineSourceSidelobeDb(1, sll)).toBeCloseTo(-13.26, 2);
  });
  it('n̄ = 2 for 30 dB reaches only about −25.7 dB; n̄ = 5 reaches the design level within 0.5 dB (SciPy fixture above)', () => {
    expect(taylorLineSourceSidelobeDb(2, 30)).toBeCloseTo(-25.72, 1);
    expect(Math.abs(taylorLineSourceSidelobeDb(5, 30) + 30)).toBeLessThan(0.5);
  });
  it('the pattern is 1 at u = 0, has its first zero at σ√(A² + ¼) and is finite at the integers below n̄ (Taylor 1955)', () => {
    const a = taylorParameterA(30), nbar = 5;
    const sigma = nbar / Math.sqrt(a * a + (nbar - 0.5) ** 2);
    expect(taylorLineSourceField(nbar, 30, 0)).toBe(1);
    expect(taylorLineSourceField(nbar, 30, sigma * Math.sqrt(a * a + 0.25))).toBeCloseTo(0, 12);
    for (const u of [1, 2, 3, 4]) {
      const at = taylorLineSourceField(nbar, 30, u);
      expect(Number.isFinite(at)).toBe(true);
      expect(at).toBeCloseTo(taylorLineSourceField(nbar, 30, u + 1e-5), 4);
    }
  });
  it('rejects a non-integer n̄ and a negative level with CalcInputError', () => {
    expect(() => taylorLineSourceSidelobeDb(2.5, 30)).toThrow(CalcInputError);
    expect(() => taylorLineSourceSidelobeDb(3, -1)).toThrow(CalcInputError);
  });
});

describe('taylorNbarRuleMinimum(sidelobeDb): the usual rule n̄ ≥ 2A² + ½', () => {
  it('30 dB: A = acosh(10^1.5)/π = 1.32, 2A² + ½ = 3.98, so n̄ ≥ 4 (hand calculation from Taylor 1955)', () => {
    expect(taylorParameterA(30)).toBeCloseTo(1.32, 3);
    expect(taylorNbarRuleMinimum(30)).toBe(4);
    expect(taylorNbarRuleMinimum(40)).toBe(7); // 2·2.844 + ½ = 6.19
  });
  it('checked against computed patterns (SciPy fixture): from 20 to 50 dB the rule\'s n̄ reaches the design level within 0.5 dB, and the smallest n̄ that does is at most the rule and at most 2 below it', () => {
    const levels = [...new Set(fixture.cases.map((c) => c.sidelobeDb))];
    for (const sll of levels) {
      const reached = (nbar: number) => fixture.cases.find((c) => c.sidelobeDb === sll && c.nbar === nbar)!.achievedDb;
      const rule = taylorNbarRuleMinimum(sll);
      expect(reached(rule), `SLL ${sll}`).toBeLessThanOrEqual(-sll + 0.5);
      const smallest = fixture.cases.filter((c) => c.sidelobeDb === sll && c.achievedDb <= -sll + 0.5).map((c) => c.nbar).sort((x, y) => x - y)[0];
      expect(smallest, `SLL ${sll}`).toBeLessThanOrEqual(rule);
      expect(rule - smallest, `SLL ${sll}`).toBeLessThanOrEqual(2);
    }
  });
});

describe('taylorNbarWarning(nbar, sidelobeDb, outputs)', () => {
  it('n̄ = 2 for 30 dB: a caution naming the reached level (−25.7 dB) and the rule (n̄ ≥ 4), on the given outputs', () => {
    const w = taylorNbarWarning(2, 30, ['sidelobeDb'])!;
    expect(w.code).toBe('taylor-nbar-too-small');
    expect(w.severity).toBe('caution');
    expect(w.message).toContain('−25.7 dB');
    expect(w.message).toContain('n̄ ≥ 4');
    expect(w.outputs).toEqual(['sidelobeDb']);
    expect(taylorNbarWarning(1, 30, [])!.message).toContain('−13.3 dB');
  });
  it('no warning when n̄ reaches the level within 0.5 dB (30 dB: n̄ = 3 reaches −30.18 dB, SciPy fixture)', () => {
    for (const nbar of [3, 4, 5, 8]) expect(taylorNbarWarning(nbar, 30, [])).toBeNull();
  });
});
