/**
 * Every number the guide (site/pages/guide/) quotes, computed with calc/ at build time and formatted
 * for prose. Guide pages import `g` and write `{g.ruzeLambda16Db}` instead of typing a number, so the
 * prose follows calc/ after every change; tests/site/guideNumbers.test.ts fails on a number in the
 * prose that does not come from here (a short allow-list covers scenario inputs, counts that define a
 * scenario and section numbers). `npx tsx scripts/guideNumbers.ts` prints the same table.
 *
 * Each entry is computed on first use and cached, so a page pays only for the numbers it shows.
 */
import { apertureGainFromArea } from '../../calc/aperture/index';
import { calculatorFactories } from '../../calc/calculators/index';
import { teamConventions } from '../conventions';
import { decodeState } from '../../components/frame/urlState';
import { validateAll } from '../../components/frame/calculatorModel';
import {
  buildArrayModel,
  figuresOfMerit,
  groundPlaneImageFactor,
  hansenWoodyardPhaseStepRad,
  ordinaryEndFirePhaseStepRad,
  phaseQuantizationEffect,
  uniformLinearArrayDirectivity,
  type ArraySpec,
  type FiguresOfMerit,
} from '../../calc/array/index';
import { freeSpaceWavelengthM } from '../../calc/wavelength';
import { maxGratingFreeSpacingWavelengths } from '../../calc/gratingLobeLimit';
import { ruzeEfficiency } from '../../calc/reflector/ruze';
import { beamFigures, tabulateAperture } from '../../calc/reflector/aperturePattern';
import { dipoleOverPlaneDirectivity } from '../../calc/backplane/index';
import { endFireDirectivity, endFireSpacingLimitWavelengths, NBS_YAGI_DESIGNS, yagiGainDbd } from '../../calc/endFire/index';
import { DIPOLE_DIRECTIVITY_DBI } from '../../calc/constants';
import { RING_FIRST_SIDELOBE_DB } from '../../calc/sizing/ringCandidates';
import { noiseDensityDbmPerHz, REFERENCE_NOISE_TEMPERATURE_K } from '../../calc/link/thermalNoise';
import { computeLinkBudget } from '../../calc/calculators/linkBudget';
import { budgetMarkdown, budgetRows } from '../../components/calculators/budgetTable';

// ---------- formatting (prose: true minus sign, space as thousands separator) ----------

const MINUS = '\u2212';
/** Fixed decimals with a true minus sign; "−0.0" is written "0.0". */
export function fixed(value: number, decimals: number): string {
  if (!Number.isFinite(value)) throw new Error(`guide number is not finite: ${value}`);
  const text = value.toFixed(decimals);
  return /^-0(\.0+)?$/.test(text) ? text.slice(1) : text.replace('-', MINUS);
}
/** A whole number rounded to `step`, grouped by thousands with a space ("2 170"). */
export function about(value: number, step: number): string {
  const rounded = Math.round(value / step) * step;
  return fixed(rounded, 0).replace(/\B(?=(\d{3})+(?!\d))/g, ' ');
}
const dB = (ratio: number) => 10 * Math.log10(ratio);
const DEG = 180 / Math.PI;

// ---------- calc/ access ----------

type Values = Record<string, number | null>;

/** A calculator's outputs for a query, as a page opened on that link would show them. */
function calculator(id: string, query: string): Values {
  const def = calculatorFactories[id](teamConventions);
  const { texts, notices } = decodeState(def, query);
  if (notices.length) throw new Error(`${id} ${query}: ${notices.join('; ')}`);
  const { inputs } = validateAll(def, texts);
  if (!inputs) throw new Error(`${id} ${query}: invalid inputs`);
  return def.compute(inputs).values;
}
function value(values: Values, key: string): number {
  const v = values[key];
  if (v === null || v === undefined || !Number.isFinite(v)) throw new Error(`guide number: output ${key} is ${v}`);
  return v;
}
function need<T>(v: T | null | undefined, what: string): T {
  if (v === null || v === undefined) throw new Error(`guide number: ${what} is missing`);
  return v;
}

function memo<T>(f: () => T): () => T {
  let cached: { v: T } | null = null;
  return () => (cached ??= { v: f() }).v;
}
const figures = (spec: ArraySpec): (() => FiguresOfMerit) => memo(() => figuresOfMerit(buildArrayModel(spec)));

