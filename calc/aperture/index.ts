/** The aperture relations shared by the reflector, range & exposure and sizing: gain from area and far-field distance. */
export * from './apertureGain';
export * from './farFieldDistance';
export * from './formulas';
