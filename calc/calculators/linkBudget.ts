/**
 * Link budget: transmitter to margin. EIRP (single antenna or active array), free-space loss (exact
 * and ITU-R P.525 form), entered atmospheric and rain losses, polarization and pointing losses,
 * receive gain and mismatch, the system noise temperature by the Friis noise formula, G/T, C/N₀,
 * C/N, Eb/N₀, sensitivity and margin, and the largest range that keeps a chosen margin (root-finding).
 */
import type { CalcInputs, CalcResult, CalculatorDef } from '../calculator';
import type { TeamConventions } from '../teamConventions';
import { freeSpaceWavelengthM } from '../wavelength';
import { freeSpacePathLossDb, p525BasicTransmissionLossDb } from '../link/friis';
import { BOLTZMANN_DBW_PER_K_HZ } from '../link/thermalNoise';
import { antennaNoiseTemperatureK, noiseFigureToTemperatureK } from '../link/noiseTemperature';
import { systemNoiseTemperatureK } from '../link/noiseCascade';
import { carrierToNoiseDb, carrierToNoiseDensityDbHz, ebN0Db, gOverTDbPerK, sensitivityDbm } from '../link/carrierToNoise';
import { mismatchLossFromVswrDb, reflectionMagnitudeFromVswr, returnLossDbFromReflectionMagnitude } from '../link/mismatch';
import { POLARIZATION_EFFICIENCY_FLOOR, polarizationMismatchLossDb } from '../link/polarizationMismatch';
import { midpointFresnelRadiusM, radioHorizonM } from '../link/lineOfSight';
import { activeArrayEirpW, activeArrayTotalPowerW } from '../link/activeArrayEirp';
import { pointingLossDb } from '../reflector/pointing';
import { farFieldBoundaryM } from '../exposure/powerDensity';
import { brentRoot } from '../numeric/brentRoot';
import { diameterForGainM } from '../aperture/apertureGain';
import { CalcInputError } from '../errors';
import { warning, type CalcWarning } from '../warnings';
import { frequencyDefaultText } from './defaultText';
import { EXPOSURE_CAUTION } from './rangeExposure';
import { freeSpacePathLossFormula, p525LossFormula } from '../linkFormulas';
import { farFieldDistanceFormula } from '../aperture/formulas';
import {
  carrierToNoiseDensityFormula,
  fresnelRadiusFormula,
  gOverTFormula,
  mismatchLossFormula,
  polarizationMismatchFormula,
  radioHorizonFormula,
  sensitivityFormula,
  systemNoiseTemperatureFormula,
} from '../linkBudgetFormulas';

/** Range limits of the largest-range search, m (the range field's own limits). */
export const RANGE_SEARCH_MIN_M = 1e-3;
export const RANGE_SEARCH_MAX_M = 1e12;

/** Unit of a budget line's value or running total. */
export type BudgetUnit = 'dBW' | 'dB' | 'dBi' | 'dB(K)' | 'dBW/K' | 'dBW/(K·Hz)' | 'dB·Hz' | 'dB(Hz)';

/** One line of the budget: what it adds (dB, signed as it enters the sum) and the total after it. */
export interface BudgetLine {
  id: string;
  label: string;
  /** Value as it enters the running total (losses negative), in `unit`. */
  valueDb: number;
  unit: BudgetUnit;
  /** The running total after this line, in `totalUnit`. */
  totalDb: number;
  totalUnit: BudgetUnit;
  /** A subtotal line (EIRP, received power, C/N₀, C/N, margin) rather than a term. */
  subtotal: boolean;
}

export interface MarginPoint {
  rangeM: number;
  marginDb: number;
}

export interface LinkBudgetData {
  lines: BudgetLine[];
  marginCurve: MarginPoint[];
  /** The margin kept in the range search, dB. */
  keptMarginDb: number;
  /** For the exposure page link: the power delivered to the antenna (W) and the gain (dBi) that with it gives this EIRP. */
  exposurePowerW: number;
  exposureGainDbi: number;
  frequencyHz: number;
}

/** Builds budget lines with running totals (pure). */
class BudgetBuilder {
  readonly lines: BudgetLine[] = [];
  total = 0;
  totalUnit: BudgetUnit = 'dBW';
  term(id: string, label: string, valueDb: number, unit: BudgetUnit, totalUnit: BudgetUnit = this.totalUnit): void {
    this.total += valueDb;
    this.totalUnit = totalUnit;
    this.lines.push({ id, label, valueDb, unit, totalDb: this.total, totalUnit, subtotal: false });
  }
  subtotal(id: string, label: string): void {
    this.lines.push({ id, label, valueDb: this.total, unit: this.totalUnit, totalDb: this.total, totalUnit: this.totalUnit, subtotal: true });
  }
}

