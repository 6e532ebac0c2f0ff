/** Link budget: path loss, noise, mismatch, polarization, line of sight. This barrel only re-exports. */
export * from './friis';
export * from './thermalNoise';
export * from './noiseTemperature';
export * from './noiseCascade';
export * from './carrierToNoise';
export * from './mismatch';
export * from './polarizationMismatch';
export * from './lineOfSight';
export * from './activeArrayEirp';
