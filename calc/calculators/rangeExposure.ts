/**
 * Range & RF exposure: Friis link range (or the gain a range needs), free-space path loss in the
 * ITU-R P.525 form, EIRP, power density and the distance to an exposure limit.
 */
import { farFieldDistanceFormula } from '../aperture/formulas';
import type { CalcInputs, CalcResult, CalculatorDef } from '../calculator';
import type { TeamConventions } from '../teamConventions';
import { freeSpaceWavelengthM } from '../wavelength';
import { freeSpacePathLossDb, friisMaxRangeM, friisReceivedPowerDbm, friisRequiredGainSumDbi, p525BasicTransmissionLossDb, wattsToDbm } from '../link/friis';
import {
  apertureDistanceToLimitM,
  apertureNearFieldZones,
  apertureOnAxisPowerDensityWPerM2,
  eirpW,
  farFieldBoundaryM,
  farFieldDistanceToLimitM,
  farFieldPowerDensityWPerM2,
} from '../exposure/powerDensity';
import { REFERENCE_LEVEL_SETS, referenceLevelWPerM2 } from '../exposure/referenceLevels';
import { warning, type CalcWarning } from '../warnings';
import { frequencyDefaultText } from './defaultText';
import { CalcInputError } from '../errors';
import { apertureGainDbi, diameterForGainM, efficiencyForGain } from '../aperture/apertureGain';
import {
  apertureExposureFormula,
  distanceToLimitFormula,
  farFieldDensityFormula,
  freeSpacePathLossFormula,
  friisRangeFormula,
  p525LossFormula,
} from '../linkFormulas';

export const EXPOSURE_CAUTION =
  'Simplified estimate. Exposure compliance must follow the local regulations and be assessed by a qualified person, with measurement where required. Never look into or stand in front of an energised high-gain antenna.';

/** Largest difference, dB, between the entered gain and η(πD/λ)² at the η entered before the page flags it. */
export const GAIN_AGREEMENT_DB = 0.5;

export interface DensityPoint {
  distanceM: number;
  farFieldWPerM2: number;
  apertureModelWPerM2: number | null;
}

export interface RangeExposureData {
  density: DensityPoint[];
  limitWPerM2: number;
  limitLabel: string;
  /** Gain to carry into architecture sizing (dBi): the transmit gain the link needs, or the one given. */
  sizingGainDbi: number;
  frequencyHz: number;
}

