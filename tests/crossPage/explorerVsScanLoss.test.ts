/**
 * Same antenna, same number: the array pattern explorer and the scan-loss estimate describe one
 * planar array (24 × 24 square lattice at 0.5 λ, element power pattern cosⁿθ with n = 1.3, the team
 * default, and n = 1), scanned in φ = 0 from 0° to 60°.
 *
 * The two pages describe different quantities, and each says which:
 * - the explorer's output is the directivity of the array pattern (array factor × element, no
 *   losses). A large array's directivity follows the projected aperture, 4πA·cos θ0/λ², whatever the
 *   element pattern: the element pattern scales the beam peak and the power around it alike. So
 *   D(θ0) − D(0) must match the scan-loss page's projected-aperture part (its "directivity drop").
 * - the scan-loss page's element factor cos^(n−1) θ0 is a drop of realized gain (mismatch and
 *   coupling folded into the embedded element pattern), which no directivity shows. What must match
 *   it is the power the explorer's model radiates toward the beam for the same excitation:
 *   |E(θ0)|²·|AF(θ0)|² steered over |E(0)|²·|AF(0)|² at broadside = the element power pattern at θ0,
 *   which equals projected + element parts on the scan-loss page only if both pages read n as the
 *   exponent of the power pattern.
 */
import { describe, expect, it } from 'vitest';
import { computeArrayExplorer } from '../../calc/calculators/arrayExplorer';
import { explorerArray } from '../../calc/explorer/explorerInputs';
import { buildArrayModel, patternPowerAtDirections } from '../../calc/array/index';
import { computeScanLoss, createScanLossCalculator } from '../../calc/calculators/scanLoss';
import { createArrayExplorerCalculator } from '../../calc/calculators/arrayExplorer';
import { defaultTexts, validateAll } from '../../components/frame/calculatorModel';
import { teamConventions } from '../../site/conventions';

const explorerDef = createArrayExplorerCalculator(teamConventions);
const scanLossDef = createScanLossCalculator(teamConventions);

function validInputs(def: typeof explorerDef | typeof scanLossDef, texts: Record<string, string>) {
  const { inputs } = validateAll(def as never, { ...defaultTexts(def as never), ...texts });
  if (!inputs) throw new Error(`invalid inputs ${JSON.stringify(texts)}`);
  return inputs;
}

const COUNT = 24;
const SPACING = '0.5 λ';
const SCANS_DEG = [0, 10, 20, 30, 40, 50, 60];
const db = (x: number) => 10 * Math.log10(x);

/** The explorer's inputs for the shared array scanned to θ0 in φ = 0. */
const explorerInputs = (n: string, scanDeg: number) =>
  validInputs(explorerDef, { geo: 'planar', lat: 'rectangular', out: 'rectangle', nx: String(COUNT), ny: String(COUNT), d: SPACING, f: '10 GHz', tap: 'uniform', el: 'cosine', nexp: n, th: `${scanDeg} deg`, ph: '0 deg', bits: '0', gp: '' });

/** The scan-loss page's inputs for the same array (given by count; same lattice, spacing and n). */
const scanLossInputs = (n: string, scanDeg: number) =>
  validInputs(scanLossDef, { f: '10 GHz', d: SPACING, lat: 'rectangular', by: 'count', n: String(COUNT * COUNT), scan: `${scanDeg} deg`, el: 'cosine', nexp: n });

describe('array pattern explorer and scan-loss estimate agree on the same array (0–60° every 10°)', () => {
  for (const n of ['1.3', '1']) {
    // Tolerance 0.1 dB (from the issue). A finite array departs from cos θ0 by its edge effects and
    // the array factor's skirt near the horizon: computed at 60° +0.062 dB (n = 1) and +0.065 dB
    // (n = 1.3) for this 24 × 24, +0.044 dB for 32 × 32, +0.089 dB for 16 × 16 — it shrinks as the
    // array grows. (24 × 24 keeps the 14 quadratures near 7 s.) The scan-loss page's projected +
    // element parts, by contrast, differ from this directivity drop by (n − 1)·10·log10 cos θ0
    // (−0.90 dB at 60° for n = 1.3): that part is realized gain, checked in the next test.
    it(`n = ${n}: explorer directivity drop D(θ0) − D(0) equals the scan-loss projected-aperture part within 0.1 dB`, () => {
      const broadside = computeArrayExplorer(explorerInputs(n, 0), 'complete').values.directivityDbi!;
      for (const scanDeg of SCANS_DEG) {
        const explorerDrop = computeArrayExplorer(explorerInputs(n, scanDeg), 'complete').values.directivityDbi! - broadside;
        const scanLoss = computeScanLoss(scanLossInputs(n, scanDeg)).values;
        expect(Math.abs(explorerDrop - scanLoss.projectedDb!), `θ0 = ${scanDeg}°`).toBeLessThan(0.1);
      }
    });
    it(`n = ${n}: the power the explorer's model sends toward the beam, relative to broadside, equals the scan-loss projected + element parts (realized gain, no mismatch term) within 0.1 dB`, () => {
      const beamPower = (scanDeg: number) => {
        const model = buildArrayModel(explorerArray(explorerInputs(n, scanDeg)).spec);
        const t = (scanDeg * Math.PI) / 180;
        return patternPowerAtDirections(model, [Math.sin(t)], [0], [Math.cos(t)])[0];
      };
      const broadside = beamPower(0);
      for (const scanDeg of SCANS_DEG) {
        const scanLoss = computeScanLoss(scanLossInputs(n, scanDeg)).values;
        expect(scanLoss.mismatchDb).toBeNull(); // the cosⁿ model has no separate mismatch term
        const explorerDrop = db(beamPower(scanDeg) / broadside);
        expect(Math.abs(explorerDrop - (scanLoss.projectedDb! + scanLoss.elementDb!)), `θ0 = ${scanDeg}°`).toBeLessThan(0.1);
        expect(Math.abs(explorerDrop - scanLoss.totalScanLossDb!), `θ0 = ${scanDeg}°`).toBeLessThan(0.1);
      }
    });
  }
  it('the two pages describe the same array: element count and broadside 4πA/λ²', () => {
    const explorer = computeArrayExplorer(explorerInputs('1.3', 0), 'interactive').values;
    const scanLoss = computeScanLoss(scanLossInputs('1.3', 0)).values;
    expect(explorer.elementCount).toBe(scanLoss.elementCount);
    expect(explorer.filledApertureDirectivityDbi!).toBeCloseTo(scanLoss.directivityBroadsideDbi!, 9);
  });
});
