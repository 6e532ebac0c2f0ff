/**
 * KaTeX settings shared by every build-time maths renderer (the guide's $…$ through rehype-katex,
 * components/astro/Formula.astro, and the tests), and a rehype plugin that turns any KaTeX error
 * into a build failure.
 *
 * rehype-katex 7 never throws: when KaTeX fails it records a message on the file and writes red
 * error markup into the page. `rehypeFailOnKatexError`, placed after it, fails the file instead, so
 * `astro build` stops on a broken formula (an unknown command, a stray control character, or a
 * strict-mode complaint such as Unicode text in maths).
 */
import katex, { type KatexOptions } from 'katex';

/**
 * KaTeX options: MathML beside the HTML (for screen readers), strict mode as errors, and errors
 * thrown rather than rendered (KaTeX docs, "Options": throwOnError, strict).
 */
export const KATEX_OPTIONS = { output: 'htmlAndMathml', throwOnError: true, strict: 'error' } as const satisfies KatexOptions;

interface FileMessage {
  source?: string | null;
  reason: string;
  line?: number | null;
  column?: number | null;
  cause?: unknown;
}
interface HastNode {
  type: string;
  properties?: { className?: unknown };
  children?: HastNode[];
}

function hasKatexErrorMarkup(node: HastNode): boolean {
  const cls = node.properties?.className;
  if (Array.isArray(cls) && cls.includes('katex-error')) return true;
  return (node.children ?? []).some(hasKatexErrorMarkup);
}

/** Describes the KaTeX messages a file collected, one per line. */
export function describeKatexMessages(messages: FileMessage[]): string[] {
  return messages
    .filter((m) => m.source === 'rehype-katex')
    .map((m) => `line ${m.line ?? '?'}:${m.column ?? '?'}: ${m.cause instanceof Error ? m.cause.message : m.reason}`);
}

/** Rehype plugin: fails the file when rehype-katex reported an error or left error markup. */
export function rehypeFailOnKatexError() {
  return (tree: HastNode, file: { path?: string; messages: FileMessage[]; fail: (reason: string) => never }) => {
    const problems = describeKatexMessages(file.messages);
    if (problems.length === 0 && hasKatexErrorMarkup(tree)) problems.push('KaTeX error markup in the output');
    if (problems.length > 0) file.fail(`KaTeX could not render maths in ${file.path ?? 'a Markdown file'}:\n${problems.join('\n')}`);
  };
}

/** Control characters other than tab, newline and carriage return: never legitimate in a source file. */
export const CONTROL_CHARACTER = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]/;

/**
 * Characters a lost backslash leaves in LaTeX held in a JS string: '\theta' is TAB + "heta", '\nu'
 * a newline, '\rho' CR, '\varepsilon' VT, '\frac' FF, '\beta' BS, '\approx' BEL. KaTeX renders some
 * of them without complaint, so formula LaTeX (always a single line) must contain none.
 */
export const LOST_BACKSLASH = /[\u0000-\u001f\u007f]/;

/** Renders a calc/ formula's LaTeX at build time; throws (failing the build) on a KaTeX error or a lost backslash. */
export function renderFormulaLatex(tex: string, displayMode: boolean): string {
  const at = tex.search(LOST_BACKSLASH);
  if (at >= 0) throw new Error(`formula LaTeX has control character U+${tex.charCodeAt(at).toString(16).padStart(4, '0')} at ${at} (a lost backslash?): ${JSON.stringify(tex)}`);
  return katex.renderToString(tex, { ...KATEX_OPTIONS, displayMode });
}
