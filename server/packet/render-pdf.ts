/**
 * The review packet as a PDF, drawn with pdfkit from PacketData (the same object the printable page shows).
 * Every page carries the study's identity (name, id, engine version, date) and "page i of n".
 */
import PDFDocument from 'pdfkit';
import type { PacketData } from '../services/packet-service.ts';
import { LIMIT_LABELS, type LimitKey } from '../../shared/targets/sheet.ts';
import { designLabel } from '../../shared/trade/design-label.ts';
import { drawChart } from './pdf-chart.ts';
import { pdfText, registerPacketFonts, type PacketFonts } from './pdf-fonts.ts';
import { drawTable } from './pdf-table.ts';
import { COST_COLUMNS, costComparison } from '../../shared/trade/cost-comparison.ts';

const MARGIN = { top: 64, bottom: 56, left: 50, right: 50 };
// Our palette (src/styles/theme.ts): ink, teal, rust.
const INK = '#123f45';
const MUTED = '#5b6775';
const ACCENT = '#1d7a74';
const CHART_COLORS = ['#1d7a74', '#c4553a'];

const num = (v: unknown, digits = 1) => (typeof v === 'number' && Number.isFinite(v) ? v.toFixed(digits) : '—');
const day = (iso: string) => iso.slice(0, 10);
const stamp = (iso: string) => `${iso.slice(0, 10)} ${iso.slice(11, 16)} UTC`;

function heading(doc: PDFKit.PDFDocument, f: PacketFonts, text: string): void {
  if (doc.y > doc.page.height - MARGIN.bottom - 80) doc.addPage();
  doc.moveDown(0.6).font(f.bold).fontSize(13).fillColor(ACCENT).text(pdfText(text), MARGIN.left);
  doc.moveDown(0.3).font(f.regular).fontSize(9.5).fillColor(INK);
}

function para(doc: PDFKit.PDFDocument, f: PacketFonts, text: string, opts: { bold?: boolean; color?: string } = {}): void {
  doc.font(opts.bold ? f.bold : f.regular).fontSize(9.5).fillColor(opts.color ?? INK).text(pdfText(text), MARGIN.left, doc.y, {
    width: doc.page.width - MARGIN.left - MARGIN.right,
  });
  doc.moveDown(0.4);
}

function identity(data: PacketData, name = data.study.name): string {
  return `${name} · study ${data.study.id} · engine ${data.engineVersion} · ${day(data.generatedAt)}`;
}

/** The identity line shortened (the study name only, never the id) until it fits on one line of `width`. */
function fittedIdentity(doc: PDFKit.PDFDocument, data: PacketData, width: number, prefix = ''): string {
  let name = data.study.name;
  let line = pdfText(prefix + identity(data, name));
  while (doc.widthOfString(line) > width && name.length > 1) {
    name = name.slice(0, -1).trimEnd();
    line = pdfText(prefix + identity(data, `${name}…`));
  }
  return line;
}

/** Header and footer on every buffered page; the bottom margin is lifted so the footer does not add a page. */
function stampPages(doc: PDFKit.PDFDocument, f: PacketFonts, data: PacketData): void {
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    const width = doc.page.width - MARGIN.left - MARGIN.right;
    const bottom = doc.page.margins.bottom;
    doc.page.margins.bottom = 0;
    doc.font(f.regular).fontSize(7.5).fillColor(MUTED);
    doc.text(fittedIdentity(doc, data, width, 'Lobewise review packet · '), MARGIN.left, 28, { width, lineBreak: false });
    doc.save().lineWidth(0.5).strokeColor('#d5dbe3').moveTo(MARGIN.left, 42).lineTo(MARGIN.left + width, 42).stroke().restore();
    const y = doc.page.height - 36;
    doc.text(fittedIdentity(doc, data, width - 80), MARGIN.left, y, { width: width - 80, lineBreak: false });
    doc.text(`Page ${i - range.start + 1} of ${range.count}`, MARGIN.left + width - 80, y, { width: 80, align: 'right', lineBreak: false });
    doc.page.margins.bottom = bottom;
  }
}

