import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { createArchitectureSizingCalculator, computeArchitectureSizing } from '../../../calc/calculators/architectureSizing';
import { computeReflector } from '../../../calc/calculators/reflector';
import { computeScanLoss } from '../../../calc/calculators/scanLoss';
import { apertureGainDbi } from '../../../calc/aperture/index';
import { freeSpaceWavelengthM } from '../../../calc/wavelength';
import { maxGratingFreeSpacingWavelengths } from '../../../calc/gratingLobeLimit';
import { defaultTexts, validateAll } from '../../../components/frame/calculatorModel';
import { teamConventions } from '../../../site/conventions';
import { RING_FIRST_SIDELOBE_DB } from '../../../calc/sizing/ringCandidates';

const def = createArchitectureSizingCalculator(teamConventions);
const inputsOf = (over: Record<string, string> = {}) => {
  const { inputs } = validateAll(def, { ...defaultTexts(def), ...over });
  if (!inputs) throw new Error('invalid test inputs');
  return inputs;
};
const candidate = (over: Record<string, string>, id: string) => computeArchitectureSizing(inputsOf(over)).data.candidates.find((c) => c.id === id)!;

describe('architecture sizing round-trips with each architecture’s own calculator', () => {
  it('reflector: size → gain with the reflector module’s gain formula → the required gain (η from the conventions)', () => {
    const c = candidate({ g: '42 dBi', saz: '0 deg' }, 'reflector');
    expect(apertureGainDbi(teamConventions.efficiencies.reflectorAperture, c.sizeM, freeSpaceWavelengthM(10e9))).toBeCloseTo(42, 9);
  });
  it('reflector: its HPBW equals the reflector calculator’s at that diameter (−10 dB taper, f/D 0.4)', () => {
    const c = candidate({ g: '38 dBi' }, 'reflector');
    const r = computeReflector({ frequencyHz: 10e9, solveFor: 'gain', diameterM: c.sizeM, targetGainDbi: 0, focalRatio: 0.4, feedSpec: 'taper', edgeTaperDb: -10, powerExponent: 2, rmsSurfaceErrorM: 0, blockageDiameterM: 0, strutBlockedFraction: 0, otherLossDb: 0, offsetSpec: 'length', feedOffsetM: 0, beamTiltBeamwidths: 1, feedCount: 1 });
    expect(c.hpbwBroadsideDeg[0]).toBeCloseTo(r.values.hpbwDeg as number, 9);
  });
  it('planar array: the scan-loss calculator, given the sized width, returns the required gain at the scan edge', () => {
    const c = candidate({ g: '33 dBi', saz: '50 deg', lat: 'rectangular' }, 'planarArray');
    const widthM = (c.outline as { widthM: number }).widthM;
    expect(c.sizeM).toBeCloseTo(widthM * Math.SQRT2, 12); // the largest dimension is the diagonal
    const scan = computeScanLoss({ frequencyHz: 10e9, spacingM: c.spacingM!, lattice: 'rectangular', sizeBy: 'width', apertureWidthM: widthM, elementCount: 4, scanMaxDeg: 50, elementModel: 'cosine', cosineExponent: teamConventions.elementPowerExponent, radiationEfficiency: teamConventions.efficiencies.arrayRadiation, targetGainDbi: null });
    expect(scan.values.gainEdgeDbi).toBeCloseTo(33, 9);
  });
  it('planar array: spacing is the grating-lobe limit at the highest frequency less the team margin (Mailloux §2.1 (section number from memory))', () => {
    const c = candidate({ f: '9 GHz', fhi: '11 GHz', saz: '45 deg', lat: 'triangular' }, 'planarArray');
    expect(c.spacingM).toBeCloseTo(maxGratingFreeSpacingWavelengths(45, 'triangular') * freeSpaceWavelengthM(11e9) * (1 - teamConventions.spacingMarginFraction), 12);
  });
  it('linear array: the face L × h (4πLh/λ², Balanis 4th ed. ch. 12 (chapter number from memory)) reaches the requirement with N elements and misses it with N − 1', () => {
    const c = candidate({ g: '25 dBi', saz: '30 deg' }, 'linearArray');
    expect(c.gainEdgeDbi).toBeGreaterThanOrEqual(25);
    expect(c.gainEdgeDbi - 10 * Math.log10(c.elementCount! / (c.elementCount! - 1))).toBeLessThan(25);
  });
  it('ring: continuous-ring first sidelobe 20·log10|J0(3.8317)| = −7.90 dB (Balanis 4th ed. §6.10 (section number from memory))', () => {
    expect(RING_FIRST_SIDELOBE_DB).toBeCloseTo(-7.9, 1);
  });
  it('ring and Y are sized by the engine when small, and reach the requirement', () => {
    const ring = candidate({ g: '20 dBi', saz: '0 deg', uaz: 'yes', sll: '' }, 'ringArray');
    expect(ring.gainEdgeDbi).toBeGreaterThanOrEqual(20);
    expect(ring.flags).toEqual([]);
    expect(ring.fits).toBe(true);
    const y = candidate({ g: '20 dBi', saz: '0 deg', uaz: 'yes' }, 'yArray');
    expect(y.gainEdgeDbi).toBeGreaterThanOrEqual(20);
  });
});

