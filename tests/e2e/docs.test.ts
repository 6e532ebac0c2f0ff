import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launch, openPage, outputText, siteUrl, waitForCalculator, closeClean } from './browser';
import { formulaCatalog } from '../../calc/formulaCatalog';
import { referenceGroups } from '../../verification/reference/index';
import { transcribedGroups } from '../../verification/reference/transcribed';
import { g } from '../../site/lib/guideNumbers';
import { calculators, docs } from '../../site/nav';
import { calculatorCautions } from '../../site/lib/cautions';
import { guideSections } from '../../site/guide';

let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

const html = async (path: string) => {
  const response = await fetch(siteUrl(path));
  expect(response.status, path).toBe(200);
  return response.text();
};

describe('generated docs pages (built HTML)', () => {
  it('the formula reference has an anchor for every catalog formula and no others', async () => {
    const page = await html('formulas/');
    const entries = [...page.matchAll(/data-formula-entry="([^"]+)"/g)].map((m) => m[1]);
    expect(entries).toEqual(formulaCatalog.map((f) => f.id));
    for (const f of formulaCatalog) expect(page, f.id).toContain(`id="formula-${f.id}"`);
    expect(page).toContain('class="katex"');
  });

  it('the verification record lists exactly the reference cases the tests run, all passing', async () => {
    const page = await html('verification/');
    const ids = [...page.matchAll(/data-case="([^"]+)"/g)].map((m) => m[1]);
    expect(ids).toEqual(referenceGroups.flatMap((g) => g.cases.map((c) => c.id)));
    const total = ids.length;
    expect(page).toContain(`data-total="${total}"`);
    expect(page).toContain(`data-passed="${total}"`);
    expect(page).not.toContain('data-pass="no"');
    // values transcribed into calc/ are listed apart, not as checks
    const transcribed = [...page.matchAll(/data-transcribed="([^"]+)"/g)].map((m) => m[1]);
    expect(transcribed).toEqual(transcribedGroups.flatMap((t) => t.values.map((v) => v.id)));
    for (const id of transcribed) expect(ids).not.toContain(id);
  });

  it('the change log page is rendered from CHANGELOG.md', async () => {
    const page = await html('changelog/');
    expect(page).toMatch(/<h2 id="unreleased">\[Unreleased\]<\/h2>/);
    expect(page).toContain('<h3 id="added">Added</h3>');
  });

  for (const scheme of ['light', 'dark'] as const) {
    it(`every docs, guide and calculator page loads offline in the ${scheme} theme without errors`, { timeout: 180_000 }, async () => {
      const { page, outside, errors, context } = await openPage(browser, { colorScheme: scheme });
      for (const entry of [...docs, ...guideSections]) {
        const response = await page.goto(siteUrl(entry.path), { waitUntil: 'load' });
        expect(response?.status(), entry.path).toBe(200);
        expect(await page.locator('h1').count(), entry.path).toBe(1);
      }
      for (const entry of calculators) {
        const response = await page.goto(siteUrl(entry.path), { waitUntil: 'load' });
        expect(response?.status(), entry.path).toBe(200);
        await waitForCalculator(page, entry.path.replace(/^calculators\/|\/$/g, '')); // hydration errors would surface here
      }
      await closeClean({ outside, errors, context });
    });
  }
});

describe('guide pages', () => {
  it('an embedded calculator opens on its worked example, leaves the page URL alone, and links to its own page in that state', async () => {
    const { page, outside, errors, context } = await openPage(browser);
    await page.goto(siteUrl('guide/broadside-arrays/'));
    const calculator = page.locator('[data-calculator="wavelength-spacing"]');
    await calculator.scrollIntoViewIfNeeded(); // client:visible
    await waitForCalculator(page, 'wavelength-spacing');
    expect(await page.locator('#wavelength-spacing-d').inputValue()).toBe('16 mm');
    expect(await outputText(page, 'countTri')).toMatch(/^1 ?598$/); // harbour panel, as the prose says
    const stateLink = await page.locator('[data-testid="state-link"]').getAttribute('href');
    const target = new URL(stateLink!);
    expect(target.pathname).toBe('/rf/calculators/wavelength-spacing/');
    expect(target.searchParams.get('d')).toBe('16mm');
    expect(new URL(page.url()).search).toBe('');
    const second = await openPage(browser);
    await second.page.goto(stateLink!);
    await waitForCalculator(second.page, 'wavelength-spacing');
    expect(await second.page.locator('#wavelength-spacing-d').inputValue()).toBe('16 mm');
    expect(await second.page.locator('#wavelength-spacing-w').inputValue()).toBe('1.2 m');
    await second.context.close();
    await closeClean({ outside, errors, context });
  });

  it('renders its maths at build time and ships no KaTeX JavaScript', async () => {
    const page = await html('guide/reflectors/');
    expect(page).toContain('class="katex"');
    expect(page).not.toMatch(/katex(\.min)?\.js/);
    const text = page.replace(/<annotation[\s\S]*?<\/annotation>/g, ''); // KaTeX keeps the TeX source there for screen readers
    expect(text).not.toMatch(/\$\$|\\frac|\\lambda/); // no unrendered TeX left in the page
    expect(page).toContain(`already ${g.ruzeLambda16Db} dB`); // numbers come from site/lib/guideNumbers.ts
  });

  it('has no KaTeX error markup on any guide page', async () => {
    for (const entry of guideSections) expect(await html(entry.path), entry.path).not.toContain('katex-error');
  });
});

