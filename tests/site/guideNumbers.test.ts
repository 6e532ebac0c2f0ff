import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { about, fixed, g, GUIDE_NUMBERS, GUIDE_PRESETS } from '../../site/lib/guideNumbers';

// The guide quotes no hand-typed number: every number in its prose is `{g.key}` from
// site/lib/guideNumbers.ts (computed with calc/ at build time), or one of the allowed phrases below,
// each with the reason it is not computed. Maths ($…$), imports, embed presets, MDX comments and
// HTML attributes are not prose and are skipped.

const GUIDE = 'site/pages/guide';
const pages = [...readdirSync(GUIDE).filter((f) => f.endsWith('.mdx')), 'index.astro'];

type Allowed = { phrase: string; reason: string };
const SCENARIO = 'scenario input (the same value as the embedded calculator’s preset or the array the text defines)';
const SECTION = 'part number of the guide';

/** Phrases whose digits are not computed, per page. Keep it short; every entry says why. */
const ALLOWED: Record<string, Allowed[]> = {
  'index.astro': [
    { phrase: 'A 3.7 m dish at 8.2 GHz', reason: SCENARIO },
    { phrase: 'a 16-element', reason: SCENARIO },
    { phrase: 'θ 1  × θ 2', reason: 'symbol subscripts' },
    { phrase: 'θ 1 θ 2', reason: 'symbol subscripts' },
    { phrase: 'about 1/ L  radians', reason: 'the order-of-magnitude rule in words (beamwidth about λ/L)' },
    { phrase: '4π', reason: 'the sphere’s solid angle' },
  ],
  'broadside-arrays.mdx': [
    { phrase: 'Numbers for a 16-element line', reason: SCENARIO },
    { phrase: 'For 16 isotropic elements', reason: SCENARIO },
    { phrase: 'Taylor, 30 dB,', reason: 'design sidelobe level of the taper (an input)' },
    { phrase: 'Dolph–Chebyshev, 30 dB', reason: 'design sidelobe level of the taper (an input)' },
    { phrase: 'the same 16 elements', reason: SCENARIO },
    { phrase: 'steered to 50°', reason: SCENARIO },
    { phrase: 'covers 9–10 GHz and scans ±50°, on a 1.2 m × 0.4 m face', reason: SCENARIO },
    { phrase: 'limit at 10 GHz', reason: SCENARIO },
    { phrase: 'proposed 16 mm', reason: SCENARIO },
    { phrase: 'Try 20 mm', reason: 'a value the reader is invited to type' },
  ],
  'circular-and-y-arrays.mdx': [
    { phrase: 'For 24 isotropic elements on a 2 λ radius', reason: SCENARIO },
    { phrase: 'Steered 30°', reason: SCENARIO },
    { phrase: 'arms 120° apart', reason: 'the geometry’s definition (three arms)' },
    { phrase: 'listening at 1.42 GHz', reason: SCENARIO },
    { phrase: 'eight elements at 0.7 λ', reason: SCENARIO },
  ],
  'end-fire.mdx': [
    { phrase: 'a line of 12 elements', reason: SCENARIO },
    { phrase: 'at 433 MHz', reason: SCENARIO },
    { phrase: 'for 12 elements', reason: SCENARIO },
    { phrase: 'our 0.25 λ', reason: SCENARIO },
  ],
  'ground-plane.mdx': [
    { phrase: 'a factor 2 in field, 4 in intensity', reason: 'image theory: two equal in-phase sources (exact)' },
    { phrase: 'designed at 5.8 GHz with the plane 12.9 mm', reason: SCENARIO },
    { phrase: '| 0.20 λ (', reason: 'table row: the height it tabulates (an input)' },
    { phrase: '| 0.25 λ (5.8 GHz, design)', reason: SCENARIO },
    { phrase: '| 0 dB |', reason: 'the design row relative to itself' },
    { phrase: '| 0.30 λ (', reason: 'table row: the height it tabulates (an input)' },
    { phrase: '| 0.40 λ (', reason: 'table row: the height it tabulates (an input)' },
    { phrase: '| 0.50 λ (', reason: 'table row: the height it tabulates (an input)' },
    { phrase: 'over its\n4.9–6.7 GHz band', reason: SCENARIO },
    { phrase: 'within 1 dB of its best', reason: 'the calculator’s band definition (its ±1 dB band output)' },
    { phrase: 'typically 15–25 dB', reason: 'experience range, said so in the sentence; the backplane calculator’s finite-plane note gives the same range' },
  ],
  'link-budget.mdx': [
    { phrase: 'sends 3 W into a 6 dBi antenna over a slant range of 1500 km at 8.2 GHz', reason: SCENARIO },
    { phrase: 'at 100 Mbit/s', reason: SCENARIO },
    { phrase: 'over the 8 dB C/N the demodulator needs', reason: SCENARIO },
    { phrase: 'Holding a margin of 3 dB', reason: SCENARIO },
  ],
  'planar-and-conformal.mdx': [
    { phrase: 'line of part 3', reason: SECTION },
    { phrase: 'ground plane of part 4', reason: SECTION },
    { phrase: 'cylinder of part 6', reason: SECTION },
    { phrase: '1.2 m × 0.4 m\nat 10 GHz', reason: SCENARIO },
    { phrase: 'For a 16 × 16 array at 0.5 λ', reason: SCENARIO },
    { phrase: 'Asked for 32 dBi at ±50° across\n9–10 GHz', reason: SCENARIO },
    { phrase: 'typically 4 × 4 or 8 × 8 elements', reason: 'common tile sizes, examples in words (common practice, no source)' },
    { phrase: 'each scanning ±45° to ±60°', reason: 'common practice for faceted arrays, no source' },
  ],
  'reflectors.mdx': [
    { phrase: 'reaches 55–70 %', reason: 'common-practice range for front-fed dishes, no source; the worked example below computes its own' },
    { phrase: 'an 8.2 GHz downlink', reason: SCENARIO },
    { phrase: 'a 3.7 m dish', reason: SCENARIO },
    { phrase: 'falls to −11 dB at the rim, 0.6 mm RMS surface error, a 28 cm feed', reason: SCENARIO },
    { phrase: 'shadowing 2.5 % of the aperture. At 8.2 GHz', reason: SCENARIO },
    { phrase: 'Ruze, 0.6 mm RMS', reason: SCENARIO },
    { phrase: 'roughly −10 to −12 dB for most feeds', reason: 'common practice, no source (the calculator’s optimum for our dish follows)' },
    { phrase: 'we chose −11 dB', reason: SCENARIO },
    { phrase: '0.6 mm dish', reason: SCENARIO },
    { phrase: 'approaches 1 for shallow dishes', reason: 'the limit of the beam deviation factor' },
    { phrase: 'three feeds about 1.1 beamwidths', reason: 'scenario input (a second scenario, the feed spacing chosen)' },
    { phrase: 'loses 1 dB', reason: 'the loss the pointing figure is computed for (an input)' },
  ],
  'sparse-and-distributed.mdx': [
    { phrase: 'two 20 λ × 20 λ apertures', reason: SCENARIO },
    { phrase: '| Filled, 0.5 λ square lattice', reason: SCENARIO },
    { phrase: '| Random, at least 1 λ apart (seeded layout) | 64 |', reason: SCENARIO },
    { phrase: 'for 64 elements', reason: SCENARIO },
    { phrase: '4 × 4 × 4 cube at 0.5 λ has 64 elements', reason: SCENARIO },
    { phrase: 'flat 8 × 8', reason: SCENARIO },
    { phrase: 'a 24 × 24 lattice at 0.5 λ', reason: SCENARIO },
    { phrase: 'seed 7', reason: SCENARIO },
    { phrase: 'At 10 GHz', reason: SCENARIO },
  ],
  'steering.mdx': [
    { phrase: 'a 30° scan', reason: SCENARIO },
    { phrase: 'modulo 360°', reason: 'one full turn of phase' },
    { phrase: 'For a 32-element', reason: SCENARIO },
    { phrase: '| 0° |', reason: 'table row: the scan it tabulates (an input)' },
    { phrase: '| 30° |', reason: 'table row: the scan it tabulates (an input)' },
    { phrase: '| 45° |', reason: 'table row: the scan it tabulates (an input)' },
    { phrase: '| 60° |', reason: 'table row: the scan it tabulates (an input)' },
    { phrase: 'at 60° that is', reason: SCENARIO },
    { phrase: 'more than ±60° for a flat face', reason: 'team practice (common practice, no source)' },
    { phrase: 'a 0.4 m square face at\n10 GHz with 0.6 λ triangular spacing and must scan ±60°', reason: SCENARIO },
    { phrase: 'an 80 % radiation efficiency', reason: SCENARIO },
    { phrase: 'at 1.68 GHz with\n0.6 λ spacing', reason: SCENARIO },
    { phrase: 'the ±30°', reason: SCENARIO },
    { phrase: 'scan to 45° below', reason: 'a value the reader is invited to type' },
    { phrase: 'the 32-element line scanned to 20°', reason: SCENARIO },
    { phrase: '| 3 |', reason: 'table row: the bit count it tabulates (an input)' },
    { phrase: '| 4 |', reason: 'table row: the bit count it tabulates (an input)' },
    { phrase: '| 5 |', reason: 'table row: the bit count it tabulates (an input)' },
  ],
};

