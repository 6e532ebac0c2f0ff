import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launch, openPage, outputText, siteUrl, typeInto, waitForCalculator, closeClean } from './browser';
import { createLinkBudgetCalculator } from '../../calc/calculators/linkBudget';
import { defaultTexts, validateAll } from '../../components/frame/calculatorModel';
import { formatOutput } from '../../components/frame/format';
import { teamConventions } from '../../site/conventions';

const ID = 'link-budget';
const def = createLinkBudgetCalculator(teamConventions);
/** An output at the defaults as the page formats it (computed by calc/ here, compared with the page). */
function expectedAtDefaults(key: string): string {
  const v = def.compute(validateAll(def, defaultTexts(def)).inputs!).values[key] as number;
  const f = formatOutput(def.outputs.find((o) => o.key === key)!, v);
  return `${f.text} ${f.unit}`.trim();
}

let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

describe('link budget in Chromium', () => {
  it('shows the exposure caution, the budget table and margin, flags bad input at the field, copies the table, and restores from its link', async () => {
    const { page, outside, errors, context } = await openPage(browser);
    await page.goto(siteUrl('calculators/link-budget/'));
    await waitForCalculator(page, ID);
    expect(await page.locator('.safety').innerText()).toMatch(/Link range & RF exposure.*local regulations/s);
    expect(await page.locator('[data-code="exposure-caution"]').innerText()).toMatch(/Never look into/);
    expect(await outputText(page, 'marginDb')).toBe(expectedAtDefaults('marginDb'));
    expect(await outputText(page, 'gOverTDbPerK')).toBe(expectedAtDefaults('gOverTDbPerK'));
    expect(await page.locator('[data-testid="budget-table"] tr[data-line]').count()).toBeGreaterThan(20);
    expect(await page.locator('[data-total="margin"]').innerText()).toBe(expectedAtDefaults('marginDb'));
    expect(await page.locator('[data-testid="to-exposure"]').getAttribute('href')).toMatch(/calculators\/range-exposure\/\?v=1&f=.*&pt=.*&gt=/);

    // bad input: a message at the field, stale results, never NaN
    await typeInto(page, ID, 'nf', '-1 dB');
    await expect.poll(() => page.locator(`#${ID}-nf-msg`).innerText()).toMatch(/Out of range/);
    expect(await page.locator('[data-testid="stale"]').count()).toBe(1);
    await typeInto(page, ID, 'nf', '2 dB');
    await typeInto(page, ID, 'bw', '0 Hz');
    await expect.poll(() => page.locator(`#${ID}-bw-msg`).innerText()).toMatch(/Out of range: expected a value above 0/);
    await typeInto(page, ID, 'bw', '10 MHz');
    await expect.poll(() => page.locator('[data-testid="stale"]').count()).toBe(0);
    expect(await page.locator('.calc-outputs').innerText()).not.toMatch(/NaN|Infinity/);

    // a longer range lowers the margin by the extra path loss, and the link keeps it
    await typeInto(page, ID, 'r', '80 km');
    await expect.poll(() => page.url()).toContain('r=80km');
    const before = parseFloat(expectedAtDefaults('marginDb').replace('−', '-'));
    await expect.poll(async () => parseFloat((await outputText(page, 'marginDb')).replace('−', '-'))).toBeCloseTo(before - 20 * Math.log10(2), 1);

    await context.grantPermissions(['clipboard-read', 'clipboard-write']);
    await page.getByRole('button', { name: 'Copy as Markdown' }).click();
    await expect.poll(() => page.locator('.share-status').innerText()).toBe('Markdown copied.');
    const md = await page.evaluate(() => navigator.clipboard.readText());
    expect(md).toContain('| Line | Value | Running total |');
    expect(md).toContain('| **Margin** |');

    const link = page.url();
    const second = await openPage(browser);
    await second.page.goto(link);
    await waitForCalculator(second.page, ID);
    expect(await second.page.locator(`#${ID}-r`).inputValue()).toBe('80 km');
    expect(await outputText(second.page, 'marginDb')).toBe(await outputText(page, 'marginDb'));
    await second.context.close();
    await closeClean({ outside, errors, context });
  });

  it('from the reflector page one click opens a link budget with that dish; a larger dish there raises G/T and margin', async () => {
    const { page, outside, errors, context } = await openPage(browser);
    const readBudget = async () => {
      await waitForCalculator(page, ID);
      expect(await page.locator('[data-testid="link-notices"]').count()).toBe(0);
      return {
        gain: await page.locator(`#${ID}-gr`).inputValue(),
        gOverT: parseFloat((await outputText(page, 'gOverTDbPerK')).replace('−', '-')),
        margin: parseFloat((await outputText(page, 'marginDb')).replace('−', '-')),
      };
    };
    await page.goto(siteUrl('calculators/front-fed-reflector/?v=1&d=1.2m'));
    await waitForCalculator(page, 'front-fed-reflector');
    const gainSmall = parseFloat((await outputText(page, 'gainDbi')).replace('−', '-'));
    await page.locator('[data-testid="to-link-budget"]').click();
    const small = await readBudget();
    expect(Math.abs(parseFloat(small.gain) - gainSmall)).toBeLessThan(0.006);

    await page.goBack();
    await waitForCalculator(page, 'front-fed-reflector');
    await typeInto(page, 'front-fed-reflector', 'd', '2.4 m');
    await expect.poll(() => page.url()).toContain('d=2.4m');
    await page.locator('[data-testid="to-link-budget"]').click();
    const large = await readBudget();
    expect(large.gOverT).toBeGreaterThan(small.gOverT + 5);
    expect(large.margin).toBeGreaterThan(small.margin + 5);
    await closeClean({ outside, errors, context });
  });
});

describe('unit & level converter in Chromium', () => {
  it('converts as you type and keeps its state in the URL', async () => {
    const { page, outside, errors, context } = await openPage(browser);
    await page.goto(siteUrl('calculators/unit-converter/'));
    await waitForCalculator(page, 'unit-converter');
    await typeInto(page, 'unit-converter', 'p', '30 dBm');
    await expect.poll(() => outputText(page, 'powerW')).toBe('1 W');
    expect(await outputText(page, 'powerDbw')).toBe('0.00 dBW');
    await typeInto(page, 'unit-converter', 'vswr', '0.8');
    await expect.poll(() => page.locator('#unit-converter-vswr-msg').innerText()).toMatch(/Out of range/);
    await typeInto(page, 'unit-converter', 'vswr', '2');
    await expect.poll(() => outputText(page, 'returnLossDb')).toBe('9.54 dB');
    await expect.poll(() => page.url()).toContain('vswr=2');
    await closeClean({ outside, errors, context });
  });
});