function targetSheet(doc: PDFKit.PDFDocument, f: PacketFonts, data: PacketData): void {
  heading(doc, f, 'Target sheet');
  const sheet = data.targetSheet;
  if (!sheet || sheet.limits.length === 0) return para(doc, f, 'No target sheet limits are set for this study.');
  if (sheet.name) para(doc, f, sheet.name + (sheet.preset ? ` (from preset ${sheet.preset})` : ''), { bold: true });
  if (sheet.judgedDecision) para(doc, f, 'The sheet the signed decision was judged against, as it was when signed.', { color: MUTED });
  drawTable(doc, f, [{ title: 'Limit', width: 3 }, { title: 'Required', width: 2 }], sheet.limits.map((l) => [l.label, l.value]));
}

const RANK_COLUMNS = [
  { title: '#', width: 0.5 },
  { title: 'Design', width: 3 },
  { title: 'Verdict', width: 0.9 },
  { title: 'Channels', width: 1.3, align: 'right' as const },
  { title: 'Aperture (mm)', width: 1.5, align: 'right' as const },
  { title: 'Peak EIRP (dBm)', width: 1.3, align: 'right' as const },
  { title: 'Edge EIRP (dBm)', width: 1.3, align: 'right' as const },
  { title: 'Scan loss edge (dB)', width: 1.3, align: 'right' as const },
  { title: 'Worst SLL (dB)', width: 1.2, align: 'right' as const },
];

function figureCells(r: { verdict: string; figures: PacketData['ranked'][number]['figures'] }): string[] {
  return [
    r.verdict,
    num(r.figures.channels, 0),
    `${num(r.figures.apertureXMm)} × ${num(r.figures.apertureYMm)}`,
    num(r.figures.peakEirpDbm),
    num(r.figures.edgeEirpDbm),
    num(r.figures.scanLossEdgeDb, 2),
    num(r.figures.worstSllDb),
  ];
}

function subheading(doc: PDFKit.PDFDocument, f: PacketFonts, text: string): void {
  if (doc.y > doc.page.height - MARGIN.bottom - 60) doc.addPage();
  doc.moveDown(0.2);
  para(doc, f, text, { bold: true });
}

function ranked(doc: PDFKit.PDFDocument, f: PacketFonts, data: PacketData): void {
  heading(doc, f, 'Ranked designs');
  para(doc, f, `Passing designs first, then by: ${data.rankObjective}. Figures are worst cases over each design's scan.`, { color: MUTED });
  subheading(doc, f, 'Candidates');
  if (data.ranked.length === 0) para(doc, f, 'The study has no candidates yet.');
  else drawTable(doc, f, RANK_COLUMNS, data.ranked.map((r) => [String(r.rank), r.label, ...figureCells(r)]));
  subheading(doc, f, 'Sweep designs');
  const s = data.sweepRanked;
  if (!s) return para(doc, f, 'The study has no finished sweep yet.');
  para(doc, f, s.summary, { color: MUTED });
  para(doc, f, `Worst cases of each sweep design are taken over ${s.basis}.`, { color: MUTED });
  if (s.rows.length === 0) return;
  // Each label carries the sweep's long name, so the design column takes a larger share here.
  const cols = RANK_COLUMNS.map((c) => (c.title === 'Design' ? { ...c, width: 5.2 } : c.title === 'Verdict' ? { ...c, width: 1.1 } : c));
  drawTable(doc, f, cols, s.rows.map((r) => [String(r.rank), `${r.label}\n${r.parameters}`, ...figureCells(r)]), 8);
}