/** Text a reader sees as prose, with maths, imports, presets, expressions, comments, tags and code removed. */
export function proseOf(text: string): string {
  return text
    .replace(/^---\n[\s\S]*?\n---\n/, '')
    .replace(/^import .*$/gm, '')
    .replace(/\$\$[\s\S]+?\$\$/g, ' ')
    .replace(/\$[^$\n]+?\$/g, ' ')
    .replace(/\{[^{}]*\}/g, ' ')
    .replace(/<[^<>]*>/g, ' ')
    .replace(/`[^`\n]*`/g, ' ');
}

/** Digit runs left in the prose once the allowed phrases are removed, with some context. */
export function handTypedNumbers(text: string, allowed: Allowed[]): string[] {
  let prose = proseOf(text);
  for (const a of allowed) prose = prose.split(a.phrase).join(' ');
  return [...prose.matchAll(/\d[\d.,]*/g)].map((m) => prose.slice(Math.max(0, m.index! - 30), m.index! + m[0].length + 20).replace(/\s+/g, ' ').trim());
}

describe('guide numbers (site/lib/guideNumbers.ts) and the prose that quotes them', () => {
  for (const page of pages) {
    const text = readFileSync(join(GUIDE, page), 'utf8');
    it(`${page}: every number in the prose comes from the module or an allowed phrase`, () => {
      expect(handTypedNumbers(text, ALLOWED[page] ?? [])).toEqual([]);
    });
    it(`${page}: every {g.key} names a number the module computes, and each allowed phrase is still used`, () => {
      for (const [, key] of text.matchAll(/\{g\.(\w+)\}/g)) expect(Object.keys(GUIDE_NUMBERS), key).toContain(key);
      if (/\{g\.\w+\}/.test(text)) expect(text).toMatch(/import \{ g \} from '\.\.\/\.\.\/lib\/guideNumbers';/);
      const prose = proseOf(text);
      for (const a of ALLOWED[page] ?? []) expect(prose.includes(a.phrase), `allowed phrase no longer in ${page}: ${a.phrase}`).toBe(true);
    });
  }

  it('the scanner catches a hand-typed number (the old Ruze sentence) and skips maths, presets and expressions', () => {
    expect(handTypedNumbers('At $\\varepsilon = \\lambda/16$ that is already −2.9 dB.', [])).toEqual(['At that is already −2.9 dB.']);
    expect(handTypedNumbers('At $\\varepsilon = \\lambda/16$ that is already {g.ruzeLambda16Db} dB.\n<X preset="?v=1&f=10GHz" />', [])).toEqual([]);
  });

  it('every embed scenario the numbers use is the preset of a calculator on a guide page', () => {
    const all = pages.map((p) => readFileSync(join(GUIDE, p), 'utf8')).join('\n');
    for (const [name, preset] of Object.entries(GUIDE_PRESETS)) expect(all.includes(`preset="${preset}"`), name).toBe(true);
  });

  it('every number computes to finite, formatted text (no NaN, no hyphen-minus)', () => {
    for (const [key, text] of Object.entries(g)) {
      expect(text, key).toMatch(/^−?\d[\d .]*(–−?\d[\d.]*)?$/);
    }
  }, 120_000);

  it('formats with a true minus, no "−0", and thousands grouped by a space', () => {
    expect(fixed(-2.678, 2)).toBe('−2.68');
    expect(fixed(-0.004, 2)).toBe('0.00');
    expect(about(2165, 10)).toBe('2 170');
    expect(about(1598, 50)).toBe('1 600');
  });

  it('the Ruze figure at λ/16 is exp(−(π/4)²) in dB: −2.68 dB (Ruze, Proc. IEEE 54(4), 1966; hand-worked)', () => {
    expect(g.ruzeLambda16Db).toBe('−2.68');
  });
});
