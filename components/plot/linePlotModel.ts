/**
 * Data preparation for line plots (pure, tested): scales, ticks and SVG paths from series.
 * Uses d3-scale for scales and ticks and d3-shape for paths. Non-finite points break the line
 * instead of producing NaN in a path.
 */
import { scaleLinear, scaleLog } from 'd3-scale';
import { line } from 'd3-shape';

export interface PlotPoint {
  x: number;
  y: number;
}

export interface PlotSeries {
  id: string;
  label: string;
  points: PlotPoint[];
}

export interface PlotFrame {
  width: number;
  height: number;
  margin: { top: number; right: number; bottom: number; left: number };
}

export interface PreparedPlot {
  xTicks: { value: number; position: number; label: string }[];
  yTicks: { value: number; position: number; label: string }[];
  paths: { id: string; label: string; d: string }[];
  x: (value: number) => number;
  y: (value: number) => number;
  inner: { left: number; top: number; right: number; bottom: number };
}

export const DEFAULT_FRAME: PlotFrame = { width: 640, height: 300, margin: { top: 16, right: 20, bottom: 44, left: 60 } };

function extent(values: number[]): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values) {
    if (!Number.isFinite(v)) continue;
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  if (lo === Infinity) return [0, 1];
  if (lo === hi) return [lo - 1, hi + 1];
  return [lo, hi];
}

/** Prepares scales, ticks and paths. Domains default to the data extent (y padded by 5 %). */
export function prepareLinePlot(
  series: PlotSeries[],
  options: { xDomain?: [number, number]; yDomain?: [number, number]; xLog?: boolean; yLog?: boolean; frame?: PlotFrame; xTickFormat?: (v: number) => string; yTickFormat?: (v: number) => string } = {},
): PreparedPlot {
  const frame = options.frame ?? DEFAULT_FRAME;
  const inner = {
    left: frame.margin.left,
    top: frame.margin.top,
    right: frame.width - frame.margin.right,
    bottom: frame.height - frame.margin.bottom,
  };
  const xs = series.flatMap((s) => s.points.map((p) => p.x));
  const ys = series.flatMap((s) => s.points.map((p) => p.y));
  const xDomain = options.xDomain ?? extent(xs);
  let yDomain = options.yDomain;
  const yLog = options.yLog === true;
  if (!yDomain) {
    const [lo, hi] = extent(yLog ? ys.filter((y) => y > 0) : ys);
    const pad = (hi - lo) * 0.05;
    yDomain = yLog ? [lo, hi] : [lo - pad, hi + pad];
  }
  const isLog = options.xLog === true && xDomain[0] > 0;
  const xScale = isLog
    ? scaleLog().domain(xDomain).range([inner.left, inner.right])
    : scaleLinear().domain(xDomain).range([inner.left, inner.right]);
  const yScale = yLog && yDomain[0] > 0
    ? scaleLog().domain(yDomain).range([inner.bottom, inner.top]).nice()
    : scaleLinear().domain(yDomain).range([inner.bottom, inner.top]).nice(6);
  const fmtX = options.xTickFormat ?? xScale.tickFormat(7, isLog ? '~g' : undefined);
  const fmtY = options.yTickFormat ?? yScale.tickFormat(6, yLog ? '~g' : undefined);
  const [yLo, yHi] = yScale.domain();
  const clampY = (v: number) => Math.min(Math.max(v, Math.min(yLo, yHi)), Math.max(yLo, yHi));
  const pathOf = line<PlotPoint>()
    .defined((p) => Number.isFinite(p.x) && Number.isFinite(p.y) && (!yLog || p.y > 0) && (!options.xLog || p.x > 0))
    .x((p) => xScale(p.x))
    .y((p) => yScale(clampY(p.y)));
  return {
    xTicks: (options.xLog ? thinLogTicks(xScale.ticks()) : xScale.ticks(7)).map((value) => ({ value, position: xScale(value), label: fmtX(value) })),
    yTicks: (yLog ? thinLogTicks(yScale.ticks()) : yScale.ticks(6)).map((value) => ({ value, position: yScale(value), label: fmtY(value) })),
    paths: series.map((s) => ({ id: s.id, label: s.label, d: pathOf(s.points.filter((p) => p.x >= Math.min(...xDomain) && p.x <= Math.max(...xDomain))) ?? '' })),
    x: (v) => xScale(v),
    y: (v) => yScale(clampY(v)),
    inner,
  };
}

/** Keeps the decade ticks (1, 10, 100…) and, when few, the 2 and 5 ticks of a log axis. */
function thinLogTicks(ticks: number[]): number[] {
  const decades = ticks.filter((t) => Math.abs(Math.log10(t) - Math.round(Math.log10(t))) < 1e-9);
  if (decades.length >= 3) return decades;
  return ticks.filter((t) => {
    const m = t / 10 ** Math.floor(Math.log10(t) + 1e-9);
    return [1, 2, 5].some((k) => Math.abs(m - k) < 1e-6);
  });
}
