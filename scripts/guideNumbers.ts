/**
 * Prints every number the guide quotes (site/pages/guide/), as the pages show it. The numbers are
 * computed with calc/ by site/lib/guideNumbers.ts, the one source the pages import at build time;
 * this script only lists them. Usage: npx tsx scripts/guideNumbers.ts [filter]
 */
import { g, GUIDE_NUMBERS, GUIDE_PRESETS, type GuideNumberKey } from '../site/lib/guideNumbers';

const filter = (process.argv[2] ?? '').toLowerCase();
console.log('Scenarios (presets of the embedded calculators):');
for (const [name, preset] of Object.entries(GUIDE_PRESETS)) console.log(`  ${name.padEnd(22)} ${preset}`);
console.log('\nNumbers ({g.key} in the pages):');
for (const key of Object.keys(GUIDE_NUMBERS) as GuideNumberKey[]) {
  if (!key.toLowerCase().includes(filter)) continue;
  console.log(`  ${key.padEnd(32)} ${g[key]}`);
}
