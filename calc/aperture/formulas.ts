/** Displayed formulas of the aperture relations, evaluated by the same functions the calculators call. */
import { defineFormula } from '../formula';
import { freeSpaceWavelengthM } from '../wavelength';
import { farFieldDistanceM } from './farFieldDistance';

/** Far-field (Fraunhofer) distance 2D²/λ: shown by the reflector and the range & exposure pages. */
export const farFieldDistanceFormula = defineFormula({
  id: 'far-field-distance',
  title: 'Far-field (Fraunhofer) distance of an aperture',
  latex: 'R_{\\mathrm{ff}} = \\frac{2D^{2}}{\\lambda}',
  symbols: [
    { symbol: 'R_{\\mathrm{ff}}', meaning: 'distance beyond which the far-field pattern holds (phase error across the aperture at most π/8)', unit: 'm' },
    { symbol: 'D', meaning: 'largest aperture dimension (a dish: its diameter)', unit: 'm' },
    { symbol: '\\lambda', meaning: 'free-space wavelength', unit: 'm' },
  ],
  validity: 'Apertures large against λ; the π/8 phase criterion. Measurements of low sidelobes need more distance.',
  source: 'IEEE Std 149-2021, IEEE Recommended Practice for Antenna Measurements (far-field criterion); Balanis, Antenna Theory, 4th ed., §2.2.4 (section number from memory).',
  argNames: ['apertureDiameterM', 'frequencyHz'],
  evaluate: ({ apertureDiameterM, frequencyHz }) => farFieldDistanceM(apertureDiameterM, freeSpaceWavelengthM(frequencyHz)),
  example: { args: { apertureDiameterM: 3, frequencyHz: 299_792_458 * 10 }, expected: 180, tolerance: 1e-9, source: 'hand-worked: λ = 0.1 m, 2 × 9 / 0.1 = 180 m' },
});
