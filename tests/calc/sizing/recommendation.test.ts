import { describe, expect, it } from 'vitest';
import { runSizing, sizingCandidate, sizingDef } from './runSizing';
import fc from 'fast-check';
import { CANDIDATE_OUTPUT_KEYS, createArchitectureSizingCalculator, computeArchitectureSizing } from '../../../calc/calculators/architectureSizing';
import { chooseCandidate, RECOMMENDATION_RULE } from '../../../calc/sizing/chooseCandidate';
import { requirementReasons } from '../../../calc/sizing/candidateChecks';
import { computeReflector } from '../../../calc/calculators/reflector';
import { freeSpaceWavelengthM } from '../../../calc/wavelength';
import { teamConventions } from '../../../site/conventions';
import type { Candidate } from '../../../calc/sizing/candidate';

const def = sizingDef;
const run = runSizing;
const candidate = sizingCandidate;
const codes = (c: Candidate) => c.flags.map((f) => f.code);

describe('the recommendation rule is data: fits, reasons, smallest footprint', () => {
  it('fits is true exactly when there are no reasons; the chosen one fits and has the smallest footprint of those that fit', () => {
    const cases: Record<string, string>[] = [{}, { g: '20 dBi' }, { req: 'hpbw', bw: '5 deg', saz: '0 deg', uaz: 'yes' }, { g: '34 dBi', sel: '20 deg', maxsize: '1.5 m' }];
    for (const over of cases) {
      const { candidates, chosenId } = run(over).data;
      for (const c of candidates) expect(c.fits, c.id).toBe(c.flags.length === 0);
      const fitting = candidates.filter((c) => c.fits);
      const chosen = candidates.find((c) => c.id === chosenId);
      if (fitting.length === 0) expect(chosen).toBeUndefined();
      else {
        expect(chosen!.fits).toBe(true);
        for (const c of fitting) expect(chosen!.footprintM2).toBeLessThanOrEqual(c.footprintM2);
      }
    }
  });
  it('chooseCandidate picks nothing when nothing fits, and the rule is stated in the assumptions', () => {
    const { candidates } = run({}).data;
    expect(chooseCandidate(candidates.map((c) => ({ ...c, fits: false })))).toBeNull();
    expect(def.assumptions.join(' ')).toContain(RECOMMENDATION_RULE);
    expect(run({}).data.recommendationRule).toBe(RECOMMENDATION_RULE);
  });
  it('never recommends a candidate that fails a stated requirement or limit (property, fast-check)', () => {
    fc.assert(
      fc.property(
        fc.constantFrom('gain', 'hpbw'),
        fc.double({ min: 12, max: 36, noNaN: true }),
        fc.double({ min: 2, max: 30, noNaN: true }),
        fc.integer({ min: 0, max: 60 }),
        fc.integer({ min: 0, max: 40 }),
        fc.constantFrom('yes', 'no'),
        fc.constantFrom('', '0.5 m', '2 m'),
        (req, g, bw, saz, sel, uaz, maxsize) => {
          const r = run({ req, g: `${g} dBi`, bw: `${bw} deg`, saz: `${saz} deg`, sel: `${sel} deg`, uaz, maxsize });
          const chosen = r.data.candidates.find((c) => c.id === r.data.chosenId);
          if (!chosen) return;
          if (req === 'gain') expect(chosen.gainEdgeDbi).toBeGreaterThanOrEqual(g - 1e-6);
          else expect(Math.max(chosen.hpbwBroadsideDeg[0]!, chosen.hpbwBroadsideDeg[1]!)).toBeLessThanOrEqual(bw * (1 + 1e-6));
          if (chosen.firstSidelobeDb !== null) expect(chosen.firstSidelobeDb).toBeLessThanOrEqual(-13);
          if (maxsize) expect(chosen.sizeM).toBeLessThanOrEqual(parseFloat(maxsize));
          if (uaz === 'yes') expect(chosen.hpbwEdgeDeg!).toBeLessThanOrEqual(chosen.hpbwBroadsideDeg[0]! * 1.1 + 1e-9);
          if (sel > 0) expect(chosen.id).not.toBe('linearArray');
        },
      ),
      { numRuns: 20 },
    );
  });
});