/** Pure computation from validated inputs (Hz, m, W, dB). */
export function computeRangeExposure(inputs: CalcInputs): CalcResult<RangeExposureData> {
  const f = inputs.frequencyHz as number;
  const mode = inputs.solveFor as 'range' | 'gain';
  const ptW = inputs.transmitPowerW as number;
  const gt = inputs.transmitGainDbi as number;
  const gr = inputs.receiveGainDbi as number;
  const requiredW = inputs.requiredPowerW as number;
  const lossDb = inputs.otherLossDb as number;
  const rangeM = inputs.rangeM as number;
  const dishM = inputs.apertureDiameterM as number | null;
  const eta = inputs.apertureEfficiency as number;
  const limitSet = inputs.limitSet as string;
  const customLimit = inputs.customLimitWPerM2 as number | null;
  const warnings: CalcWarning[] = [warning('exposure-caution', 'caution', EXPOSURE_CAUTION, ['eirpW', 'densityAtRangeWPerM2', 'distanceToLimitM', 'apertureDistanceToLimitM'])];

  const ptDbm = wattsToDbm(ptW);
  const requiredDbm = wattsToDbm(requiredW);
  const lambda = freeSpaceWavelengthM(f);

  const maxRangeM = friisMaxRangeM(ptDbm, gt, gr, requiredDbm, f, lossDb);
  const gainSumDbi = friisRequiredGainSumDbi(ptDbm, requiredDbm, rangeM, f, lossDb);
  const requiredTxGainDbi = gainSumDbi - gr;
  const fsplDb = freeSpacePathLossDb(rangeM, f);
  const p525Db = p525BasicTransmissionLossDb(rangeM, f);
  const receivedDbm = friisReceivedPowerDbm(ptDbm, gt, gr, rangeM, f, lossDb);

  const eirp = eirpW(ptW, gt);
  let limit: number;
  let limitLabel: string;
  if (limitSet === 'custom') {
    limit = customLimit ?? 10;
    limitLabel = 'custom limit';
    if (customLimit === null) warnings.push(warning('no-custom-limit', 'note', 'No custom limit given: 10 W/m² is used.', ['limitWPerM2']));
  } else {
    const set = REFERENCE_LEVEL_SETS.find((s) => s.id === limitSet)!;
    const level = referenceLevelWPerM2(limitSet, f);
    if (level === null) {
      limit = set.limitWPerM2(Math.min(Math.max(f, set.minHz), set.maxHz));
      warnings.push(
        warning('limit-out-of-range', 'outside-validity', `${set.guideline} gives levels from ${set.minHz / 1e6} MHz to ${set.maxHz / 1e9} GHz; the nearest band edge value is used.`, ['limitWPerM2']),
      );
    } else {
      limit = level;
    }
    limitLabel = `${set.guideline} (${set.population})`;
  }

  const densityAtRange = farFieldPowerDensityWPerM2(eirp, rangeM);
  const distanceToLimit = farFieldDistanceToLimitM(eirp, limit);
  let farFieldBoundary: number | null = null;
  let apertureDistance: number | null = null;
  let surfaceDensity: number | null = null;
  let apertureDensityAtRange: number | null = null;
  let impliedEfficiency: number | null = null;
  let gainAtEtaDbi: number | null = null;
  let apertureDistanceAtEta: number | null = null;
  if (dishM !== null) {
    // One antenna description: the entered gain, with the diameter where one is given. The aperture
    // model takes the efficiency that makes η(πD/λ)² equal the entered gain.
    const uniformGainDbi = apertureGainDbi(1, dishM, lambda);
    if (gt > uniformGainDbi) {
      throw new CalcInputError(
        'apertureDiameterM',
        `expected at least ${diameterForGainM(gt, 1, lambda).toPrecision(3)} m: a ${dishM} m aperture gives at most ${uniformGainDbi.toFixed(2)} dBi at this frequency (η = 1), less than the ${gt} dBi entered as transmit gain; got ${dishM} m`,
      );
    }
    impliedEfficiency = Math.min(1, efficiencyForGain(gt, dishM, lambda));
    gainAtEtaDbi = apertureGainDbi(eta, dishM, lambda);
    farFieldBoundary = farFieldBoundaryM(dishM, f);
    apertureDistance = apertureDistanceToLimitM(ptW, dishM, impliedEfficiency, f, limit);
    apertureDistanceAtEta = apertureDistanceToLimitM(ptW, dishM, eta, f, limit);
    surfaceDensity = apertureNearFieldZones(ptW, dishM, impliedEfficiency, f).surfaceDensityWPerM2;
    apertureDensityAtRange = apertureOnAxisPowerDensityWPerM2(ptW, dishM, impliedEfficiency, f, rangeM);
    const differenceDb = gainAtEtaDbi - gt;
    if (Math.abs(differenceDb) > GAIN_AGREEMENT_DB) {
      const direction = differenceDb > 0 ? 'more' : 'less';
      warnings.push(
        warning(
          'gain-aperture-mismatch',
          differenceDb > 0 ? 'caution' : 'note',
          `The ${dishM} m aperture at η = ${eta} would give ${gainAtEtaDbi.toFixed(1)} dBi, ${Math.abs(differenceDb).toFixed(1)} dB ${direction} than the ${gt} dBi entered as transmit gain (this page flags differences above ${GAIN_AGREEMENT_DB} dB). ` +
            `EIRP, link and both exposure models use the entered gain (the aperture model with the efficiency it implies, η = ${impliedEfficiency.toPrecision(2)}), so every figure describes one antenna; ` +
            `with η = ${eta} the aperture-model distance to the limit would be ${apertureDistanceAtEta.toPrecision(3)} m instead of ${apertureDistance.toPrecision(3)} m. Check which of gain, diameter and efficiency is right.`,
          ['transmitGainDbi', 'impliedEfficiencyPercent', 'apertureGainAtEtaDbi', 'apertureDistanceToLimitM', 'apertureDistanceToLimitAtEtaM'],
        ),
      );
    }
    if (distanceToLimit < farFieldBoundary) {
      warnings.push(
        warning('limit-inside-near-field', 'caution', 'The far-field distance to the limit lies inside 2D²/λ, where the far-field formula does not hold; use the aperture-model distance.', ['distanceToLimitM']),
      );
    }
    if (rangeM < farFieldBoundary) {
      warnings.push(warning('range-inside-near-field', 'outside-validity', 'The link distance is inside the far-field boundary 2D²/λ: the Friis equation does not hold there.', ['receivedPowerDbm', 'fsplDb']));
    }
  } else {
    warnings.push(warning('no-aperture', 'note', 'Give the transmit aperture diameter to check the far-field boundary and get the near-field bound.', ['distanceToLimitM']));
  }
  if (mode === 'gain' && requiredTxGainDbi > 60) {
    warnings.push(warning('very-high-gain', 'caution', `The link needs ${requiredTxGainDbi.toFixed(1)} dBi at the transmit end: beyond practical apertures at most frequencies. Check the sizing.`, ['requiredTxGainDbi']));
  }

  const density: DensityPoint[] = [];
  const start = Math.max(0.1, (dishM ?? lambda) / 10);
  const stop = Math.max(distanceToLimit, apertureDistance ?? 0, farFieldBoundary ?? 0) * 4 + start;
  for (let i = 0; i <= 160; i++) {
    const r = start * (stop / start) ** (i / 160);
    density.push({
      distanceM: r,
      farFieldWPerM2: farFieldPowerDensityWPerM2(eirp, r),
      apertureModelWPerM2: dishM === null || impliedEfficiency === null ? null : apertureOnAxisPowerDensityWPerM2(ptW, dishM, impliedEfficiency, f, r),
    });
  }

  return {
    values: {
      wavelengthM: lambda,
      maxRangeM: mode === 'range' ? maxRangeM : null,
      requiredGainSumDbi: mode === 'gain' ? gainSumDbi : null,
      requiredTxGainDbi: mode === 'gain' ? requiredTxGainDbi : null,
      equalGainEachDbi: mode === 'gain' ? gainSumDbi / 2 : null,
      fsplDb,
      p525LossDb: p525Db,
      receivedPowerDbm: receivedDbm,
      marginDb: receivedDbm - requiredDbm,
      eirpW: eirp,
      eirpDbw: 10 * Math.log10(eirp),
      densityAtRangeWPerM2: densityAtRange,
      apertureDensityAtRangeWPerM2: apertureDensityAtRange,
      limitWPerM2: limit,
      distanceToLimitM: distanceToLimit,
      apertureDistanceToLimitM: apertureDistance,
      farFieldBoundaryM: farFieldBoundary,
      surfaceDensityWPerM2: surfaceDensity,
      impliedEfficiencyPercent: impliedEfficiency === null ? null : 100 * impliedEfficiency,
      apertureGainAtEtaDbi: gainAtEtaDbi,
      apertureDistanceToLimitAtEtaM: apertureDistanceAtEta,
    },
    warnings,
    data: { density, limitWPerM2: limit, limitLabel, sizingGainDbi: mode === 'gain' ? requiredTxGainDbi : gt, frequencyHz: f },
  };
}

