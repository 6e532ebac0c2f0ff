/**
 * Upgrade of array pattern explorer links from schema version 1 to version 2.
 *
 * Version 1 had the element exponent `q` of a **field** pattern cos^q θ (default 1, a cos²θ power
 * pattern) and the isotropic element as the default. Version 2 names the element by the exponent
 * n of its **power** pattern cosⁿθ (key `nexp`, as on the scan-loss page; default the team's
 * element) and starts from the team's cosine element. A version-1 link keeps meaning the same
 * antenna: n = 2·q (q absent: the old default 1, so n = 2), and a link without `el` gets
 * `el=isotropic`, the old default. `q` is not reused: in a version-2 link it is an unknown key.
 */

/** Version-1 default of the field exponent q. */
const V1_DEFAULT_FIELD_EXPONENT = 1;

/** Field exponent m → power exponent n = 2m, as text; a text that is not a plain number passes through unchanged (the frame then reports it). */
function powerExponentText(fieldText: string): string {
  const trimmed = fieldText.trim();
  const value = Number(trimmed);
  if (trimmed === '' || !Number.isFinite(value)) return fieldText;
  return String(Number((2 * value).toPrecision(15)));
}

/** migrations[1]: a version-1 explorer query (key → text) as the version-2 query of the same antenna. */
export function explorerQueryV1toV2(query: Record<string, string>): Record<string, string> {
  const { q, ...rest } = query;
  const upgraded: Record<string, string> = { ...rest, nexp: q === undefined ? String(2 * V1_DEFAULT_FIELD_EXPONENT) : powerExponentText(q) };
  if (upgraded.el === undefined) upgraded.el = 'isotropic';
  return upgraded;
}
