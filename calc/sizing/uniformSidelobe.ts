import { brentRoot } from '../numeric/brentRoot';

/**
 * First sidelobe of a long uniformly excited line or rectangular aperture, dB: the pattern
 * sin x / x peaks again where tan x = x (x ≈ 4.4934), giving 20·log10|sin x / x| ≈ −13.26 dB
 * (Balanis, Antenna Theory, 4th ed., §6.3 and §12.5 (section number from memory)). Computed here by root-finding, not typed.
 */
export const UNIFORM_FIRST_SIDELOBE_DB = (() => {
  const x = brentRoot((t) => Math.tan(t) - t, Math.PI + 0.1, 1.5 * Math.PI - 1e-6, 1e-14);
  return 20 * Math.log10(Math.abs(Math.sin(x) / x));
})();