/** Pure computation from validated inputs (Hz, m, W, dB, K, degrees). */
export function computeLinkBudget(inputs: CalcInputs): CalcResult<LinkBudgetData> {
  const f = inputs.frequencyHz as number;
  const mode = inputs.transmitterKind as 'single' | 'array';
  const rangeM = inputs.rangeM as number;
  const warnings: CalcWarning[] = [warning('exposure-caution', 'caution', EXPOSURE_CAUTION, ['eirpDbw', 'eirpW'])];
  const lambda = freeSpaceWavelengthM(f);

  // Transmit side
  const b = new BudgetBuilder();
  let transmitPowerW: number;
  let totalRadiatedW: number | null = null;
  let eirpEdgeDbw: number | null = null;
  const txMismatchDb = mismatchLossFromVswrDb(inputs.transmitVswr as number);
  const txRadomeDb = inputs.transmitRadomeLossDb as number;
  if (mode === 'array') {
    const n = inputs.elementCount as number;
    const pel = inputs.elementPowerW as number;
    const gel = inputs.elementGainDbi as number;
    transmitPowerW = activeArrayTotalPowerW(n, pel);
    totalRadiatedW = transmitPowerW;
    b.term('element-power', 'Power per element P_el', 10 * Math.log10(pel), 'dBW');
    b.term('element-gain', 'Element gain G_el (IEEE Std 145 gain)', gel, 'dBi');
    b.term('array-combining', `Coherent combining of ${n} elements, N² (N for the array gain, N for the powers)`, 20 * Math.log10(n), 'dB');
    const gelEdge = inputs.elementGainEdgeDbi as number | null;
    if (gelEdge !== null) eirpEdgeDbw = 10 * Math.log10(activeArrayEirpW(n, pel, gelEdge)) - txMismatchDb - txRadomeDb;
  } else {
    transmitPowerW = inputs.transmitPowerW as number;
    b.term('transmit-power', 'Transmitter power', 10 * Math.log10(transmitPowerW), 'dBW');
    b.term('transmit-feeder', 'Transmit feeder loss', -(inputs.transmitFeederLossDb as number), 'dB');
    b.term('transmit-gain', 'Transmit antenna gain (IEEE Std 145 gain)', inputs.transmitGainDbi as number, 'dBi');
  }
  b.term('transmit-mismatch', 'Transmit mismatch loss (gain → realized gain)', -txMismatchDb, 'dB');
  b.term('transmit-radome', 'Transmit radome loss', -txRadomeDb, 'dB');
  const eirpDbw = b.total;
  b.subtotal('eirp', 'EIRP on the beam axis');
  const txHpbw = inputs.transmitBeamwidthDeg as number | null;
  const txPointingDb = txHpbw === null ? 0 : pointingLossDb(inputs.transmitPointingErrorDeg as number, txHpbw);
  b.term('transmit-pointing', 'Transmit pointing loss (Gaussian beam)', -txPointingDb, 'dB');

  // Path
  const fsplDb = freeSpacePathLossDb(rangeM, f);
  const p525Db = p525BasicTransmissionLossDb(rangeM, f);
  const atmosphericDb = inputs.atmosphericLossDb as number;
  const rainDb = inputs.rainLossDb as number;
  const sameSense = inputs.polarizationSense === 'same';
  const polarizationLossDb = polarizationMismatchLossDb(inputs.transmitAxialRatioDb as number, inputs.receiveAxialRatioDb as number, sameSense, inputs.tiltDifferenceDeg as number);
  b.term('free-space-loss', 'Free-space path loss 20·log10(4πR/λ)', -fsplDb, 'dB');
  b.term('atmospheric', 'Atmospheric gases (entered)', -atmosphericDb, 'dB');
  b.term('rain', 'Rain (entered)', -rainDb, 'dB');
  b.term('polarization', 'Polarization mismatch', -polarizationLossDb, 'dB');

  // Receive antenna
  const rxHpbw = inputs.receiveBeamwidthDeg as number | null;
  const rxPointingDb = rxHpbw === null ? 0 : pointingLossDb(inputs.receivePointingErrorDeg as number, rxHpbw);
  const rxMismatchDb = mismatchLossFromVswrDb(inputs.receiveVswr as number);
  const rxRadomeDb = inputs.receiveRadomeLossDb as number;
  const gr = inputs.receiveGainDbi as number;
  b.term('receive-pointing', 'Receive pointing loss (Gaussian beam)', -rxPointingDb, 'dB');
  b.term('receive-radome', 'Receive radome loss', -rxRadomeDb, 'dB');
  b.term('receive-gain', 'Receive antenna gain (IEEE Std 145 gain)', gr, 'dBi');
  b.term('receive-mismatch', 'Receive mismatch loss (gain → realized gain)', -rxMismatchDb, 'dB');
  const receivedDbw = b.total;
  b.subtotal('received-power', 'Received power at the antenna terminals');

  // Noise
  const antennaTempK = antennaNoiseTemperatureK(inputs.skyTemperatureK as number, inputs.groundTemperatureK as number, inputs.groundFraction as number);
  const receiverTempK = noiseFigureToTemperatureK(inputs.receiverNoiseFigureDb as number);
  const tsysK = systemNoiseTemperatureK(antennaTempK, inputs.receiveFeederLossDb as number, inputs.feederTemperatureK as number, receiverTempK);
  if (!(tsysK > 0)) {
    throw new CalcInputError('skyTemperatureK', 'the system noise temperature comes out 0 K: give a sky or ground temperature above 0 K, or a receiver noise figure above 0 dB');
  }
  const receivedDbm = receivedDbw + 30;
  const cn0 = carrierToNoiseDensityDbHz(receivedDbm, tsysK);
  const bandwidthHz = inputs.bandwidthHz as number;
  const cn = carrierToNoiseDb(cn0, bandwidthHz);
  const requiredCnDb = inputs.requiredCarrierToNoiseDb as number;
  const marginDb = cn - requiredCnDb;
  b.term('system-temperature', 'System noise temperature 10·log10(T_sys)', -10 * Math.log10(tsysK), 'dB(K)', 'dBW/K');
  b.term('boltzmann', 'Boltzmann constant −10·log10(k)', -BOLTZMANN_DBW_PER_K_HZ, 'dBW/(K·Hz)', 'dB·Hz');
  b.subtotal('cn0', 'C/N₀');
  b.term('bandwidth', 'Noise bandwidth 10·log10(B)', -10 * Math.log10(bandwidthHz), 'dB(Hz)', 'dB');
  b.subtotal('cn', 'C/N in the bandwidth');
  b.term('required', 'Required C/N', -requiredCnDb, 'dB');
  b.subtotal('margin', 'Margin');

  const bitRate = inputs.bitRateBitPerS as number | null;
  const ebn0 = bitRate === null ? null : ebN0Db(cn0, bitRate);
  const receiverNf = inputs.receiverNoiseFigureDb as number;
  const sensitivity = sensitivityDbm(bandwidthHz, receiverNf, requiredCnDb);

  // Largest range at the kept margin: margin(R) falls with R through the free-space loss alone.
  const keptMarginDb = inputs.keptMarginDb as number;
  const marginWithoutPathDb = marginDb + fsplDb;
  const marginAtRangeDb = (r: number) => marginWithoutPathDb - freeSpacePathLossDb(r, f);
  const excessAtLog = (logR: number) => marginAtRangeDb(10 ** logR) - keptMarginDb;
  const logMin = Math.log10(RANGE_SEARCH_MIN_M);
  const logMax = Math.log10(RANGE_SEARCH_MAX_M);
  let maxRangeM: number | null = null;
  if (excessAtLog(logMin) < 0) {
    warnings.push(warning('no-range-at-margin', 'caution', `No range from 1 mm on keeps a margin of ${keptMarginDb} dB with these figures.`, ['maxRangeM']));
  } else if (excessAtLog(logMax) > 0) {
    warnings.push(warning('range-beyond-search', 'note', `The margin of ${keptMarginDb} dB holds beyond 10⁹ km; the search stops there.`, ['maxRangeM']));
  } else {
    maxRangeM = 10 ** brentRoot(excessAtLog, logMin, logMax, 1e-12);
  }

  // Smallest receive antenna: the margin moves dB for dB with the receive gain (T_sys does not depend on it)
  const requiredReceiveGainDbi = gr + keptMarginDb - marginDb;
  let smallestDishM: number | null = null;
  if (requiredReceiveGainDbi >= -100 && requiredReceiveGainDbi <= 200) {
    const d = diameterForGainM(requiredReceiveGainDbi, inputs.receiveApertureEfficiency as number, lambda);
    if (d >= lambda) smallestDishM = d;
    else warnings.push(warning('dish-below-wavelength', 'note', 'The receive gain that keeps the margin needs an aperture smaller than a wavelength: the aperture relation does not apply, so no dish diameter is given.', ['smallestReceiveDishM']));
  }

  // Geometry
  const fresnelM = midpointFresnelRadiusM(rangeM, f);
  const h1 = inputs.transmitHeightM as number | null;
  const h2 = inputs.receiveHeightM as number | null;
  const horizonM = h1 !== null && h2 !== null ? radioHorizonM(h1, h2) : null;
  const dmax = inputs.largestApertureM as number | null;
  const farFieldM = dmax === null ? null : farFieldBoundaryM(dmax, f);

  if (marginDb < 0) {
    warnings.push(warning('negative-margin', 'caution', `The link does not close: the margin is ${marginDb.toFixed(2)} dB at ${(rangeM / 1000).toPrecision(4)} km.`, ['marginDb']));
  }
  if (horizonM !== null && rangeM > horizonM) {
    warnings.push(
      warning('beyond-radio-horizon', 'outside-validity', `The range is beyond the radio horizon (${(horizonM / 1000).toPrecision(4)} km for these heights, 4/3 earth): the earth blocks the direct path and free-space loss does not apply.`, ['receivedPowerDbm', 'marginDb', 'fsplDb']),
    );
  }
  if (horizonM !== null && maxRangeM !== null && maxRangeM > horizonM) {
    warnings.push(warning('max-range-beyond-horizon', 'caution', `The free-space range at the kept margin lies beyond the radio horizon (${(horizonM / 1000).toPrecision(4)} km): it is not reachable over a smooth earth at these heights.`, ['maxRangeM', 'radioHorizonM']));
  }
  if (farFieldM !== null && rangeM < farFieldM) {
    warnings.push(warning('inside-far-field', 'outside-validity', `The range is inside the far-field distance 2D²/λ = ${farFieldM.toPrecision(3)} m of the largest aperture: the gains and the Friis equation do not hold there.`, ['receivedPowerDbm', 'marginDb']));
  }
  if (polarizationLossDb >= -10 * Math.log10(POLARIZATION_EFFICIENCY_FLOOR) - 1e-9) {
    warnings.push(warning('cross-polarized', 'caution', 'The two polarizations are orthogonal: the ideal model gives no coupling, shown as 60 dB. Real antennas couple through their cross-polarization; use a measured figure.', ['polarizationLossDb']));
  }
  if (txHpbw === null && (inputs.transmitPointingErrorDeg as number) > 0) {
    warnings.push(warning('transmit-pointing-unused', 'note', 'A transmit pointing error without a transmit beamwidth is not counted: give the beamwidth.', ['transmitPointingLossDb']));
  }
  if (rxHpbw === null && (inputs.receivePointingErrorDeg as number) > 0) {
    warnings.push(warning('receive-pointing-unused', 'note', 'A receive pointing error without a receive beamwidth is not counted: give the beamwidth.', ['receivePointingLossDb']));
  }

  const marginCurve: MarginPoint[] = [];
  const curveStop = Math.max(rangeM, maxRangeM ?? 0) * 3;
  const curveStart = Math.max(RANGE_SEARCH_MIN_M, curveStop / 1e3);
  for (let i = 0; i <= 120; i++) {
    const r = curveStart * (curveStop / curveStart) ** (i / 120);
    marginCurve.push({ rangeM: r, marginDb: marginAtRangeDb(r) });
  }

  const txGamma = reflectionMagnitudeFromVswr(inputs.transmitVswr as number);
  const rxGamma = reflectionMagnitudeFromVswr(inputs.receiveVswr as number);
  const eirpW = 10 ** (eirpDbw / 10);
  const exposurePowerW = mode === 'array' ? transmitPowerW : transmitPowerW * 10 ** (-(inputs.transmitFeederLossDb as number) / 10);

  return {
    values: {
      wavelengthM: lambda,
      eirpDbw,
      eirpW,
      eirpEdgeDbw,
      totalRadiatedPowerW: totalRadiatedW,
      transmitReflectionMagnitude: txGamma,
      transmitReturnLossDb: txGamma > 0 ? returnLossDbFromReflectionMagnitude(txGamma) : null,
      transmitMismatchLossDb: txMismatchDb,
      transmitRealizedGainDbi: mode === 'single' ? (inputs.transmitGainDbi as number) - txMismatchDb : null,
      transmitPointingLossDb: txPointingDb,
      fsplDb,
      p525LossDb: p525Db,
      polarizationLossDb,
      receivePointingLossDb: rxPointingDb,
      receiveReflectionMagnitude: rxGamma,
      receiveReturnLossDb: rxGamma > 0 ? returnLossDbFromReflectionMagnitude(rxGamma) : null,
      receiveMismatchLossDb: rxMismatchDb,
      receiveRealizedGainDbi: gr - rxMismatchDb,
      receivedPowerDbm: receivedDbm,
      antennaNoiseTemperatureK: antennaTempK,
      receiverNoiseTemperatureK: receiverTempK,
      systemNoiseTemperatureK: tsysK,
      gOverTDbPerK: gOverTDbPerK(gr, tsysK),
      carrierToNoiseDensityDbHz: cn0,
      carrierToNoiseDb: cn,
      ebN0Db: ebn0,
      sensitivityDbm: sensitivity,
      marginDb,
      maxRangeM,
      requiredReceiveGainDbi,
      smallestReceiveDishM: smallestDishM,
      fresnelRadiusM: fresnelM,
      radioHorizonM: horizonM,
      farFieldBoundaryM: farFieldM,
    },
    warnings,
    data: { lines: b.lines, marginCurve, keptMarginDb, exposurePowerW, exposureGainDbi: eirpDbw - 10 * Math.log10(exposurePowerW), frequencyHz: f },
  };
}

