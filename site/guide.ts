/**
 * The onboarding guide's sections, in reading order. Each entry is one MDX page under
 * site/pages/guide/ (path `guide/<slug>/` ↔ file `site/pages/guide/<slug>.mdx`); the guide index,
 * the previous/next links and tests/site/guide.test.ts follow this list.
 */
import type { NavEntry } from './nav';

export const guideSections: NavEntry[] = [
  { path: 'guide/reflectors/', title: 'Reflectors and focal-plane feeds', summary: 'Collimating a feed’s spherical wave into a plane wave: f/D, edge taper, the efficiency budget, and moving the beam with the feed.' },
  { path: 'guide/end-fire/', title: 'End-fire arrays and Yagis', summary: 'Directivity along the array axis from a travelling-wave phase, and why a longer boom gains slowly.' },
  { path: 'guide/broadside-arrays/', title: 'Broadside arrays and element spacing', summary: 'Gain from length, sidelobes from the taper, and the spacing rule that keeps grating lobes out.' },
  { path: 'guide/ground-plane/', title: 'Back-lobe suppression with a ground plane', summary: 'The image element, the λ/4 height, and what happens across a band.' },
  { path: 'guide/steering/', title: 'Steering with progressive phase', summary: 'The phase ramp, beam broadening and scan loss, and what phase-shifter bits cost.' },
  { path: 'guide/circular-and-y-arrays/', title: 'Circular and Y-shaped arrays', summary: 'Arrays that look the same in every azimuth, and sparse arms that buy resolution cheaply.' },
  { path: 'guide/planar-and-conformal/', title: 'Planar and conformal surface arrays', summary: 'Directivity from area, element counts from the lattice, and arrays that follow a curved surface.' },
  { path: 'guide/sparse-and-distributed/', title: 'Sparse, volumetric and distributed arrays', summary: 'Resolution from extent, directivity from element count, and where the missing power goes.' },
  { path: 'guide/link-budget/', title: 'The system around the antenna — link budgets and G/T', summary: 'From the dish to the margin: noise temperature and the Friis noise formula, G/T, polarization and mismatch, and one downlink budget line by line.' },
];
