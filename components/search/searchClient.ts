/**
 * Loads the Pagefind index that the build writes to <base>pagefind/ and runs searches. Only the
 * site's own origin is contacted: the module URL is built from the base path at runtime.
 */

/** One result as the search page shows it. */
export interface SearchHit {
  url: string;
  title: string;
  /** Excerpt HTML from the index: escaped page text with <mark> around matches. */
  excerptHtml: string;
}

/** The part of Pagefind's browser API we use. */
interface PagefindModule {
  options(o: { baseUrl?: string; excerptLength?: number }): Promise<void>;
  init(): Promise<void>;
  search(term: string): Promise<{ results: { id: string; data(): Promise<PagefindData> }[] } | null>;
}
interface PagefindData {
  url: string;
  excerpt: string;
  meta: Record<string, string | undefined>;
}

/** URL of the Pagefind module under the site's base path (e.g. /rf/pagefind/pagefind.js). */
export function pagefindModuleUrl(baseUrl: string): string {
  return `${baseUrl.replace(/\/+$/, '')}/pagefind/pagefind.js`;
}

/** Turns Pagefind's result data into a hit; the title falls back to the URL. */
export function toHit(data: PagefindData): SearchHit {
  return { url: data.url, title: data.meta.title?.trim() || data.url, excerptHtml: data.excerpt };
}

let loading: Promise<PagefindModule> | null = null;

/** Loads and initialises Pagefind once per page. */
export function loadPagefind(baseUrl: string): Promise<PagefindModule> {
  loading ??= (async () => {
    const module = (await import(/* @vite-ignore */ pagefindModuleUrl(baseUrl))) as PagefindModule;
    await module.options({ baseUrl: baseUrl.endsWith('/') ? baseUrl : `${baseUrl}/`, excerptLength: 24 });
    await module.init();
    return module;
  })();
  loading.catch(() => {
    loading = null;
  });
  return loading;
}

/** Searches and returns up to `limit` hits, best first. */
export async function searchSite(baseUrl: string, term: string, limit = 12): Promise<SearchHit[]> {
  if (!term.trim()) return [];
  const pagefind = await loadPagefind(baseUrl);
  const found = await pagefind.search(term);
  if (!found) return [];
  const data = await Promise.all(found.results.slice(0, limit).map((r) => r.data()));
  return data.map(toHit);
}
