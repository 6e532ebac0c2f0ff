/** Every calculator and docs page, for the navigation and the home page. */
export interface NavEntry {
  path: string;
  title: string;
  summary: string;
}

export const calculators: NavEntry[] = [
  {
    path: 'calculators/architecture-sizing/',
    title: 'Architecture sizing',
    summary: 'Every architecture — reflector, end-fire, linear, planar, circular and Y arrays — sized to one gain or beamwidth requirement, side by side, with what rules each out.'
  },
  {
    path: 'calculators/wavelength-spacing/',
    title: 'Wavelength & element spacing',
    summary: 'Wavelengths over a band, the grating-lobe-free spacing for a lattice and scan range, and the element count of an aperture.'
  },
  {
    path: 'calculators/front-fed-reflector/',
    title: 'Front-fed parabolic reflector',
    summary: 'Gain or diameter from an efficiency budget (spillover, taper, surface, blockage), the far-field pattern, the best edge taper, and beam steering by feed offset.'
  },
  {
    path: 'calculators/end-fire-length/',
    title: 'End-fire length vs gain',
    summary: 'Length of an ordinary or Hansen–Woodyard end-fire array or a Yagi–Uda for a gain, against a broadside aperture of the same length; stacking Yagis.'
  },
  {
    path: 'calculators/backplane-spacing/',
    title: 'Backplane spacing',
    summary: 'Spacing of a conducting plane behind dipoles: the λ/4 rule with a spacer, the image factor over a band and scan range, the flattest spacing, and directivity over the plane.'
  },
  {
    path: 'calculators/array-explorer/',
    title: 'Array pattern explorer',
    summary: 'Pattern cut, u–v map, directivity, beamwidths, sidelobes and grating lobes of a steered array, with the element excitation table.'
  },
  {
    path: 'calculators/scan-loss/',
    title: 'Scan-loss estimate',
    summary: 'Gain lost at the scan edge — projected aperture, element factor, mismatch — beam broadening, grating-lobe onset, and the aperture growth a gain target needs.'
  },
  {
    path: 'calculators/range-exposure/',
    title: 'Link range & RF exposure',
    summary: 'Friis range or the gain a range needs, free-space loss (ITU-R P.525), EIRP, power density and the distance to an exposure limit.'
  },
  {
    path: 'calculators/link-budget/',
    title: 'Link budget, G/T & margin',
    summary: 'The whole link as a budget table: EIRP (also of an active array), path, polarization and pointing losses, system noise temperature, G/T, C/N₀, Eb/N₀, margin and the largest range at a chosen margin.'
  },
  {
    path: 'calculators/unit-converter/',
    title: 'Unit & level converter',
    summary: 'dB and ratios, dBm and watts, power density and field strength, VSWR and return loss, noise figure and temperature, dBi and dBd, frequency and wavelength, Eb/N₀ and C/N₀.'
  },
];

export const docs: NavEntry[] = [
  { path: 'guide/', title: 'Guide', summary: 'How the team reaches high directivity, part by part, with live calculators preset to worked examples.' },
  { path: 'glossary/', title: 'Glossary', summary: 'The trade terms the calculators use, in our words, following IEEE Std 145 where it defines them.' },
  { path: 'conventions/', title: 'Conventions', summary: 'The team defaults every calculator starts from, and the angle convention.' },
  { path: 'formulas/', title: 'Formula reference', summary: 'Every formula the calculators evaluate: symbols and units, validity, source, and where it is shown.' },
  { path: 'search/', title: 'Search', summary: 'Full-text search over every page, from an index built with the site (works offline).' },
  { path: 'changelog/', title: 'Change log', summary: 'What changed in the handbook and the calculators, newest first.' },
  { path: 'verification/', title: 'Verification record', summary: 'Every check against a published source, with the value the code computed when this site was built.' },
];
