/**
 * Reactive state of one calculator island (Svelte 5 runes). Logic lives in calculatorModel.ts
 * and urlState.ts; this module wires it to $state/$derived and to the page URL.
 */
import type { CalcResult, CalculatorDef } from '../../calc/calculator';
import { defaultTexts, evaluate, type Evaluation, type FieldTexts } from './calculatorModel';
import { decodeState, encodeState } from './urlState';
import { debounce } from './debounce';

export interface CalculatorState<Data> {
  readonly def: CalculatorDef<Data>;
  readonly texts: FieldTexts;
  readonly evaluation: Evaluation<Data>;
  readonly notices: string[];
  /** Absolute link to the current state ('' before the page has loaded in a browser). */
  readonly link: string;
  /** Query string of the current state. */
  readonly query: string;
  setText(key: string, text: string): void;
  dismissNotices(): void;
  /** Reads the page URL, then keeps it updated (debounced replaceState). Returns a cleanup. */
  connectToUrl(): () => void;
  /** For a copy not bound to the page URL (e.g. in a guide page): links point at this page instead. */
  linkTo(pageUrl: string): void;
}

/** Creates the state, seeded with defaults (so the server-rendered HTML shows default results). */
export function createCalculatorState<Data>(def: CalculatorDef<Data>, initialQuery = ''): CalculatorState<Data> {
  const initial = initialQuery ? decodeState(def as CalculatorDef<unknown>, initialQuery) : null;
  const texts = $state<FieldTexts>(initial?.texts ?? defaultTexts(def as CalculatorDef<unknown>));
  let notices = $state<string[]>(initial?.notices ?? []);
  let pageBase = $state('');
  let lastGood: CalcResult<Data> | null = null;

  const evaluation = $derived.by(() => {
    const result = evaluate(def, texts, lastGood);
    if (!result.stale && result.result) lastGood = result.result;
    return result;
  });
  const query = $derived(encodeState(def as CalculatorDef<unknown>, texts));
  const link = $derived(pageBase ? `${pageBase}${query}` : '');

  return {
    def,
    get texts() {
      return texts;
    },
    get evaluation() {
      return evaluation;
    },
    get notices() {
      return notices;
    },
    get link() {
      return link;
    },
    get query() {
      return query;
    },
    setText(key: string, text: string) {
      texts[key] = text;
    },
    dismissNotices() {
      notices = [];
    },
    linkTo(pageUrl: string) {
      pageBase = pageUrl;
    },
    connectToUrl() {
      pageBase = `${location.origin}${location.pathname}`;
      if (location.search) {
        const decoded = decodeState(def as CalculatorDef<unknown>, location.search);
        for (const [key, text] of Object.entries(decoded.texts)) texts[key] = text;
        notices = decoded.notices;
      }
      const write = debounce((q: string) => {
        try {
          history.replaceState(history.state, '', `${location.pathname}${q}${location.hash}`);
        } catch {
          // a sandboxed frame may refuse; the link control still works
        }
      }, 250);
      const stop = $effect.root(() => {
        $effect(() => {
          write(query);
        });
      });
      return () => {
        write.flush();
        stop();
      };
    },
  };
}
