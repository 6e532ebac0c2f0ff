/**
 * "Copy as Markdown": a small table of inputs and results plus the link, for design-review
 * notes and chat threads.
 */
import type { CalcResult, CalculatorDef } from '../../calc/calculator';
import { formatOutput } from './format';
import type { FieldStatus } from './calculatorModel';

function cell(text: string): string {
  return text.replace(/\|/g, '\\|').replace(/\n/g, ' ');
}

/** Markdown for the current state. Results that do not apply (null) are left out. */
export function toMarkdown(
  def: CalculatorDef<unknown>,
  fields: Record<string, FieldStatus>,
  result: CalcResult<unknown> | null,
  link: string,
  stale: boolean,
  extra = '',
): string {
  const lines: string[] = [];
  lines.push(`**${def.title}**${stale ? ' (results are stale: an input is invalid)' : ''}`, '');
  lines.push('| Input | Value |', '| --- | --- |');
  for (const spec of def.params) {
    const status = fields[spec.key];
    const shown = status?.ok ? status.parsedDisplay : `invalid: ${status?.message ?? ''}`;
    lines.push(`| ${cell(spec.label)} | ${cell(shown)} |`);
  }
  if (result) {
    lines.push('', '| Result | Value |', '| --- | --- |');
    for (const spec of def.outputs) {
      const value = result.values[spec.key];
      if (value === null || value === undefined) continue;
      const f = formatOutput(spec, value);
      lines.push(`| ${cell(spec.label)} | ${cell(`${f.text}${f.unit ? ` ${f.unit}` : ''}`)} |`);
    }
    if (result.warnings.length) {
      lines.push('');
      for (const w of result.warnings) lines.push(`> ⚠ ${w.message}`);
    }
  }
  if (extra) lines.push('', extra);
  lines.push('', `[Open in Dirigo](${link})`);
  return lines.join('\n');
}
