/**
 * The packet's fonts: Work Sans (our UI face) from @fontsource, whose .woff files pdfkit reads through fontkit.
 * Falls back to pdfkit's built-in Helvetica if the files are missing, so a packet is always produced.
 */
import { existsSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';

export interface PacketFonts {
  regular: string;
  bold: string;
}

const require = createRequire(import.meta.url);

function fontFile(weight: number): string | null {
  try {
    const pkg = path.dirname(require.resolve('@fontsource/work-sans/package.json'));
    const file = path.join(pkg, 'files', `work-sans-latin-${weight}-normal.woff`);
    return existsSync(file) ? file : null;
  } catch {
    return null;
  }
}

/** Registers the fonts on `doc` and returns their names. */
export function registerPacketFonts(doc: PDFKit.PDFDocument): PacketFonts {
  const regular = fontFile(400);
  const bold = fontFile(600);
  if (!regular || !bold) return { regular: 'Helvetica', bold: 'Helvetica-Bold' };
  doc.registerFont('WorkSans', regular);
  doc.registerFont('WorkSans-SemiBold', bold);
  return { regular: 'WorkSans', bold: 'WorkSans-SemiBold' };
}

/** The latin subset has no Greek or maths symbols; spell them so no glyph prints as a box. */
export function pdfText(s: string): string {
  return s
    .replace(/π/g, 'pi')
    .replace(/λ/g, 'lambda')
    .replace(/θ/g, 'theta')
    .replace(/≤/g, '<=')
    .replace(/≥/g, '>=')
    .replace(/√/g, 'sqrt');
}
