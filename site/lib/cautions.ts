/**
 * Safety notes by calculator id: every calculator has one, because every one of them sizes or
 * describes antennas that transmit or are mounted on masts and roofs. CalculatorPage.astro shows
 * the note above the calculator and the embed route shows the same note, so an embedded copy
 * never loses it. tests/site/cautions.test.ts checks that every registered calculator has one.
 */

/** What every note ends with: the page estimates, people and rules decide. */
const DEFER =
  'These figures do not replace local regulations, a qualified RF-exposure assessment, or licensed practice for work at height.';

/** The RF-exposure caution for anything that transmits. */
export const RF_EXPOSURE_CAUTION =
  'A transmitting antenna can exceed exposure limits far along its beam and close in front of it. Exposure from several transmitters on a shared mast or rooftop adds up. Occupational limits apply only to trained workers under a safety programme. Switch off and lock out every transmitter on a site, other operators’ included, before anyone climbs or works in front of an antenna. Pulsed transmitters also have limits on peak exposure that this site does not check.';

/** The caution for climbing and rooftop work. */
export const WORK_AT_HEIGHT_CAUTION =
  'Masts, towers and roofs are work at height: use trained people, fall protection and a rescue plan, keep clear of power lines, and check the structure and its wind load before adding an antenna.';

const SUN_CAUTION = 'A dish pointed near the sun focuses sunlight on its feed and can burn it or anyone in front of it.';

export const calculatorCautions: Record<string, string> = {
  'architecture-sizing': `${RF_EXPOSURE_CAUTION} ${WORK_AT_HEIGHT_CAUTION} ${DEFER}`,
  'wavelength-spacing': `Arrays spaced here usually transmit: ${RF_EXPOSURE_CAUTION} ${DEFER}`,
  'scan-loss': `A scanned array still concentrates its power along the steered beam. ${RF_EXPOSURE_CAUTION} ${DEFER}`,
  'array-explorer': `${RF_EXPOSURE_CAUTION} ${WORK_AT_HEIGHT_CAUTION} ${DEFER}`,
  'backplane-spacing': `${RF_EXPOSURE_CAUTION} ${WORK_AT_HEIGHT_CAUTION} ${DEFER}`,
  'end-fire-length': `Yagi–Uda antennas and stacked bays go on masts and towers. ${WORK_AT_HEIGHT_CAUTION} ${RF_EXPOSURE_CAUTION} ${DEFER}`,
  'front-fed-reflector': `A high-gain transmitting dish concentrates RF power along its beam, most strongly in the near field in front of the aperture. Never stand in front of an energised dish. ${RF_EXPOSURE_CAUTION} ${SUN_CAUTION} ${WORK_AT_HEIGHT_CAUTION} ${DEFER}`,
  'range-exposure': `These are simplified estimates. ${RF_EXPOSURE_CAUTION} ${SUN_CAUTION} ${DEFER}`,
  'link-budget': `The transmit side of a link budget is a transmitter: the Link range & RF exposure page (linked under the budget table, with this EIRP) estimates how close to the antenna the power density exceeds a limit. ${RF_EXPOSURE_CAUTION} ${DEFER}`,
  'unit-converter': `Power densities and field strengths converted here bear on exposure limits. ${RF_EXPOSURE_CAUTION} ${DEFER}`,
};
