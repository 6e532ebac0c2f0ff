import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launch, openPage, outputText, siteUrl, typeInto, waitForCalculator, closeClean } from './browser';

const ID = 'range-exposure';
let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

describe('link range & RF exposure in Chromium', () => {
  it('shows the exposure caution, computes range and exposure distances, and restores from its link', async () => {
    const { page, outside, errors, context } = await openPage(browser);
    await page.goto(siteUrl('calculators/range-exposure/'));
    await waitForCalculator(page, ID);
    // the caution is on the page and with the results
    expect(await page.locator('.safety').innerText()).toMatch(/local regulations/);
    expect(await page.locator('[data-code="exposure-caution"]').innerText()).toMatch(/Never look into or stand in front/);
    // 10 W into 30 dBi = 10 kW EIRP; 10 W/m² (ICNIRP 2020 public above 2 GHz): √(10⁴/(40π)) = 8.92 m (hand-worked)
    expect(await outputText(page, 'eirpW')).toBe('10 kW');
    expect(await outputText(page, 'distanceToLimitM')).toBe('8.92 m');
    // P.525 and Friis path loss agree within 0.05 dB
    const friis = parseFloat(await outputText(page, 'fsplDb'));
    const p525 = parseFloat(await outputText(page, 'p525LossDb'));
    expect(Math.abs(friis - p525)).toBeLessThan(0.06);

    await typeInto(page, ID, 'pt', '100 W');
    await expect.poll(() => outputText(page, 'distanceToLimitM')).toBe('28.2 m');
    await typeInto(page, ID, 'dant', '1.2 m');
    await expect.poll(() => page.locator('[data-output="apertureDistanceToLimitM"]').count()).toBe(1);
    await expect.poll(() => page.locator('[data-plot="on-axis-power-density-against-distance"] path[data-series="aperture"]').count()).toBe(1);
    // One antenna description: 30 dBi from a 1.2 m aperture at 10 GHz implies η = 1000/(π·1.2/0.02998)² = 6.32 % (hand-worked);
    // the η field (team default) gives far more gain, so the page flags the difference and says what it uses.
    await expect.poll(() => outputText(page, 'impliedEfficiencyPercent')).toBe('6.32 %');
    expect(await page.locator('[data-code="gain-aperture-mismatch"]').innerText()).toMatch(/use the entered gain/);
    await typeInto(page, ID, 'dant', '0.1 m');
    await expect.poll(() => page.locator(`#${ID}-dant-msg`).innerText()).toMatch(/at most .* dBi/);
    await typeInto(page, ID, 'dant', '1.2 m');
    await expect.poll(() => page.locator('[data-testid="stale"]').count()).toBe(0);

    await typeInto(page, ID, 'solve', '');
    await page.selectOption(`#${ID}-solve`, 'gain');
    await expect.poll(() => page.locator('[data-output="requiredTxGainDbi"]').count()).toBe(1);
    await expect.poll(() => page.url()).toContain('solve=gain');

    const link = page.url();
    const second = await openPage(browser);
    await second.page.goto(link);
    await waitForCalculator(second.page, ID);
    expect(await second.page.locator(`#${ID}-pt`).inputValue()).toBe('100 W');
    expect(await second.page.locator(`#${ID}-dant`).inputValue()).toBe('1.2 m');
    expect(await second.page.locator(`#${ID}-solve`).inputValue()).toBe('gain');
    expect(await outputText(second.page, 'requiredTxGainDbi')).toBe(await outputText(page, 'requiredTxGainDbi'));
    await second.context.close();

    await typeInto(page, ID, 'pt', 'lots');
    await expect.poll(() => page.locator(`#${ID}-pt-msg`).innerText()).toMatch(/Not a number/);
    expect(await page.locator('[data-testid="stale"]').count()).toBe(1);
    await closeClean({ outside, errors, context });
  });
});
