/**
 * Performance marks and measures of the array explorer (read by tests/e2e/arrayExplorer.test.ts;
 * timing is informative only, never asserted). Both do nothing outside a browser.
 */

/** Sets a mark and returns its name, or null where there is no window (server rendering, Node). */
export function startMark(name: string): string | null {
  if (typeof performance === 'undefined' || typeof window === 'undefined') return null;
  performance.mark(name);
  return name;
}

/** Records a measure from the mark to now; nothing when the mark is null or was cleared. */
export function measureSince(name: string, mark: string | null): void {
  if (!mark) return;
  try {
    performance.measure(name, mark);
  } catch {
    // marks may have been cleared by a test; timing is informative only
  }
}
