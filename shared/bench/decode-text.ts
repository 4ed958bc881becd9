import { DelimitedParseError } from './delimited-parse-error.ts';

/** Bytes of an uploaded text file as a string: UTF-8 only; binary files (NUL bytes, invalid UTF-8) are refused. */
export function decodeText(bytes: Uint8Array): string {
  const nul = bytes.indexOf(0);
  if (nul >= 0) throw new DelimitedParseError(lineAt(bytes, nul), 'holds a NUL byte: this is a binary file, not CSV text');
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    // Find the first bad byte for the line number: decode growing prefixes is slow, so scan for the offending sequence.
    const bad = firstInvalidUtf8(bytes);
    throw new DelimitedParseError(lineAt(bytes, bad), 'is not UTF-8 text (save the file as UTF-8 CSV)');
  }
}

function lineAt(bytes: Uint8Array, offset: number): number {
  let line = 1;
  for (let i = 0; i < offset; i++) if (bytes[i] === 0x0a) line++;
  return line;
}

function firstInvalidUtf8(bytes: Uint8Array): number {
  let i = 0;
  while (i < bytes.length) {
    const b = bytes[i]!;
    const len = b < 0x80 ? 1 : b >= 0xc2 && b < 0xe0 ? 2 : b >= 0xe0 && b < 0xf0 ? 3 : b >= 0xf0 && b < 0xf5 ? 4 : 0;
    if (len === 0 || i + len > bytes.length) return i;
    for (let k = 1; k < len; k++) if ((bytes[i + k]! & 0xc0) !== 0x80) return i;
    i += len;
  }
  return Math.max(0, bytes.length - 1);
}