const SINGLE = { key: 'tx', values: ['single'] };
const ARRAY = { key: 'tx', values: ['array'] };

/** The calculator definition, with defaults from the team conventions. */
export function createLinkBudgetCalculator(conventions: TeamConventions): CalculatorDef<LinkBudgetData> {
  return {
    id: 'link-budget',
    title: 'Link budget, G/T & margin',
    summary: 'The whole link as a budget table: EIRP (also of an active array), path, polarization and pointing losses, system noise temperature, G/T, C/N₀, Eb/N₀, margin and the largest range at a chosen margin.',
    nav: { order: 9 },
    safety: { lead: 'The transmit side of a link budget is a transmitter: the Link range & RF exposure page (linked under the budget table, with this EIRP) estimates how close to the antenna the power density exceeds a limit.', cautions: ['rfExposure'] },
    embed: true,
    purpose:
      'Does the link close? EIRP, path and polarization losses, the receiving system’s noise temperature and G/T, C/N₀, C/N and Eb/N₀, the margin, and the largest range that keeps a chosen margin — as a budget table.',
    schemaVersion: 1,
    migrations: {},
    params: [
      { kind: 'frequency', key: 'f', name: 'frequencyHz', label: 'Frequency', defaultText: frequencyDefaultText(conventions.designFrequencyHz), min: 1e6, max: 1e12, description: 'Carrier frequency.' },
      { kind: 'length', key: 'r', name: 'rangeM', label: 'Range (link distance)', defaultText: '40 km', min: RANGE_SEARCH_MIN_M, max: RANGE_SEARCH_MAX_M, description: 'Distance between the antennas for the budget.' },
      {
        kind: 'choice',
        key: 'tx',
        name: 'transmitterKind',
        label: 'Transmitter',
        options: [
          { value: 'single', label: 'One transmitter and antenna' },
          { value: 'array', label: 'Active array (power per element)' },
        ],
        defaultText: 'single',
        description: 'A transmitter feeding one antenna, or an active array with an amplifier at every element.',
      },
      { kind: 'power', key: 'pt', name: 'transmitPowerW', label: 'Transmitter power', defaultText: '2 W', min: 1e-12, max: 1e7, minExclusive: true, usedWhen: SINGLE, description: 'Power at the transmitter output, before the feeder (W, dBm or dBW).' },
      { kind: 'decibel', key: 'lft', name: 'transmitFeederLossDb', label: 'Transmit feeder loss', defaultText: '1 dB', min: 0, max: 100, usedWhen: SINGLE, description: 'Cable, waveguide and connector loss between transmitter and antenna, positive dB.' },
      { kind: 'decibel', key: 'gt', name: 'transmitGainDbi', label: 'Transmit antenna gain (dBi)', defaultText: '28 dBi', min: -30, max: 90, usedWhen: SINGLE, description: 'Gain in the IEEE Std 145 sense (directivity × radiation efficiency), toward the receiver; the mismatch below turns it into realized gain. Use dBic for a circularly polarized antenna (see the polarization fields).' },
      { kind: 'count', key: 'n', name: 'elementCount', label: 'Number of elements N', defaultText: '64', min: 1, max: 1e6, usedWhen: ARRAY, description: 'Active elements, each with its own amplifier, all radiating in phase toward the receiver.' },
      { kind: 'power', key: 'pel', name: 'elementPowerW', label: 'Power per element', defaultText: '0.1 W', min: 1e-12, max: 1e5, minExclusive: true, usedWhen: ARRAY, description: 'Power delivered to each element.' },
      { kind: 'decibel', key: 'gel', name: 'elementGainDbi', label: 'Element gain toward the receiver (dBi)', defaultText: '5 dBi', min: -30, max: 30, usedWhen: ARRAY, description: 'Gain of one element in the array (embedded) at the beam direction.' },
      { kind: 'decibel', key: 'gele', name: 'elementGainEdgeDbi', label: 'Element gain at the scan edge (dBi)', defaultText: '', min: -30, max: 30, optional: true, usedWhen: ARRAY, description: 'Optional: the embedded element gain at the edge of the scan range, for the EIRP there.' },
      { kind: 'number', key: 'vswrt', name: 'transmitVswr', label: 'Transmit antenna VSWR', defaultText: '1.5', min: 1, max: 100, description: 'Standing-wave ratio at the transmit antenna port (1 = matched); gives |Γ|, return loss and mismatch loss.' },
      { kind: 'decibel', key: 'radt', name: 'transmitRadomeLossDb', label: 'Transmit radome loss', defaultText: '0 dB', min: 0, max: 30, description: 'One-way radome or window loss at the transmit end, positive dB.' },
      { kind: 'angle', key: 'bwt', name: 'transmitBeamwidthDeg', label: 'Transmit half-power beamwidth', defaultText: '', min: 0.001, max: 180, optional: true, description: 'Optional: HPBW of the transmit antenna, for the pointing loss.' },
      { kind: 'angle', key: 'pet', name: 'transmitPointingErrorDeg', label: 'Transmit pointing error', defaultText: '0 deg', min: 0, max: 90, description: 'Angle between the transmit beam axis and the receiver.' },
      { kind: 'decibel', key: 'atm', name: 'atmosphericLossDb', label: 'Atmospheric gases loss', defaultText: '0.2 dB', min: 0, max: 100, description: 'Oxygen and water-vapour absorption along the path, from Recommendation ITU-R P.676 for your path and climate; entered, not computed here.' },
      { kind: 'decibel', key: 'rain', name: 'rainLossDb', label: 'Rain loss', defaultText: '0 dB', min: 0, max: 100, description: 'Rain attenuation exceeded for the time percentage you design for, from Recommendations ITU-R P.838 and P.530 (terrestrial) or P.618 (earth–space); entered, not computed here.' },
      { kind: 'decibel', key: 'art', name: 'transmitAxialRatioDb', label: 'Transmit axial ratio', defaultText: '40 dB', min: 0, max: 100, description: 'Axial ratio of the transmit polarization, major over minor axis: 0 dB circular, 40 dB or more practically linear.' },
      { kind: 'decibel', key: 'arr', name: 'receiveAxialRatioDb', label: 'Receive axial ratio', defaultText: '40 dB', min: 0, max: 100, description: 'Axial ratio of the receive antenna’s own polarization (as it would transmit), major over minor axis.' },
      {
        kind: 'choice',
        key: 'sense',
        name: 'polarizationSense',
        label: 'Senses of rotation',
        options: [
          { value: 'same', label: 'Same (e.g. both right-hand)' },
          { value: 'opposite', label: 'Opposite' },
        ],
        defaultText: 'same',
        description: 'Whether the two antennas have the same sense of rotation, each as it transmits (both right-hand: same); for linear polarizations it makes no difference.',
      },
      { kind: 'angle', key: 'tilt', name: 'tiltDifferenceDeg', label: 'Angle between the major axes', defaultText: '5 deg', min: -180, max: 180, description: 'Angle between the two polarization ellipses’ major axes (for two linear antennas, the misalignment).' },
      { kind: 'decibel', key: 'gr', name: 'receiveGainDbi', label: 'Receive antenna gain (dBi)', defaultText: '28 dBi', min: -30, max: 90, description: 'Gain in the IEEE Std 145 sense toward the transmitter; the mismatch below turns it into realized gain.' },
      { kind: 'number', key: 'vswrr', name: 'receiveVswr', label: 'Receive antenna VSWR', defaultText: '1.5', min: 1, max: 100, description: 'Standing-wave ratio at the receive antenna port (1 = matched).' },
      { kind: 'decibel', key: 'radr', name: 'receiveRadomeLossDb', label: 'Receive radome loss', defaultText: '0 dB', min: 0, max: 30, description: 'One-way radome loss at the receive end (its added noise is not modelled: put it in the sky temperature).' },
      { kind: 'angle', key: 'bwr', name: 'receiveBeamwidthDeg', label: 'Receive half-power beamwidth', defaultText: '', min: 0.001, max: 180, optional: true, description: 'Optional: HPBW of the receive antenna, for the pointing loss.' },
      { kind: 'angle', key: 'per', name: 'receivePointingErrorDeg', label: 'Receive pointing error', defaultText: '0 deg', min: 0, max: 90, description: 'Angle between the receive beam axis and the transmitter.' },
      { kind: 'number', key: 'tsky', name: 'skyTemperatureK', label: 'Sky (background) noise temperature, K', defaultText: '100', min: 0, max: 1e5, description: 'Brightness temperature the main beam sees, kelvin: a few kelvin for a high-elevation beam at low microwave frequencies, about 290 K for a beam on the horizon or on the ground.' },
      { kind: 'number', key: 'gfr', name: 'groundFraction', label: 'Share of the pattern on the ground (0–1)', defaultText: '0.1', min: 0, max: 1, description: 'Fraction of the received noise power that comes from the ground through spillover and sidelobes (for a front-fed dish about 1 − spillover efficiency, half of it toward the ground).' },
      { kind: 'number', key: 'tgnd', name: 'groundTemperatureK', label: 'Ground temperature, K', defaultText: '290', min: 0, max: 1e4, description: 'Temperature of the ground the spillover sees, kelvin.' },
      { kind: 'decibel', key: 'lfr', name: 'receiveFeederLossDb', label: 'Receive feeder loss', defaultText: '1 dB', min: 0, max: 100, description: 'Loss between the antenna terminals and the receiver input, positive dB; it attenuates the signal and adds noise.' },
      { kind: 'number', key: 'tphys', name: 'feederTemperatureK', label: 'Receive feeder physical temperature, K', defaultText: '290', min: 0, max: 1e4, description: 'Physical temperature of the receive feeder, kelvin.' },
      { kind: 'decibel', key: 'nf', name: 'receiverNoiseFigureDb', label: 'Receiver noise figure', defaultText: '2 dB', min: 0, max: 40, description: 'Noise figure of the receiver (first amplifier onward), dB ≥ 0; its noise temperature T₀(F − 1) is shown.' },
      { kind: 'frequency', key: 'bw', name: 'bandwidthHz', label: 'Noise bandwidth', defaultText: '10 MHz', min: 0, max: 1e12, minExclusive: true, description: 'Noise bandwidth of the receiver, > 0.' },
      { kind: 'number', key: 'rb', name: 'bitRateBitPerS', label: 'Bit rate, bit/s', defaultText: '', min: 0, max: 1e13, minExclusive: true, optional: true, description: 'Optional: bit rate for Eb/N₀, in bit/s (e.g. 2e6).' },
      { kind: 'decibel', key: 'cnreq', name: 'requiredCarrierToNoiseDb', label: 'Required C/N', defaultText: '12 dB', min: -30, max: 100, description: 'C/N the demodulator needs in the noise bandwidth (signal-to-noise ratio).' },
      { kind: 'decibel', key: 'mkeep', name: 'keptMarginDb', label: 'Margin to keep (for the largest range)', defaultText: '6 dB', min: 0, max: 100, description: 'Fade margin the largest-range search keeps above the required C/N.' },
      { kind: 'number', key: 'etar', name: 'receiveApertureEfficiency', label: 'Receive aperture efficiency η (for the smallest dish)', defaultText: String(conventions.efficiencies.reflectorAperture), min: 0.01, max: 1, description: 'Aperture efficiency assumed when the page turns the receive gain that keeps the margin into a dish diameter D = (λ/π)·√(G/η) (team default from the conventions).' },
      { kind: 'length', key: 'ht', name: 'transmitHeightM', label: 'Transmit antenna height', defaultText: '', min: 0, max: 1e6, optional: true, description: 'Optional: height above the ground, for the radio horizon (with the receive height).' },
      { kind: 'length', key: 'hr', name: 'receiveHeightM', label: 'Receive antenna height', defaultText: '', min: 0, max: 1e6, optional: true, description: 'Optional: height above the ground, for the radio horizon (with the transmit height).' },
      { kind: 'length', key: 'dmax', name: 'largestApertureM', label: 'Largest aperture at either end', defaultText: '', min: 1e-3, max: 1e3, optional: true, wavelengthFrom: 'design', description: 'Optional: the largest antenna dimension of the two, for the far-field check 2D²/λ.' },
    ],
    outputs: [
      { key: 'marginDb', label: 'Margin over the required C/N', kind: 'decibel', digits: 4 },
      { key: 'maxRangeM', label: 'Largest range keeping the margin to keep', kind: 'length', digits: 4, description: 'Found by Brent root-finding on the margin against range' },
      { key: 'requiredReceiveGainDbi', label: 'Receive gain that keeps the margin to keep at this range', kind: 'decibel', digits: 4, unit: 'dBi', description: 'The margin changes dB for dB with the receive gain; pointing loss held as entered' },
      { key: 'smallestReceiveDishM', label: 'Smallest receive dish keeping that margin (at the η entered)', kind: 'length', digits: 3, description: 'D = (λ/π)·√(G/η), the aperture relation of calc/aperture' },
      { key: 'eirpDbw', label: 'EIRP on the beam axis', kind: 'decibel', digits: 4, unit: 'dBW' },
      { key: 'eirpW', label: 'EIRP on the beam axis', kind: 'power', digits: 4 },
      { key: 'eirpEdgeDbw', label: 'EIRP at the scan edge', kind: 'decibel', digits: 4, unit: 'dBW' },
      { key: 'totalRadiatedPowerW', label: 'Total power radiated by the array N·P_el', kind: 'power', digits: 4 },
      { key: 'transmitReflectionMagnitude', label: 'Transmit |Γ|', kind: 'ratio', digits: 3 },
      { key: 'transmitReturnLossDb', label: 'Transmit return loss', kind: 'decibel', digits: 4 },
      { key: 'transmitMismatchLossDb', label: 'Transmit mismatch loss', kind: 'decibel', digits: 4 },
      { key: 'transmitRealizedGainDbi', label: 'Transmit realized gain', kind: 'decibel', digits: 4, unit: 'dBi' },
      { key: 'transmitPointingLossDb', label: 'Transmit pointing loss', kind: 'decibel', digits: 4 },
      { key: 'fsplDb', label: 'Free-space path loss', kind: 'decibel', digits: 4 },
      { key: 'p525LossDb', label: 'Same, ITU-R P.525 form', kind: 'decibel', digits: 4 },
      { key: 'polarizationLossDb', label: 'Polarization mismatch loss', kind: 'decibel', digits: 4 },
      { key: 'receivePointingLossDb', label: 'Receive pointing loss', kind: 'decibel', digits: 4 },
      { key: 'receiveReflectionMagnitude', label: 'Receive |Γ|', kind: 'ratio', digits: 3 },
      { key: 'receiveReturnLossDb', label: 'Receive return loss', kind: 'decibel', digits: 4 },
      { key: 'receiveMismatchLossDb', label: 'Receive mismatch loss', kind: 'decibel', digits: 4 },
      { key: 'receiveRealizedGainDbi', label: 'Receive realized gain', kind: 'decibel', digits: 4, unit: 'dBi' },
      { key: 'receivedPowerDbm', label: 'Received power at the antenna terminals', kind: 'decibel', digits: 4, unit: 'dBm' },
      { key: 'antennaNoiseTemperatureK', label: 'Antenna noise temperature T_A', kind: 'number', digits: 4, unit: 'K' },
      { key: 'receiverNoiseTemperatureK', label: 'Receiver noise temperature T_rx', kind: 'number', digits: 4, unit: 'K' },
      { key: 'systemNoiseTemperatureK', label: 'System noise temperature T_sys (at the antenna terminals)', kind: 'number', digits: 4, unit: 'K' },
      { key: 'gOverTDbPerK', label: 'G/T', kind: 'decibel', digits: 4, unit: 'dB/K' },
      { key: 'carrierToNoiseDensityDbHz', label: 'C/N₀', kind: 'decibel', digits: 4, unit: 'dB·Hz' },
      { key: 'carrierToNoiseDb', label: 'C/N in the noise bandwidth', kind: 'decibel', digits: 4 },
      { key: 'ebN0Db', label: 'Eb/N₀ at the bit rate', kind: 'decibel', digits: 4 },
      { key: 'sensitivityDbm', label: 'Receiver sensitivity kT₀B + NF + required C/N', kind: 'decibel', digits: 4, unit: 'dBm', description: 'At the receiver input, fed from a source at 290 K' },
      { key: 'fresnelRadiusM', label: 'First Fresnel-zone radius at the midpoint', kind: 'length', digits: 3 },
      { key: 'radioHorizonM', label: 'Radio horizon (4/3 earth)', kind: 'length', digits: 4 },
      { key: 'farFieldBoundaryM', label: 'Far-field distance 2D²/λ of the largest aperture', kind: 'length', digits: 4 },
      { key: 'wavelengthM', label: 'Wavelength λ', kind: 'length', digits: 5 },
    ],
    formulas: [
      { formula: freeSpacePathLossFormula, output: 'fsplDb', args: (i) => ({ distanceM: i.rangeM as number, frequencyHz: i.frequencyHz as number }) },
      { formula: p525LossFormula, output: 'p525LossDb', args: (i) => ({ distanceM: i.rangeM as number, frequencyHz: i.frequencyHz as number }) },
      {
        formula: polarizationMismatchFormula,
        output: 'polarizationLossDb',
        args: (i) => ({ axialRatio1Db: i.transmitAxialRatioDb as number, axialRatio2Db: i.receiveAxialRatioDb as number, sameSense: i.polarizationSense === 'same' ? 1 : 0, tiltDifferenceDeg: i.tiltDifferenceDeg as number }),
      },
      { formula: mismatchLossFormula, output: 'transmitMismatchLossDb', args: (i) => ({ vswr: i.transmitVswr as number }) },
      { formula: mismatchLossFormula, output: 'receiveMismatchLossDb', args: (i) => ({ vswr: i.receiveVswr as number }) },
      {
        formula: systemNoiseTemperatureFormula,
        output: 'systemNoiseTemperatureK',
        args: (i, v) => ({
          antennaTemperatureK: v.antennaNoiseTemperatureK as number,
          feederLossDb: i.receiveFeederLossDb as number,
          feederPhysicalTemperatureK: i.feederTemperatureK as number,
          receiverNoiseTemperatureK: v.receiverNoiseTemperatureK as number,
        }),
      },
      { formula: gOverTFormula, output: 'gOverTDbPerK', args: (i, v) => ({ receiveGainDbi: i.receiveGainDbi as number, systemNoiseTemperatureK: v.systemNoiseTemperatureK as number }) },
      { formula: carrierToNoiseDensityFormula, output: 'carrierToNoiseDensityDbHz', args: (_i, v) => ({ receivedPowerDbm: v.receivedPowerDbm as number, systemNoiseTemperatureK: v.systemNoiseTemperatureK as number }) },
      { formula: sensitivityFormula, output: 'sensitivityDbm', args: (i) => ({ bandwidthHz: i.bandwidthHz as number, noiseFigureDb: i.receiverNoiseFigureDb as number, requiredSnrDb: i.requiredCarrierToNoiseDb as number }) },
      { formula: fresnelRadiusFormula, output: 'fresnelRadiusM', args: (i) => ({ pathLengthM: i.rangeM as number, frequencyHz: i.frequencyHz as number }) },
      {
        formula: radioHorizonFormula,
        output: 'radioHorizonM',
        args: (i) => (i.transmitHeightM === null || i.receiveHeightM === null ? null : { heightTransmitM: i.transmitHeightM as number, heightReceiveM: i.receiveHeightM as number }),
      },
      { formula: farFieldDistanceFormula, output: 'farFieldBoundaryM', args: (i) => (i.largestApertureM === null ? null : { apertureDiameterM: i.largestApertureM as number, frequencyHz: i.frequencyHz as number }) },
    ],
    assumptions: [
      'Free-space propagation on a clear line of sight (keep about 60 % of the first Fresnel zone clear; common practice); atmospheric gases and rain enter as the values you give — take them from Recommendations ITU-R P.676 (gases), P.838 with P.530 (rain, terrestrial) or P.618 (earth–space) for your path, climate and availability.',
      'Gains are IEEE Std 145 gains (directivity × radiation efficiency); the mismatch loss −10·log10(1 − |Γ|²) from the VSWR turns each into realized gain. The source and the receiver are taken as matched to the line.',
      'Pointing loss by the Gaussian-beam rule 12.04·(Δθ/HPBW)² dB (common practice, no source): good within the half-power beamwidth.',
      'Polarization: each antenna’s sense of rotation is its own, as it transmits (two right-hand circular antennas match), and the tilt is the physical angle between the two major axes; a gain in dBic is to the co-polarized circular component, so a linear antenna receiving circular polarization loses 3 dB here, not in its gain.',
      'Noise: the system noise temperature is referred to the antenna terminals by the Friis noise formula: T_sys = T_A + (L − 1)·T_phys + L·T_rx, with T_rx = 290 K·(10^(NF/10) − 1). The antenna temperature is a weighted sum of sky and ground (common practice, no source). Radome and mismatch act on the signal only; a lossy radome’s own noise belongs in the sky temperature.',
      'C/N₀ = P_r − 10·log10(k·T_sys) with k = 1.380649×10⁻²³ J/K exact in the SI (kT₀ = −173.98 dBm/Hz at 290 K). Thermal noise only: no interference, intermodulation or phase noise.',
      'The largest range keeps the margin you set with every other line unchanged (only the free-space loss changes with range), found by Brent root-finding; atmospheric and rain losses that grow with the path are not rescaled. Likewise the smallest receive dish keeps every other line, including the pointing loss as entered (a larger dish has a narrower beam).',
      'Active array: EIRP = N²·P_el·G_el (every element in phase toward the receiver, equal amplitudes), while the total radiated power is N·P_el.',
      'Radio horizon: smooth earth, radius 6371 km times 4/3 (standard refraction). Beyond it, free-space range is not reachable.',
      EXPOSURE_CAUTION,
    ],
    references: [
      'H. T. Friis, "A note on a simple transmission formula", Proc. IRE 34, 1946.',
      'H. T. Friis, "Noise figures of radio receivers", Proc. IRE 32, 1944.',
      'Recommendation ITU-R P.525-4, Calculation of free-space attenuation, 2019.',
      'IEEE Std 145-2013, IEEE Standard for Definitions of Terms for Antennas (gain, realized gain).',
      'W. L. Stutzman, Polarization in Electromagnetic Systems, Artech House, 1993.',
      'D. M. Pozar, Microwave Engineering, 4th ed., Wiley, 2012.',
      'G. Maral and M. Bousquet, Satellite Communications Systems, 5th ed., Wiley, 2009.',
      'BIPM, The International System of Units (SI), 9th ed., 2019 (the Boltzmann constant).',
    ],
    examples: [
      {
        title: 'Valley-floor weather station to a ridge relay, 5.8 GHz, 0.5 W into 0.4 m dishes, 35 km',
        query: '?v=1&f=5.8GHz&r=35km&tx=single&pt=0.5W&lft=0.5dB&gt=25dBi&vswrt=1.4&radt=0.5dB&bwt=9deg&pet=1deg&atm=0.3dB&rain=2dB&art=40dB&arr=40dB&sense=same&tilt=3deg&gr=25dBi&vswrr=1.4&radr=0.5dB&bwr=9deg&per=1deg&tsky=150&gfr=0.2&tgnd=290&lfr=0.5dB&tphys=300&nf=3dB&bw=20MHz&rb=30e6&cnreq=15dB&mkeep=10dB&ht=15m&hr=40m&dmax=0.4m',
      },
      {
        title: 'High-altitude balloon telemetry, 2.25 GHz active 16-element panel to a 1.5 m ground dish, 600 km',
        query: '?v=1&f=2.25GHz&r=600km&tx=array&n=16&pel=0.1W&gel=3dBi&gele=0dBi&vswrt=1.3&radt=0.2dB&art=3dB&arr=1dB&sense=same&tilt=30deg&gr=30dBi&vswrr=1.2&radr=0dB&bwr=6.2deg&per=0.8deg&tsky=40&gfr=0.05&tgnd=290&lfr=0.3dB&tphys=290&nf=0.8dB&bw=20MHz&rb=10e6&cnreq=9dB&mkeep=3dB&ht=30km&hr=10m&dmax=1.5m',
      },
    ],
    sourcePath: 'calc/calculators/linkBudget.ts',
    compute: (inputs) => computeLinkBudget(inputs),
  };
}
