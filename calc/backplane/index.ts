// Backplane (ground plane behind a radiator): image factor with a spacer, band figures, flattest spacing, element directivity over the plane. Re-exports only.
export {
  IMAGE_FACTOR_FLOOR_DB,
  backplaneImageFactor,
  backplaneImageFactorDb,
  backplaneRoundTripPhaseRad,
  bestBroadsideFrequencyHz,
  broadsideBandHz,
  broadsideNullFrequencyHz,
  broadsideRippleDb,
  flattestSpacingM,
  quarterWaveSpacingM,
} from './imageFactor';
export type { DipoleKind } from './elementOverGround';
export { dipoleOverPlaneDirectivity, horizontalDipoleFieldAt } from './elementOverGround';
