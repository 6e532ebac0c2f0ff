import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launch, openPage, outputText, siteUrl, typeInto, waitForCalculator, closeClean } from './browser';
import { createReflectorCalculator } from '../../calc/calculators/reflector';
import { teamConventions } from '../../site/conventions';

const ID = 'front-fed-reflector';
const PATTERN_PATH = '[data-plot="far-field-pattern-of-the-on-axis-feed"] path[data-series="pattern"]';
let browser: Browser;

beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

/** The number shown in an output row ("40.31 dBi" → 40.31; the page uses a true minus sign). */
async function outputNumber(page: Page, key: string): Promise<number> {
  const text = await outputText(page, key);
  return Number(text.split(' ')[0].replace('−', '-'));
}

/** Per cent and dB columns of one efficiency-budget row. */
async function budgetRow(page: Page, key: string): Promise<{ percent: number; db: number }> {
  const cells = await page.locator(`[data-testid="efficiency-budget"] [data-budget="${key}"] td`).allInnerTexts();
  const [percent, db] = cells.map((c) => Number(c.trim().replace('−', '-')));
  return { percent, db };
}

describe('front-fed reflector calculator in Chromium', () => {
  it('is rendered on the server: default gain, budget and pattern are in the HTML, formulas by KaTeX, the safety note is shown', async () => {
    const html = await (await fetch(siteUrl(`calculators/${ID}/`))).text();
    expect(html).toMatch(/data-output="gainDbi"[\s\S]*?\d+\.\d\d[\s\S]*?dBi/);
    expect(html).toContain('data-testid="efficiency-budget"');
    expect(html).toContain('data-plot="far-field-pattern-of-the-on-axis-feed"');
    expect(html).toContain('class="katex"');
    expect(html).toMatch(/Never stand in front of an energised dish/);
  });

  it('follows D, feed taper and a bad blockage; the link restores every input in a new context; nothing leaves localhost', async () => {
    const { page, outside, errors, context } = await openPage(browser);
    await page.goto(siteUrl(`calculators/${ID}/`));
    await waitForCalculator(page, ID);
    expect(await page.locator(`#${ID}-d`).inputValue()).toBe('1.2 m');
    expect(await outputText(page, 'gainDbi')).toMatch(/^\d+\.\d\d dBi$/);

    // D 1.2 m → 2.4 m: gain rises by 20·log10(2) = 6.02 dB plus a little, because the same 10 cm
    // blockage shades a smaller share of the larger dish (hand-worked from G = η (πD/λ)²).
    const gain1 = await outputNumber(page, 'gainDbi');
    const hpbw1 = await outputNumber(page, 'hpbwDeg');
    const blockage1 = await budgetRow(page, 'centralBlockage');
    const aperture1 = await budgetRow(page, 'aperture');
    const path1 = await page.locator(PATTERN_PATH).getAttribute('d');
    await typeInto(page, ID, 'd', '2.4 m');
    await expect.poll(() => outputText(page, 'diameterM')).toBe('2.4 m');
    const gain2 = await outputNumber(page, 'gainDbi');
    expect(gain2 - gain1).toBeGreaterThan(6.0);
    expect(gain2 - gain1).toBeLessThan(6.2);
    // the beam halves (HPBW ∝ λ/D) to within the small change of the blocked share
    expect((await outputNumber(page, 'hpbwDeg')) / hpbw1).toBeGreaterThan(0.48);
    expect((await outputNumber(page, 'hpbwDeg')) / hpbw1).toBeLessThan(0.52);
    const blockage2 = await budgetRow(page, 'centralBlockage');
    expect(blockage2.percent).toBeGreaterThan(blockage1.percent);
    expect((await budgetRow(page, 'aperture')).percent).toBeGreaterThan(aperture1.percent);
    expect(await page.locator(PATTERN_PATH).getAttribute('d')).not.toBe(path1);

    // Edge taper −10 dB → −20 dB: less spillover (its efficiency rises), a more tapered aperture
    // (taper efficiency falls), and the text beside the plot follows.
    const spill1 = await budgetRow(page, 'spillover');
    const taper1 = await budgetRow(page, 'taper');
    await typeInto(page, ID, 'et', '-20 dB');
    await expect.poll(() => outputText(page, 'edgeTaperDb')).toBe('−20.00 dB');
    const spill2 = await budgetRow(page, 'spillover');
    const taper2 = await budgetRow(page, 'taper');
    expect(spill2.percent).toBeGreaterThan(spill1.percent);
    expect(taper2.percent).toBeLessThan(taper1.percent);
    expect(spill2.db).toBeGreaterThan(spill1.db);
    expect(taper2.db).toBeLessThan(taper1.db);
    expect(await page.locator('[data-testid="taper-compare"]').innerText()).toContain('yours is −20.00 dB');

    // A blockage wider than the dish: every field is valid on its own, calc/ rejects the pair
    // (CalcInputError). The field says why, the results stay (marked stale), the page keeps working.
    const gainBefore = await outputText(page, 'gainDbi');
    await typeInto(page, ID, 'blk', '3 m');
    await expect.poll(() => page.locator(`#${ID}-blk-msg`).innerText()).toMatch(/blockage diameter smaller than the dish diameter 2\.4 m/);
    expect(await page.locator(`#${ID}-blk`).getAttribute('aria-invalid')).toBe('true');
    await expect.poll(() => page.locator('[data-testid="stale"]').count()).toBe(1);
    expect(await page.locator('[data-testid="stale"]').innerText()).toMatch(/Central blockage diameter/);
    expect(await outputText(page, 'gainDbi')).toBe(gainBefore);
    expect(await page.locator('[data-testid="efficiency-budget"]').count()).toBe(1);
    expect(await page.locator('body').innerText()).not.toMatch(/\bNaN\b|Infinity/);
    await typeInto(page, ID, 'blk', '18 cm');
    await expect.poll(() => page.locator('[data-testid="stale"]').count()).toBe(0);

    // Steering: three feeds, beams 1.1 HPBW apart, give a three-row beam table and a crossover level.
    expect(await page.locator('[data-testid="beam-table"]').count()).toBe(0);
    await page.selectOption(`#${ID}-offby`, 'beamwidths');
    await typeInto(page, ID, 'offbw', '1.1');
    await typeInto(page, ID, 'n', '3');
    await expect.poll(() => page.locator('[data-testid="beam-table"] tbody tr').count()).toBe(3);
    expect(await outputText(page, 'beamSpacingBeamwidths')).toBe('1.1 HPBW');
    expect(await page.locator('[data-testid="crossover"]').innerText()).toMatch(/cross over at −\d+\.\d\d dB/);

    await expect.poll(() => page.url(), { timeout: 5000 }).toContain('n=3');
    await page.getByRole('button', { name: 'Copy link' }).click();
    await expect.poll(() => page.locator('.share-status').innerText()).toBe('Link copied.');
    const copied = await page.evaluate(() => navigator.clipboard.readText());
    const texts: Record<string, string> = {};
    for (const input of await page.locator(`[data-calculator="${ID}"] input, [data-calculator="${ID}"] select`).all()) {
      texts[(await input.getAttribute('id'))!] = await input.inputValue();
    }
    expect(Object.keys(texts).sort()).toEqual(createReflectorCalculator(teamConventions).params.map((p) => `${ID}-${p.key}`).sort());
    const shown = { gain: await outputText(page, 'gainDbi'), crossover: await outputText(page, 'crossoverDb') };

    const second = await openPage(browser);
    await second.page.goto(copied);
    await waitForCalculator(second.page, ID);
    for (const [id, text] of Object.entries(texts)) expect(await second.page.locator(`#${id}`).inputValue(), id).toBe(text);
    expect(await second.page.locator(`#${ID}-d`).inputValue()).toBe('2.4 m');
    expect(await second.page.locator(`#${ID}-et`).inputValue()).toBe('-20 dB');
    expect(await second.page.locator(`#${ID}-blk`).inputValue()).toBe('18 cm');
    expect(await outputText(second.page, 'gainDbi')).toBe(shown.gain);
    expect(await outputText(second.page, 'crossoverDb')).toBe(shown.crossover);
    expect(await second.page.locator('[data-testid="link-notices"]').count()).toBe(0);
    await closeClean(second);

    await closeClean({ outside, errors, context });
  });

  it('shows the highest sidelobe beside the first, and marks it on the pattern when a later lobe is higher (q = 12 feed, f/D 0.5, 0.1 D blockage)', async () => {
    const { page, outside, errors, context } = await openPage(browser);
    await page.goto(siteUrl(`calculators/${ID}/?v=1&f=10GHz&solve=gain&d=1.2m&fd=0.5&feed=exponent&q=12&blk=12cm`));
    await waitForCalculator(page, ID);
    const first = await outputNumber(page, 'firstSidelobeDb');
    const highest = await outputNumber(page, 'highestSidelobeDb');
    // SciPy fixture (scripts/fixtures/reflector_sidelobes.py): −32.8 dB first, −29.6 dB highest
    expect(first).toBeCloseTo(-32.8, 1);
    expect(highest).toBeCloseTo(-29.6, 1);
    const refs = await page.locator('[data-plot="far-field-pattern-of-the-on-axis-feed"] .plot-refs').innerHTML();
    expect(refs).toContain('highest sidelobe');
    // Lo's beam deviation factor is shown with two digits
    expect(await outputText(page, 'beamDeviationFactor')).toMatch(/^0\.\d\d$/);
    await closeClean({ outside, errors, context });
  });

  it('solving for the diameter reaches the target gain; fields that do not apply say so', async () => {
    const { page, outside, errors, context } = await openPage(browser);
    await page.goto(siteUrl(`calculators/${ID}/?v=1&solve=diameter&g=45dB`));
    await waitForCalculator(page, ID);
    expect(await outputText(page, 'gainDbi')).toBe('45.00 dBi');
    expect(await page.locator(`#${ID}-d-msg`).innerText()).toMatch(/Not used/);
    expect(await page.locator(`#${ID}-g-msg`).innerText()).not.toMatch(/Not used/);
    await page.selectOption(`#${ID}-solve`, 'gain');
    await expect.poll(() => page.locator(`#${ID}-g-msg`).innerText()).toMatch(/Not used/);
    await closeClean({ outside, errors, context });
  });

  it('loads only from its own origin in both themes, and every input has a visible label', async () => {
    for (const scheme of ['light', 'dark'] as const) {
      const { page, outside, errors, context } = await openPage(browser, { colorScheme: scheme });
      const response = await page.goto(siteUrl(`calculators/${ID}/?v=1&offby=length&off=3cm&n=2`));
      expect(response?.status()).toBe(200);
      await waitForCalculator(page, ID);
      await page.waitForLoadState('networkidle');
      expect(await page.locator('[data-testid="beam-table"] tbody tr').count()).toBe(2);
      const unlabeled = await page.evaluate(() =>
        [...document.querySelectorAll('.calc input, .calc select')].filter((el) => !document.querySelector(`label[for="${el.id}"]`)).length,
      );
      expect(unlabeled).toBe(0);
      await closeClean({ outside, errors, context });
    }
  });
});
