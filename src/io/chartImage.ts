// Chart images for export: a chart's SVG element serialised as a standalone SVG file (computed
// colours inlined so it looks the same outside the page), and a PNG drawn from it on a canvas.
// Browser only (DOM, canvas); nothing is sent anywhere.

const STYLE_PROPS = [
  'fill',
  'stroke',
  'stroke-width',
  'stroke-dasharray',
  'opacity',
  'font-size',
  'font-family',
  'text-anchor',
  'dominant-baseline',
];

/** Standalone SVG text of an element, with the computed presentation styles written inline. */
export function svgTextOf(svg: SVGSVGElement): string {
  const clone = svg.cloneNode(true) as SVGSVGElement;
  const src = [svg, ...Array.from(svg.querySelectorAll('*'))];
  const dst = [clone, ...Array.from(clone.querySelectorAll('*'))];
  src.forEach((el, i) => {
    const cs = getComputedStyle(el);
    const target = dst[i];
    if (!target) return;
    const inline = STYLE_PROPS.map((p) => `${p}:${cs.getPropertyValue(p)}`).join(';');
    target.setAttribute('style', `${inline};${target.getAttribute('style') ?? ''}`);
  });
  const { width, height } = svg.getBoundingClientRect();
  // No namespace attribute is set by hand: the clone is an SVG-namespace element, so
  // XMLSerializer writes its namespace declaration itself.
  if (!clone.getAttribute('width')) clone.setAttribute('width', String(Math.round(width)));
  if (!clone.getAttribute('height')) clone.setAttribute('height', String(Math.round(height)));
  return `<?xml version="1.0" encoding="UTF-8"?>\n${new XMLSerializer().serializeToString(clone)}\n`;
}

/** PNG of an SVG element at `scale` × its on-screen size, on the given background colour. */
export async function pngBlobOf(
  svg: SVGSVGElement,
  scale = 2,
  background = '#ffffff',
): Promise<Blob> {
  const text = svgTextOf(svg);
  const { width, height } = svg.getBoundingClientRect();
  const url = URL.createObjectURL(new Blob([text], { type: 'image/svg+xml' }));
  try {
    const img = new Image();
    await new Promise<void>((resolve, reject) => {
      img.onload = () => resolve();
      img.onerror = () => reject(new Error('the chart could not be drawn as an image'));
      img.src = url;
    });
    const canvas = document.createElement('canvas');
    canvas.width = Math.max(1, Math.round(width * scale));
    canvas.height = Math.max(1, Math.round(height * scale));
    const ctx = canvas.getContext('2d');
    if (!ctx) throw new Error('no 2-D canvas available');
    ctx.fillStyle = background;
    ctx.fillRect(0, 0, canvas.width, canvas.height);
    ctx.drawImage(img, 0, 0, canvas.width, canvas.height);
    return await new Promise<Blob>((resolve, reject) =>
      canvas.toBlob(
        (b) => (b ? resolve(b) : reject(new Error('PNG encoding failed'))),
        'image/png',
      ),
    );
  } finally {
    URL.revokeObjectURL(url);
  }
}
