/** Every calculator and docs page, for the navigation and the home page. */
export interface NavEntry {
  path: string;
  title: string;
  summary: string;
}

export const calculators: NavEntry[] = [
  {
    path: 'calculators/wavelength-spacing/',
    title: 'Wavelength & element spacing',
    summary: 'Wavelengths over a band, the grating-lobe-free spacing for a lattice and scan range, and the element count of an aperture.',
  },
  {
    path: 'calculators/front-fed-reflector/',
    title: 'Front-fed parabolic reflector',
    summary: 'Gain or diameter from an efficiency budget (spillover, taper, surface, blockage), the far-field pattern, the best edge taper, and beam steering by feed offset.',
  },
];

export const docs: NavEntry[] = [
  { path: 'conventions/', title: 'Conventions', summary: 'The team defaults every calculator starts from, and the angle convention.' },
];