// ---------- the guide's scenarios (the same links as the pages' presets) ----------

/** Presets of the calculators embedded in the guide; tests/site/guideNumbers.test.ts checks each appears on its page. */
export const GUIDE_PRESETS = {
  harbourSpacing: '?v=1&f=9GHz&fhi=10GHz&er=1&scan=50deg&lat=triangular&d=16mm&w=1.2m&h=0.4m&shape=rectangle',
  dish: '?v=1&f=8.2GHz&solve=gain&d=3.7m&fd=0.38&feed=taper&et=-11dB&rms=0.6mm&blk=28cm&strut=0.025&loss=0.4dB&offby=length&off=0cm&n=1',
  droneScan: '?v=1&f=10GHz&d=0.6lambda&lat=triangular&by=width&w=0.4m&scan=60deg&el=cosine&nexp=1.3&eta=0.8',
  gliderHansenWoodyard: '?v=1&f=433MHz&type=hansenWoodyard&solve=gain&len=2.75lambda&d=0.25lambda',
  campusSector: '?v=1&f=5.8GHz&flo=4.9GHz&fhi=6.7GHz&er=1&scan=30deg&el=halfWave&h=12.9mm',
  radioY: '?v=2&geo=yArms&nx=8&d=0.7lambda&f=1.42GHz&tap=uniform&el=isotropic&th=0deg&ph=0deg',
  thinned: '?v=2&geo=thinned&lat=rectangular&out=rectangle&nx=24&ny=24&d=0.5lambda&f=10GHz&fill=0.25&seed=7&tap=uniform&el=cosine&nexp=2&th=0deg&ph=0deg',
  harbourSizing: '?v=1&f=9GHz&fhi=10GHz&req=gain&g=32dBi&saz=50deg&sel=0deg&uaz=no&maxsize=1.3m&eta=0.6&etar=0.8&nexp=1.3&margin=0.05&lat=triangular&ge=6dBi',
  balloonSpacing: '?v=1&f=1.68GHz&er=1&scan=30deg&lat=rectangular&d=0.6lambda&w=1m&shape=ellipse',
  /** The 3.7 m dish of the reflector part as the receive antenna of an 8.2 GHz downlink (its gain, beamwidth and spillover share as the reflector page's link carries them). */
  xbandDownlink:
    '?v=1&f=8.2GHz&r=1500km&tx=single&pt=3W&lft=1dB&gt=6dBi&vswrt=1.3&radt=0dB&pet=0deg&atm=0.3dB&rain=1dB&art=2dB&arr=1dB&sense=same&tilt=45deg&gr=48.34dBi&vswrr=1&radr=0dB&bwr=0.65373deg&per=0.1deg&tsky=30&gfr=0.03228&tgnd=290&lfr=0.2dB&tphys=290&nf=0.8dB&bw=60MHz&rb=100e6&cnreq=8dB&mkeep=3dB&dmax=3.7m',
} as const;

const harbour = memo(() => calculator('wavelength-spacing', GUIDE_PRESETS.harbourSpacing));
const dish = memo(() => calculator('front-fed-reflector', GUIDE_PRESETS.dish));
const drone = memo(() => calculator('scan-loss', GUIDE_PRESETS.droneScan));
const gliderHw = memo(() => calculator('end-fire-length', GUIDE_PRESETS.gliderHansenWoodyard));
const sector = memo(() => calculator('backplane-spacing', GUIDE_PRESETS.campusSector));
const radioY = memo(() => calculator('array-explorer', GUIDE_PRESETS.radioY));
const thinned = memo(() => calculator('array-explorer', GUIDE_PRESETS.thinned));
const sizing = memo(() => calculator('architecture-sizing', GUIDE_PRESETS.harbourSizing));
const balloon = memo(() => calculator('wavelength-spacing', GUIDE_PRESETS.balloonSpacing));
const downlink = memo(() => calculator('link-budget', GUIDE_PRESETS.xbandDownlink));

const line16 = (spec: Partial<ArraySpec> = {}): ArraySpec => ({ geometry: { kind: 'linear', count: 16, spacingWavelengths: 0.5 }, ...spec });
const uniform16 = figures(line16());
const taylor16 = figures(line16({ taper: { kind: 'taylor', nbar: 5, sidelobeDb: 30 } }));
const chebyshev16 = figures(line16({ taper: { kind: 'chebyshev', sidelobeDb: 30 } }));

