/** Power ratio (linear) to decibels: 10·log10(p). Returns −Infinity for 0; callers clamp for display. */
export function powerRatioToDb(powerRatio: number): number {
  return 10 * Math.log10(powerRatio);
}

/** Decibels to power ratio (linear): 10^(dB/10). */
export function dbToPowerRatio(decibels: number): number {
  return 10 ** (decibels / 10);
}

/** Field (amplitude) ratio to decibels: 20·log10(|a|). */
export function fieldRatioToDb(fieldRatio: number): number {
  return 20 * Math.log10(Math.abs(fieldRatio));
}

/** Decibels to field (amplitude) ratio: 10^(dB/20). */
export function dbToFieldRatio(decibels: number): number {
  return 10 ** (decibels / 20);
}

/** Power ratio to dB, floored so that a null never becomes −Infinity (floor in dB, default −300). */
export function powerRatioToDbFloored(powerRatio: number, floorDb = -300): number {
  if (!(powerRatio > 0)) return floorDb;
  return Math.max(floorDb, 10 * Math.log10(powerRatio));
}
