/** Returns a function that calls `fn` once, `waitMs` after the last call. */
export function debounce<A extends unknown[]>(fn: (...args: A) => void, waitMs: number): ((...args: A) => void) & { flush: () => void } {
  let timer: ReturnType<typeof setTimeout> | undefined;
  let pending: A | undefined;
  const wrapped = (...args: A) => {
    pending = args;
    if (timer !== undefined) clearTimeout(timer);
    timer = setTimeout(() => {
      timer = undefined;
      const callArgs = pending!;
      pending = undefined;
      fn(...callArgs);
    }, waitMs);
  };
  wrapped.flush = () => {
    if (timer !== undefined) {
      clearTimeout(timer);
      timer = undefined;
      const callArgs = pending!;
      pending = undefined;
      fn(...callArgs);
    }
  };
  return wrapped;
}
