/** Every calculator and docs page, for the navigation and the home page. */
import { calculatorsInNavOrder } from '../calc/calculators/index';
import { teamConventions } from '../calc/teamConventions';
import { calculatorPagePath } from './lib/formulaReference';

export interface NavEntry {
  path: string;
  title: string;
  summary: string;
}

/** The calculators, in the order and with the label and summary their definitions give (calc/calculators/). */
export const calculators: NavEntry[] = calculatorsInNavOrder(teamConventions).map((def) => ({
  path: calculatorPagePath(def.id),
  title: def.nav.label ?? def.title,
  summary: def.summary,
}));

export const docs: NavEntry[] = [
  { path: 'guide/', title: 'Guide', summary: 'How the team reaches high directivity, part by part, with live calculators preset to worked examples.' },
  { path: 'glossary/', title: 'Glossary', summary: 'The trade terms the calculators use, in our words, following IEEE Std 145 where it defines them.' },
  { path: 'conventions/', title: 'Conventions', summary: 'The team defaults every calculator starts from, and the angle convention.' },
  { path: 'formulas/', title: 'Formula reference', summary: 'Every formula the calculators evaluate: symbols and units, validity, source, and where it is shown.' },
  { path: 'search/', title: 'Search', summary: 'Full-text search over every page, from an index built with the site (works offline).' },
  { path: 'changelog/', title: 'Change log', summary: 'What changed in the handbook and the calculators, newest first.' },
  { path: 'verification/', title: 'Verification record', summary: 'Every check against a published source, with the value the code computed when this site was built.' },
];
