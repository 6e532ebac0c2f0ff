/** Front-fed paraboloid: geometry, feed model, efficiencies, pattern, feed offset, pointing. */
export * from './geometry';
export * from './feedPattern';
export * from './efficiency';
export * from './ruze';
export * from './blockage';
export * from './gain';
export * from './aperturePattern';
export * from './feedOffset';
export * from './pointing';
