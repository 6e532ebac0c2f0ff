/**
 * The team's conventions: their shape and their values, the defaults every calculator starts
 * from. calc/ functions take these values as ordinary arguments; only calculator definitions
 * read them as defaults. Change a value here and rebuild: every calculator, island and the
 * Conventions page (site/conventions.ts re-exports these values with one sentence on each) follow.
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

/** The team's defaults (the Conventions page explains each one). */
export const teamConventions: TeamConventions = {
  units: { frequency: 'GHz', length: 'cm' },
  spacingMarginFraction: 0.05,
  elementPowerExponent: 1.3,
  efficiencies: { reflectorAperture: 0.6, arrayRadiation: 0.8 },
  maxScanDeg: 45,
  designFrequencyHz: 10e9,
  lattice: 'triangular',
};
