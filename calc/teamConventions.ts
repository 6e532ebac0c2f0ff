/**
 * The shape of the team's conventions file (values live in site/conventions.ts).
 * calc/ functions take these values as ordinary arguments; only page-level calculator
 * definitions read them as defaults.
 */
export interface TeamConventions {
  /** Preferred display units. */
  units: {
    frequency: 'Hz' | 'kHz' | 'MHz' | 'GHz';
    length: 'm' | 'cm' | 'mm' | 'ft' | 'in';
  };
  /** Spacing kept below the grating-lobe limit, as a fraction of the limit (0.05 = 5 % below). */
  spacingMarginFraction: number;
  /**
   * The team's default element: exponent n of its embedded element **power** pattern cosⁿθ
   * (forward half space). Every calculator that models an element pattern uses this one
   * convention (power, not field: a field pattern cos^m θ is a power pattern with n = 2m).
   */
  elementPowerExponent: number;
  /** Default efficiencies (linear, 0…1). */
  efficiencies: {
    /** Front-fed reflector aperture efficiency for quick sizing. */
    reflectorAperture: number;
    /** Phased-array radiation efficiency (feed network and element losses). */
    arrayRadiation: number;
  };
  /** Default maximum scan angle from broadside, degrees. */
  maxScanDeg: number;
  /** Default design frequency, Hz. */
  designFrequencyHz: number;
  /** Default lattice for planar arrays. */
  lattice: 'rectangular' | 'triangular';
}