/** The calculator definition, with defaults from the team conventions. */
export function createRangeExposureCalculator(conventions: TeamConventions): CalculatorDef<RangeExposureData> {
  return {
    id: 'range-exposure',
    title: 'Link range & RF exposure',
    summary: 'Friis range or the gain a range needs, free-space loss (ITU-R P.525), EIRP, power density and the distance to an exposure limit.',
    nav: { order: 8 },
    safety: { lead: 'These are simplified estimates.', cautions: ['rfExposure', 'sunOnFeed'] },
    embed: true,
    purpose:
      'How far does a free-space link reach with these antennas — or how much gain does a given range need — and how close to the transmitting antenna does the power density exceed an exposure limit?',
    schemaVersion: 1,
    migrations: {},
    params: [
      { kind: 'frequency', key: 'f', name: 'frequencyHz', label: 'Frequency', defaultText: frequencyDefaultText(conventions.designFrequencyHz), min: 1e6, max: 1e12, description: 'Carrier frequency.' },
      { kind: 'choice', key: 'solve', name: 'solveFor', label: 'Solve for', options: [ { value: 'range', label: 'Maximum range (gains given)' }, { value: 'gain', label: 'Gain needed (range given)' } ], defaultText: 'range', description: 'Find the range these gains reach, or the transmit gain the range below needs.' },
      { kind: 'power', key: 'pt', name: 'transmitPowerW', label: 'Transmit power at the antenna', defaultText: '10 W', min: 1e-9, max: 1e7, minExclusive: true, description: 'Power delivered to the transmit antenna (after the feeder).' },
      { kind: 'decibel', key: 'gt', name: 'transmitGainDbi', label: 'Transmit antenna gain (dBi)', defaultText: '30 dBi', min: -30, max: 90, description: 'Gain over isotropic in the direction of the receiver.' },
      { kind: 'decibel', key: 'gr', name: 'receiveGainDbi', label: 'Receive antenna gain (dBi)', defaultText: '20 dBi', min: -30, max: 90, description: 'Gain over isotropic in the direction of the transmitter.' },
      { kind: 'power', key: 'preq', name: 'requiredPowerW', label: 'Required received power (sensitivity + margin)', defaultText: '-90 dBm', min: 1e-25, max: 1e3, minExclusive: true, description: 'Receiver sensitivity plus the fade margin you hold, e.g. −90 dBm.' },
      { kind: 'decibel', key: 'loss', name: 'otherLossDb', label: 'Other losses', defaultText: '3 dB', min: 0, max: 200, description: 'Pointing, polarization, radome and atmospheric losses, positive dB.' },
      { kind: 'length', key: 'r', name: 'rangeM', label: 'Range (link distance)', defaultText: '20 km', min: 1e-3, max: 1e12, description: 'Distance for the received power, the gain needed, and the density readout.' },
      { kind: 'length', key: 'dant', name: 'apertureDiameterM', label: 'Transmit aperture diameter', defaultText: '', min: 1e-3, max: 1e3, optional: true, wavelengthFrom: 'design', description: 'Optional. For the far-field boundary 2D²/λ and the near-field density bound; with the entered gain it fixes the aperture efficiency the near-field model uses.' },
      { kind: 'number', key: 'eta', name: 'apertureEfficiency', label: 'Aperture efficiency η expected (cross-check of the gain)', defaultText: String(conventions.efficiencies.reflectorAperture), min: 0.01, max: 1, description: 'Used only with a diameter, to cross-check the entered gain: the page shows η(πD/λ)² and the aperture-model distance at this η beside the results from the entered gain, and flags a difference above 0.5 dB (team default from the conventions).' },
      {
        kind: 'choice',
        key: 'lim',
        name: 'limitSet',
        label: 'Exposure limit',
        options: [
          ...REFERENCE_LEVEL_SETS.map((s) => ({ value: s.id, label: `${s.guideline.split(' (')[0].split(',')[0]} — ${s.population}` })),
          { value: 'custom', label: 'Custom limit (below)' },
        ],
        defaultText: 'icnirp2020-public',
        description: 'Published reference levels for orientation, or your own limit.',
      },
      { kind: 'powerDensity', key: 'slim', name: 'customLimitWPerM2', label: 'Custom power-density limit', defaultText: '', min: 1e-6, max: 1e6, optional: true, description: 'Used when the exposure limit is set to custom.' },
    ],
    outputs: [
      { key: 'maxRangeM', label: 'Maximum range (free space)', kind: 'length', digits: 4 },
      { key: 'requiredTxGainDbi', label: 'Transmit gain needed (receive gain as given)', kind: 'decibel', digits: 4, unit: 'dBi' },
      { key: 'requiredGainSumDbi', label: 'Sum of both gains needed', kind: 'decibel', digits: 4, unit: 'dBi' },
      { key: 'equalGainEachDbi', label: 'Gain needed at each end if equal', kind: 'decibel', digits: 4, unit: 'dBi' },
      { key: 'receivedPowerDbm', label: 'Received power at the range', kind: 'decibel', digits: 4, unit: 'dBm' },
      { key: 'marginDb', label: 'Margin over the required power', kind: 'decibel', digits: 4 },
      { key: 'fsplDb', label: 'Free-space path loss at the range', kind: 'decibel', digits: 4 },
      { key: 'p525LossDb', label: 'Same, ITU-R P.525 form', kind: 'decibel', digits: 4 },
      { key: 'wavelengthM', label: 'Wavelength λ', kind: 'length', digits: 5 },
      { key: 'eirpW', label: 'EIRP', kind: 'power', digits: 4 },
      { key: 'eirpDbw', label: 'EIRP', kind: 'decibel', digits: 4, unit: 'dBW' },
      { key: 'densityAtRangeWPerM2', label: 'Far-field power density at the range', kind: 'powerDensity', digits: 3 },
      { key: 'apertureDensityAtRangeWPerM2', label: 'Aperture-model density at the range', kind: 'powerDensity', digits: 3 },
      { key: 'limitWPerM2', label: 'Exposure limit used', kind: 'powerDensity', digits: 3 },
      { key: 'distanceToLimitM', label: 'Distance to the limit (far-field formula)', kind: 'length', digits: 3 },
      { key: 'apertureDistanceToLimitM', label: 'Distance to the limit (aperture model, conservative)', kind: 'length', digits: 3 },
      { key: 'farFieldBoundaryM', label: 'Far-field boundary 2D²/λ', kind: 'length', digits: 4 },
      { key: 'surfaceDensityWPerM2', label: 'Density bound at the aperture surface 4P/A', kind: 'powerDensity', digits: 3 },
      { key: 'impliedEfficiencyPercent', label: 'Aperture efficiency implied by the entered gain and diameter', kind: 'percent', digits: 3, description: 'G/(πD/λ)²: the efficiency the aperture model uses, so that it describes the same antenna as the EIRP' },
      { key: 'apertureGainAtEtaDbi', label: 'Cross-check: gain of the diameter at the η entered', kind: 'decibel', digits: 3, unit: 'dBi', description: 'η(πD/λ)²; flagged when it differs from the entered gain by more than 0.5 dB' },
      { key: 'apertureDistanceToLimitAtEtaM', label: 'Cross-check: distance to the limit (aperture model at the η entered)', kind: 'length', digits: 3, description: 'The aperture model with the diameter and η as entered instead of the entered gain' },
    ],
    formulas: [
      {
        formula: friisRangeFormula,
        output: 'maxRangeM',
        args: (i, v) =>
          v.maxRangeM === null
            ? null
            : {
                transmitPowerDbm: wattsToDbm(i.transmitPowerW as number),
                transmitGainDbi: i.transmitGainDbi as number,
                receiveGainDbi: i.receiveGainDbi as number,
                requiredPowerDbm: wattsToDbm(i.requiredPowerW as number),
                frequencyHz: i.frequencyHz as number,
                otherLossDb: i.otherLossDb as number,
              },
      },
      { formula: freeSpacePathLossFormula, output: 'fsplDb', args: (i) => ({ distanceM: i.rangeM as number, frequencyHz: i.frequencyHz as number }) },
      { formula: p525LossFormula, output: 'p525LossDb', args: (i) => ({ distanceM: i.rangeM as number, frequencyHz: i.frequencyHz as number }) },
      { formula: farFieldDensityFormula, output: 'densityAtRangeWPerM2', args: (i, v) => ({ eirpW: v.eirpW as number, distanceM: i.rangeM as number }) },
      { formula: distanceToLimitFormula, output: 'distanceToLimitM', args: (_i, v) => ({ eirpW: v.eirpW as number, limitWPerM2: v.limitWPerM2 as number }) },
      {
        formula: apertureExposureFormula,
        output: 'apertureDistanceToLimitM',
        args: (i, v) =>
          i.apertureDiameterM === null
            ? null
            : { transmitPowerW: i.transmitPowerW as number, apertureDiameterM: i.apertureDiameterM as number, apertureEfficiency: (v.impliedEfficiencyPercent as number) / 100, frequencyHz: i.frequencyHz as number, limitWPerM2: v.limitWPerM2 as number },
      },
      { formula: farFieldDistanceFormula, output: 'farFieldBoundaryM', args: (i) => (i.apertureDiameterM === null ? null : { apertureDiameterM: i.apertureDiameterM as number, frequencyHz: i.frequencyHz as number }) },
    ],
    assumptions: [
      'Free-space propagation with a clear line of sight; no ground reflection, multipath, rain or gaseous absorption beyond what you put in “other losses”.',
      'Both antennas are in each other’s far field and point at each other; polarization mismatch belongs in “other losses”.',
      'Power densities are on the beam axis, time-averaged at full power (no duty-cycle reduction). Ground reflections can raise the density up to fourfold near the ground.',
      'The aperture model is a conservative estimate for circular apertures; it is not a field computation and is not a compliance assessment.',
      'One antenna description: the transmit antenna is its entered gain. With a diameter, the aperture model uses the efficiency that gain implies, η = G/(πD/λ)², so the EIRP, the far-field formula and the aperture model describe one antenna (beyond 0.6 D²/λ the two models then agree). The η field only cross-checks: the gain η(πD/λ)² and the aperture-model distance at that η are shown beside, and a difference above 0.5 dB from the entered gain is flagged (0.5 dB is about 12 % in power density; common practice, no source). A gain above what the diameter gives at η = 1 is rejected.',
      'The reference-level table is for orientation only: limits, averaging times and the way they are applied differ by country and change over time.',
      EXPOSURE_CAUTION,
    ],
    references: [
      'H. T. Friis, "A note on a simple transmission formula", Proc. IRE 34, 1946.',
      'Recommendation ITU-R P.525-4, Calculation of free-space attenuation, 2019.',
      'FCC Office of Engineering and Technology, Bulletin 65, Edition 97-01, Evaluating compliance with FCC guidelines for human exposure to radiofrequency electromagnetic fields, 1997.',
      'ICNIRP, Guidelines for limiting exposure to electromagnetic fields (100 kHz to 300 GHz), Health Physics 118(5), 2020.',
      'US Code of Federal Regulations, 47 CFR §1.1310, Radiofrequency radiation exposure limits.',
    ],
    examples: [
      { title: 'Mountain-hut telemetry hop, 5.8 GHz, 1 W, 27 dBi dishes of 0.6 m (η ≈ 0.4), −85 dBm needed', query: '?v=1&f=5.8GHz&solve=range&pt=1W&gt=27dBi&gr=27dBi&preq=-85dBm&loss=4dB&r=35km&dant=0.6m&eta=0.4&lim=icnirp2020-public' },
      { title: 'Gain needed for a 120 km ship-to-shore link at 2.2 GHz', query: '?v=1&f=2.2GHz&solve=gain&pt=20W&gt=18dBi&gr=24dBi&preq=-100dBm&loss=6dB&r=120km&eta=0.6&lim=icnirp2020-occupational' },
    ],
    sourcePath: 'calc/calculators/rangeExposure.ts',
    compute: (inputs) => computeRangeExposure(inputs),
  };
}
