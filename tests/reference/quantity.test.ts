import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { referenceGroups } from '../../verification/reference/index';
import { caseUnit } from '../../verification/reference/referenceCase';
import { hasUnitSuffix, quantityFromName, quantityOfOutput, QUANTITY_UNITS } from '../../verification/reference/quantity';
import { transcribedGroups } from '../../verification/reference/transcribed';
import { calculatorFactories } from '../../calc/calculators/index';
import { teamConventions } from '../../site/conventions';

// Each reference case's unit follows from its quantity, and the quantity must match what compute
// reads: the unit suffix of the calc/ name (the project's naming rule), or, for a formula's worked
// example, the OutputSpec of the calculator output the formula is linked to (tests/calc/formulas.test.ts
// checks that the formula reproduces that output, so the output's kind is the unit of evaluate).

const cases = referenceGroups.flatMap((g) => g.cases);
const calculators = Object.entries(calculatorFactories).map(([id, make]) => ({ id, def: make(teamConventions) }));

describe('reference cases: the unit comes from the quantity checked', () => {
  it('every case reads something and shows the unit of its quantity', () => {
    for (const c of cases) {
      expect(c.reads.length, c.id).toBeGreaterThan(0);
      expect(caseUnit(c), c.id).toBe(QUANTITY_UNITS[c.quantity]);
    }
  });

  for (const c of cases.filter((k) => !k.reads.includes('#'))) {
    it(`${c.id}: reads ${c.reads}, whose name says ${quantityFromName(c.reads)}`, () => {
      expect(c.compute.toString(), `compute of ${c.id} does not mention ${c.reads}`).toMatch(new RegExp(`\\b${c.reads}\\b`));
      expect(c.quantity).toBe(quantityFromName(c.reads));
    });
  }

  for (const c of cases.filter((k) => k.reads.includes('#'))) {
    it(`${c.id}: every calculator output showing the formula holds ${c.quantity}`, () => {
      const formulaId = c.id.replace(/^formula-/, '');
      const links = calculators.flatMap(({ id, def }) =>
        def.formulas.filter((l) => l.formula.id === formulaId).map((l) => ({ at: `${id}#${l.output}`, spec: def.outputs.find((o) => o.key === l.output)! })),
      );
      expect(links.map((l) => l.at)).toContain(c.reads);
      for (const { at, spec } of links) {
        expect(quantityOfOutput(spec), at).toBe(c.quantity);
        // and the output's own name, where it carries a unit, agrees with its OutputSpec kind
        if (hasUnitSuffix(spec.key)) expect(quantityFromName(spec.key), `${at}: name vs kind`).toBe(quantityOfOutput(spec));
      }
    });
  }

  it('the naming rule reads units the way calc/ writes them', () => {
    expect(quantityFromName('roundTripPhaseDeg')).toBe('angleDeg');
    expect(quantityFromName('backplaneRoundTripPhaseRad')).toBe('angleRad');
    expect(quantityFromName('maxGratingFreeSpacingWavelengths')).toBe('lengthWavelengths');
    expect(quantityFromName('apertureDistanceToLimitM')).toBe('lengthM');
    expect(quantityFromName('densityAtRangeWPerM2')).toBe('powerDensityWPerM2');
    expect(quantityFromName('gainDbi')).toBe('dBi');
    expect(quantityFromName('RING_FIRST_SIDELOBE_DB')).toBe('dB');
    expect(quantityFromName('broadeningCosineLaw')).toBe('ratio');
    expect(quantityFromName('elementCount')).toBe('count');
  });

  it('catches the four mislabels the record used to show (degrees as rad, a distance as W/m², wavelengths as m, a ratio as °)', () => {
    const byId = new Map(cases.map((c) => [c.id, c]));
    expect(caseUnit(byId.get('formula-backplane-round-trip-phase')!)).toBe('°');
    expect(caseUnit(byId.get('formula-end-fire-phase-step')!)).toBe('°');
    expect(caseUnit(byId.get('formula-aperture-near-field-density')!)).toBe('m');
    expect(caseUnit(byId.get('formula-grating-free-spacing-rectangular')!)).toBe('λ');
    expect(caseUnit(byId.get('formula-yagi-stacking-distance')!)).toBe('λ');
    expect(caseUnit(byId.get('formula-beam-broadening')!)).toBe('');
    expect(caseUnit(byId.get('formula-ruze-surface-loss')!)).toBe('dB');
  });
});

describe('transcribed values are not reference cases', () => {
  const values = transcribedGroups.flatMap((t) => t.values);

  it('no reference case expects a transcribed value (that would compare the code with itself)', () => {
    for (const c of cases) {
      for (const v of values) {
        const same = c.quantity === v.quantity && Math.abs(c.expected - v.value) <= 1e-9 * Math.max(1, Math.abs(v.value));
        expect(same, `${c.id} expects ${c.expected}, the transcribed ${v.id}`).toBe(false);
      }
    }
  });

  it('no *.cases.ts file reads a transcribed constant', () => {
    const files = readdirSync('verification/reference').filter((f) => f.endsWith('.cases.ts'));
    for (const t of transcribedGroups) {
      for (const f of files) expect(readFileSync(`verification/reference/${f}`, 'utf8').includes(t.constant.name), `${f} reads ${t.constant.name}`).toBe(false);
    }
  });

  it('ids are unique across reference cases and transcribed values, and each names its source', () => {
    const ids = [...cases.map((c) => c.id), ...values.map((v) => v.id)];
    expect(new Set(ids).size).toBe(ids.length);
    for (const v of values) expect(v.source, v.id).toMatch(/transcribed|from memory/);
  });
});
