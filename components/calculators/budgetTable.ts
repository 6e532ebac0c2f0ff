/** Rows of the link-budget table, formatted for the page and for Markdown (pure, tested). */
import type { BudgetLine, BudgetUnit, LinkBudgetData } from '../../calc/calculators/linkBudget';
import { formatQuantity } from '../frame/format';

export interface BudgetRow {
  id: string;
  label: string;
  /** The line's value as it enters the sum, signed, with its unit ("−1.00 dB"); empty for a subtotal. */
  value: string;
  /** The running total after the line, with its unit. */
  total: string;
  subtotal: boolean;
}

/** The table's column headings, shared by the page and the Markdown. */
export const BUDGET_COLUMNS = ['Line', 'Value', 'Running total'] as const;

const UNIT_TEXT: Record<BudgetUnit, string> = {
  dBW: 'dBW',
  dB: 'dB',
  dBi: 'dBi',
  'dB(K)': 'dBK',
  'dBW/K': 'dBW/K',
  'dBW/(K·Hz)': 'dBW/(K·Hz)',
  'dB·Hz': 'dB·Hz',
  'dB(Hz)': 'dBHz',
};

/** A decibel figure to 0.01 dB with a sign on terms ("+28.00 dBi", "−1.00 dB"). */
function decibels(value: number, unit: BudgetUnit, signed: boolean): string {
  const text = formatQuantity(value, 'decibel', 4).text;
  const sign = signed && value >= 0 && !/^0\.00$/.test(text) ? '+' : '';
  return `${sign}${text} ${UNIT_TEXT[unit]}`;
}

export function budgetRows(data: LinkBudgetData): BudgetRow[] {
  return data.lines.map((line: BudgetLine) => ({
    id: line.id,
    label: line.label,
    value: line.subtotal ? '' : decibels(line.valueDb, line.unit, true),
    total: decibels(line.totalDb, line.totalUnit, false),
    subtotal: line.subtotal,
  }));
}

const cell = (text: string) => text.replace(/\|/g, '\\|');

/** The whole budget as a Markdown table, subtotals in bold, for design-review notes. */
export function budgetMarkdown(rows: BudgetRow[]): string {
  const lines = ['Link budget', '', `| ${BUDGET_COLUMNS.join(' | ')} |`, '| --- | ---: | ---: |'];
  for (const r of rows) {
    const label = r.subtotal ? `**${r.label}**` : r.label;
    const total = r.subtotal ? `**${r.total}**` : r.total;
    lines.push(`| ${[label, r.value, total].map(cell).join(' | ')} |`);
  }
  return lines.join('\n');
}

/**
 * Query for the range & exposure page carrying this transmitter: the power delivered to the
 * antenna and the gain that with it gives the budget's EIRP, at the same frequency.
 */
export function exposureQuery(data: LinkBudgetData): string {
  return `?v=1&f=${data.frequencyHz}Hz&pt=${+data.exposurePowerW.toPrecision(6)}W&gt=${data.exposureGainDbi.toFixed(2)}dBi`;
}
