/**
 * Safety notes by calculator id, for calculators whose results bear on RF exposure or work at
 * height. CalculatorPage.astro shows the note above the calculator and the embed route shows the
 * same note, so an embedded copy never loses it.
 */
import { EXPOSURE_CAUTION } from '../../calc/calculators/rangeExposure';

export const calculatorCautions: Record<string, string> = {
  'front-fed-reflector':
    'A high-gain transmitting dish concentrates RF power along its beam, far beyond the antenna and most strongly in the near field in front of the aperture. Never stand in front of an energised dish. RF exposure and work at height follow local regulations and a qualified assessment; these figures do not replace either.',
  'range-exposure': EXPOSURE_CAUTION,
  'link-budget': `${EXPOSURE_CAUTION} The transmit side of a link budget is a transmitter: the Link range & RF exposure page (linked under the budget table, with this EIRP) estimates how close to the antenna the power density exceeds a limit.`,
};
