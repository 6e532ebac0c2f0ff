import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { CHANGELOG_PATH, renderChangelog } from '../../site/lib/changelog';

describe('change log (CHANGELOG.md → site/lib/changelog.ts)', () => {
  const text = readFileSync(CHANGELOG_PATH, 'utf8');

  it('has an Unreleased section and dated releases, newest first', () => {
    const releases = [...text.matchAll(/^## \[([^\]]+)\](?: — (\d{4}-\d{2}-\d{2}))?$/gm)];
    expect(releases[0][1]).toBe('Unreleased');
    const dates = releases.slice(1).map((m) => m[2]);
    expect(dates.length).toBeGreaterThan(0);
    for (const d of dates) expect(d, 'each release has a date').toMatch(/^\d{4}-\d{2}-\d{2}$/);
    expect([...dates].sort().reverse()).toEqual(dates);
  });

  it('renders to HTML with release headings as anchors and no leftover Markdown', async () => {
    const rendered = await renderChangelog(text);
    expect(rendered.releases[0].text).toBe('[Unreleased]');
    for (const r of rendered.releases) expect(rendered.html).toContain(`id="${r.id}"`);
    expect(rendered.html).toContain('<strong>Wavelength &#x26; element spacing</strong>');
    expect(rendered.html).not.toMatch(/^#+ /m);
    expect(rendered.html).not.toContain('<h1');
  });
});
