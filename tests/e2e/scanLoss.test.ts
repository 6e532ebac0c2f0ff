import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launch, openPage, outputText, siteUrl, typeInto, waitForCalculator, closeClean } from './browser';

const ID = 'scan-loss';
let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

describe('scan-loss estimate in Chromium', () => {
  it('splits the loss, plots it, follows the element model and restores from its link', async () => {
    const { page, outside, errors, context } = await openPage(browser);
    await page.goto(siteUrl('calculators/scan-loss/'));
    await waitForCalculator(page, ID);
    // projected aperture at 45°: 10·log10(cos 45°) = −1.51 dB (Mailloux §2.1 (section number from memory))
    expect(await outputText(page, 'projectedDb')).toBe('−1.51 dB');
    const pathBefore = await page.locator('[data-plot="gain-change-against-scan-angle"] path[data-series="total"]').getAttribute('d');

    await typeInto(page, ID, 'scan', '60 deg');
    await expect.poll(() => outputText(page, 'projectedDb')).toBe('−3.01 dB');
    expect(await outputText(page, 'broadeningCosineLaw')).toBe('2 ×');

    await page.selectOption(`#${ID}-el`, 'currentSheet');
    // Wheeler (1965): |Γ| = tan²30° = 1/3 → −0.51 dB
    await expect.poll(() => outputText(page, 'mismatchDb')).toBe('−0.51 dB');
    const pathAfter = await page.locator('[data-plot="gain-change-against-scan-angle"] path[data-series="total"]').getAttribute('d');
    expect(pathAfter).not.toBe(pathBefore);

    await typeInto(page, ID, 'gt', '40 dB');
    await expect.poll(() => page.locator('[data-output="areaGrowth"]').count()).toBe(1);

    await typeInto(page, ID, 'd', '0.9 λ');
    await expect.poll(() => page.locator('[data-code="grating-lobe-in-scan"]').count()).toBe(1);

    await expect.poll(() => page.url()).toContain('d=0.9lambda');
    const second = await openPage(browser);
    await second.page.goto(page.url());
    await waitForCalculator(second.page, ID);
    expect(await second.page.locator(`#${ID}-el`).inputValue()).toBe('currentSheet');
    expect(await outputText(second.page, 'mismatchDb')).toBe('−0.51 dB');
    await second.context.close();

    await typeInto(page, ID, 'nexp', '-2');
    await expect.poll(() => page.locator(`#${ID}-nexp-msg`).innerText()).toMatch(/Out of range/);
    await closeClean({ outside, errors, context });
  });

  it('an old link with an element exponent below 1 opens, with a warning naming the bound n ≥ 1', async () => {
    const { page, outside, errors, context } = await openPage(browser);
    await page.goto(siteUrl(`calculators/scan-loss/?v=1&f=10GHz&el=cosine&nexp=0.7&scan=60deg`));
    await waitForCalculator(page, ID);
    expect(await page.locator('[data-testid="link-notices"]').count()).toBe(0);
    expect(await page.locator(`#${ID}-nexp`).inputValue()).toBe('0.7');
    const warning = page.locator('[data-code="element-exponent-below-one"]');
    await expect.poll(() => warning.count()).toBe(1);
    expect(await warning.innerText()).toMatch(/n ≥ 1/);
    await closeClean({ outside, errors, context });
  });
});
