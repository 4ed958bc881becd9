/**
 * Saves a chart as SVG or PNG. SVG charts are serialised with their computed presentation inlined where it
 * matters (font, colours are set as attributes by the charts); canvas charts go straight to PNG. A chart made of
 * a canvas under an SVG overlay is composited onto one canvas for PNG, and embedded as an image for SVG.
 */
import { downloadBlob } from './download-blob';

export type ChartFormat = 'svg' | 'png';

const SVG_NS = 'http://www.w3.org/2000/svg';

/** The chart's SVG as a standalone document string; canvases inside the container become <image> layers. */
export function chartSvgString(container: HTMLElement): string {
  const svg = container.querySelector('svg');
  // Hidden canvases (a chart drawn as SVG this time) stay out of the saved file.
  const canvases = Array.from(container.querySelectorAll('canvas')).filter((c) => c.style.display !== 'none');
  const width = svg?.viewBox.baseVal?.width || svg?.clientWidth || canvases[0]?.width || 600;
  const height = svg?.viewBox.baseVal?.height || svg?.clientHeight || canvases[0]?.height || 400;
  const out = document.createElementNS(SVG_NS, 'svg');
  out.setAttribute('xmlns', SVG_NS);
  out.setAttribute('width', String(width));
  out.setAttribute('height', String(height));
  out.setAttribute('viewBox', `0 0 ${width} ${height}`);
  out.setAttribute('font-family', "'Work Sans', system-ui, sans-serif");
  const bg = document.createElementNS(SVG_NS, 'rect');
  bg.setAttribute('width', '100%');
  bg.setAttribute('height', '100%');
  bg.setAttribute('fill', '#ffffff');
  out.appendChild(bg);
  for (const c of canvases) {
    const img = document.createElementNS(SVG_NS, 'image');
    img.setAttribute('href', c.toDataURL('image/png'));
    img.setAttribute('x', c.dataset.x ?? '0');
    img.setAttribute('y', c.dataset.y ?? '0');
    img.setAttribute('width', String(c.clientWidth || c.width));
    img.setAttribute('height', String(c.clientHeight || c.height));
    out.appendChild(img);
  }
  if (svg) for (const child of Array.from(svg.childNodes)) out.appendChild(child.cloneNode(true));
  return new XMLSerializer().serializeToString(out);
}

async function svgToPng(svgText: string, width: number, height: number, scale = 2): Promise<Blob> {
  const img = new Image();
  const url = URL.createObjectURL(new Blob([svgText], { type: 'image/svg+xml' }));
  try {
    await new Promise<void>((resolve, reject) => {
      img.onload = () => resolve();
      img.onerror = () => reject(new Error('the chart could not be drawn as an image'));
      img.src = url;
    });
    const canvas = document.createElement('canvas');
    canvas.width = width * scale;
    canvas.height = height * scale;
    const g = canvas.getContext('2d');
    if (!g) throw new Error('this browser cannot draw images');
    g.scale(scale, scale);
    g.drawImage(img, 0, 0, width, height);
    return await new Promise<Blob>((resolve, reject) =>
      canvas.toBlob((b) => (b ? resolve(b) : reject(new Error('PNG encoding failed'))), 'image/png'),
    );
  } finally {
    URL.revokeObjectURL(url);
  }
}

/** Saves what `container` draws under `baseName.svg` or `baseName.png`. */
export async function saveChart(container: HTMLElement, baseName: string, format: ChartFormat): Promise<void> {
  const text = chartSvgString(container);
  const safe = baseName.replace(/[^\w.-]+/g, '-').replace(/^-+|-+$/g, '') || 'chart';
  if (format === 'svg') {
    downloadBlob(new Blob([text], { type: 'image/svg+xml' }), `${safe}.svg`);
    return;
  }
  const m = /width="(\d+(?:\.\d+)?)" height="(\d+(?:\.\d+)?)"/.exec(text);
  const png = await svgToPng(text, Number(m?.[1] ?? 600), Number(m?.[2] ?? 400));
  downloadBlob(png, `${safe}.png`);
}
