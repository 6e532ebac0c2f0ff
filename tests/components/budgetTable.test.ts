import { describe, expect, it } from 'vitest';
import { computeLinkBudget, createLinkBudgetCalculator } from '../../calc/calculators/linkBudget';
import { createRangeExposureCalculator } from '../../calc/calculators/rangeExposure';
import { defaultTexts, validateAll } from '../../components/frame/calculatorModel';
import { decodeState } from '../../components/frame/urlState';
import { teamConventions } from '../../site/conventions';
import { BUDGET_COLUMNS, budgetMarkdown, budgetRows, exposureQuery } from '../../components/calculators/budgetTable';

const def = createLinkBudgetCalculator(teamConventions);
const result = computeLinkBudget(validateAll(def, decodeState(def, def.examples[0].query).texts).inputs!);

describe('link budget table', () => {
  it('has one row per budget line, signed values on terms, none on subtotals, and no NaN', () => {
    const rows = budgetRows(result.data);
    expect(rows.map((r) => r.id)).toEqual(result.data.lines.map((l) => l.id));
    expect(rows.find((r) => r.id === 'transmit-gain')!.value).toBe('+25.00 dBi');
    expect(rows.find((r) => r.id === 'transmit-feeder')!.value).toBe('−0.50 dB');
    expect(rows.find((r) => r.id === 'eirp')!.value).toBe('');
    expect(rows.find((r) => r.id === 'eirp')!.total).toMatch(/ dBW$/);
    expect(rows.find((r) => r.id === 'cn0')!.total).toMatch(/ dB·Hz$/);
    for (const r of rows) expect(`${r.value} ${r.total}`).not.toMatch(/NaN|Infinity|undefined/);
  });
  it('the margin row shows the margin output to 0.01 dB', () => {
    const margin = budgetRows(result.data).at(-1)!;
    expect(margin.id).toBe('margin');
    expect(margin.total).toBe(`${(result.values.marginDb as number).toFixed(2).replace('-', '−')} dB`);
  });
  it('copies as a Markdown table with every line, subtotals in bold', () => {
    const md = budgetMarkdown(budgetRows(result.data));
    const lines = md.split('\n');
    expect(lines[2]).toBe(`| ${BUDGET_COLUMNS.join(' | ')} |`);
    expect(lines.length).toBe(4 + result.data.lines.length);
    expect(md).toContain('| **EIRP on the beam axis** |');
    expect(md).toContain('| **Margin** |');
  });
  it('the exposure link carries the same EIRP to the range & exposure page (its EIRP output equals this one)', () => {
    const exposure = createRangeExposureCalculator(teamConventions);
    const decoded = decodeState(exposure, exposureQuery(result.data));
    expect(decoded.notices).toEqual([]);
    const { inputs } = validateAll(exposure, { ...defaultTexts(exposure), ...decoded.texts });
    const eirpW = exposure.compute(inputs!).values.eirpW as number;
    expect(Math.abs(10 * Math.log10(eirpW) - (result.values.eirpDbw as number))).toBeLessThan(0.01);
  });
});
