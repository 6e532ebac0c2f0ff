/** calc/: the one tested source of numbers. This barrel only re-exports. */
export * from './constants';
export * from './angle';
export * from './angleConvention';
export * from './decibel';
export * from './errors';
export * from './warnings';
export * from './formula';
export * from './calculator';
export * from './teamConventions';
export * from './wavelength';
export * from './gratingLobeLimit';
export * from './elementCount';
export * from './wavelengthFormulas';
export * from './numeric/gaussLegendre';
export * from './numeric/brentRoot';
export * from './numeric/goldenMinimize';
export * from './numeric/besselJ';
