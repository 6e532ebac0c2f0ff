import { describe, expect, it } from 'vitest';
import { referenceGroups } from '../../verification/reference/index';
import { runReferenceCase } from '../../verification/reference/referenceCase';

// Runs every reference case; the same list feeds the Verification record page.
describe('reference cases', () => {
  it('have unique ids and name a source', () => {
    const ids = referenceGroups.flatMap((g) => g.cases.map((c) => c.id));
    expect(new Set(ids).size).toBe(ids.length);
    for (const g of referenceGroups) for (const c of g.cases) expect(c.source.length, c.id).toBeGreaterThan(5);
  });
  for (const group of referenceGroups) {
    describe(group.topic, () => {
      for (const c of group.cases) {
        it(`${c.title} (${c.source})`, () => {
          const outcome = runReferenceCase(c);
          expect(Number.isFinite(outcome.computed)).toBe(true);
          expect(outcome.error, `computed ${outcome.computed}, expected ${c.expected} ± ${c.tolerance}`).toBeLessThanOrEqual(c.tolerance);
        });
      }
    });
  }
});