describe('coverage means the same for every candidate, and every flag applies to every candidate its numbers trip', () => {
  it('before: a 5° beam with a uniform beam required recommended an 18.8 dBi ring (−7.9 dB sidelobes) over a 30 dBi dish; now the ring is flagged on its sidelobes and not chosen', () => {
    const r = run({ req: 'hpbw', bw: '5 deg', saz: '0 deg', uaz: 'yes' });
    const ring = r.data.candidates.find((c) => c.id === 'ringArray')!;
    expect(codes(ring)).toContain('sidelobes-above-requirement');
    expect(ring.firstSidelobeDb!).toBeGreaterThan(-9);
    expect(r.data.chosenId).not.toBe('ringArray');
    expect(r.data.chosenId).not.toBe('yArray');
  });
  it('with no sidelobe requirement stated (empty field) the ring is judged on the rest alone', () => {
    expect(codes(candidate({ req: 'hpbw', bw: '5 deg', saz: '0 deg', uaz: 'yes', sll: '' }, 'ringArray'))).not.toContain('sidelobes-above-requirement');
  });
  it('a ring scanned to the corner broadens like the planar face (≈ 1/cos θc), and a uniform-beam need flags both; the dish keeps its beam', () => {
    const over = { g: '24 dBi', saz: '45 deg', uaz: 'yes', sll: '' };
    const ring = candidate(over, 'ringArray');
    const planar = candidate(over, 'planarArray');
    const dish = candidate(over, 'reflector');
    expect(ring.hpbwEdgeDeg! / ring.hpbwBroadsideDeg[0]!).toBeCloseTo(1 / Math.cos(Math.PI / 4), 1);
    expect(codes(ring)).toContain('beam-broadens-with-scan');
    expect(codes(planar)).toContain('beam-broadens-with-scan');
    expect(codes(dish)).not.toContain('beam-broadens-with-scan');
  });
  it('a small scan (±10°, ×1.015) does not trip the uniform-beam check for any candidate', () => {
    for (const c of run({ g: '24 dBi', saz: '10 deg', uaz: 'yes' }).data.candidates) expect(codes(c), c.id).not.toContain('beam-broadens-with-scan');
  });
  it('the shared checks read only the numbers: a candidate with no half-power beamwidth cannot pass a beamwidth requirement', () => {
    const c = run({ req: 'hpbw', bw: '10 deg' }).data.candidates[0];
    const requirement = run({ req: 'hpbw', bw: '10 deg' }).data.requirement;
    expect(requirementReasons({ ...c, hpbwBroadsideDeg: [null, null] }, requirement).map((r) => r.code)).toContain('no-half-power-beamwidth');
  });
});

describe('every place a candidate’s number appears carries its flag', () => {
  it('before: the 10 λ Yagi–Uda for 30 dBi appeared in the results unflagged; now a caution names endFireLengthM', () => {
    const r = run({ g: '30 dBi' });
    const yagi = r.data.candidates.find((c) => c.id === 'endFire')!;
    expect(yagi.fits).toBe(false);
    const w = r.warnings.find((x) => x.code === 'candidate-does-not-fit-endFire')!;
    expect(w.outputs).toEqual(expect.arrayContaining(['endFireLengthM', 'endFireGainDbi', 'endFireHpbwDeg']));
    expect(w.message).toMatch(/impractical/);
  });
  it('each output key of a candidate that does not fit is named by a warning, and no fitting candidate’s keys are', () => {
    const cases: Record<string, string>[] = [{}, { g: '30 dBi', sel: '20 deg' }, { req: 'hpbw', bw: '25 deg' }];
    for (const over of cases) {
      const r = run(over);
      const flaggedKeys = new Set(r.warnings.filter((w) => w.code.startsWith('candidate-does-not-fit')).flatMap((w) => w.outputs ?? []));
      for (const c of r.data.candidates) for (const key of CANDIDATE_OUTPUT_KEYS[c.id]) expect(flaggedKeys.has(key), `${c.id} ${key}`).toBe(!c.fits);
    }
  });
  it('every output key belongs to the def', () => {
    const keys = new Set(def.outputs.map((o) => o.key));
    for (const list of Object.values(CANDIDATE_OUTPUT_KEYS)) for (const key of list) expect(keys.has(key), key).toBe(true);
  });
});

