/** Power values in dB relative to reference (default: their largest value), floored at floorDb so nulls stay finite. */
export function powerToRelativeDb(power: Float64Array, floorDb = -300, reference?: number): Float64Array {
  let peak = reference ?? 0;
  if (reference === undefined) for (const p of power) peak = Math.max(peak, p);
  const out = new Float64Array(power.length);
  for (let i = 0; i < power.length; i++) {
    out[i] = peak > 0 && power[i] > 0 ? Math.max(floorDb, 10 * Math.log10(power[i] / peak)) : floorDb;
  }
  return out;
}
