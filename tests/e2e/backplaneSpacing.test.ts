import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launch, openPage, outputText, siteUrl, typeInto, waitForCalculator, closeClean } from './browser';

const ID = 'backplane-spacing';
let browser: Browser;

beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

const path = (page: Page, plot: string, series: string) => page.locator(`[data-plot="${plot}"] path[data-series="${series}"]`).getAttribute('d');

describe('backplane spacing calculator in Chromium', () => {
  it('is rendered on the server: λ/4 at 10 GHz (7.4948 mm, c exact) and the three plots are in the HTML', async () => {
    const html = await (await fetch(siteUrl('calculators/backplane-spacing/'))).text();
    expect(html).toMatch(/data-output="quarterWaveFreeM"[\s\S]*?7\.494[\s\S]*?mm/);
    for (const plot of ['broadside-image-factor-against-frequency', 'image-factor-against-angle-at-the-band-edges', 'broadside-directivity-against-spacing']) expect(html).toContain(`data-plot="${plot}"`);
    expect(html).toContain('Finite backplanes');
  });

  it('changing the band updates results and plots; a reversed band gives a message at the field and stale results; the link restores the state', async () => {
    const { page, outside, errors, context } = await openPage(browser);
    await page.goto(siteUrl('calculators/backplane-spacing/'));
    await waitForCalculator(page, ID);
    expect(await outputText(page, 'broadsideDesignDb')).toBe('6.02 dB');
    const highBefore = await outputText(page, 'broadsideHighDb');
    const freqPathBefore = await path(page, 'broadside-image-factor-against-frequency', 'chosen');
    const anglePathBefore = await path(page, 'image-factor-against-angle-at-the-band-edges', 'high');
    const flattestBefore = await outputText(page, 'flattestSpacingM');

    await typeInto(page, ID, 'fhi', '14 GHz');
    await expect.poll(() => outputText(page, 'broadsideHighDb')).not.toBe(highBefore);
    await expect.poll(() => path(page, 'broadside-image-factor-against-frequency', 'chosen')).not.toBe(freqPathBefore);
    expect(await path(page, 'image-factor-against-angle-at-the-band-edges', 'high')).not.toBe(anglePathBefore);
    expect(await outputText(page, 'flattestSpacingM')).not.toBe(flattestBefore);
    await expect.poll(() => page.locator('[data-code="band-beyond-1db"]').count()).toBe(1);
    const highAfter = await outputText(page, 'broadsideHighDb');

    await typeInto(page, ID, 'fhi', '8 GHz'); // below the 9 GHz low edge
    await expect.poll(() => page.locator(`#${ID}-fhi-msg`).innerText()).toMatch(/above the band low edge/);
    await expect.poll(() => page.locator('[data-testid="stale"]').count()).toBe(1);
    expect(await page.locator(`#${ID}-fhi`).getAttribute('aria-invalid')).toBe('true');
    expect(await outputText(page, 'broadsideHighDb')).toBe(highAfter);
    expect(await page.locator('body').innerText()).not.toMatch(/\bNaN\b|Infinity/);

    await typeInto(page, ID, 'fhi', '14 GHz');
    await typeInto(page, ID, 'h', '0.3 λ');
    await typeInto(page, ID, 'er', '2.2');
    await expect.poll(() => page.locator('[data-code="spacer-approximation"]').count()).toBe(1);
    await expect.poll(() => page.url(), { timeout: 5000 }).toContain('er=2.2');
    expect(page.url()).toContain('h=0.3lambda');
    expect(page.url()).toContain('fhi=14GHz');
    const directivity = await outputText(page, 'directivityDbi');
    const link = page.url();

    const second = await openPage(browser);
    await second.page.goto(link);
    await waitForCalculator(second.page, ID);
    expect(await second.page.locator(`#${ID}-fhi`).inputValue()).toBe('14 GHz');
    expect(await second.page.locator(`#${ID}-h`).inputValue()).toBe('0.3 λ');
    expect(await second.page.locator(`#${ID}-er`).inputValue()).toBe('2.2');
    expect(await outputText(second.page, 'directivityDbi')).toBe(directivity);
    expect(await second.page.locator('[data-testid="link-notices"]').count()).toBe(0);
    await closeClean(second);

    await closeClean({ outside, errors, context });
  });
});