function decision(doc: PDFKit.PDFDocument, f: PacketFonts, data: PacketData): void {
  heading(doc, f, 'Decision');
  const d = data.decision;
  if (!d) return para(doc, f, 'No decision has been signed for this study yet.');
  para(doc, f, `Chosen design: ${d.label}`, { bold: true });
  para(doc, f, `Parameters: ${designLabel(d.design, { frequency: true })}`);
  if (d.metrics.basis) para(doc, f, `Its figures are worst cases over ${d.metrics.basis}.`, { color: MUTED });
  const check = d.check;
  if (check && d.targetSheet) {
    const rows = Object.entries(check.limits).map(([key, c]) => [
      LIMIT_LABELS[key as LimitKey] ?? key,
      c.pass === null ? 'n/a' : c.pass ? 'pass' : 'FAIL',
    ]);
    para(doc, f, `Against the target sheet${d.targetSheet.name ? ` "${d.targetSheet.name}"` : ''}: ${check.failed.length === 0 ? 'meets every limit.' : `fails ${check.failed.length} limit${check.failed.length === 1 ? '' : 's'}.`}`);
    if (rows.length) drawTable(doc, f, [{ title: 'Limit', width: 4 }, { title: 'Result', width: 1 }], rows);
  }
  if (d.justification) {
    para(doc, f, 'Why it was signed off although it fails limits', { bold: true });
    para(doc, f, d.justification);
  }
  para(doc, f, `Signed by ${d.decidedBy.name} on ${stamp(d.signedAt ?? d.createdAt)} with engine ${d.engineVersion}.${d.supersedesId ? ` Supersedes decision ${d.supersedesId}.` : ''}`, { color: MUTED });
  para(doc, f, 'Rationale', { bold: true });
  para(doc, f, d.rationale);
  if (d.alternatives.length > 0) {
    para(doc, f, 'Alternatives considered', { bold: true });
    drawTable(doc, f, [{ title: 'Alternative', width: 2 }, { title: 'Why not chosen', width: 4 }], d.alternatives.map((a) => [a.label, a.reason]));
  }
}

/** Cost, DC power and heat of the ranked sweep designs beside edge EIRP, the signed one marked. */
function costs(doc: PDFKit.PDFDocument, f: PacketFonts, data: PacketData): void {
  const c = costComparison(data.sweepRanked, data.decision?.source ?? null);
  if (c.rows.length === 0) return;
  heading(doc, f, 'Cost and power: the chosen design and the alternatives');
  if (!c.priced) return para(doc, f, 'The study has no cost model, so its designs carry no cost, DC power or heat figures.');
  para(doc, f, 'Priced with the study\'s cost model (its own inputs, not quotes). DC power is the average draw over the transmit duty cycle; heat is per cm² of the module outline.', { color: MUTED });
  drawTable(doc, f, COST_COLUMNS, c.rows, 8);
}

function charts(doc: PDFKit.PDFDocument, f: PacketFonts, data: PacketData): void {
  const c = data.chart;
  if (!c || c.points.length === 0) return;
  heading(doc, f, 'Key charts: the chosen design across its scan');
  const x = (p: { angleDeg: number }) => Math.round(p.angleDeg * 1000) / 1000;
  const axis = c.axis === 'az' ? 'azimuth' : 'elevation';
  // The scan-plane width is what moves with scan; the other plane (often element-limited) would flatten it.
  drawChart(doc, f, {
    title: `HPBW in ${axis} vs scan angle`,
    xLabel: `Scan angle in ${axis} (°)`,
    yLabel: 'HPBW (°)',
    series: [
      { name: `HPBW ${c.axis}`, color: CHART_COLORS[0]!, points: c.points.map((p) => ({ x: x(p), y: c.axis === 'az' ? p.hpbwAzDeg : p.hpbwElDeg })) },
    ],
  });
  drawChart(doc, f, {
    title: 'Scan loss vs scan angle',
    xLabel: `Scan angle in ${axis} (°)`,
    yLabel: 'Scan loss (dB)',
    series: [{ name: 'Scan loss', color: CHART_COLORS[1]!, points: c.points.map((p) => ({ x: x(p), y: p.scanLossDb })) }],
  });
  // What a link budget reads: embedded-element gain plus array gain toward each steer.
  if (c.points.some((p) => p.gainAtSteerDbi !== null)) {
    drawChart(doc, f, {
      title: 'Gain toward the steer vs scan angle',
      xLabel: `Scan angle in ${axis} (°)`,
      yLabel: 'Gain (dBi)',
      series: [{ name: 'Gain toward the steer', color: CHART_COLORS[0]!, points: c.points.map((p) => ({ x: x(p), y: p.gainAtSteerDbi })) }],
    });
  }
}

