/**
 * Browser helpers for the end-to-end tests: playwright-core driving Debian's Chromium
 * (/usr/bin/chromium). Every page records requests that leave the test server's origin; tests
 * assert there are none (the site must work offline on an internal server).
 */
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { inject } from 'vitest';

export const CHROMIUM_PATH = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
const FLAGS = ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run', '--disable-quic'];

export function siteUrl(path = ''): string {
  return `${inject('siteUrl')}${path.replace(/^\//, '')}`;
}

export async function launch(): Promise<Browser> {
  return chromium.launch({ executablePath: CHROMIUM_PATH, args: FLAGS, headless: true });
}

export interface GuardedPage {
  context: BrowserContext;
  page: Page;
  /** URLs requested outside the test server (should stay empty). */
  outside: string[];
  /** Uncaught page errors and console errors. */
  errors: string[];
}

/** A fresh context (its own storage and clipboard) and page, with the outside-request guard. */
export async function openPage(browser: Browser, options: { offline?: boolean; colorScheme?: 'light' | 'dark' } = {}): Promise<GuardedPage> {
  const origin = inject('origin');
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 }, colorScheme: options.colorScheme ?? 'light' });
  await context.grantPermissions(['clipboard-read', 'clipboard-write'], { origin });
  const outside: string[] = [];
  const errors: string[] = [];
  await context.route('**/*', (route) => {
    const url = route.request().url();
    if (url.startsWith(origin) || url.startsWith('data:') || url.startsWith('blob:')) return route.continue();
    outside.push(url);
    return route.abort();
  });
  const page = await context.newPage();
  page.on('pageerror', (e) => errors.push(`pageerror: ${e.message}`));
  page.on('console', (m) => {
    if (m.type() === 'error' && !/Failed to load resource/.test(m.text())) errors.push(`console: ${m.text()}`);
  });
  page.on('response', (r) => {
    if (r.status() >= 400) errors.push(`HTTP ${r.status()}: ${r.url()}`);
  });
  return { context, page, outside, errors };
}

/** Waits until a calculator island has hydrated (its frame sets data-hydrated="yes"). */
export async function waitForCalculator(page: Page, id: string): Promise<void> {
  await page.waitForSelector(`[data-calculator="${id}"][data-hydrated="yes"]`, { timeout: 15_000 });
}

/** Text of one output row's value and unit. */
export async function outputText(page: Page, key: string): Promise<string> {
  const row = page.locator(`[data-output="${key}"]`).first();
  const value = await row.locator('output').innerText();
  const unit = await row.locator('.result-unit').innerText();
  return `${value} ${unit}`.replace(/\s+/g, ' ').trim();
}

/** Replaces a field's text as a user would (select all, type). */
export async function typeInto(page: Page, calculatorId: string, key: string, text: string): Promise<void> {
  const input = page.locator(`#${calculatorId}-${key}`);
  await input.click();
  await input.press('Control+A');
  await input.press('Backspace');
  if (text) await input.pressSequentially(text, { delay: 5 });
}

/** Asserts that nothing left the test server and no page error occurred, then closes the context. */
export async function closeClean(guarded: Pick<GuardedPage, 'outside' | 'errors' | 'context'>): Promise<void> {
  const { outside, errors, context } = guarded;
  await context.close();
  if (outside.length) throw new Error(`requests left the test server: ${outside.join(', ')}`);
  if (errors.length) throw new Error(`page errors: ${errors.join(' | ')}`);
}
