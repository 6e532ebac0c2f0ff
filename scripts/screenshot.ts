/** Dev aid: screenshot a built page. Usage: tsx scripts/screenshot.ts <path-with-query> <out.png> [light|dark] [css selector] */
import { chromium } from 'playwright-core';
import { startStaticServer } from './staticServer';

const [path = '', out = '/tmp/shot.png', scheme = 'light', selector = ''] = process.argv.slice(2);
const { server, origin } = await startStaticServer('dist', '/');
const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'] });
const page = await browser.newPage({ viewport: { width: 1280, height: 900 }, colorScheme: scheme === 'dark' ? 'dark' : 'light' });
page.on('console', (m) => console.log('console:', m.type(), m.text()));
page.on('pageerror', (e) => console.log('pageerror:', e.message));
await page.goto(`${origin}/${path}`);
await page.waitForTimeout(800);
if (selector) await page.locator(selector).first().screenshot({ path: out });
else await page.screenshot({ path: out, fullPage: true });
await browser.close();
server.close();
console.log('wrote', out);
