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
    path: 'calculators/array-explorer/',
    title: 'Array pattern explorer',
    summary: 'Pattern cut, u–v map, directivity, beamwidths, sidelobes and grating lobes of a steered array, with the element excitation table.',
  },
];

export const docs: NavEntry[] = [
  { path: 'conventions/', title: 'Conventions', summary: 'The team defaults every calculator starts from, and the angle convention.' },
];
