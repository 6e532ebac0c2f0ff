// End-fire structures (ordinary and Hansen–Woodyard arrays, Yagi–Uda data, stacking) and the broadside comparison: re-exports only.
export type { EndFireArrayKind, EndFireLengthSolution } from './endFireArray';
export {
  HANSEN_WOODYARD_LONG_ARRAY_FACTOR,
  MAX_END_FIRE_ELEMENTS,
  endFireApproxDirectivity,
  endFireArrayModel,
  endFireDirectivity,
  endFireElementCount,
  endFireHpbwDeg,
  endFireLengthForDirectivity,
  endFirePhaseStepRad,
  endFireSpacingLimitWavelengths,
  hansenWoodyardApproxDirectivity,
  ordinaryEndFireApproxDirectivity,
} from './endFireArray';
export type { YagiDesignPoint, YagiEstimateKind, YagiGainEstimate } from './yagiGain';
export { NBS_YAGI_DESIGNS, YAGI_BOOM_LIMITS_WAVELENGTHS, yagiBoomForGainWavelengths, yagiGainDbd } from './yagiGain';
export type { StackBays } from './stacking';
export { directivityForEqualPlaneHpbw, hpbwFromDirectivityDeg, stackingDistanceWavelengths, stackingGainIncreaseDb } from './stacking';
export { squareApertureDirectivity, squareApertureSideForDirectivity } from './apertureComparison';
