/**
 * Exports an on-page SVG figure as a standalone SVG or PNG file. Computed colours are inlined so
 * the file looks as it does on the page (in either theme), with a white or dark background.
 */
const STYLE_PROPS = ['fill', 'stroke', 'stroke-width', 'stroke-dasharray', 'font-size', 'font-family', 'font-weight', 'opacity', 'text-anchor', 'dominant-baseline'];

function standaloneSvg(svg: SVGSVGElement): string {
  const clone = svg.cloneNode(true) as SVGSVGElement;
  const source = svg.querySelectorAll('*');
  const target = clone.querySelectorAll('*');
  source.forEach((el, i) => {
    const computed = getComputedStyle(el);
    const style = STYLE_PROPS.map((p) => `${p}:${computed.getPropertyValue(p)}`).join(';');
    (target[i] as SVGElement).setAttribute('style', style);
  });
  clone.setAttribute('xmlns', 'http://www.w3.org/2000/svg');
  const background = getComputedStyle(svg).getPropertyValue('--bg') || '#ffffff';
  const rect = document.createElementNS('http://www.w3.org/2000/svg', 'rect');
  rect.setAttribute('width', '100%');
  rect.setAttribute('height', '100%');
  rect.setAttribute('fill', background.trim() || '#ffffff');
  clone.insertBefore(rect, clone.firstChild);
  return new XMLSerializer().serializeToString(clone);
}

/** Downloads a blob as a file (figures, CSV tables). */
export function downloadBlob(blob: Blob, filename: string) {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = filename;
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

/** Downloads the figure as SVG. */
export function exportSvg(svg: SVGSVGElement, filename: string) {
  downloadBlob(new Blob([standaloneSvg(svg)], { type: 'image/svg+xml' }), `${filename}.svg`);
}

/** Downloads the figure as PNG at 2× the on-page viewBox size. */
export function exportPng(svg: SVGSVGElement, filename: string) {
  const text = standaloneSvg(svg);
  const box = svg.viewBox.baseVal;
  const scale = 2;
  const image = new Image();
  image.onload = () => {
    const canvas = document.createElement('canvas');
    canvas.width = box.width * scale;
    canvas.height = box.height * scale;
    const context = canvas.getContext('2d');
    if (!context) return;
    context.drawImage(image, 0, 0, canvas.width, canvas.height);
    canvas.toBlob((blob) => blob && downloadBlob(blob, `${filename}.png`), 'image/png');
  };
  image.src = `data:image/svg+xml;charset=utf-8,${encodeURIComponent(text)}`;
}