describe('offline search', () => {
  // Expected pages: the calculator that treats the term, or the handbook page that explains it
  // until that calculator's page is published.
  const spilloverPage = calculators.some((c) => c.path === 'calculators/front-fed-reflector/') ? 'calculators/front-fed-reflector/' : 'guide/reflectors/';
  const cases = [
    { term: 'grating lobe', expect: 'calculators/wavelength-spacing/' },
    { term: 'spillover', expect: spilloverPage },
  ];

  for (const c of cases) {
    it(`“${c.term}” finds ${c.expect} with every outside request blocked`, async () => {
      const { page, outside, errors, context } = await openPage(browser);
      await page.goto(siteUrl('search/'));
      await page.waitForSelector('form.search-form[data-hydrated="yes"]');
      await page.getByLabel('Search the handbook').fill(c.term);
      await page.getByLabel('Search the handbook').press('Enter');
      const results = page.locator('[data-testid="search-results"] li a');
      await expect.poll(() => results.count(), { timeout: 10_000 }).toBeGreaterThan(0);
      const hrefs = await results.evaluateAll((links) => links.map((a) => (a as HTMLAnchorElement).getAttribute('href')));
      expect(hrefs.slice(0, 5)).toContain(new URL(siteUrl(c.expect)).pathname);
      expect(await page.locator('[data-testid="search-results"] mark').count()).toBeGreaterThan(0);
      expect(page.url()).toContain(`q=${encodeURIComponent(c.term)}`);
      await closeClean({ outside, errors, context });
    });
  }

  it('the search box in the navigation opens the search page with results', async () => {
    const { page, outside, errors, context } = await openPage(browser);
    await page.goto(siteUrl('conventions/'));
    await page.getByLabel('Search', { exact: true }).fill('grating lobe');
    await page.getByLabel('Search', { exact: true }).press('Enter');
    await page.waitForURL(/\/rf\/search\/\?q=grating/);
    await expect.poll(() => page.locator('[data-testid="search-results"] li').count(), { timeout: 10_000 }).toBeGreaterThan(0);
    const first = page.locator('[data-testid="search-results"] li a').first();
    await first.click();
    await page.waitForLoadState('load');
    expect(new URL(page.url()).pathname.startsWith('/rf/')).toBe(true);
    await closeClean({ outside, errors, context });
  });
});

describe('embedding', () => {
  const query = '?v=1&f=9GHz&scan=30deg&lat=rectangular&d=0.6lambda';

  it('an embed route renders the calculator without the site navigation and restores state from its link', async () => {
    const { page, outside, errors, context } = await openPage(browser);
    await page.goto(siteUrl(`embed/wavelength-spacing/${query}`));
    await waitForCalculator(page, 'wavelength-spacing');
    expect(await page.locator('.site-nav').count()).toBe(0);
    expect(await page.locator('#wavelength-spacing-f').inputValue()).toBe('9 GHz');
    expect(await page.locator('#wavelength-spacing-d').inputValue()).toBe('0.6 λ');
    expect(await outputText(page, 'lambda0High')).toBe('3.331 cm'); // c/9 GHz, c exact (SI)
    const open = page.getByRole('link', { name: /Open in Dirigo/ });
    await open.hover();
    const target = new URL((await open.getAttribute('href'))!, page.url());
    expect(target.pathname).toBe('/rf/calculators/wavelength-spacing/');
    expect(target.searchParams.get('f')).toBe('9GHz');
    expect(target.searchParams.get('d')).toBe('0.6lambda');
    await closeClean({ outside, errors, context });
  });

  it('every published calculator has a bare embed route that hydrates offline and keeps its safety note', async () => {
    const { page, outside, errors, context } = await openPage(browser);
    for (const c of calculators) {
      const id = c.path.replace(/^calculators\/|\/$/g, '');
      const response = await page.goto(siteUrl(`embed/${id}/`));
      expect(response?.status(), id).toBe(200);
      await waitForCalculator(page, id);
      expect(await page.locator('.site-nav').count(), id).toBe(0);
      const safety = page.locator('.safety');
      if (calculatorCautions[id]) expect(await safety.innerText(), id).toContain(calculatorCautions[id]);
      else expect(await safety.count(), id).toBe(0);
    }
    await closeClean({ outside, errors, context });
  });

  it('the calculator page offers embed code that carries the current inputs', async () => {
    const { page, outside, errors, context } = await openPage(browser);
    await page.goto(siteUrl(`calculators/wavelength-spacing/${query}`));
    await waitForCalculator(page, 'wavelength-spacing');
    await page.getByRole('button', { name: 'Copy embed code (current inputs)' }).click();
    await expect.poll(() => page.locator('[data-embed-status]').innerText()).toBe('Embed code copied.');
    const snippet = await page.evaluate(() => navigator.clipboard.readText());
    const src = snippet.match(/src="([^"]+)"/)![1].replace(/&amp;/g, '&');
    expect(snippet).toMatch(/^<iframe /);
    expect(new URL(src).pathname).toBe('/rf/embed/wavelength-spacing/');
    // What the iframe would load: the embed route in the copied state.
    const frame = await openPage(browser);
    await frame.page.goto(src);
    await waitForCalculator(frame.page, 'wavelength-spacing');
    expect(await frame.page.locator('#wavelength-spacing-lat').inputValue()).toBe('rectangular');
    expect(await frame.page.locator('#wavelength-spacing-scan').inputValue()).toBe('30 deg');
    await closeClean(frame);
    await closeClean({ outside, errors, context });
  });
});
