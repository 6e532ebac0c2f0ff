/**
 * Safety notes: every calculator has one, because every one of them sizes or describes antennas
 * that transmit or are mounted on masts and roofs. Each definition names its note (`safety`: its
 * own opening sentences and which shared cautions below apply, in order); this file holds the
 * shared texts and joins them. CalculatorPage.astro shows the note above the calculator and the
 * embed route shows the same note, so an embedded copy never loses it.
 * tests/site/cautions.test.ts checks every registered calculator's note.
 */
import type { SafetyNote, SharedCaution } from '../../calc/calculatorListing';
import { calculatorsInNavOrder } from '../../calc/calculators/index';
import { teamConventions } from '../conventions';

/** What every note ends with: the page estimates, people and rules decide. */
export const DEFER =
  'These figures do not replace local regulations, a qualified RF-exposure assessment, or licensed practice for work at height.';

/** The RF-exposure caution for anything that transmits. */
export const RF_EXPOSURE_CAUTION =
  'A transmitting antenna can exceed exposure limits far along its beam and close in front of it. Exposure from several transmitters on a shared mast or rooftop adds up. Occupational limits apply only to trained workers under a safety programme. Switch off and lock out every transmitter on a site, other operators’ included, before anyone climbs or works in front of an antenna. Pulsed transmitters also have limits on peak exposure that this site does not check.';

/** The caution for climbing and rooftop work. */
export const WORK_AT_HEIGHT_CAUTION =
  'Masts, towers and roofs are work at height: use trained people, fall protection and a rescue plan, keep clear of power lines, and check the structure and its wind load before adding an antenna.';

const SUN_CAUTION = 'A dish pointed near the sun focuses sunlight on its feed and can burn it or anyone in front of it.';

/** The text of each shared caution a definition may name. */
export const SHARED_CAUTIONS: Record<SharedCaution, string> = {
  rfExposure: RF_EXPOSURE_CAUTION,
  workAtHeight: WORK_AT_HEIGHT_CAUTION,
  sunOnFeed: SUN_CAUTION,
};

/** A calculator's safety note as shown: its lead, the shared cautions in order, then the deferral. */
export function safetyNoteText(note: SafetyNote): string {
  return [note.lead, ...note.cautions.map((c) => SHARED_CAUTIONS[c]), DEFER].filter((s) => s !== '').join(' ');
}

/** Safety note by calculator id, built from the registry (for the embed route and the tests). */
export const calculatorCautions: Record<string, string> = Object.fromEntries(
  calculatorsInNavOrder(teamConventions).map((def) => [def.id, safetyNoteText(def.safety)]),
);
