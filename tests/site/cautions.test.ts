import { describe, expect, it } from 'vitest';
import { calculatorsInNavOrder } from '../../calc/calculators/index';
import { teamConventions } from '../../calc/teamConventions';
import { calculatorCautions, DEFER, RF_EXPOSURE_CAUTION, safetyNoteText, SHARED_CAUTIONS } from '../../site/lib/cautions';

// Every calculator sizes or describes antennas that transmit or go on masts and roofs, so every one
// carries a safety note that defers to regulations and qualified people (common practice, no source).
// Each note comes from its definition in the registry (`safety`), joined with the shared texts here.
const defs = calculatorsInNavOrder(teamConventions);

describe('safety notes', () => {
  for (const def of defs) {
    it(`${def.id} has a safety note with the RF-exposure caution that defers to local regulations and qualified people`, () => {
      const note = safetyNoteText(def.safety);
      expect(note).toContain(RF_EXPOSURE_CAUTION);
      expect(note).toMatch(/local regulations/);
      expect(note).toMatch(/qualified/);
      expect(note.endsWith(DEFER)).toBe(true);
      expect(calculatorCautions[def.id], 'the embed route shows the same note').toBe(note);
    });
  }
  it('joins the lead, the named shared cautions in order and the deferral with single spaces', () => {
    expect(safetyNoteText({ lead: 'Lead.', cautions: ['workAtHeight', 'rfExposure'] })).toBe(
      `Lead. ${SHARED_CAUTIONS.workAtHeight} ${RF_EXPOSURE_CAUTION} ${DEFER}`,
    );
    expect(safetyNoteText({ lead: '', cautions: ['rfExposure'] })).toBe(`${RF_EXPOSURE_CAUTION} ${DEFER}`);
  });
  it('every shared caution text is used by at least one calculator', () => {
    const used = new Set(defs.flatMap((d) => d.safety.cautions));
    expect(Object.keys(SHARED_CAUTIONS).filter((c) => !used.has(c as never))).toEqual([]);
  });
  it('the RF-exposure caution names shared sites, occupational limits, lock-out and pulsed peaks', () => {
    for (const words of [/several transmitters/, /Occupational limits apply only to trained workers/, /lock out every transmitter/, /Pulsed transmitters/]) expect(RF_EXPOSURE_CAUTION).toMatch(words);
  });
  it('no note is listed for a calculator that does not exist', () => {
    expect(Object.keys(calculatorCautions).sort()).toEqual(defs.map((d) => d.id).sort());
  });
});