describe('reflector sized for a beamwidth by root-finding on its pattern', () => {
  // Before: D = k·λ/HPBW with k from a 100 λ dish gave beams 0.5 % (20°) to 21.5 % (100°) wider than required.
  it.each([3, 20, 25, 40, 60, 80, 100])('a %s° requirement: the reflector calculator at the sized diameter gives that HPBW (relative 1e-6)', (bw) => {
    const c = candidate({ req: 'hpbw', bw: `${bw} deg`, saz: '0 deg' }, 'reflector');
    const r = computeReflector({ frequencyHz: 10e9, solveFor: 'gain', diameterM: c.sizeM, targetGainDbi: 0, focalRatio: 0.4, feedSpec: 'taper', edgeTaperDb: -10, powerExponent: 2, rmsSurfaceErrorM: 0, blockageDiameterM: 0, strutBlockedFraction: 0, otherLossDb: 0, offsetSpec: 'length', feedOffsetM: 0, beamTiltBeamwidths: 1, feedCount: 1 });
    expect((r.values.hpbwDeg as number) / bw - 1).toBeLessThan(1e-6);
    expect(Math.abs((r.values.hpbwDeg as number) / bw - 1)).toBeLessThan(1e-6);
  });
  it('dishes under 10 λ are flagged outside the model and not recommended (20° and 25° were recommended before)', () => {
    for (const bw of [20, 25]) {
      const r = run({ req: 'hpbw', bw: `${bw} deg`, saz: '0 deg' });
      const dish = r.data.candidates.find((c) => c.id === 'reflector')!;
      expect(dish.sizeM / freeSpaceWavelengthM(10e9)).toBeLessThan(10);
      expect(codes(dish)).toContain('small-dish');
      expect(r.data.chosenId).not.toBe('reflector');
    }
    expect(codes(candidate({ req: 'hpbw', bw: '3 deg' }, 'reflector'))).not.toContain('small-dish');
  });
});

describe('element power pattern exponent below 1', () => {
  it('before: n = 0.5 gave +1.5 dB “element loss” at 60° silently; now an outside-validity warning names the bound n ≥ 1 and the array outputs', () => {
    const r = run({ nexp: '0.5', saz: '60 deg' });
    const w = r.warnings.find((x) => x.code === 'element-exponent-below-one')!;
    expect(w.severity).toBe('outside-validity');
    expect(w.message).toContain('n ≥ 1');
    expect(w.message).toContain('1.51 dB'); // 10·(0.5 − 1)·log10(cos 60°) = +1.505 dB, hand-worked
    expect(w.outputs).toEqual(expect.arrayContaining(['planarScanLossDb', 'planarGainEdgeDbi']));
    expect(run({ nexp: '1', saz: '60 deg' }).warnings.map((x) => x.code)).not.toContain('element-exponent-below-one');
  });
  it('the field is labelled as the power pattern exponent (teamConventions.elementPowerExponent)', () => {
    const field = def.params.find((p) => p.key === 'nexp')!;
    expect(field.label).toBe('Element power pattern cosⁿθ, n');
    expect(field.defaultText).toBe(String(teamConventions.elementPowerExponent));
  });
});
