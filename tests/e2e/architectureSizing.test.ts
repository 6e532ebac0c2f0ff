import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launch, openPage, outputText, siteUrl, typeInto, waitForCalculator, closeClean } from './browser';

let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

describe('architecture sizing in Chromium', () => {
  it('sizes every architecture with flags, to scale, and copies the whole table as Markdown', async () => {
    const { page, outside, errors, context } = await openPage(browser);
    await page.goto(siteUrl('calculators/architecture-sizing/'));
    await waitForCalculator(page, 'architecture-sizing');
    await typeInto(page, 'architecture-sizing', 'g', '34 dBi');
    await typeInto(page, 'architecture-sizing', 'sel', '20 deg');
    await typeInto(page, 'architecture-sizing', 'maxsize', '1.5 m');
    await expect.poll(() => page.url(), { timeout: 8000 }).toContain('maxsize=1.5m');
    const ids = await page.locator('[data-testid="sizing-table"] tr.candidate-row').evaluateAll((rows) => rows.map((r) => r.getAttribute('data-candidate')));
    for (const id of ['reflector', 'linearArray', 'planarArray', 'ringArray', 'yArray']) expect(ids).toContain(id);
    // the linear array cannot scan in elevation and is longer than 1.5 m
    const linearStatus = await page.locator('[data-status="linearArray"]').innerText();
    expect(linearStatus).toMatch(/azimuth only/);
    expect(linearStatus).toMatch(/size limit/);
    // coverage is stated once for every candidate, with the corner: acos(cos 45° · cos 20°) = acos(0.6645) = 48.4° (hand-worked)
    expect(await page.locator('[data-testid="coverage-statement"]').innerText()).toMatch(/±45° in azimuth × ±20° in elevation.*48\.4°/);
    // the recommendation rule is on the page
    expect(await page.locator('[data-testid="recommendation-rule"]').innerText()).toMatch(/smallest footprint/);
    // a candidate that does not fit is marked in the table, in the sketch and in the results (the 34 dBi Yagi–Uda is impractical)
    expect(await page.locator('tr.candidate-row[data-candidate="endFire"]').getAttribute('data-fits')).toBe('no');
    expect(await page.locator('tr.candidate-row[data-candidate="endFire"] th').innerText()).toMatch(/✖/);
    expect(await page.locator('[data-plot="outline-sketch"] [data-candidate="endFire"]').textContent()).toMatch(/✖/);
    expect(await page.locator('[data-output="endFireLengthM"] .flag').count()).toBe(1);
    // one candidate is recommended and marked without colour alone (★ and the word)
    expect(await page.locator('tr.candidate-row.chosen').count()).toBe(1);
    expect(await page.locator('tr.candidate-row.chosen th').innerText()).toMatch(/★/);
    expect(await page.locator('[data-plot="outline-sketch"] [data-candidate]').count()).toBe(ids.length);
    await context.grantPermissions(['clipboard-read', 'clipboard-write']);
    await page.getByRole('button', { name: 'Copy as Markdown' }).click();
    await expect.poll(() => page.locator('.share-status').innerText()).toBe('Markdown copied.');
    const md = await page.evaluate(() => navigator.clipboard.readText());
    expect(md).toContain('| Architecture | Largest dimension |');
    expect(md).toContain('Planar phased array');
    expect(md).toContain('Coverage for every candidate');
    expect(md).toContain('smallest footprint');
    await closeClean({ outside, errors, context });
  });

  it('follows the link from range to sizing and carries the gain over', async () => {
    const { page, outside, errors, context } = await openPage(browser);
    await page.goto(siteUrl('calculators/range-exposure/?v=1&f=5.8GHz&solve=gain&pt=1W&gt=20dBi&gr=20dBi&preq=-85dBm&loss=3dB&r=60km&eta=0.6&lim=icnirp2020-public'));
    await waitForCalculator(page, 'range-exposure');
    const needed = await outputText(page, 'requiredTxGainDbi'); // e.g. "31.43 dBi"
    const link = page.locator('[data-testid="to-sizing"]');
    const neededDbi = parseFloat(needed.replace('−', '-'));
    const linkDbi = parseFloat(/for (−?[\d.]+) dBi/.exec(await link.innerText())![1].replace('−', '-'));
    expect(Math.abs(linkDbi - neededDbi)).toBeLessThanOrEqual(0.05);
    await link.click();
    await waitForCalculator(page, 'architecture-sizing');
    const gainField = await page.locator('#architecture-sizing-g').inputValue();
    expect(Math.abs(parseFloat(gainField) - neededDbi)).toBeLessThan(0.006);
    expect(await page.locator('#architecture-sizing-f').inputValue()).toBe('5800000000 Hz');
    expect(await page.locator('[data-testid="link-notices"]').count()).toBe(0);
    await closeClean({ outside, errors, context });
  });
});
