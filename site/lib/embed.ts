/** Embed routes and the iframe snippet shown under each calculator ("Embed this"). */

/** Site path of a calculator's embed route. */
export function embedPath(calculatorId: string): string {
  return `embed/${calculatorId}/`;
}

/** Escapes a value for an HTML attribute in double quotes. */
function attr(value: string): string {
  return value.replace(/&/g, '&amp;').replace(/"/g, '&quot;').replace(/</g, '&lt;');
}

/**
 * The HTML a reader pastes into another page (wiki, report) to embed a calculator.
 * `url` is the embed URL including the state's query string, which carries the inputs.
 */
export function embedSnippet(url: string, title: string, heightPx = 760): string {
  return `<iframe src="${attr(url)}" title="${attr(`${title} (Dirigo)`)}" width="100%" height="${heightPx}" style="border:1px solid #ccc" loading="lazy"></iframe>`;
}
