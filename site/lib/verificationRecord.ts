/**
 * Data for the Verification record page: every reference case the test suite runs
 * (verification/reference/index.ts), with the value the code computes at build time and pass/fail, and,
 * apart from the pass count, the values transcribed into calc/ from a source
 * (verification/reference/transcribed.ts), which the code cannot check against itself.
 * Pure, so tests/site/verificationRecord.test.ts checks it lists exactly the cases the tests run.
 */
import { caseUnit, runReferenceCase, type ReferenceGroup } from '../../verification/reference/referenceCase';
import { formatTranscribed, type TranscribedGroup } from '../../verification/reference/transcribed';

export interface VerificationRow {
  id: string;
  title: string;
  source: string;
  expected: number;
  tolerance: number;
  unit: string;
  /** Value computed now; null when the computation threw. */
  computed: number | null;
  /** |computed − expected|; null when there is no computed value. */
  error: number | null;
  pass: boolean;
  /** Message when the computation threw. */
  failure: string | null;
}

export interface VerificationGroup {
  topic: string;
  modules: string[];
  rows: VerificationRow[];
}

export interface TranscribedRow {
  id: string;
  title: string;
  source: string;
  /** The value with the decimals its source supports, and its unit. */
  text: string;
}

export interface TranscribedSection {
  topic: string;
  /** Where the values live in calc/ (`file: NAME`). */
  constant: string;
  note: string;
  rows: TranscribedRow[];
}

export interface VerificationRecord {
  groups: VerificationGroup[];
  /** Values transcribed into calc/: listed, never counted in `total` or `passed`. */
  transcribed: TranscribedSection[];
  total: number;
  passed: number;
}

/**
 * Runs every case of every group (a throwing case is recorded as a failure, not a crash) and lists
 * the transcribed values beside them, outside the count.
 */
export function buildVerificationRecord(groups: ReferenceGroup[], transcribed: TranscribedGroup[] = []): VerificationRecord {
  const out: VerificationGroup[] = groups.map((g) => ({
    topic: g.topic,
    modules: g.modules,
    rows: g.cases.map((c) => {
      const base = { id: c.id, title: c.title, source: c.source, expected: c.expected, tolerance: c.tolerance, unit: caseUnit(c) };
      try {
        const outcome = runReferenceCase(c);
        return { ...base, computed: outcome.computed, error: Number.isFinite(outcome.error) ? outcome.error : null, pass: outcome.pass, failure: null };
      } catch (e) {
        return { ...base, computed: null, error: null, pass: false, failure: e instanceof Error ? e.message : String(e) };
      }
    }),
  }));
  const rows = out.flatMap((g) => g.rows);
  const listed = transcribed.map((t) => ({
    topic: t.topic,
    constant: `${t.constant.file}: ${t.constant.name}`,
    note: t.note,
    rows: t.values.map((v) => ({ id: v.id, title: v.title, source: v.source, text: formatTranscribed(v) })),
  }));
  return { groups: out, transcribed: listed, total: rows.length, passed: rows.filter((r) => r.pass).length };
}

const SUPERSCRIPT: Record<string, string> = { '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' };

/** A number for the record: up to 12 significant digits, exponent form for very small or large, true minus sign. */
export function formatRecordNumber(value: number | null): string {
  if (value === null || !Number.isFinite(value)) return '—';
  if (value === 0) return '0';
  const abs = Math.abs(value);
  if (abs < 1e-4 || abs >= 1e9) {
    const [mantissa, exponent] = value.toExponential(3).split('e');
    const sup = [...String(Number(exponent))].map((ch) => SUPERSCRIPT[ch] ?? ch).join('');
    return `${String(Number(mantissa)).replace('-', '−')} × 10${sup}`;
  }
  return String(Number(value.toPrecision(12))).replace('-', '−');
}

/**
 * A computed value for the record, with the digits its tolerance makes meaningful: one decimal
 * below the tolerance's leading digit (a check to ±0.1 shows 2 decimals, not 12 digits), never
 * more than formatRecordNumber shows.
 */
export function formatComputedNumber(value: number | null, tolerance: number): string {
  if (value === null || !Number.isFinite(value) || !(tolerance > 0)) return formatRecordNumber(value);
  const decimals = Math.max(0, Math.ceil(-Math.log10(tolerance)) + 1);
  const full = formatRecordNumber(value);
  if (Math.abs(value) < 1e-4 || Math.abs(value) >= 1e9 || decimals > 12) return full;
  const short = formatRecordNumber(Number(value.toFixed(decimals)));
  return short.length < full.length ? short : full;
}
