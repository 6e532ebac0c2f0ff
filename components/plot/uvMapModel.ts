/**
 * Data preparation for the u–v (direction-cosine) heat map (pure, tested): a colour for each
 * level, the RGBA pixels of the map (row 0 at the top, v = +1), the colour-scale legend, and
 * the mapping between (u, v) and the drawing. Colours are our own ramp, dark (low) to light
 * (high), so that brightness alone also orders the levels in print.
 */
import { scaleLinear } from 'd3-scale';

/** Colour stops from the floor (first) to 0 dB (last). */
export const UV_COLOUR_STOPS = ['#101a33', '#263f78', '#2f7d8f', '#5fae6e', '#d3c64f', '#fff6cf'];

function hexToRgb(hex: string): [number, number, number] {
  const n = Number.parseInt(hex.slice(1), 16);
  return [(n >> 16) & 255, (n >> 8) & 255, n & 255];
}

const STOP_RGB = UV_COLOUR_STOPS.map(hexToRgb);

/** Position of a level on the ramp: stop index k and fraction f between stops k and k + 1. */
function rampPosition(db: number, floorDb: number): [number, number] {
  const t = Number.isFinite(db) ? Math.min(1, Math.max(0, (db - floorDb) / -floorDb)) : 0;
  const position = t * (STOP_RGB.length - 1);
  const k = Math.min(STOP_RGB.length - 2, Math.floor(position));
  return [k, position - k];
}

/** RGB colour of a level in dB between floorDb (first stop) and 0 dB (last stop), clamped. */
export function levelColour(db: number, floorDb: number): [number, number, number] {
  const [k, f] = rampPosition(db, floorDb);
  const a = STOP_RGB[k], b = STOP_RGB[k + 1];
  return [Math.round(a[0] + (b[0] - a[0]) * f), Math.round(a[1] + (b[1] - a[1]) * f), Math.round(a[2] + (b[2] - a[2]) * f)];
}

/** RGBA pixels (count × count, row 0 = largest v) for levels powerDb[j·count + i] at (u_i, v_j); invisible samples transparent. */
export function uvMapPixels(count: number, powerDb: ArrayLike<number>, visible: ArrayLike<number>, floorDb: number): Uint8ClampedArray {
  const pixels = new Uint8ClampedArray(count * count * 4);
  for (let j = 0; j < count; j++) {
    const row = count - 1 - j;
    for (let i = 0; i < count; i++) {
      const k = j * count + i;
      if (!visible[k]) continue;
      const p = 4 * (row * count + i);
      const [stop, f] = rampPosition(powerDb[k], floorDb);
      const a = STOP_RGB[stop], b = STOP_RGB[stop + 1];
      pixels[p] = Math.round(a[0] + (b[0] - a[0]) * f);
      pixels[p + 1] = Math.round(a[1] + (b[1] - a[1]) * f);
      pixels[p + 2] = Math.round(a[2] + (b[2] - a[2]) * f);
      pixels[p + 3] = 255;
    }
  }
  return pixels;
}

export interface UvFrame {
  size: number;
  margin: { top: number; right: number; bottom: number; left: number };
}

export const DEFAULT_UV_FRAME: UvFrame = { size: 360, margin: { top: 12, right: 90, bottom: 44, left: 52 } };

export interface PreparedUvMap {
  /** Square drawing area for u, v ∈ [−1, 1]. */
  inner: { left: number; top: number; size: number };
  x: (u: number) => number;
  y: (v: number) => number;
  /** Inverse mapping of a point in the drawing to (u, v). */
  invert: (x: number, y: number) => { u: number; v: number };
  ticks: { value: number; label: string }[];
  /** Legend: a vertical bar from floor to 0 dB with ticks. */
  legend: { x: number; top: number; height: number; width: number; stops: { offset: number; colour: string }[]; ticks: { db: number; y: number; label: string }[] };
}

/** Scales, ticks and legend of a u–v map drawn in frame. */
export function prepareUvMap(floorDb: number, frame: UvFrame = DEFAULT_UV_FRAME, legendStepDb = 10): PreparedUvMap {
  const inner = { left: frame.margin.left, top: frame.margin.top, size: frame.size - frame.margin.top - frame.margin.bottom };
  const x = scaleLinear().domain([-1, 1]).range([inner.left, inner.left + inner.size]);
  const y = scaleLinear().domain([-1, 1]).range([inner.top + inner.size, inner.top]);
  const legendScale = scaleLinear().domain([floorDb, 0]).range([inner.top + inner.size, inner.top]);
  const ticks: { db: number; y: number; label: string }[] = [];
  for (let db = 0; db >= floorDb - 1e-9; db -= legendStepDb) ticks.push({ db, y: legendScale(db), label: `${db}`.replace('-', '−') });
  return {
    inner,
    x: (u) => x(u),
    y: (v) => y(v),
    invert: (px, py) => ({ u: x.invert(px), v: y.invert(py) }),
    ticks: [-1, -0.5, 0, 0.5, 1].map((value) => ({ value, label: `${value}`.replace('-', '−') })),
    legend: {
      x: inner.left + inner.size + 22,
      top: inner.top,
      height: inner.size,
      width: 14,
      // gradient from the top (0 dB, last stop) down to the floor (first stop)
      stops: UV_COLOUR_STOPS.map((colour, k) => ({ offset: 1 - k / (UV_COLOUR_STOPS.length - 1), colour })).reverse(),
      ticks,
    },
  };
}

/** θ and φ (degrees) of a direction in visible space from its direction cosines; null outside. */
export function uvToAngles(u: number, v: number): { thetaDeg: number; phiDeg: number } | null {
  const r2 = u * u + v * v;
  if (!(r2 <= 1)) return null;
  const phi = (Math.atan2(v, u) * 180) / Math.PI;
  return { thetaDeg: (Math.asin(Math.sqrt(r2)) * 180) / Math.PI, phiDeg: phi < 0 ? phi + 360 : phi };
}
