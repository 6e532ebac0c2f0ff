/**
 * The frame's logic, free of Svelte: validate every field of a calculator against its spec,
 * compute when all fields are valid, and keep the last good result (marked stale) otherwise.
 * Svelte state in calculatorState.svelte.ts only wraps these functions.
 */
import type { CalcInputs, CalcResult, CalculatorDef, NumberParamSpec, ParamSpec } from '../../calc/calculator';
import { freeSpaceWavelengthM } from '../../calc/wavelength';
import { CalcInputError } from '../../calc/errors';
import { formatQuantity } from './format';
import { exampleFor, parseQuantity } from './quantity';

export type FieldTexts = Record<string, string>;

export type FieldStatus =
  | { ok: true; value: number | string | null; canonical: string; parsedDisplay: string; note?: string }
  | { ok: false; message: string };

export interface Evaluation<Data> {
  fields: Record<string, FieldStatus>;
  /** The result to show: the current one, or the last good one when `stale`. */
  result: CalcResult<Data> | null;
  stale: boolean;
  /** A calculation-level error (e.g. a combination of inputs calc/ rejects). */
  error: string | null;
}

/** Default texts of every field. */
export function defaultTexts(def: CalculatorDef<unknown>): FieldTexts {
  return Object.fromEntries(def.params.map((p) => [p.key, p.defaultText]));
}

function isNumberSpec(spec: ParamSpec): spec is NumberParamSpec {
  return spec.kind !== 'choice';
}

function rangeText(spec: NumberParamSpec): string {
  const kind = spec.kind;
  if (kind === 'levelBelowPeak') return `from ${formatQuantity(spec.min, kind, 4).text} to ${formatQuantity(spec.max, kind, 4).text} dB (${-spec.max} to ${-spec.min} dB below the peak)`;
  const format = (x: number) => {
    const f = formatQuantity(x, kind, 4);
    return `${f.text}${f.unit ? ` ${f.unit}` : ''}`;
  };
  return `${spec.minExclusive ? 'above' : 'from'} ${format(spec.min)} to ${format(spec.max)}`;
}

/** Wavelength for λ-relative lengths: from the calculator's frequency fields. */
function referenceWavelengthM(frequencies: number[], mode: 'design' | 'highest'): number | undefined {
  if (frequencies.length === 0) return undefined;
  const f = mode === 'highest' ? Math.max(...frequencies) : frequencies[0];
  return f > 0 && Number.isFinite(f) ? freeSpaceWavelengthM(f) : undefined;
}

/** Validates one field's text against its spec. Never throws. */
export function validateField(spec: ParamSpec, text: string, frequenciesHz: number[] = []): FieldStatus {
  const trimmed = (text ?? '').trim();
  if (!isNumberSpec(spec)) {
    const option = spec.options.find((o) => o.value === trimmed);
    if (!option) return { ok: false, message: `Choose one of: ${spec.options.map((o) => o.label).join(', ')}.` };
    return { ok: true, value: option.value, canonical: option.value, parsedDisplay: option.label };
  }
  if (trimmed === '') {
    if (spec.optional) return { ok: true, value: null, canonical: '', parsedDisplay: 'not set' };
    return { ok: false, message: `Enter a value, e.g. ${exampleFor(spec.kind)}.` };
  }
  const wavelengthM = spec.wavelengthFrom ? referenceWavelengthM(frequenciesHz, spec.wavelengthFrom) : undefined;
  const parsed = parseQuantity(trimmed, spec.kind, { wavelengthM });
  if (!parsed.ok) {
    if (/wavelengths needs/.test(parsed.message) && !spec.wavelengthFrom) {
      return { ok: false, message: 'This field does not take wavelengths; give a length such as 1.2 m.' };
    }
    return parsed;
  }
  const value = parsed.value;
  const belowMin = spec.minExclusive ? value <= spec.min : value < spec.min;
  if (belowMin || value > spec.max) {
    return { ok: false, message: `Out of range: expected a value ${rangeText(spec)}.` };
  }
  const shown = formatQuantity(value, spec.kind, 6);
  const parsedDisplay = spec.kind === 'levelBelowPeak'
    ? `${shown.text} dB, ${formatQuantity(-value, 'number', 6).text} dB below the peak`
    : `${shown.text}${shown.unit ? ` ${shown.unit}` : ''}`;
  return parsed.note ? { ok: true, value, canonical: parsed.canonical, parsedDisplay, note: parsed.note } : { ok: true, value, canonical: parsed.canonical, parsedDisplay };
}

