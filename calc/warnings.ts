/**
 * Structured warnings returned beside results. calc/ never formats numbers into prose for
 * display beyond the message; the frame shows each warning next to the output it names.
 */
export type WarningSeverity = 'note' | 'caution' | 'outside-validity';

export interface CalcWarning {
  /** Stable identifier, e.g. 'grating-lobe-visible'. */
  code: string;
  severity: WarningSeverity;
  /** One sentence for an engineer. */
  message: string;
  /** Output keys this warning applies to (empty: the whole calculation). */
  outputs?: string[];
}

/** Builds a warning object. */
export function warning(code: string, severity: WarningSeverity, message: string, outputs: string[] = []): CalcWarning {
  return { code, severity, message, outputs };
}
