/** Default field text for a frequency in Hz, in the largest unit that keeps it ≥ 1 (e.g. '10 GHz'). */
export function frequencyDefaultText(frequencyHz: number): string {
  if (frequencyHz >= 1e9) return `${+(frequencyHz / 1e9).toPrecision(12)} GHz`;
  if (frequencyHz >= 1e6) return `${+(frequencyHz / 1e6).toPrecision(12)} MHz`;
  if (frequencyHz >= 1e3) return `${+(frequencyHz / 1e3).toPrecision(12)} kHz`;
  return `${frequencyHz} Hz`;
}
