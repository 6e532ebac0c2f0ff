import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launch, openPage, outputText, siteUrl, typeInto, waitForCalculator, closeClean } from './browser';

const ID = 'end-fire-length';
const PLOT = '[data-plot="gain-against-length"]';
let browser: Browser;

beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

const seriesPath = (page: Page, id: string) => page.locator(`${PLOT} path[data-series="${id}"]`).getAttribute('d');
const designLabel = async (page: Page) => (await page.locator(`${PLOT} .plot-refs text`).allTextContents()).find((t) => t.startsWith('this design')) ?? '';

describe('end-fire length calculator in Chromium', () => {
  it('is rendered on the server: the default Yagi–Uda result (2.2 λ boom: 12.25 dBd, NBS TN 688 from memory) is in the HTML', async () => {
    const html = await (await fetch(siteUrl('calculators/end-fire-length/'))).text();
    expect(html).toMatch(/data-output="gainDbd"[\s\S]*?12\.25[\s\S]*?dBd/);
    expect(html).toContain('data-plot="gain-against-length"');
  });

  it('changing the boom updates results, warnings and the chart; a bad boom gives a message at the field and stale results; the link restores the state', async () => {
    const { page, outside, errors, context } = await openPage(browser);
    await page.goto(siteUrl('calculators/end-fire-length/'));
    await waitForCalculator(page, ID);
    expect(await outputText(page, 'gainDbi')).toMatch(/^(⚠ )?14\.40 dBi$/); // ⚠ marks a row a warning concerns
    const aperturePathBefore = await seriesPath(page, 'aperture');
    expect(await designLabel(page)).toContain('2.2 λ');

    await typeInto(page, ID, 'len', '10 λ');
    await expect.poll(() => outputText(page, 'lengthWavelengths')).toMatch(/(^| )10 λ$/);
    expect(await outputText(page, 'gainDbi')).not.toMatch(/14\.40 dBi/);
    await expect.poll(() => page.locator('[data-code="yagi-extrapolated-long"]').count()).toBe(1);
    await expect.poll(() => seriesPath(page, 'aperture')).not.toBe(aperturePathBefore); // the length axis grew
    expect(await designLabel(page)).toContain('10 λ');
    const gainAt10 = await outputText(page, 'gainDbi');

    await typeInto(page, ID, 'len', '30 λ');
    await expect.poll(() => page.locator(`#${ID}-len-msg`).innerText()).toMatch(/boom from 0\.2 λ to 10 λ/);
    await expect.poll(() => page.locator('[data-testid="stale"]').count()).toBe(1);
    expect(await page.locator(`#${ID}-len`).getAttribute('aria-invalid')).toBe('true');
    expect(await outputText(page, 'gainDbi')).toBe(gainAt10); // last good result still shown
    await typeInto(page, ID, 'len', '2.2 furlongs');
    await expect.poll(() => page.locator(`#${ID}-len-msg`).innerText()).toMatch(/Unknown unit/);
    expect(await page.locator('body').innerText()).not.toMatch(/\bNaN\b|Infinity/);

    await typeInto(page, ID, 'len', '4 λ');
    await page.selectOption(`#${ID}-type`, 'hansenWoodyard');
    await typeInto(page, ID, 'd', '0.2 λ');
    await expect.poll(() => outputText(page, 'elementCount')).toMatch(/(^| )21$/);
    await expect.poll(() => page.url(), { timeout: 5000 }).toContain('d=0.2lambda'); // the link follows the last edit
    expect(page.url()).toContain('len=4lambda');
    expect(page.url()).toContain('type=hansenWoodyard');
    const gainHw = await outputText(page, 'gainDbi');
    const link = page.url();

    const second = await openPage(browser);
    await second.page.goto(link);
    await waitForCalculator(second.page, ID);
    expect(await second.page.locator(`#${ID}-type`).inputValue()).toBe('hansenWoodyard');
    expect(await second.page.locator(`#${ID}-len`).inputValue()).toBe('4 λ');
    expect(await second.page.locator(`#${ID}-d`).inputValue()).toBe('0.2 λ');
    expect(await outputText(second.page, 'gainDbi')).toBe(gainHw);
    expect(await second.page.locator('[data-testid="link-notices"]').count()).toBe(0);
    await closeClean(second);

    await closeClean({ outside, errors, context });
  });

  it('solves for the length of a target gain and shows stacking figures for Yagi bays', async () => {
    const { page, outside, errors, context } = await openPage(browser);
    await page.goto(siteUrl('calculators/end-fire-length/?v=1&f=145MHz&type=yagi&solve=length&g=16dBi&bays=4'));
    await waitForCalculator(page, ID);
    expect(await outputText(page, 'gainDbi')).toMatch(/16\.00 dBi$/);
    // A rule-of-thumb figure is shown to 0.1 dB (the output's decimals), which is what it supports.
    expect(await outputText(page, 'stackLowDbi')).toMatch(/21\.0 dBi$/);
    expect(await page.locator('[data-code="stacking-practice"]').count()).toBe(1);
    await typeInto(page, ID, 'g', '17 dBi');
    await expect.poll(() => outputText(page, 'gainDbi')).toMatch(/17\.00 dBi$/);
    await closeClean({ outside, errors, context });
  });
});
