/**
 * The team's conventions for pages: the values (kept beside their type in calc/teamConventions.ts,
 * so islands read them without importing site/) and one sentence on each for the Conventions page.
 * Change a value in calc/teamConventions.ts and rebuild: every calculator and the Conventions page follow.
 */
import type { TeamConventions } from '../calc/teamConventions';

export { teamConventions } from '../calc/teamConventions';

/** One sentence per convention, for the Conventions page (keys follow TeamConventions). */
export const conventionNotes: { key: string; value: (c: TeamConventions) => string; note: string }[] = [
  { key: 'units', value: (c) => `${c.units.frequency}, ${c.units.length}`, note: 'Preferred display units for frequency and length. Fields accept any supported unit; results are shown in these where they read well.' },
  { key: 'designFrequencyHz', value: (c) => `${c.designFrequencyHz / 1e9} GHz`, note: 'The frequency a calculator opens with when a link does not set one.' },
  { key: 'maxScanDeg', value: (c) => `${c.maxScanDeg}°`, note: 'Default largest scan angle from broadside for array sizing and spacing.' },
  { key: 'lattice', value: (c) => c.lattice, note: 'Default lattice for planar arrays. An equilateral triangular lattice allows about 15 % larger spacing than a square one for the same scan, so it needs about 13 % fewer elements.' },
  { key: 'spacingMarginFraction', value: (c) => `${(c.spacingMarginFraction * 100).toFixed(0)} % below the limit`, note: 'We never design at the grating-lobe limit: the grating lobe sits on the horizon there and rises fast with any frequency or scan overshoot. Recommended spacings are this fraction below the limit at the highest frequency.' },
  { key: 'elementPowerExponent', value: (c) => `element power pattern cosⁿθ, n = ${c.elementPowerExponent}`, note: 'The team\'s default element: its embedded element power pattern is cosⁿθ (the exponent of the power pattern, never of the field; a field pattern cosᵐθ is n = 2m). Scan loss, architecture sizing and the array pattern explorer all start from it. n = 1 is the projected-aperture loss alone; measured well-matched elements usually fall between 1.2 and 1.5.' },
  { key: 'efficiencies.reflectorAperture', value: (c) => `${(c.efficiencies.reflectorAperture * 100).toFixed(0)} %`, note: 'Aperture efficiency assumed for front-fed reflectors in quick sizing (the reflector calculator computes its own budget).' },
  { key: 'efficiencies.arrayRadiation', value: (c) => `${(c.efficiencies.arrayRadiation * 100).toFixed(0)} %`, note: 'Radiation efficiency assumed for phased arrays in quick sizing (feed network and element losses).' },
];
