import { describe, expect, it } from 'vitest';
import { createReflectorCalculator } from '../../calc/calculators/reflector';
import { createLinkBudgetCalculator } from '../../calc/calculators/linkBudget';
import { spilloverGroundFraction } from '../../calc/link/noiseTemperature';
import { defaultTexts, validateAll } from '../../components/frame/calculatorModel';
import { decodeState } from '../../components/frame/urlState';
import { teamConventions } from '../../site/conventions';
import { linkBudgetQueryFromReflector } from '../../components/calculators/linkBudgetLink';

const reflector = createReflectorCalculator(teamConventions);
const budget = createLinkBudgetCalculator(teamConventions);

/** The reflector at diameter d, carried into the link budget as the page's link does. */
function budgetFromDish(diameterText: string) {
  const { inputs, fields } = validateAll(reflector, { ...defaultTexts(reflector), d: diameterText });
  const v = reflector.compute(inputs!).values;
  const f = fields.f;
  if (!f.ok) throw new Error('frequency');
  const query = linkBudgetQueryFromReflector({ frequencyCanonical: f.canonical, gainDbi: v.gainDbi as number, diameterM: v.diameterM as number, hpbwDeg: v.hpbwDeg, spilloverPercent: v.spilloverPercent });
  const decoded = decodeState(budget, query);
  const state = validateAll(budget, { ...defaultTexts(budget), ...decoded.texts });
  return { query, notices: decoded.notices, dish: v, inputs: state.inputs!, result: budget.compute(state.inputs!) };
}

describe('"use this antenna in a link budget" from the reflector', () => {
  it('opens the link budget without notices, with the dish’s gain, beamwidth, diameter and spillover ground share', () => {
    const { query, notices, dish, inputs } = budgetFromDish('1.2 m');
    expect(notices).toEqual([]);
    expect(query).toMatch(/^\?v=1&f=/);
    expect(inputs.receiveGainDbi).toBeCloseTo(dish.gainDbi as number, 2);
    expect(inputs.largestApertureM).toBeCloseTo(1.2, 9);
    expect(inputs.receiveBeamwidthDeg).toBeCloseTo(dish.hpbwDeg as number, 3);
    expect(inputs.groundFraction).toBeCloseTo(spilloverGroundFraction((dish.spilloverPercent as number) / 100), 4);
    expect(inputs.receiveVswr).toBe(1);
    expect(inputs.frequencyHz).toBe(teamConventions.designFrequencyHz);
  });
  it('a larger dish raises G/T and margin by its extra gain (same f/D and feed: same spillover, same T_sys)', () => {
    const small = budgetFromDish('1.2 m');
    const large = budgetFromDish('2.4 m');
    const extraGainDb = (large.dish.gainDbi as number) - (small.dish.gainDbi as number);
    expect(extraGainDb).toBeGreaterThan(5);
    expect(large.result.values.systemNoiseTemperatureK).toBeCloseTo(small.result.values.systemNoiseTemperatureK as number, 6);
    // the link carries the gain to 0.01 dB
    expect(Math.abs((large.result.values.gOverTDbPerK as number) - (small.result.values.gOverTDbPerK as number) - extraGainDb)).toBeLessThanOrEqual(0.01);
    expect(large.result.values.marginDb as number).toBeGreaterThan(small.result.values.marginDb as number);
  });
  it('spillover ground share: half of what spills, by default (common practice, no source)', () => {
    expect(spilloverGroundFraction(0.9)).toBeCloseTo(0.05, 12);
    expect(spilloverGroundFraction(0.9, 1)).toBeCloseTo(0.1, 12);
    expect(() => spilloverGroundFraction(1.2)).toThrow(/spilloverEfficiency/);
  });
});
