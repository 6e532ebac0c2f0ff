/** Unit and level conversions the converter page uses beyond calc/decibel.ts and calc/link/. This barrel only re-exports. */
export * from './planeWave';
export * from './gainReference';
