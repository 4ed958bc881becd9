/** A plain table in a pdfkit document: header row, zebra rows, page breaks that repeat the header. */
import { pdfText, type PacketFonts } from './pdf-fonts.ts';

export interface TableColumn {
  title: string;
  /** Share of the table width. */
  width: number;
  align?: 'left' | 'right';
}

const ROW_PAD = 3;

function rowHeight(doc: PDFKit.PDFDocument, cells: string[], widths: number[]): number {
  return Math.max(...cells.map((c, i) => doc.heightOfString(pdfText(c), { width: widths[i]! - 2 * ROW_PAD }))) + 2 * ROW_PAD;
}

function drawRow(doc: PDFKit.PDFDocument, cells: string[], cols: TableColumn[], widths: number[], y: number, h: number): void {
  let x = doc.page.margins.left;
  cells.forEach((c, i) => {
    doc.text(pdfText(c), x + ROW_PAD, y + ROW_PAD, { width: widths[i]! - 2 * ROW_PAD, align: cols[i]!.align ?? 'left', lineBreak: true });
    x += widths[i]!;
  });
  doc.y = y + h;
}

export function drawTable(doc: PDFKit.PDFDocument, fonts: PacketFonts, cols: TableColumn[], rows: string[][], fontSize = 8.5): void {
  const total = doc.page.width - doc.page.margins.left - doc.page.margins.right;
  const share = cols.reduce((s, c) => s + c.width, 0);
  const widths = cols.map((c) => (c.width / share) * total);
  const bottom = () => doc.page.height - doc.page.margins.bottom;
  const header = () => {
    doc.font(fonts.bold).fontSize(fontSize);
    const h = rowHeight(doc, cols.map((c) => c.title), widths);
    const y = doc.y;
    doc.save().rect(doc.page.margins.left, y, total, h).fill('#e8edf3').restore();
    doc.fillColor('#1f2a37');
    drawRow(doc, cols.map((c) => c.title), cols, widths, y, h);
    doc.font(fonts.regular).fontSize(fontSize);
  };
  header();
  rows.forEach((cells, r) => {
    const h = rowHeight(doc, cells, widths);
    if (doc.y + h > bottom()) {
      doc.addPage();
      header();
    }
    const y = doc.y;
    if (r % 2 === 1) doc.save().rect(doc.page.margins.left, y, total, h).fill('#f6f8fa').restore();
    doc.fillColor('#1f2a37');
    drawRow(doc, cells, cols, widths, y, h);
  });
  doc.x = doc.page.margins.left;
  doc.moveDown(0.8);
}
