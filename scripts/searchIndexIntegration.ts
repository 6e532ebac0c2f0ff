/**
 * Astro integration: after every `astro build` (any OUT_DIR and BASE), index the built HTML with
 * Pagefind's Node API and write the index to <outDir>/pagefind/. Pages are indexed from their
 * `data-pagefind-body` element (the main content in Base.astro; navigation, embeds and the search
 * page itself are left out; rendered maths and plots are skipped). The site's own search component loads <base>pagefind/pagefind.js.
 */
import type { AstroIntegration } from 'astro';
import { readdir, rm } from 'node:fs/promises';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { close, createIndex } from 'pagefind';

export function searchIndex(): AstroIntegration {
  return {
    name: 'dirigo-search-index',
    hooks: {
      'astro:build:done': async ({ dir, logger }) => {
        const outDir = fileURLToPath(dir);
        try {
          const { index, errors } = await createIndex({ forceLanguage: 'en', excludeSelectors: ['.katex', 'svg'] });
          if (!index) throw new Error(`Pagefind could not start: ${errors.join('; ')}`);
          const added = await index.addDirectory({ path: outDir });
          if (added.errors.length) throw new Error(`Pagefind indexing failed: ${added.errors.join('; ')}`);
          const written = await index.writeFiles({ outputPath: join(outDir, 'pagefind') });
          if (written.errors.length) throw new Error(`Pagefind could not write the index: ${written.errors.join('; ')}`);
          // We ship our own search component: drop Pagefind's stock UI files from the output.
          for (const name of await readdir(written.outputPath)) {
            if (/^pagefind-(component-ui|modular-ui|ui|highlight)\./.test(name)) await rm(join(written.outputPath, name));
          }
          logger.info(`search index: ${added.page_count} pages → ${written.outputPath}`);
        } finally {
          await close();
        }
      },
    },
  };
}
