import { describe, expect, it } from 'vitest';
import { checkBuiltSite } from '../../scripts/checkLinks';
import { E2E_BASE } from './globalSetup';

// Runs after the global setup's build (dist-e2e, BASE=/rf/).
describe('built site links', () => {
  it('every internal href/src/action and island URL resolves to a built file, and every fragment to an id', () => {
    const { problems, pages, references } = checkBuiltSite('dist-e2e', E2E_BASE);
    expect(pages).toBeGreaterThan(5);
    expect(references).toBeGreaterThan(pages * 10);
    expect(problems).toEqual([]);
  });
});
