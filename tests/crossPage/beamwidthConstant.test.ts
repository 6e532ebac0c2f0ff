import { describe, expect, it } from 'vitest';
import { SPHERE_SQUARE_DEG } from '../../calc/beamSolidAngle';
import { elementBeamwidthDeg } from '../../calc/sizing/lineCandidate';
import { hpbwFromDirectivityDeg } from '../../calc/endFire/stacking';
import { hpbwFromDirectivityFormula } from '../../calc/endFireFormulas';
import { computeEndFireLength, createEndFireLengthCalculator } from '../../calc/calculators/endFireLength';
import { computeArchitectureSizing, createArchitectureSizingCalculator } from '../../calc/calculators/architectureSizing';
import { defaultTexts, validateAll } from '../../components/frame/calculatorModel';
import { teamConventions } from '../../site/conventions';

const inputsOf = (def: Parameters<typeof defaultTexts>[0], over: Record<string, string>) => {
  const { inputs } = validateAll(def, { ...defaultTexts(def), ...over });
  if (!inputs) throw new Error('invalid test inputs');
  return inputs;
};

describe('one beam-area constant across pages (Kraus, Antennas, 2nd ed., §2-13 (section number from memory): D ≈ 41 253/(θ₁θ₂))', () => {
  it('the constant is the sphere in square degrees, 4π(180/π)² = 41 252.96 (hand-worked)', () => {
    expect(SPHERE_SQUARE_DEG).toBeCloseTo(41252.96, 2);
  });
  it('sizing’s element beam and the end-fire page’s beam estimate give the same beamwidth for the same directivity', () => {
    for (const dbi of [-3, 0, 6, 10, 17.3]) {
      const d = 10 ** (dbi / 10);
      expect(elementBeamwidthDeg(dbi)).toBeCloseTo(hpbwFromDirectivityDeg(d), 12);
      expect(hpbwFromDirectivityFormula.evaluate({ directivity: d })).toBeCloseTo(elementBeamwidthDeg(dbi), 12);
    }
  });
  it('the Yagi–Uda in sizing and on the end-fire page: same gain, same beamwidth', () => {
    const sizingDef = createArchitectureSizingCalculator(teamConventions);
    const endFireDef = createEndFireLengthCalculator(teamConventions);
    const sizing = computeArchitectureSizing(inputsOf(sizingDef, { g: '14 dBi', saz: '0 deg' }));
    const boomM = sizing.values.endFireLengthM as number;
    const endFire = computeEndFireLength(inputsOf(endFireDef, { type: 'yagi', solve: 'gain', len: `${boomM} m`, f: '10 GHz' }));
    expect(endFire.values.gainDbi as number).toBeCloseTo(sizing.values.endFireGainDbi as number, 6);
    expect(endFire.values.hpbwDeg as number).toBeCloseTo(sizing.values.endFireHpbwDeg as number, 6);
  });
});