function history(doc: PDFKit.PDFDocument, f: PacketFonts, data: PacketData): void {
  heading(doc, f, 'Decision history');
  if (data.history.length === 0) return para(doc, f, 'No decisions recorded.');
  drawTable(
    doc,
    f,
    [{ title: 'Recorded', width: 1.2 }, { title: 'By', width: 1.3 }, { title: 'Design', width: 3 }, { title: 'Status', width: 1.6 }, { title: 'Decision id', width: 2.9 }],
    data.history.map((d) => [
      day(d.signedAt ?? d.createdAt),
      d.decidedBy.name,
      d.label,
      d.status === 'superseded' ? `superseded by ${d.supersededById?.slice(0, 8)}` : d.status,
      d.id,
    ]),
  );
}

const TRAIL_WORDS = { accepted: 'accepted', sent_back: 'sent back with notes' } as const;

/** Every request, answer and sign-off, oldest first, with their notes. */
function trail(doc: PDFKit.PDFDocument, f: PacketFonts, data: PacketData): void {
  heading(doc, f, 'Review trail');
  const entries = data.review.trail;
  if (entries.length === 0) return para(doc, f, 'Nobody has been asked to review this study yet.');
  drawTable(
    doc,
    f,
    [{ title: 'When', width: 1.4 }, { title: 'Who', width: 1.4 }, { title: 'What', width: 5 }],
    entries.map((e) => [
      stamp(e.at),
      e.by.name,
      e.kind === 'asked'
        ? `asked ${e.reviewer.name} to review${e.message ? `: ${e.message}` : ''}`
        : e.kind === 'answered'
          ? `${TRAIL_WORDS[e.verdict]}${e.note ? `: ${e.note}` : ''}`
          : `signed off ${e.label}${e.supersedesId ? ' (supersedes an earlier decision)' : ''}: ${e.rationale}${e.justification ? ` Why despite failed limits: ${e.justification}` : ''}`,
    ]),
  );
}

function exposure(doc: PDFKit.PDFDocument, f: PacketFonts, data: PacketData): void {
  heading(doc, f, 'RF exposure: far-field estimate');
  const e = data.exposure;
  if (e) {
    para(doc, f, `S = EIRP / (4·pi·r²), with EIRP ${data.exposureBasis ?? 'the design’s peak EIRP'}.`);
    drawTable(doc, f, [{ title: 'Quantity', width: 3 }, { title: 'Value', width: 2, align: 'right' }], [
      ['Peak EIRP', `${num(e.eirpDbm)} dBm (${num(e.eirpW, 2)} W)`],
      [`Power density at ${num(e.distanceM, 2)} m`, `${num(e.densityWm2, 3)} W/m²`],
      ['Reference level', `${num(e.referenceWm2, 2)} W/m²`],
      ['Distance at which S falls to the reference level', `${num(e.distanceToReferenceM, 3)} m`],
    ]);
  } else {
    para(doc, f, 'No EIRP estimate: no design of this study has a channel power to compute EIRP from.');
  }
  para(doc, f, `Reference level source: ${data.referenceSource}`, { color: MUTED });
  para(doc, f, data.caution, { bold: true });
}

/** Renders the packet; resolves with the whole PDF file. */
export function renderPacketPdf(data: PacketData): Promise<Buffer> {
  const doc = new PDFDocument({ size: 'A4', margins: MARGIN, bufferPages: true, info: { Title: `Review packet: ${data.study.name}`, Author: 'Lobewise' } });
  const fonts = registerPacketFonts(doc);
  const chunks: Buffer[] = [];
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('data', (c: Buffer) => chunks.push(c));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  doc.font(fonts.bold).fontSize(20).fillColor(INK).text(pdfText(data.study.name), MARGIN.left, MARGIN.top);
  doc.font(fonts.regular).fontSize(9).fillColor(MUTED).text(pdfText(`Review packet · ${data.study.teamName} · generated ${stamp(data.generatedAt)} · review state: ${data.review.state.replace('_', ' ')}`));
  heading(doc, fonts, 'The job');
  para(doc, fonts, data.job);
  targetSheet(doc, fonts, data);
  ranked(doc, fonts, data);
  decision(doc, fonts, data);
  costs(doc, fonts, data);
  charts(doc, fonts, data);
  history(doc, fonts, data);
  trail(doc, fonts, data);
  exposure(doc, fonts, data);
  stampPages(doc, fonts, data);
  doc.end();
  return done;
}
