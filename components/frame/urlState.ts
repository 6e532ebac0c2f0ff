/**
 * Calculator state in the URL query string: readable keys with units (?v=1&f=10GHz&scan=45deg),
 * a schema version key `v`, and field-by-field fallback with a visible notice for anything
 * unknown, invalid, or from another version. Decoding never throws.
 */
import type { CalculatorDef } from '../../calc/calculator';
import { canonicalToFieldText } from './format';
import { defaultTexts, validateAll, type FieldTexts } from './calculatorModel';

export const VERSION_KEY = 'v';

export interface DecodedState {
  texts: FieldTexts;
  notices: string[];
  /** True when the query carried any calculator state at all. */
  fromLink: boolean;
}

function labelOf(def: CalculatorDef<unknown>, key: string): string {
  return def.params.find((p) => p.key === key)?.label ?? key;
}

/** Reads a query string (with or without '?') into field texts plus notices. */
export function decodeState(def: CalculatorDef<unknown>, search: string): DecodedState {
  const texts = defaultTexts(def);
  const notices: string[] = [];
  let params: URLSearchParams;
  try {
    params = new URLSearchParams(search.startsWith('?') ? search.slice(1) : search);
  } catch {
    return { texts, notices: ['The link could not be read; defaults are shown.'], fromLink: false };
  }
  const keys = [...new Set([...params.keys()])];
  if (keys.length === 0) return { texts, notices, fromLink: false };

  let query: Record<string, string> = {};
  for (const key of keys) query[key] = params.get(key) ?? '';

  const versionText = query[VERSION_KEY];
  delete query[VERSION_KEY];
  let version = def.schemaVersion;
  if (versionText === undefined) {
    notices.push(`The link has no version (v); it was read as version ${def.schemaVersion}.`);
  } else if (!/^\d+$/.test(versionText) || Number(versionText) < 1) {
    notices.push(`The link's version "${versionText}" is not valid; it was read as version ${def.schemaVersion}.`);
  } else {
    version = Number(versionText);
  }
  if (version > def.schemaVersion) {
    notices.push(`The link was made by a newer version (v${version}) of this calculator; fields this version knows were read, others ignored.`);
  } else if (version < def.schemaVersion) {
    for (let from = version; from < def.schemaVersion; from++) {
      const migrate = def.migrations[from];
      if (migrate) {
        try {
          query = migrate({ ...query });
        } catch {
          notices.push(`Part of the version ${from} link could not be upgraded.`);
        }
      }
    }
    notices.push(`The link was made with version ${version} and was upgraded to version ${def.schemaVersion}.`);
  }

  const known = new Set(def.params.map((p) => p.key));
  for (const key of Object.keys(query)) {
    if (!known.has(key)) notices.push(`Unknown setting "${key}" in the link was ignored.`);
  }
  for (const spec of def.params) {
    if (query[spec.key] !== undefined) texts[spec.key] = canonicalToFieldText(query[spec.key].slice(0, 200));
  }
  // Field-by-field fallback: an invalid value returns to its default, with a notice.
  const { fields } = validateAll(def, texts);
  for (const spec of def.params) {
    const status = fields[spec.key];
    if (query[spec.key] !== undefined && !status.ok) {
      notices.push(`${spec.label}: "${query[spec.key].slice(0, 40)}" from the link is not usable (${status.message}) The default was used.`);
      texts[spec.key] = spec.defaultText;
    }
  }
  // A fallback can invalidate a dependent field (a λ-relative length); settle once more.
  const settled = validateAll(def, texts).fields;
  for (const spec of def.params) {
    if (!settled[spec.key].ok) {
      notices.push(`${labelOf(def, spec.key)} was reset to its default.`);
      texts[spec.key] = spec.defaultText;
    }
  }
  return { texts, notices, fromLink: true };
}

/**
 * Writes field texts as a query string: version first, then every field in spec order with its
 * canonical text (units included). Empty fields are omitted unless their default is non-empty.
 * Invalid fields are written as typed, so a shared link shows the same problem.
 */
export function encodeState(def: CalculatorDef<unknown>, texts: FieldTexts): string {
  const { fields } = validateAll(def, texts);
  const params = new URLSearchParams();
  params.set(VERSION_KEY, String(def.schemaVersion));
  for (const spec of def.params) {
    const status = fields[spec.key];
    const text = status.ok ? status.canonical : (texts[spec.key] ?? '').trim();
    if (text === '' && spec.defaultText === '') continue;
    params.set(spec.key, text);
  }
  return `?${params.toString()}`;
}
