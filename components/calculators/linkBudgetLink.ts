/** Links that carry an antenna into the link budget ("use this antenna in a link budget"); pure, tested. */
import { spilloverGroundFraction } from '../../calc/link/noiseTemperature';

export interface ReflectorForLink {
  /** The reflector page's frequency field in its canonical link form, e.g. '10GHz'. */
  frequencyCanonical: string;
  gainDbi: number;
  diameterM: number;
  hpbwDeg: number | null;
  spilloverPercent: number | null;
}

const figures = (x: number, digits: number) => String(+x.toPrecision(digits));

/**
 * Query for the link-budget page with a dish as the receive antenna: frequency, gain, half-power
 * beamwidth (for the pointing loss), the diameter (for the far-field check) and the ground share of
 * the noise pick-up from its spillover. The dish's gain already holds its "other losses" (ohmic,
 * mismatch, radome), so the receive VSWR is set to 1 and the radome loss to 0 dB: nothing counted twice.
 */
export function linkBudgetQueryFromReflector(dish: ReflectorForLink): string {
  const parts = [
    'v=1',
    `f=${encodeURIComponent(dish.frequencyCanonical)}`,
    `gr=${dish.gainDbi.toFixed(2)}dBi`,
    `dmax=${figures(dish.diameterM, 6)}m`,
    'vswrr=1',
    'radr=0dB',
  ];
  if (dish.hpbwDeg !== null) parts.push(`bwr=${figures(dish.hpbwDeg, 5)}deg`);
  if (dish.spilloverPercent !== null) parts.push(`gfr=${figures(spilloverGroundFraction(dish.spilloverPercent / 100), 4)}`);
  return `?${parts.join('&')}`;
}
