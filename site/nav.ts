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
    path: 'calculators/end-fire-length/',
    title: 'End-fire length vs gain',
    summary: 'Length of an ordinary or Hansen–Woodyard end-fire array or a Yagi–Uda for a gain, against a broadside aperture of the same length; stacking Yagis.',
  },
  {
    path: 'calculators/backplane-spacing/',
    title: 'Backplane spacing',
    summary: 'Spacing of a conducting plane behind dipoles: the λ/4 rule with a spacer, the image factor over a band and scan range, the flattest spacing, and directivity over the plane.',
  },
];

export const docs: NavEntry[] = [
  { path: 'conventions/', title: 'Conventions', summary: 'The team defaults every calculator starts from, and the angle convention.' },
];