/** Validates every field; frequency fields first, so λ-relative lengths can use them. */
export function validateAll(def: CalculatorDef<unknown>, texts: FieldTexts): { fields: Record<string, FieldStatus>; inputs: CalcInputs | null } {
  const fields: Record<string, FieldStatus> = {};
  const frequencies: number[] = [];
  for (const spec of def.params) {
    if (spec.kind !== 'frequency') continue;
    const status = validateField(spec, texts[spec.key] ?? '');
    fields[spec.key] = status;
    if (status.ok && typeof status.value === 'number') frequencies.push(status.value);
  }
  for (const spec of def.params) {
    if (spec.kind === 'frequency') continue;
    fields[spec.key] = validateField(spec, texts[spec.key] ?? '', frequencies);
  }
  const allOk = def.params.every((spec) => fields[spec.key].ok);
  if (!allOk) return { fields, inputs: null };
  const inputs: CalcInputs = {};
  for (const spec of def.params) {
    const status = fields[spec.key];
    if (status.ok) inputs[spec.name] = status.value;
  }
  return { fields, inputs };
}

/**
 * Runs compute, rejecting any non-finite output so NaN and Infinity never reach the page. A
 * CalcInputError also reports the parameter it names and its message without that prefix.
 */
export function safeCompute<Data>(
  def: CalculatorDef<Data>,
  inputs: CalcInputs,
): { ok: true; result: CalcResult<Data> } | { ok: false; message: string; parameter?: string; detail?: string } {
  try {
    const result = def.compute(inputs);
    for (const [key, value] of Object.entries(result.values)) {
      if (value !== null && !Number.isFinite(value)) {
        return { ok: false, message: `These inputs give no finite value for "${key}"; adjust them.` };
      }
    }
    return { ok: true, result };
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    if (error instanceof CalcInputError) {
      const prefix = `${error.parameter}: `;
      const detail = message.startsWith(prefix) ? message.slice(prefix.length) : message;
      return { ok: false, message: `Cannot compute with these inputs: ${message}`, parameter: error.parameter, detail };
    }
    return { ok: false, message: `Cannot compute with these inputs: ${message}` };
  }
}

/**
 * Full evaluation for the current texts. `previous` is the last good result; it is shown,
 * marked stale, while any field is invalid or the computation fails.
 */
export function evaluate<Data>(def: CalculatorDef<Data>, texts: FieldTexts, previous: CalcResult<Data> | null): Evaluation<Data> {
  const { fields, inputs } = validateAll(def as CalculatorDef<unknown>, texts);
  if (!inputs) return { fields, result: previous, stale: true, error: null };
  const computed = safeCompute(def, inputs);
  if (!computed.ok) {
    // Every field passed on its own, but calc/ rejects the combination: when it names one of the
    // inputs, mark that field with the reason (e.g. a blockage wider than the dish).
    const spec = computed.parameter ? def.params.find((p) => p.name === computed.parameter) : undefined;
    if (!spec || !computed.detail) return { fields, result: previous, stale: true, error: computed.message };
    const message = `Not possible with the other inputs: ${computed.detail}.`;
    return { fields: { ...fields, [spec.key]: { ok: false, message } }, result: previous, stale: true, error: `${spec.label}: ${computed.detail}.` };
  }
  return { fields, result: computed.result, stale: false, error: null };
}

/**
 * Why a field is not read with the current choices (its spec's `usedWhen`), e.g.
 * 'Solve for is “Gain (diameter given)”'; null when it is used. Fields keep their text and are
 * still validated, so a link restores them and switching the choice back needs no retyping.
 */
export function unusedReason(def: CalculatorDef<unknown>, spec: ParamSpec, texts: FieldTexts): string | null {
  if (!spec.usedWhen) return null;
  const choice = def.params.find((p) => p.key === spec.usedWhen!.key);
  const current = (texts[spec.usedWhen.key] ?? '').trim();
  if (!choice || choice.kind !== 'choice' || spec.usedWhen.values.includes(current)) return null;
  const option = choice.options.find((o) => o.value === current);
  return option ? `${choice.label} is “${option.label}”` : null;
}
