/**
 * Thins a densely sampled curve for drawing: within each of `bins` equal x-intervals over
 * [xMin, xMax] it keeps the lowest and the highest sample (in x order), so peaks and nulls survive
 * while the path has at most 2 points per bin (about one per pixel column). Pure, tested.
 */
export function minMaxDecimate(xs: ArrayLike<number>, ys: ArrayLike<number>, xMin: number, xMax: number, bins: number): { x: number; y: number }[] {
  const out: { x: number; y: number }[] = [];
  const width = (xMax - xMin) / bins;
  let bin = -1, lo = -1, hi = -1;
  const flush = () => {
    if (lo < 0) return;
    const [a, b] = lo <= hi ? [lo, hi] : [hi, lo];
    out.push({ x: xs[a], y: ys[a] });
    if (b !== a) out.push({ x: xs[b], y: ys[b] });
  };
  for (let i = 0; i < xs.length; i++) {
    const x = xs[i];
    if (!(x >= xMin && x <= xMax) || !Number.isFinite(ys[i])) continue;
    const k = Math.min(bins - 1, Math.floor((x - xMin) / width));
    if (k !== bin) {
      flush();
      bin = k; lo = i; hi = i;
    } else {
      if (ys[i] < ys[lo]) lo = i;
      if (ys[i] > ys[hi]) hi = i;
    }
  }
  flush();
  return out;
}