describe('flags and the recommendation', () => {
  it('a size limit flags the candidates that exceed it, and the recommendation respects it', () => {
    const r = computeArchitectureSizing(inputsOf({ g: '34 dBi', maxsize: '0.5 m' }));
    for (const c of r.data.candidates) if (c.sizeM > 0.5) expect(c.flags.map((f) => f.message).join(' ')).toMatch(/size limit/);
    const chosen = r.data.candidates.find((c) => c.id === r.data.chosenId);
    if (chosen) expect(chosen.sizeM).toBeLessThanOrEqual(0.5);
  });
  it('elevation scan flags the linear array; a uniform-beam need flags the planar array', () => {
    expect(candidate({ sel: '20 deg' }, 'linearArray').flags.map((f) => f.code)).toContain('one-plane-scan');
    expect(candidate({ uaz: 'yes', saz: '45 deg' }, 'planarArray').flags.map((f) => f.code)).toContain('beam-broadens-with-scan');
  });
  it('nothing fits under impossible limits: a caution says so', () => {
    const r = computeArchitectureSizing(inputsOf({ g: '40 dBi', maxsize: '1 cm' }));
    expect(r.data.chosenId).toBeNull();
    expect(r.warnings.map((w) => w.code)).toContain('nothing-fits');
  });
});

describe('bigger requirements never give smaller antennas (property, fast-check)', () => {
  it('more gain → every architecture at least as large', () => {
    fc.assert(
      fc.property(fc.double({ min: 10, max: 30, noNaN: true }), fc.double({ min: 0.5, max: 6, noNaN: true }), fc.integer({ min: 0, max: 60 }), (g, extra, scan) => {
        const a = computeArchitectureSizing(inputsOf({ g: `${g} dBi`, saz: `${scan} deg` })).data.candidates;
        const b = computeArchitectureSizing(inputsOf({ g: `${g + extra} dBi`, saz: `${scan} deg` })).data.candidates;
        for (const ca of a) {
          const cb = b.find((c) => c.id === ca.id)!;
          expect(cb.sizeM, ca.id).toBeGreaterThanOrEqual(ca.sizeM * (1 - 1e-9));
          for (const v of [cb.sizeM, cb.footprintM2, cb.gainEdgeDbi]) expect(Number.isFinite(v)).toBe(true);
        }
      }),
      { numRuns: 25 },
    );
  });
  it('narrower beamwidth → reflector and planar array at least as large', () => {
    fc.assert(
      fc.property(fc.double({ min: 2, max: 20, noNaN: true }), fc.double({ min: 1.05, max: 2, noNaN: true }), (bw, k) => {
        const a = computeArchitectureSizing(inputsOf({ req: 'hpbw', bw: `${bw} deg`, saz: '0 deg' })).data.candidates;
        const b = computeArchitectureSizing(inputsOf({ req: 'hpbw', bw: `${bw / k} deg`, saz: '0 deg' })).data.candidates;
        for (const id of ['reflector', 'planarArray', 'linearArray']) {
          expect(b.find((c) => c.id === id)!.sizeM).toBeGreaterThanOrEqual(a.find((c) => c.id === id)!.sizeM * (1 - 1e-9));
        }
      }),
      { numRuns: 20 },
    );
  });
});

describe('end-fire (Yagi–Uda) candidate', () => {
  it('round-trips with the end-fire module: the boom it picks gives the required gain (NBS TN 688 table, values from memory)', async () => {
    const { yagiGainDbd } = await import('../../../calc/endFire/yagiGain');
    const c = candidate({ g: '14 dBi', saz: '0 deg' }, 'endFire');
    expect(c.flags).toEqual([]);
    const boom = c.sizeM / freeSpaceWavelengthM(10e9);
    expect(yagiGainDbd(boom).gainDbd + 2.15).toBeCloseTo(14, 9);
  });
  it('is flagged impractical past the longest published boom', () => {
    expect(candidate({ g: '17.5 dBi' }, 'endFire').flags.map((f) => f.message).join(' ')).toMatch(/impractical/);
    expect(candidate({ g: '30 dBi' }, 'endFire').flags.map((f) => f.message).join(' ')).toMatch(/impractical/);
  });
});

describe('any valid input gives finite numbers, never an exception (property, fast-check)', () => {
  it('over the whole range of every field, including 80 dBi at ±85° (which needs more elements than a beam can be computed for)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 6, max: 12, noNaN: true }),
        fc.constantFrom('gain', 'hpbw'),
        fc.double({ min: 0, max: 80, noNaN: true }),
        fc.double({ min: 0.01, max: 120, noNaN: true }),
        fc.double({ min: 0, max: 85, noNaN: true }),
        fc.double({ min: 0, max: 85, noNaN: true }),
        fc.double({ min: 0.5, max: 10, noNaN: true }),
        fc.double({ min: -5, max: 20, noNaN: true }),
        fc.constantFrom('rectangular', 'triangular'),
        (logF, req, g, bw, saz, sel, nexp, ge, lat) => {
          const r = computeArchitectureSizing(inputsOf({ f: `${10 ** logF} Hz`, req, g: `${g} dBi`, bw: `${bw} deg`, saz: `${saz} deg`, sel: `${sel} deg`, uaz: 'yes', nexp: String(nexp), ge: `${ge} dBi`, lat }));
          for (const [key, v] of Object.entries(r.values)) if (v !== null) expect(Number.isFinite(v), key).toBe(true);
          for (const c of r.data.candidates) for (const v of [c.sizeM, c.footprintM2, c.depthM, c.gainBroadsideDbi, c.gainEdgeDbi]) expect(Number.isFinite(v), c.id).toBe(true);
        },
      ),
      { numRuns: 30, seed: 7 },
    );
    const extreme = computeArchitectureSizing(inputsOf({ f: '1 MHz', g: '80 dBi', saz: '85 deg', nexp: '10' }));
    expect(extreme.data.candidates.find((c) => c.id === 'linearArray')!.flags.map((f) => f.code)).toContain('line-too-long');
  });
});
