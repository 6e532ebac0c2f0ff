/**
 * Friis noise formula for a cascade, and the system noise temperature of a receiving chain referred
 * to the antenna terminals. H. T. Friis, "Noise figures of radio receivers", Proc. IRE 32 (1944) 419–422.
 */
import { CalcInputError, requireFinite, requireNonNegative } from '../errors';
import { lossyLineNoiseTemperatureK } from './noiseTemperature';

/** One stage of a cascade: available gain (dB; a loss is negative) and effective input noise temperature (K). */
export interface NoiseStage {
  gainDb: number;
  noiseTemperatureK: number;
}

/** Effective input noise temperature (K) of a cascade: T₁ + T₂/G₁ + T₃/(G₁G₂) + … (Friis 1944). */
export function cascadeNoiseTemperatureK(stages: NoiseStage[]): number {
  if (stages.length === 0) throw new CalcInputError('stages', 'expected at least one stage');
  let total = 0;
  let gainBefore = 1;
  stages.forEach((s, i) => {
    requireFinite(`stages[${i}].gainDb`, s.gainDb, 'dB');
    requireNonNegative(`stages[${i}].noiseTemperatureK`, s.noiseTemperatureK, 'K');
    total += s.noiseTemperatureK / gainBefore;
    gainBefore *= 10 ** (s.gainDb / 10);
  });
  return total;
}

/**
 * System noise temperature (K) referred to the antenna terminals: antenna, then a feeder of loss
 * feederLossDb at feederPhysicalTemperatureK, then a receiver of noise temperature receiverNoiseTemperatureK:
 * T_sys = T_A + (L − 1)·T_phys + L·T_rx.
 */
export function systemNoiseTemperatureK(
  antennaTemperatureK: number,
  feederLossDb: number,
  feederPhysicalTemperatureK: number,
  receiverNoiseTemperatureK: number,
): number {
  requireNonNegative('antennaTemperatureK', antennaTemperatureK, 'K');
  return (
    antennaTemperatureK +
    cascadeNoiseTemperatureK([
      { gainDb: -feederLossDb, noiseTemperatureK: lossyLineNoiseTemperatureK(feederLossDb, feederPhysicalTemperatureK) },
      { gainDb: 0, noiseTemperatureK: receiverNoiseTemperatureK },
    ])
  );
}
