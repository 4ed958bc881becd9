/** A line chart drawn with pdfkit's vector operators: axes, ticks, one polyline per series, a legend. */
import { pdfText, type PacketFonts } from './pdf-fonts.ts';

export interface ChartSeries {
  name: string;
  color: string;
  points: { x: number; y: number | null }[];
}

export interface ChartSpec {
  title: string;
  xLabel: string;
  yLabel: string;
  series: ChartSeries[];
  height?: number;
}

const TICKS = 5;

/** Rounded tick values covering [lo, hi]. */
export function niceTicks(lo: number, hi: number, count = TICKS): number[] {
  if (!Number.isFinite(lo) || !Number.isFinite(hi)) return [0, 1];
  if (hi - lo < 1e-9) {
    lo -= 1;
    hi += 1;
  }
  const raw = (hi - lo) / count;
  const mag = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 2.5, 5, 10].map((k) => k * mag).find((s) => s >= raw) ?? 10 * mag;
  const start = Math.floor(lo / step) * step;
  const out: number[] = [];
  for (let v = start; v <= hi + step * 1e-6; v += step) out.push(Math.round(v * 1e6) / 1e6);
  if (out[out.length - 1]! < hi) out.push(out[out.length - 1]! + step);
  return out;
}

export function drawChart(doc: PDFKit.PDFDocument, fonts: PacketFonts, spec: ChartSpec): void {
  const height = spec.height ?? 170;
  const left = doc.page.margins.left;
  const width = doc.page.width - left - doc.page.margins.right;
  if (doc.y + height + 40 > doc.page.height - doc.page.margins.bottom) doc.addPage();
  doc.font(fonts.bold).fontSize(10).fillColor('#1f2a37').text(pdfText(spec.title), left, doc.y);
  const top = doc.y + 6;
  const plot = { x: left + 42, y: top, w: width - 52, h: height - 36 };
  const all = spec.series.flatMap((s) => s.points);
  const xs = all.map((p) => p.x);
  const ys = all.map((p) => p.y).filter((y): y is number => y !== null && Number.isFinite(y));
  const xt = niceTicks(Math.min(...xs), Math.max(...xs));
  const yt = niceTicks(ys.length ? Math.min(...ys) : 0, ys.length ? Math.max(...ys) : 1);
  const [x0, x1, y0, y1] = [xt[0]!, xt[xt.length - 1]!, yt[0]!, yt[yt.length - 1]!];
  const px = (x: number) => plot.x + ((x - x0) / (x1 - x0)) * plot.w;
  const py = (y: number) => plot.y + plot.h - ((y - y0) / (y1 - y0)) * plot.h;

  doc.font(fonts.regular).fontSize(7).fillColor('#5b6775');
  doc.save().lineWidth(0.4).strokeColor('#d5dbe3');
  for (const t of yt) doc.moveTo(plot.x, py(t)).lineTo(plot.x + plot.w, py(t)).stroke();
  for (const t of xt) doc.moveTo(px(t), plot.y).lineTo(px(t), plot.y + plot.h).stroke();
  doc.restore();
  for (const t of yt) doc.text(String(t), plot.x - 40, py(t) - 3, { width: 36, align: 'right' });
  for (const t of xt) doc.text(String(t), px(t) - 20, plot.y + plot.h + 3, { width: 40, align: 'center' });
  doc.text(pdfText(spec.xLabel), plot.x, plot.y + plot.h + 13, { width: plot.w, align: 'center' });
  doc.save().rotate(-90, { origin: [left + 4, plot.y + plot.h / 2] });
  doc.text(pdfText(spec.yLabel), left + 4 - plot.h / 2, plot.y + plot.h / 2 - 4, { width: plot.h, align: 'center' });
  doc.restore();

  for (const s of spec.series) {
    const pts = s.points.filter((p) => p.y !== null && Number.isFinite(p.y));
    if (pts.length === 0) continue;
    doc.save().lineWidth(1.4).strokeColor(s.color);
    pts.forEach((p, i) => (i === 0 ? doc.moveTo(px(p.x), py(p.y!)) : doc.lineTo(px(p.x), py(p.y!))));
    doc.stroke();
    for (const p of pts) doc.circle(px(p.x), py(p.y!), 1.6).fill(s.color);
    doc.restore();
  }
  let lx = plot.x;
  const ly = plot.y + plot.h + 25;
  for (const s of spec.series) {
    doc.save().rect(lx, ly + 2, 10, 3).fill(s.color).restore();
    doc.fillColor('#1f2a37').text(pdfText(s.name), lx + 14, ly, { lineBreak: false });
    lx += 14 + doc.widthOfString(pdfText(s.name)) + 16;
  }
  doc.x = left;
  doc.y = ly + 16;
}