const GLIDER_COUNT = 12;
const GLIDER_SPACING = 0.25;
const endFireSpec = (step: number): ArraySpec => ({ geometry: { kind: 'linear', count: GLIDER_COUNT, spacingWavelengths: GLIDER_SPACING }, phaseStepRad: step, beam: { thetaDeg: 90, phiDeg: 0 } });
const ordinaryLine = figures(endFireSpec(ordinaryEndFirePhaseStepRad(GLIDER_SPACING)));
const hwLine = figures(endFireSpec(hansenWoodyardPhaseStepRad(GLIDER_COUNT, GLIDER_SPACING)));

const dipoles8 = (groundPlaneHeightWavelengths?: number): ArraySpec => ({ geometry: { kind: 'linear', count: 8, spacingWavelengths: 0.5 }, element: { kind: 'halfWaveDipole', axis: 'y', groundPlaneHeightWavelengths } });
const dipolesFree = figures(dipoles8());
const dipolesOverGround = figures(dipoles8(0.25));
/** Broadside intensity factor of a horizontal element over an infinite plane, |2 sin(kh)|², in dB. */
const imageFactorDb = (heightWavelengths: number) => dB(groundPlaneImageFactor(heightWavelengths, 1, 'horizontal') ** 2);
const SECTOR_DESIGN_HZ = 5.8e9;
const sectorHz = (heightWavelengths: number) => (SECTOR_DESIGN_HZ * heightWavelengths) / 0.25;

const line32 = (scanDeg: number): ArraySpec => ({ geometry: { kind: 'linear', count: 32, spacingWavelengths: 0.5 }, steering: { thetaDeg: scanDeg, phiDeg: 0 } });
const scan32: Record<0 | 30 | 45 | 60, () => FiguresOfMerit> = { 0: figures(line32(0)), 30: figures(line32(30)), 45: figures(line32(45)), 60: figures(line32(60)) };
const hpbw32 = (s: 0 | 30 | 45 | 60) => need(scan32[s]().theta.hpbwDeg, 'HPBW');
const quantized = (bits: number) => memo(() => phaseQuantizationEffect(line32(20), bits));
const bits = { 3: quantized(3), 4: quantized(4), 5: quantized(5) };

const ring = figures({ geometry: { kind: 'circular', count: 24, radiusWavelengths: 2 } });
const ringSteered = figures({ geometry: { kind: 'circular', count: 24, radiusWavelengths: 2 }, steering: { thetaDeg: 30, phiDeg: 0 } });
/** HPBW (°) of a uniformly illuminated disc `diameterWavelengths` across, from the aperture pattern in calc/reflector. */
const discHpbwDeg = (diameterWavelengths: number) => ((2 * need(beamFigures(tabulateAperture(() => 1)), 'disc pattern').halfPowerU) / (Math.PI * diameterWavelengths)) * DEG;

const planar16 = (element?: ArraySpec['element']): ArraySpec => ({ geometry: { kind: 'planar', lattice: 'rectangular', columns: 16, rows: 16, spacingXWavelengths: 0.5 }, element });
const planarIso = figures(planar16());
const planarCos = figures(planar16({ kind: 'cosine', powerExponent: 2 }));

const random64 = figures({ geometry: { kind: 'random', count: 64, extentXWavelengths: 20, extentYWavelengths: 20, minSeparationWavelengths: 1, seed: 7 }, element: { kind: 'cosine', powerExponent: 2 } });
const filled40 = figures({ geometry: { kind: 'planar', lattice: 'rectangular', columns: 40, rows: 40, spacingXWavelengths: 0.5 }, element: { kind: 'cosine', powerExponent: 2 } });
const cube = figures({ geometry: { kind: 'volumetric', countX: 4, countY: 4, countZ: 4, spacingWavelengths: 0.5 } });
const flat8 = figures({ geometry: { kind: 'planar', lattice: 'rectangular', columns: 8, rows: 8, spacingXWavelengths: 0.5 } });
/** Coherent gain kept with random position errors of λ/f RMS: e^{−(2π/f)²} (one-way Ruze form), in dB. */
const oneWayRuzeDb = (fraction: number) => dB(Math.exp(-(((2 * Math.PI) / fraction) ** 2)));

