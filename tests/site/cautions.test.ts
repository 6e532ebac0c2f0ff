import { describe, expect, it } from 'vitest';
import { calculatorFactories } from '../../calc/calculators/index';
import { calculatorCautions, RF_EXPOSURE_CAUTION } from '../../site/lib/cautions';

// Every calculator sizes or describes antennas that transmit or go on masts and roofs, so every one
// carries a safety note that defers to regulations and qualified people (common practice, no source).
describe('safety notes', () => {
  for (const id of Object.keys(calculatorFactories)) {
    it(`${id} has a safety note with the RF-exposure caution that defers to local regulations and qualified people`, () => {
      const note = calculatorCautions[id];
      expect(note).toBeTruthy();
      expect(note).toContain(RF_EXPOSURE_CAUTION);
      expect(note).toMatch(/local regulations/);
      expect(note).toMatch(/qualified/);
    });
  }
  it('the RF-exposure caution names shared sites, occupational limits, lock-out and pulsed peaks', () => {
    for (const words of [/several transmitters/, /Occupational limits apply only to trained workers/, /lock out every transmitter/, /Pulsed transmitters/]) expect(RF_EXPOSURE_CAUTION).toMatch(words);
  });
  it('no note is listed for a calculator that does not exist', () => {
    expect(Object.keys(calculatorCautions).filter((id) => !(id in calculatorFactories))).toEqual([]);
  });
});
