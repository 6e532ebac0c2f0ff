/**
 * The one angle convention of calc/ (also rendered on the Conventions page from this text).
 *
 * - Array coordinates: a linear array lies along the x axis; planar, circular and Y-shaped arrays
 *   lie in the x–y plane; z is the array normal (broadside). Arbitrary arrays give x, y, z.
 * - θ is the polar angle from +z (broadside), 0…180°; φ is the azimuth in the x–y plane from +x,
 *   0…360°. For a linear array the scan angle is θ in the φ = 0° plane, measured from broadside;
 *   end-fire along +x is θ = 90°, φ = 0°.
 * - Direction cosines: u = sin θ cos φ, v = sin θ sin φ, w = cos θ; visible space is u² + v² ≤ 1.
 * - Steering by progressive phase: element n at r_n gets the phase −k r_n·û0, so the array factor
 *   AF(û) = Σ a_n e^{j k r_n·(û − û0)} peaks at û0 = û(θ0, φ0).
 * - Degrees at every public boundary; radians inside.
 */
export const ANGLE_CONVENTION = {
  summary: 'θ from the array normal (broadside, +z), φ in the array plane from +x; a linear array lies on x and scans in the φ = 0° plane.',
  points: [
    'A linear array lies along the x axis; planar, circular and Y-shaped arrays lie in the x–y plane; z is the array normal (broadside).',
    'θ is measured from broadside (+z), 0° to 180°; φ is measured in the array plane from +x, 0° to 360°.',
    'For a linear array, the scan angle is θ in the φ = 0° plane, measured from broadside; end-fire along the array axis is θ = 90°.',
    'Direction cosines are u = sin θ cos φ and v = sin θ sin φ; visible space is u² + v² ≤ 1.',
    'Steering applies the progressive phase −k r·û₀ to the element at r, so the beam peaks at (θ₀, φ₀).',
    'Inputs and outputs use degrees; calculations use radians inside.',
  ],
} as const;
