/**
 * Builds the site under a sub-path (/rf/, as on an internal server) into dist-e2e/, serves it on
 * 127.0.0.1, and hands the base URL to the browser tests. E2E_SKIP_BUILD=1 reuses a build.
 */
import { execSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import type { TestProject } from 'vitest/node';
import { startStaticServer } from '../../scripts/staticServer';

export const E2E_BASE = '/rf/';

export default async function setup(project: TestProject) {
  if (!process.env.E2E_SKIP_BUILD || !existsSync('dist-e2e/index.html')) {
    // Vitest puts Vite's own variables (BASE_URL=/, MODE, DEV, PROD, SSR) into process.env; Astro
    // would read BASE_URL from there on the server side and drop the sub-path, so leave them out.
    const env: NodeJS.ProcessEnv = { ...process.env, BASE: E2E_BASE, OUT_DIR: './dist-e2e' };
    for (const key of ['BASE_URL', 'MODE', 'DEV', 'PROD', 'SSR', 'NODE_ENV']) delete env[key];
    execSync('npx astro build', { stdio: 'inherit', env });
  }
  const { server, origin } = await startStaticServer('dist-e2e', E2E_BASE);
  project.provide('siteUrl', `${origin}${E2E_BASE}`);
  project.provide('origin', origin);
  return () => new Promise<void>((resolve) => server.close(() => resolve()));
}

declare module 'vitest' {
  export interface ProvidedContext {
    siteUrl: string;
    origin: string;
  }
}
