import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launch, openPage, outputText, siteUrl, typeInto, waitForCalculator, closeClean } from './browser';

const ID = 'wavelength-spacing';
let browser: Browser;

beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

describe('wavelength & spacing calculator in Chromium', () => {
  it('is rendered on the server: default results are in the HTML before any JavaScript', async () => {
    const html = await (await fetch(siteUrl('calculators/wavelength-spacing/'))).text();
    // λ0 at 10 GHz = 2.9979 cm (c exact, SI)
    expect(html).toMatch(/data-output="lambda0High"[\s\S]*?2\.9979[\s\S]*?cm/);
    expect(html).toContain('class="katex"');
    expect(html).not.toContain('katex.min.js');
  });

  it('computes as the user types, marks a bad entry at the field, keeps stale results, and updates the link', async () => {
    const { page, outside, errors, context } = await openPage(browser);
    await page.goto(siteUrl('calculators/wavelength-spacing/'));
    await waitForCalculator(page, ID);
    expect(await outputText(page, 'lambda0High')).toBe('2.9979 cm');

    await typeInto(page, ID, 'f', '12 GHz');
    await expect.poll(() => outputText(page, 'lambda0High')).toBe('2.4983 cm');
    expect(await page.locator(`#${ID}-f-msg`).innerText()).toContain('= 12 GHz');

    await typeInto(page, ID, 'f', '12 GHzz');
    await expect.poll(() => page.locator(`#${ID}-f-msg`).innerText()).toMatch(/Unknown unit "GHzz"/);
    await expect.poll(() => page.locator('[data-testid="stale"]').count()).toBe(1);
    expect(await page.locator(`#${ID}-f`).getAttribute('aria-invalid')).toBe('true');
    expect(await outputText(page, 'lambda0High')).toBe('2.4983 cm'); // last good result still shown
    const body = await page.locator('body').innerText();
    expect(body).not.toMatch(/\bNaN\b|Infinity/);

    await typeInto(page, ID, 'f', '12 GHz');
    await typeInto(page, ID, 'lat', '');
    await page.selectOption(`#${ID}-lat`, 'rectangular');
    await typeInto(page, ID, 'd', '0.7 λ');
    await expect.poll(() => page.locator('[data-code="grating-lobe-in-scan-range"]').count()).toBe(1);
    await expect.poll(() => page.locator('[data-plot="grating-lobe-onset-against-frequency"] path[data-series="rect"]').count()).toBe(1);

    await expect.poll(() => page.url(), { timeout: 5000 }).toContain('d=0.7lambda');
    expect(page.url()).toContain('f=12GHz');
    expect(page.url()).toContain('lat=rectangular');
    expect(page.url()).toContain('v=1');

    await page.getByRole('button', { name: 'Copy link' }).click();
    await expect.poll(() => page.locator('.share-status').innerText()).toBe('Link copied.');
    const copied = await page.evaluate(() => navigator.clipboard.readText());
    expect(copied).toContain('f=12GHz');

    await page.getByRole('button', { name: 'Copy as Markdown' }).click();
    await expect.poll(() => page.locator('.share-status').innerText()).toBe('Markdown copied.');
    const markdown = await page.evaluate(() => navigator.clipboard.readText());
    expect(markdown).toContain('| Frequency (or band low edge) | 12 GHz |');
    expect(markdown).toContain('| Free-space wavelength λ₀ (highest frequency) | 2.4983 cm |');
    expect(markdown).toContain(`(${copied})`);

    // The copied link restores the exact state in a new browser context.
    const second = await openPage(browser);
    await second.page.goto(copied);
    await waitForCalculator(second.page, ID);
    expect(await second.page.locator(`#${ID}-f`).inputValue()).toBe('12 GHz');
    expect(await second.page.locator(`#${ID}-d`).inputValue()).toBe('0.7 λ');
    expect(await second.page.locator(`#${ID}-lat`).inputValue()).toBe('rectangular');
    expect(await outputText(second.page, 'lambda0High')).toBe('2.4983 cm');
    expect(await second.page.locator('[data-testid="link-notices"]').count()).toBe(0);
    await closeClean(second);

    await closeClean({ outside, errors, context });
  });

  it('a broken link gives notices, falls back field by field, and the page keeps working', async () => {
    const { page, outside, errors, context } = await openPage(browser);
    await page.goto(siteUrl('calculators/wavelength-spacing/?v=1&f=banana&scan=30deg&lat=hexagonal&zz=9'));
    await waitForCalculator(page, ID);
    const notices = await page.locator('[data-testid="link-notices"]').innerText();
    expect(notices).toMatch(/banana/);
    expect(notices).toMatch(/Unknown setting "zz"/);
    expect(notices).toMatch(/Lattice/);
    expect(await page.locator(`#${ID}-scan`).inputValue()).toBe('30 deg');
    expect(await page.locator(`#${ID}-f`).inputValue()).toBe('10 GHz');
    expect(await outputText(page, 'lambda0High')).toBe('2.9979 cm');
    await typeInto(page, ID, 'f', '3 GHz');
    await expect.poll(() => outputText(page, 'lambda0High')).toBe('9.9931 cm');
    await closeClean({ outside, errors, context });
  });

  it('works from the keyboard: tab into a field, type, results follow', async () => {
    const { page, context } = await openPage(browser);
    await page.goto(siteUrl('calculators/wavelength-spacing/'));
    await waitForCalculator(page, ID);
    await page.locator(`#${ID}-f`).focus();
    await page.keyboard.press('Tab'); // to the band high edge
    await page.keyboard.type('11 GHz');
    await expect.poll(() => outputText(page, 'lambda0Low')).toBe('2.9979 cm');
    await expect.poll(() => outputText(page, 'lambda0High')).toBe('2.7254 cm');
    // every input has a visible label
    const unlabeled = await page.evaluate(() =>
      [...document.querySelectorAll('.calc input, .calc select')].filter((el) => !document.querySelector(`label[for="${el.id}"]`)).length,
    );
    expect(unlabeled).toBe(0);
    await context.close();
  });

  it('the Conventions page shows the team defaults the calculator used', async () => {
    const { page, outside, context } = await openPage(browser);
    await page.goto(siteUrl('conventions/'));
    const table = await page.locator('[data-testid="conventions-table"]').innerText();
    expect(table).toMatch(/spacingMarginFraction\s+5 % below the limit/);
    expect(table).toMatch(/maxScanDeg\s+45°/);
    await page.goto(siteUrl('calculators/wavelength-spacing/'));
    await waitForCalculator(page, ID);
    expect(await page.locator(`#${ID}-scan`).inputValue()).toBe('45 deg');
    expect(await page.locator('[data-output="recommendedM"] th').innerText()).toContain('5 % below the limit');
    expect(outside).toEqual([]);
    await context.close();
  });

  it('prints as a one-page record with inputs, results, formulas and the link', async () => {
    const { page, context } = await openPage(browser);
    await page.goto(siteUrl('calculators/wavelength-spacing/?v=1&f=8GHz&fhi=12GHz&d=1.5cm&w=50cm'));
    await waitForCalculator(page, ID);
    await page.emulateMedia({ media: 'print' });
    expect(await page.locator('.share-link a').isVisible()).toBe(true);
    expect(await page.locator('.formula').first().isVisible()).toBe(true);
    expect(await page.locator('.site-nav').isVisible()).toBe(false);
    const pdf = (await page.pdf({ format: 'A4', printBackground: true })).toString('latin1');
    const pages = pdf.match(/\/Type\s*\/Page[^s]/g) ?? [];
    expect(pages.length).toBe(1);
    await context.close();
  });

  it('every page loads only from its own origin, under the /rf/ sub-path, in both themes', async () => {
    for (const scheme of ['light', 'dark'] as const) {
      const { page, outside, errors, context } = await openPage(browser, { colorScheme: scheme });
      for (const path of ['', 'conventions/', 'calculators/wavelength-spacing/']) {
        const response = await page.goto(siteUrl(path));
        expect(response?.status(), path).toBe(200);
        await page.waitForLoadState('networkidle');
      }
      await closeClean({ outside, errors, context });
    }
  });
});
