import { readdirSync, readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { islandsById } from '../../components/calculators/islands';
import { calculatorFactories } from '../../calc/calculators';
import { teamConventions } from '../../site/conventions';
import { decodeState } from '../../components/frame/urlState';
import { validateAll } from '../../components/frame/calculatorModel';

// Every calculator embedded in a guide page opens on its preset without notices, with valid inputs,
// and unlinked from the page URL (several calculators share a guide page).
const dir = 'site/pages/guide';
const pages = readdirSync(dir).filter((f) => f.endsWith('.mdx'));

describe('guide embeds', () => {
  for (const file of pages) {
    const text = readFileSync(`${dir}/${file}`, 'utf8');
    const imports = new Map([...text.matchAll(/^import (\w+) from '([^']+\.svelte)';$/gm)].map((m) => [m[1], m[2]]));
    const uses = [...text.matchAll(/<(\w+)\s([^>]*?)\/>/g)].filter((m) => imports.has(m[1]));
    if (uses.length === 0) continue;
    it(`${file}: ${uses.length} embedded calculator(s) open on valid presets`, async () => {
      // field ids are <calculator-id>-<key>: two copies of one calculator on a page would repeat them
      const names = uses.map((u) => u[1]);
      expect(new Set(names).size, 'at most one copy of each calculator per page').toBe(names.length);
      for (const [, name, attrs] of uses) {
        const component = (await import(/* @vite-ignore */ resolve(dir, imports.get(name)!))).default;
        const id = Object.keys(islandsById).find((k) => islandsById[k] === component);
        expect(id, `${name} is listed in components/calculators/islands.ts`).toBeDefined();
        expect(attrs).toMatch(/linked=\{false\}/);
        expect(attrs).toMatch(/client:visible/);
        const preset = attrs.match(/preset="([^"]+)"/)?.[1];
        expect(preset, `${name} has a preset`).toBeDefined();
        const def = calculatorFactories[id!](teamConventions);
        const decoded = decodeState(def, preset!);
        expect(decoded.notices, `${file} ${preset}`).toEqual([]);
        expect(validateAll(def, decoded.texts).inputs, `${file} ${preset}`).not.toBeNull();
      }
    });
  }
});
