/**
 * The glossary: trade terms the calculators and the guide use, in our own words. `ieee145` says
 * whether IEEE Std 145-2013 (IEEE Standard for Definitions of Terms for Antennas) has an entry for
 * the term; where it does, our wording follows its meaning. `calculators` are registry ids
 * (calc/calculators/index.ts) and `see` are site paths (with an optional #fragment); the page links
 * a calculator only once its page is published, and the link checker verifies every `see` link.
 */
export interface GlossaryTerm {
  id: string;
  term: string;
  /** Other names or abbreviations. */
  aka?: string[];
  definition: string;
  ieee145: boolean;
  calculators?: string[];
  see?: { path: string; label: string }[];
}

const guide = (slug: string, label: string, fragment = '') => ({ path: `guide/${slug}/${fragment ? `#${fragment}` : ''}`, label });

export const glossary: GlossaryTerm[] = [
  {
    id: 'directivity',
    term: 'Directivity',
    aka: ['D'],
    definition: 'The radiation intensity in a given direction divided by the intensity averaged over all directions; without a direction, its maximum. It describes the shape of the pattern only — losses and mismatch do not enter. Quoted in dBi.',
    ieee145: true,
    calculators: ['front-fed-reflector'],
    see: [guide('broadside-arrays', 'Guide: broadside arrays')],
  },
  {
    id: 'gain',
    term: 'Gain',
    aka: ['G'],
    definition: 'Directivity multiplied by the radiation efficiency: the intensity in a direction relative to an isotropic source fed with the same power as the antenna accepts. Gain counts ohmic and dielectric losses but not impedance mismatch.',
    ieee145: true,
    calculators: ['front-fed-reflector'],
    see: [guide('reflectors', 'Guide: reflectors')],
  },
  {
    id: 'realized-gain',
    term: 'Realized gain',
    definition: 'Gain reduced by the impedance-mismatch loss at the antenna port, i.e. relative to the power available from the source rather than the power accepted. This is the figure a link budget needs.',
    ieee145: true,
  },
  {
    id: 'radiation-efficiency',
    term: 'Radiation efficiency',
    definition: 'The ratio of the power radiated to the power accepted at the antenna terminals; the rest is lost as heat in conductors and dielectrics.',
    ieee145: true,
  },
  {
    id: 'dbi-dbd',
    term: 'dBi, dBd',
    definition: 'Decibels relative to an isotropic radiator (dBi) or to a lossless half-wave dipole (dBd). A half-wave dipole has 2.15 dBi, so dBd = dBi − 2.15. Dirigo always quotes dBi. Units, not antenna terms, so not defined in the standard.',
    ieee145: false,
    see: [{ path: 'conventions/', label: 'Conventions' }],
  },
  {
    id: 'isotropic-radiator',
    term: 'Isotropic radiator',
    definition: 'A hypothetical lossless antenna radiating equal intensity in all directions; the reference for dBi. It cannot be built for a vector field but is the natural yardstick for directivity.',
    ieee145: true,
  },
  {
    id: 'hpbw',
    term: 'Half-power beamwidth',
    aka: ['HPBW', '3 dB beamwidth'],
    definition: 'The full angle between the two directions, in a named plane through the main-beam peak, where the radiation intensity is half the peak (−3 dB). Dirigo finds the −3 dB points by root-finding, not by reading a grid.',
    ieee145: true,
    calculators: ['front-fed-reflector', 'scan-loss'],
    see: [guide('steering', 'Guide: steering')],
  },
  {
    id: 'fnbw',
    term: 'First-null beamwidth',
    aka: ['FNBW'],
    definition: 'The full angle between the first nulls (or minima) either side of the main beam in a named plane. About twice the HPBW for a uniform aperture, wider for a tapered one.',
    ieee145: false,
    see: [guide('broadside-arrays', 'Guide: broadside arrays')],
  },
  {
    id: 'sidelobe-level',
    term: 'Sidelobe level',
    aka: ['SLL', 'relative sidelobe level'],
    definition: 'The peak of the highest sidelobe relative to the main-beam peak, a negative number in dB (−13.2 dB for a uniform line). Without a qualifier, Dirigo means the highest sidelobe, not the first.',
    ieee145: true,
    see: [guide('broadside-arrays', 'Guide: broadside arrays')],
  },
  {
    id: 'grating-lobe',
    term: 'Grating lobe',
    definition: 'A lobe, other than the main beam, produced by an array whose element spacing is large enough that the contributions add in phase in a second direction as well. It can be as strong as the main beam. For a linear or rectangular lattice it stays out of visible space while d/λ ≤ 1/(1 + |sin θ₀|).',
    ieee145: true,
    calculators: ['wavelength-spacing'],
    see: [guide('broadside-arrays', 'Guide: broadside arrays')],
  },
  {
    id: 'visible-space',
    term: 'Visible space',
    aka: ['visible region'],
    definition: 'The set of direction cosines that correspond to real directions: u² + v² ≤ 1. Array factors are periodic in (u, v); only the part inside this circle is radiated, the rest is stored (reactive) energy.',
    ieee145: false,
    calculators: ['wavelength-spacing'],
  },
  {
    id: 'direction-cosines',
    term: 'Direction cosines',
    aka: ['u, v'],
    definition: 'The components of a unit vector toward the observation direction: u = sin θ cos φ, v = sin θ sin φ, with θ from the array normal. In (u, v) a planar array\'s pattern keeps its shape as it is steered — it just shifts.',
    ieee145: false,
    see: [{ path: 'conventions/', label: 'Conventions (angles)' }],
  },
  {
    id: 'array-factor',
    term: 'Array factor',
    aka: ['AF'],
    definition: 'The pattern of an array of isotropic sources with the array\'s positions and excitations. For identical, identically oriented elements the full pattern is the element pattern times the array factor.',
    ieee145: true,
    see: [guide('broadside-arrays', 'Guide: broadside arrays')],
  },
  {
    id: 'element-pattern',
    term: 'Element pattern',
    aka: ['embedded element pattern', 'active element pattern'],
    definition: 'The pattern of one element. In an array we mean the embedded pattern: that element driven with all others present and terminated in matched loads, which includes mutual coupling and sets the scan loss.',
    ieee145: false,
    see: [guide('broadside-arrays', 'Guide: broadside arrays')],
  },
  {
    id: 'mutual-coupling',
    term: 'Mutual coupling',
    definition: 'The interaction between elements: current on one element induces current on its neighbours, so each element\'s impedance and pattern depend on the others and on the scan angle. Strong below about λ/4 spacing.',
    ieee145: false,
    calculators: ['wavelength-spacing', 'scan-loss'],
    see: [guide('broadside-arrays', 'Guide: broadside arrays')],
  },
  {
    id: 'scan-loss',
    term: 'Scan loss',
    definition: 'The drop in gain of a phased array as its beam is steered away from broadside: at least the projected-area factor cos θ₀, more with real element patterns and mismatch. Our default model is cosⁿθ₀ with n = 1.3.',
    calculators: ['scan-loss'],
    ieee145: false,
    see: [guide('steering', 'Guide: steering'), { path: 'conventions/', label: 'Conventions' }],
  },
  {
    id: 'progressive-phase',
    term: 'Progressive phase',
    aka: ['phase ramp'],
    definition: 'Element-to-element phase −k d sin θ₀ that steers a uniformly spaced array\'s beam to θ₀. Reduced modulo 360° for phase shifters; a true-time-delay network applies the delay itself and does not squint with frequency.',
    ieee145: false,
    see: [guide('steering', 'Guide: steering')],
  },
  {
    id: 'phase-quantization',
    term: 'Phase quantization',
    definition: 'Rounding each element\'s phase to the 2ᴮ states of a B-bit phase shifter. The periodic rounding error raises quantization lobes (peak near −6B dB for a uniform ramp) and shifts the beam slightly.',
    ieee145: false,
    see: [guide('steering', 'Guide: steering')],
  },
  {
    id: 'taylor-taper',
    term: 'Taylor taper',
    aka: ['Taylor distribution'],
    definition: 'An amplitude distribution, named for its inventor, that holds the first n̄ − 1 sidelobes near a chosen level and lets the rest decay. Close to the narrowest beam for its sidelobe level, and tolerant of errors; our default low-sidelobe taper.',
    ieee145: false,
    see: [guide('broadside-arrays', 'Guide: broadside arrays')],
  },
  {
    id: 'dolph-chebyshev',
    term: 'Dolph–Chebyshev taper',
    definition: 'An amplitude distribution for a uniformly spaced line, built from Chebyshev polynomials, that puts every sidelobe at exactly the chosen level; for that level it gives the narrowest main beam.',
    ieee145: false,
    see: [guide('broadside-arrays', 'Guide: broadside arrays')],
  },
  {
    id: 'taper-efficiency',
    term: 'Taper efficiency',
    aka: ['illumination efficiency', 'aperture illumination efficiency'],
    definition: 'The directivity of an aperture or array with its actual amplitude distribution divided by that with uniform amplitude over the same aperture: |Σa|² / (N Σ|a|²) for an array. The price of low sidelobes.',
    ieee145: true,
    calculators: ['front-fed-reflector'],
    see: [guide('reflectors', 'Guide: reflectors'), guide('broadside-arrays', 'Guide: broadside arrays')],
  },
  {
    id: 'spillover-efficiency',
    term: 'Spillover efficiency',
    definition: 'The fraction of the feed\'s radiated power that the reflector intercepts. The rest spills past the rim, raising wide-angle sidelobes and the noise picked up from the ground.',
    ieee145: true,
    calculators: ['front-fed-reflector'],
    see: [guide('reflectors', 'Guide: reflectors')],
  },
  {
    id: 'edge-taper',
    term: 'Edge taper',
    aka: ['edge illumination'],
    definition: 'The illumination at the reflector rim relative to the centre, in dB: the feed pattern\'s fall-off at the rim angle plus the extra path (space) attenuation. Around −10 to −12 dB balances spillover against taper efficiency.',
    ieee145: false,
    calculators: ['front-fed-reflector'],
    see: [guide('reflectors', 'Guide: reflectors')],
  },
  {
    id: 'aperture',
    term: 'Aperture',
    definition: 'A surface near or on the antenna, usually a plane across its mouth, through which most of the radiated power passes and over which the field defines the pattern. For a dish, the circle of the rim.',
    ieee145: true,
    see: [guide('planar-and-conformal', 'Guide: planar arrays')],
  },
  {
    id: 'aperture-efficiency',
    term: 'Aperture efficiency',
    definition: 'The ratio of an antenna\'s effective area to its physical aperture area, so G = η(πD/λ)² for a dish. For a reflector it is the product of spillover, taper, phase (surface), blockage and other losses.',
    ieee145: true,
    calculators: ['front-fed-reflector'],
    see: [guide('reflectors', 'Guide: reflectors')],
  },
  {
    id: 'surface-efficiency',
    term: 'Surface (Ruze) efficiency',
    definition: 'The gain kept by a reflector with random surface errors of ε RMS: about exp(−(4πε/λ)²), after Ruze. Small beyond λ/16, where the estimate itself stops being reliable.',
    ieee145: false,
    calculators: ['front-fed-reflector'],
    see: [guide('reflectors', 'Guide: reflectors')],
  },
  {
    id: 'beam-deviation-factor',
    term: 'Beam deviation factor',
    aka: ['BDF'],
    definition: 'The ratio of the beam\'s tilt to the angle of a laterally displaced feed seen from the vertex. Below 1, approaching 1 for shallow dishes; sets how far apart the feeds of a multi-beam cluster sit.',
    ieee145: false,
    calculators: ['front-fed-reflector'],
    see: [guide('reflectors', 'Guide: reflectors')],
  },
  {
    id: 'far-field',
    term: 'Far field',
    aka: ['far-field region', 'Fraunhofer region'],
    definition: 'The region where the angular distribution of the field no longer depends on distance and power density falls as 1/r². Conventionally beyond 2D²/λ for an aperture of largest dimension D; pattern measurements and far-field exposure formulas need it.',
    ieee145: true,
    calculators: ['front-fed-reflector', 'range-exposure'],
    see: [guide('reflectors', 'Guide: reflectors')],
  },
  {
    id: 'eirp',
    term: 'EIRP',
    aka: ['equivalent isotropically radiated power'],
    definition: 'Transmitter power delivered to the antenna times the antenna gain in a given direction: the power an isotropic source would need for the same intensity. In dBW or dBm: P + G.',
    calculators: ['range-exposure'],
    ieee145: true,
  },
  {
    id: 'front-to-back',
    term: 'Front-to-back ratio',
    definition: 'The ratio of the intensity in the main beam to that in the opposite direction (or the highest level in a stated rear sector), in dB.',
    ieee145: true,
    see: [guide('ground-plane', 'Guide: ground plane')],
  },
  {
    id: 'end-fire',
    term: 'End-fire array',
    definition: 'An array whose main beam lies along its own axis. Ordinary phasing −kd per element; Hansen–Woodyard phasing adds about π/N for a narrower beam and more directivity.',
    ieee145: true,
    see: [guide('end-fire', 'Guide: end-fire arrays')],
  },
  {
    id: 'broadside-array',
    term: 'Broadside array',
    definition: 'An array whose main beam is perpendicular to the line or plane of its elements, produced by equal phases.',
    ieee145: true,
    see: [guide('broadside-arrays', 'Guide: broadside arrays')],
  },
];
