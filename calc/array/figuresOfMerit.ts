import type { CalcWarning } from '../warnings';
import { warning } from '../warnings';
import type { PlaneMetrics } from './beamMetrics';
import { principalPlaneMetrics } from './beamMetrics';
import type { DirectivityResult } from './directivity';
import { directivity } from './directivity';
import type { GratingLobe } from './gratingLobes';
import { gratingLobeDirections } from './gratingLobes';
import { taperEfficiency } from './taperEfficiency';
import type { ArrayModel } from './types';

/** All figures of merit of a model in one object, for a calculator page. */
export interface FiguresOfMerit {
  directivity: DirectivityResult;
  theta: PlaneMetrics;
  phi: PlaneMetrics;
  /** Grating lobes in visible space (lattice arrays only; empty otherwise). */
  gratingLobes: GratingLobe[];
  /** Taper efficiency of the element amplitudes (0…1). */
  taperEfficiency: number;
  warnings: CalcWarning[];
}

/** Directivity, HPBW/FNBW/sidelobe level in both principal planes, grating lobes and taper efficiency, with warnings. */
export function figuresOfMerit(model: ArrayModel): FiguresOfMerit {
  const planes = principalPlaneMetrics(model);
  const gratingLobes = model.lattice ? gratingLobeDirections(model.lattice.vectorsWavelengths, model.beam) : [];
  const amplitudes = Float64Array.from(model.weights.re, (re, n) => Math.hypot(re, model.weights.im[n]));
  const warnings = [...planes.warnings];
  if (gratingLobes.length > 0) {
    warnings.push(warning('grating-lobe-visible', 'caution', `${gratingLobes.length} grating lobe(s) are in visible space at this spacing, frequency and scan.`, ['gratingLobes']));
  }
  return { directivity: directivity(model), theta: planes.theta, phi: planes.phi, gratingLobes, taperEfficiency: taperEfficiency(amplitudes), warnings };
}
