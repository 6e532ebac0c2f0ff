import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { E2E_BASE } from './globalSetup';

function htmlFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? htmlFiles(path) : name.endsWith('.html') ? [path] : [];
  });
}

// The site is built under /rf/ for these tests: every root-relative link must carry that base.
describe('sub-path build', () => {
  it('every root-relative href and src in every page starts with the base path', () => {
    const offenders: string[] = [];
    for (const file of htmlFiles('dist-e2e')) {
      const html = readFileSync(file, 'utf8');
      for (const m of html.matchAll(/(?:href|src|component-url|renderer-url)="(\/[^"]*)"/g)) {
        if (!m[1].startsWith(E2E_BASE)) offenders.push(`${file}: ${m[1]}`);
      }
      for (const m of html.matchAll(/&quot;(\/[a-z][^&]*)&quot;/g)) {
        if (!m[1].startsWith(E2E_BASE) && /calculators|conventions|guide|search|embed/.test(m[1])) offenders.push(`${file}: island prop ${m[1]}`);
      }
    }
    expect(offenders).toEqual([]);
  });
});