const yagiDbi = (boomWavelengths: number) => yagiGainDbd(boomWavelengths).gainDbd + DIPOLE_DIRECTIVITY_DBI;
/** Average gain per doubling of the boom across the whole NBS table (dB). */
const yagiDbPerDoubling = () => {
  const first = NBS_YAGI_DESIGNS[0], last = NBS_YAGI_DESIGNS[NBS_YAGI_DESIGNS.length - 1];
  return (last.gainDbd - first.gainDbd) / Math.log2(last.boomWavelengths / first.boomWavelengths);
};

const hpbwRange = (a: number, b: number, decimals: number) => {
  const [lo, hi] = [Math.min(a, b), Math.max(a, b)].map((x) => fixed(x, decimals));
  return lo === hi ? lo : `${lo}–${hi}`;
};

// ---------- the numbers, by page ----------

/** Every quoted number, as a function returning the text the page shows (without its unit). */
export const GUIDE_NUMBERS = {
  // Guide contents page (site/pages/guide/index.astro)
  dishDiameterWavelengths: () => fixed(value(dish(), 'diameterWavelengths'), 0),
  dishGainRoundDbi: () => fixed(value(dish(), 'gainDbi'), 0),
  line16LengthWavelengths: () => fixed(16 * 0.5, 0),
  line16RoundDbi: () => fixed(uniform16().directivity.directivityDbi, 0),

  // Broadside arrays
  line16UniformDbi: () => fixed(uniform16().directivity.directivityDbi, 2),
  line16UniformHpbwDeg: () => fixed(need(uniform16().theta.hpbwDeg, 'HPBW'), 1),
  line16UniformFnbwDeg: () => fixed(need(uniform16().theta.fnbwDeg, 'FNBW'), 1),
  line16UniformSllDb: () => fixed(need(uniform16().theta.peakSidelobeDb, 'SLL'), 1),
  line16UniformSllRoundDb: () => fixed(need(uniform16().theta.peakSidelobeDb, 'SLL'), 0),
  line16TaylorDbi: () => fixed(taylor16().directivity.directivityDbi, 2),
  line16TaylorHpbwDeg: () => fixed(need(taylor16().theta.hpbwDeg, 'HPBW'), 1),
  line16TaylorFnbwDeg: () => fixed(need(taylor16().theta.fnbwDeg, 'FNBW'), 1),
  line16TaylorSllDb: () => fixed(need(taylor16().theta.peakSidelobeDb, 'SLL'), 1),
  line16ChebyshevDbi: () => fixed(chebyshev16().directivity.directivityDbi, 2),
  line16ChebyshevHpbwDeg: () => fixed(need(chebyshev16().theta.hpbwDeg, 'HPBW'), 1),
  line16ChebyshevFnbwDeg: () => fixed(need(chebyshev16().theta.fnbwDeg, 'FNBW'), 1),
  line16ChebyshevSllDb: () => fixed(need(chebyshev16().theta.peakSidelobeDb, 'SLL'), 1),
  line16TaylorCostDb: () => fixed(uniform16().directivity.directivityDbi - taylor16().directivity.directivityDbi, 1),
  line16At07Dbi: () => fixed(dB(uniformLinearArrayDirectivity(16, 0.7, 0)), 1),
  line16At09Dbi: () => fixed(dB(uniformLinearArrayDirectivity(16, 0.9, 0)), 1),
  line16At10Dbi: () => fixed(dB(uniformLinearArrayDirectivity(16, 1, 0)), 1),
  rectLimitAt50Wavelengths: () => fixed(maxGratingFreeSpacingWavelengths(50, 'rectangular'), 2),
  harbourLimitWavelengths: () => fixed(value(harbour(), 'limitWavelengths'), 3),
  harbourLimitMm: () => fixed(value(harbour(), 'limitM') * 1e3, 1),
  teamMarginPercent: () => fixed(teamConventions.spacingMarginFraction * 100, 0),
  harbourRecommendedMm: () => fixed(value(harbour(), 'recommendedM') * 1e3, 1),
  harbourChosenWavelengths: () => fixed(value(harbour(), 'chosenWavelengths'), 2),
  harbourChosenCount: () => about(value(harbour(), 'countChosen'), 10),
  harbourTriangularCount: () => about(value(harbour(), 'countTri'), 50),
  harbourSquareCount: () => about(value(harbour(), 'countRect'), 50),
  harbourSavingPercent: () => fixed(value(harbour(), 'savingPercent'), 0),

  // Circular and Y-shaped arrays
  ringBesselSidelobeRoundDb: () => fixed(RING_FIRST_SIDELOBE_DB, 0),
  ringDbi: () => fixed(ring().directivity.directivityDbi, 1),
  ringHpbwDeg: () => fixed(need(ring().theta.hpbwDeg, 'HPBW'), 1),
  ringSllDb: () => fixed(need(ring().theta.peakSidelobeDb, 'SLL'), 1),
  ringSteeredDbi: () => fixed(ringSteered().directivity.directivityDbi, 1),
  ringSteeredHpbwDeg: () => fixed(need(ringSteered().theta.hpbwDeg, 'HPBW'), 1),
  yElementCount: () => fixed(value(radioY(), 'elementCount'), 0),
  yHpbwDeg: () => fixed(value(radioY(), 'hpbwScanDeg'), 1),
  ySpanWavelengths: () => fixed(value(radioY(), 'sizeWavelengths'), 1),
  yFilledDiscHpbwDeg: () => fixed(discHpbwDeg(value(radioY(), 'sizeWavelengths')), 1),
  yDbi: () => fixed(value(radioY(), 'directivityDbi'), 1),
  ySllRoundDb: () => fixed(value(radioY(), 'sidelobeDb'), 0),

  // End-fire arrays and Yagis
  gliderLengthNdWavelengths: () => fixed(GLIDER_COUNT * GLIDER_SPACING, 0),
  ordinaryStepDeg: () => fixed(ordinaryEndFirePhaseStepRad(GLIDER_SPACING) * DEG, 1),
  ordinaryDbi: () => fixed(ordinaryLine().directivity.directivityDbi, 1),
  ordinaryHpbwDeg: () => fixed(need(ordinaryLine().theta.hpbwDeg, 'HPBW'), 0),
  ordinarySllDb: () => fixed(need(ordinaryLine().theta.peakSidelobeDb, 'SLL'), 1),
  hwStepDeg: () => fixed(hansenWoodyardPhaseStepRad(GLIDER_COUNT, GLIDER_SPACING) * DEG, 1),
  hwDbi: () => fixed(hwLine().directivity.directivityDbi, 1),
  hwHpbwDeg: () => fixed(need(hwLine().theta.hpbwDeg, 'HPBW'), 0),
  hwSllDb: () => fixed(need(hwLine().theta.peakSidelobeDb, 'SLL'), 1),
  gliderLengthM: () => fixed(value(gliderHw(), 'lengthM'), 1),
  hwAdvantageDb: () => fixed(value(gliderHw(), 'hwAdvantageDb'), 1),
  hwLongArrayFactor: () => fixed(endFireDirectivity('hansenWoodyard', 400, 0.25) / endFireDirectivity('ordinary', 400, 0.25), 1),
  hwSpacingLimitWavelengths: () => fixed(endFireSpacingLimitWavelengths('hansenWoodyard', GLIDER_COUNT), 3),
  gliderFourLOverLambda: () => fixed(4 * GLIDER_COUNT * GLIDER_SPACING, 0),
  gliderFourLOverLambdaDbi: () => fixed(dB(4 * GLIDER_COUNT * GLIDER_SPACING), 1),
  doublingDb: () => fixed(dB(2), 0),
  yagiDbPerDoubling: () => fixed(yagiDbPerDoubling(), 1),
  yagiOneWavelengthDbi: () => fixed(yagiDbi(1), 0),
  yagiThreeWavelengthDbi: () => fixed(yagiDbi(3), 0),

  // Back-lobe suppression with a ground plane
  imagePeakFieldDb: () => fixed(20 * Math.log10(2), 0),
  dipoles8FreeDbi: () => fixed(dipolesFree().directivity.directivityDbi, 1),
  dipoles8GroundDbi: () => fixed(dipolesOverGround().directivity.directivityDbi, 1),
  dipoles8GainDb: () => fixed(dipolesOverGround().directivity.directivityDbi - dipolesFree().directivity.directivityDbi, 1),
  dipoleFreeDbi: () => fixed(dB(dipoleOverPlaneDirectivity('halfWave', null)), 2),
  dipoleQuarterWaveDbi: () => fixed(dB(dipoleOverPlaneDirectivity('halfWave', 0.25)), 1),
  sectorGHzAt020: () => fixed(sectorHz(0.2) / 1e9, 2),
  sectorGHzAt030: () => fixed(sectorHz(0.3) / 1e9, 2),
  sectorGHzAt040: () => fixed(sectorHz(0.4) / 1e9, 2),
  sectorGHzAt050: () => fixed(sectorHz(0.5) / 1e9, 1),
  imageDbAt020: () => fixed(imageFactorDb(0.2), 2),
  imageDbAt025: () => fixed(imageFactorDb(0.25), 2),
  imageDbAt030: () => fixed(imageFactorDb(0.3), 2),
  imageDbAt040: () => fixed(imageFactorDb(0.4), 2),
  imageRelDbAt020: () => fixed(imageFactorDb(0.2) - imageFactorDb(0.25), 2),
  imageRelDbAt030: () => fixed(imageFactorDb(0.3) - imageFactorDb(0.25), 2),
  imageRelDbAt040: () => fixed(imageFactorDb(0.4) - imageFactorDb(0.25), 2),
  sectorFlatPercent: () => fixed(((0.3 - 0.25) / 0.25) * 100, 0),
  sectorOneDbLowGHz: () => fixed(value(sector(), 'band1LowHz') / 1e9, 1),
  sectorOneDbHighGHz: () => fixed(value(sector(), 'band1HighHz') / 1e9, 1),
  sectorNullGHz: () => fixed(value(sector(), 'nullFrequencyHz') / 1e9, 1),

  // Planar and conformal
  harbourApertureDbi: () => fixed(dB(apertureGainFromArea(1.2 * 0.4, freeSpaceWavelengthM(10e9))), 1),
  mirrorBeamDb: () => fixed(dB(2), 0),
  planar16SideWavelengths: () => fixed(16 * 0.5, 0),
  planar16ApertureDbi: () => fixed(dB(apertureGainFromArea((16 * 0.5) ** 2, 1)), 1),
  planar16IsotropicDbi: () => fixed(planarIso().directivity.directivityDbi, 1),
  planar16CosineDbi: () => fixed(planarCos().directivity.directivityDbi, 1),
  sizingFaceWidthM: () => fixed(value(sizing(), 'planarWidthM'), 2),
  sizingFaceCount: () => about(value(sizing(), 'planarElementsTri'), 10),
  sizingScanLossDb: () => fixed(-value(sizing(), 'planarScanLossDb'), 1),

  // Reflectors
  dishWavelengthCm: () => fixed(value(dish(), 'wavelengthM') * 100, 2),
  dishSpilloverPercent: () => fixed(value(dish(), 'spilloverPercent'), 1),
  dishSpilloverDb: () => fixed(value(dish(), 'spilloverDb'), 2),
  dishTaperPercent: () => fixed(value(dish(), 'taperPercent'), 1),
  dishTaperDb: () => fixed(value(dish(), 'taperDb'), 2),
  dishSurfacePercent: () => fixed(value(dish(), 'surfaceEfficiencyPercent'), 1),
  dishSurfaceDb: () => fixed(value(dish(), 'surfaceDb'), 2),
  dishBlockagePercent: () => fixed(value(dish(), 'centralBlockagePercent'), 1),
  dishBlockageDb: () => fixed(value(dish(), 'centralBlockageDb'), 2),
  dishStrutPercent: () => fixed(value(dish(), 'strutPercent'), 1),
  dishStrutDb: () => fixed(value(dish(), 'strutDb'), 2),
  dishOtherPercent: () => fixed(value(dish(), 'otherPercent'), 1),
  dishOtherDb: () => fixed(value(dish(), 'otherDb'), 2),
  dishApertureEfficiencyPercent: () => fixed(value(dish(), 'apertureEfficiencyPercent'), 1),
  dishApertureEfficiencyDb: () => fixed(value(dish(), 'apertureEfficiencyDb'), 2),
  dishGainDbi: () => fixed(value(dish(), 'gainDbi'), 1),
  dishHpbwDeg: () => fixed(value(dish(), 'hpbwDeg'), 2),
  dishFirstSidelobeDb: () => fixed(value(dish(), 'firstSidelobeDb'), 0),
  dishFarFieldM: () => about(value(dish(), 'farFieldDistanceM'), 10),
  dishOptimumEdgeTaperDb: () => fixed(value(dish(), 'optimumEdgeTaperDb'), 1),
  dishEdgeTaperCostDb: () => fixed(dB(value(dish(), 'optimumIlluminationPercent') / value(dish(), 'illuminationPercent')), 2),
  dishRimHalfAngleDeg: () => fixed(value(dish(), 'rimHalfAngleDeg'), 1),
  dishSpaceAttenuationDb: () => fixed(-value(dish(), 'spaceAttenuationDb'), 1),
  dishFeedEdgeDb: () => fixed(-value(dish(), 'feedEdgeLevelDb'), 1),
  ruzeLambda16Db: () => fixed(dB(ruzeEfficiency(1 / 16, 1)), 2),
  dishRuzePeakGHz: () => fixed(value(dish(), 'ruzePeakFrequencyHz') / 1e9, 0),
  dishBeamDeviationFactor: () => fixed(value(dish(), 'beamDeviationFactor'), 2),
  dishPointingOneDbDeg: () => fixed(value(dish(), 'pointingOneDbDeg'), 2),

  // Sparse, volumetric and distributed
  filled40Count: () => about(40 * 40, 1),
  filled40Dbi: () => fixed(filled40().directivity.directivityDbi, 1),
  filled40HpbwDeg: () => fixed(need(filled40().theta.hpbwDeg, 'HPBW'), 1),
  random64Dbi: () => fixed(random64().directivity.directivityDbi, 1),
  random64HpbwDeg: () => hpbwRange(need(random64().theta.hpbwDeg, 'HPBW'), need(random64().phi.hpbwDeg, 'HPBW'), 1),
  random64SharePercent: () => fixed((64 / (40 * 40)) * 100, 0),
  random64DeficitDb: () => fixed(filled40().directivity.directivityDbi - random64().directivity.directivityDbi, 0),
  random64AverageSidelobeDb: () => fixed(dB(1 / 64), 0),
  random64CutSllDb: () => fixed(Math.max(need(random64().theta.peakSidelobeDb, 'SLL'), need(random64().phi.peakSidelobeDb, 'SLL')), 0),
  cubeDbi: () => fixed(cube().directivity.directivityDbi, 1),
  flat8Dbi: () => fixed(flat8().directivity.directivityDbi, 1),
  cubeSideWavelengths: () => fixed(4 * 0.5, 0),
  thinnedCount: () => fixed(value(thinned(), 'elementCount'), 0),
  thinnedHpbwDeg: () => hpbwRange(value(thinned(), 'hpbwScanDeg'), value(thinned(), 'hpbwCrossDeg'), 1),
  thinnedSideWavelengths: () => fixed(24 * 0.5, 0),
  distributedLambda20Db: () => fixed(-oneWayRuzeDb(20), 1),
  distributedLambda10Db: () => fixed(-oneWayRuzeDb(10), 1),

  // Steering
  steer30StepDeg: () => fixed(-360 * 0.5 * Math.sin(Math.PI / 6), 0),
  line32Hpbw0Deg: () => fixed(hpbw32(0), 2),
  line32Hpbw30Deg: () => fixed(hpbw32(30), 2),
  line32Hpbw45Deg: () => fixed(hpbw32(45), 2),
  line32Hpbw60Deg: () => fixed(hpbw32(60), 2),
  line32Cos30Deg: () => fixed(hpbw32(0) / Math.cos(Math.PI / 6), 2),
  line32Cos45Deg: () => fixed(hpbw32(0) / Math.cos(Math.PI / 4), 2),
  line32Cos60Deg: () => fixed(hpbw32(0) / Math.cos(Math.PI / 3), 2),
  line32Dbi: () => fixed(scan32[0]().directivity.directivityDbi, 2),
  elementPowerExponent: () => String(teamConventions.elementPowerExponent),
  elementScanLoss60Db: () => fixed(-dB(Math.cos(Math.PI / 3) ** teamConventions.elementPowerExponent), 1),
  droneBroadsideDbi: () => fixed(value(drone(), 'directivityBroadsideDbi'), 1),
  droneGainDbi: () => fixed(value(drone(), 'gainBroadsideDbi'), 1),
  droneEdgeDbi: () => fixed(value(drone(), 'gainEdgeDbi'), 1),
  droneProjectedDb: () => fixed(-value(drone(), 'projectedDb'), 1),
  droneElementDb: () => fixed(-value(drone(), 'elementDb'), 1),
  droneBroadening: () => fixed(value(drone(), 'broadeningComputed'), 1),
  balloonOnsetDeg: () => fixed(value(balloon(), 'onsetHighDeg'), 1),
  bits3StepDeg: () => String(bits[3]().phaseStepDeg),
  bits4StepDeg: () => String(bits[4]().phaseStepDeg),
  bits5StepDeg: () => String(bits[5]().phaseStepDeg),
  bits3PointingDeg: () => fixed(bits[3]().pointingErrorDeg, 3),
  bits4PointingDeg: () => fixed(bits[4]().pointingErrorDeg, 3),
  bits5PointingDeg: () => fixed(bits[5]().pointingErrorDeg, 3),
  bits3SllDb: () => fixed(need(bits[3]().quantizedPeakSidelobeDb, 'SLL'), 1),
  bits4SllDb: () => fixed(need(bits[4]().quantizedPeakSidelobeDb, 'SLL'), 1),
  bits5SllDb: () => fixed(need(bits[5]().quantizedPeakSidelobeDb, 'SLL'), 1),
  bitsIdealSllDb: () => fixed(need(bits[3]().peakSidelobeDb, 'SLL'), 1),
  bitsIdealSllRoundDb: () => fixed(need(bits[3]().peakSidelobeDb, 'SLL'), 0),
  kT0DbmPerHz: () => fixed(noiseDensityDbmPerHz(REFERENCE_NOISE_TEMPERATURE_K), 2),
  downlinkReceiverK: () => fixed(value(downlink(), 'receiverNoiseTemperatureK'), 0),
  downlinkAntennaK: () => fixed(value(downlink(), 'antennaNoiseTemperatureK'), 1),
  downlinkSystemK: () => fixed(value(downlink(), 'systemNoiseTemperatureK'), 0),
  downlinkGOverTDbPerK: () => fixed(value(downlink(), 'gOverTDbPerK'), 1),
  downlinkEirpDbw: () => fixed(value(downlink(), 'eirpDbw'), 1),
  downlinkFsplDb: () => fixed(value(downlink(), 'fsplDb'), 1),
  downlinkPolarizationDb: () => fixed(value(downlink(), 'polarizationLossDb'), 2),
  downlinkCn0DbHz: () => fixed(value(downlink(), 'carrierToNoiseDensityDbHz'), 1),
  downlinkEbN0Db: () => fixed(value(downlink(), 'ebN0Db'), 1),
  downlinkMarginDb: () => fixed(value(downlink(), 'marginDb'), 1),
  downlinkMaxRangeKm: () => about(value(downlink(), 'maxRangeM') / 1000, 10),
} satisfies Record<string, () => string>;

/** The guide's closing budget: the whole downlink budget as the page's "Copy as Markdown" writes it, built at build time. */
export const downlinkBudgetMarkdown = memo(() => {
  const def = calculatorFactories['link-budget'](teamConventions);
  const { inputs } = validateAll(def, decodeState(def, GUIDE_PRESETS.xbandDownlink).texts);
  return budgetMarkdown(budgetRows(computeLinkBudget(inputs!).data));
});

export type GuideNumberKey = keyof typeof GUIDE_NUMBERS;

/** The guide's numbers as text: `g.ruzeLambda16Db` is "−2.68". Each is computed on first read. */
export const g: Readonly<Record<GuideNumberKey, string>> = (() => {
  const out = {} as Record<GuideNumberKey, string>;
  for (const key of Object.keys(GUIDE_NUMBERS) as GuideNumberKey[]) {
    const compute = memo(GUIDE_NUMBERS[key]);
    Object.defineProperty(out, key, { get: compute, enumerable: true });
  }
  return Object.freeze(out);
})();
