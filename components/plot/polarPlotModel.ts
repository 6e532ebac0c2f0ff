/**
 * Data preparation for polar pattern plots (pure, tested): θ runs clockwise from the top
 * (broadside up, +θ to the right), radius is the level in dB from floorDb at the centre to 0 dB
 * at the rim. Paths come from d3-shape's lineRadial; levels below the floor sit at the centre.
 */
import { lineRadial } from 'd3-shape';
import { scaleLinear } from 'd3-scale';

export interface PolarPoint {
  thetaDeg: number;
  db: number;
}

export interface PolarSeries {
  id: string;
  label: string;
  points: PolarPoint[];
}

export interface PolarFrame {
  size: number;
  margin: number;
}

export interface PreparedPolarPlot {
  centre: { x: number; y: number };
  radius: number;
  rings: { db: number; r: number; label: string }[];
  spokes: { angleDeg: number; x: number; y: number; labelX: number; labelY: number; label: string }[];
  /** Paths relative to the centre (render inside a translate to the centre). */
  paths: { id: string; label: string; d: string }[];
  /** Position (relative to the centre) of a level at an angle, clamped to the plot. */
  at: (thetaDeg: number, db: number) => { x: number; y: number };
}

export const DEFAULT_POLAR_FRAME: PolarFrame = { size: 420, margin: 44 };

/** Prepares rings every ringStepDb down to floorDb, spokes every spokeStepDeg over −180…180°, and the series' paths. */
export function preparePolarPlot(series: PolarSeries[], options: { floorDb?: number; ringStepDb?: number; spokeStepDeg?: number; frame?: PolarFrame } = {}): PreparedPolarPlot {
  const frame = options.frame ?? DEFAULT_POLAR_FRAME;
  const floorDb = options.floorDb ?? -40;
  if (!(floorDb < 0) || !Number.isFinite(floorDb)) throw new RangeError(`floorDb: expected a negative finite number of dB, got ${floorDb}`);
  const ringStep = options.ringStepDb ?? 10;
  const spokeStep = options.spokeStepDeg ?? 30;
  const radius = frame.size / 2 - frame.margin;
  const centre = { x: frame.size / 2, y: frame.size / 2 };
  const r = scaleLinear().domain([floorDb, 0]).range([0, radius]).clamp(true);
  const rings: PreparedPolarPlot['rings'] = [];
  for (let db = 0; db > floorDb - 1e-9; db -= ringStep) rings.push({ db, r: r(db), label: db === 0 ? '0 dB' : `${db}`.replace('-', '−') });
  const spokes: PreparedPolarPlot['spokes'] = [];
  for (let a = -180 + spokeStep; a <= 180 + 1e-9; a += spokeStep) {
    const rad = (a * Math.PI) / 180;
    const label = `${Math.round(a)}°`.replace('-', '−');
    spokes.push({ angleDeg: a, x: radius * Math.sin(rad), y: -radius * Math.cos(rad), labelX: (radius + 18) * Math.sin(rad), labelY: -(radius + 18) * Math.cos(rad) + 4, label });
  }
  const toRad = (deg: number) => (deg * Math.PI) / 180;
  const path = lineRadial<PolarPoint>()
    .defined((p) => Number.isFinite(p.thetaDeg) && Number.isFinite(p.db))
    .angle((p) => toRad(p.thetaDeg))
    .radius((p) => r(p.db));
  return {
    centre,
    radius,
    rings,
    spokes,
    paths: series.map((s) => ({ id: s.id, label: s.label, d: path(s.points) ?? '' })),
    at: (thetaDeg, db) => ({ x: r(db) * Math.sin(toRad(thetaDeg)), y: -r(db) * Math.cos(toRad(thetaDeg)) }),
  };
}
