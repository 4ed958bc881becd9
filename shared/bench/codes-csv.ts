import { safeText } from '../export/safe-cell.ts';
import type { CodesTable } from './codes-table.ts';

/** Fixed decimals keep the file diff-able and stop float noise (27.999999999) reaching the bench. */
function fmt(x: number, digits = 2): string {
  const r = Math.round(x * 10 ** digits) / 10 ** digits;
  return String(r === 0 ? 0 : r);
}

/** Header text on one line: no commas or line breaks (the block is '#' lines a CSV reader skips). */
const line = (text: string) => text.replace(/[\r\n]+/g, ' ').replace(/,/g, ';');

/**
 * The header block: '#' lines naming the candidate, frequency, phase and attenuator steps, then which elements
 * each channel feeds (m, n from the -x/-y corner). Readers of the table (ours skip '#' lines) see plain comments.
 */
function headerBlock(table: CodesTable): string[] {
  const h = table.header;
  const out = [
    `# candidate: ${line(h.candidate ?? 'unnamed')}`,
    `# frequencyGHz: ${h.frequencyGHz}`,
    `# array: ${h.nx} x ${h.ny} elements; ${table.channels} channels (${h.grouping} grouping)`,
    `# phase: ${h.phaseBits} bits; ${fmt(h.phaseStepDeg, 6)} deg per code`,
    h.attenuatorBits === null ? '# attenuator: none (continuous amplitude)' : `# attenuator: ${h.attenuatorBits} bits; ${h.attenuatorStepDb} dB per code (code 0 = full amplitude)`,
    `# calibrated: ${table.calibrated ? 'yes' : 'no'}`,
  ];
  table.channelElements.forEach((els, c) => out.push(`# ch${c + 1} feeds (m n): ${els.map(([m, n]) => `(${m} ${n})`).join(' ')}`));
  return out.map(safeText);
}

/**
 * The table as CSV: the header block, then one row per beam: azDeg,elDeg,ch1..chN[,attCh1..attChN],peakAzDeg,
 * peakElDeg,pointingErrorDeg,hpbwAzDeg,hpbwElDeg,warnings; warnings are codes joined by '|' (no commas, so no
 * quoting needed). Every cell goes through safeText, so no text a spreadsheet would run as a formula reaches the bench.
 */
export function codesCsv(table: CodesTable): string {
  const channels = Array.from({ length: table.channels }, (_, i) => `ch${i + 1}`);
  const att = table.attenuation === null ? [] : Array.from({ length: table.channels }, (_, i) => `attCh${i + 1}`);
  const header = ['azDeg', 'elDeg', ...channels, ...att, 'peakAzDeg', 'peakElDeg', 'pointingErrorDeg', 'hpbwAzDeg', 'hpbwElDeg', 'warnings'];
  const lines = [...headerBlock(table), header.join(',')];
  for (const r of table.rows) {
    lines.push(
      [
        fmt(r.azDeg, 6),
        fmt(r.elDeg, 6),
        ...r.codes.map(String),
        ...(table.attenuation ?? []).map(String),
        fmt(r.peakAzDeg),
        fmt(r.peakElDeg),
        fmt(r.pointingErrorDeg),
        fmt(r.hpbwAzDeg),
        fmt(r.hpbwElDeg),
        r.warnings.map((w) => w.code).join('|'),
      ]
        .map(safeText)
        .join(','),
    );
  }
  return `${lines.join('\n')}\n`;
}
