import { ChannelOffsetSchema, type Calibration } from './calibration.ts';
import { DelimitedParseError } from './delimited-parse-error.ts';
import { readDelimited } from './read-delimited.ts';

/** Calibration offsets from CSV: channel, gainDb, phaseDeg per line (header optional, comma or semicolon). */
export function parseCalibrationCsv(text: string): Calibration {
  const table = readDelimited(text, { maxRows: 4096 });
  const seen = new Set<number>();
  return table.rows.map((r) => {
    if (r.values.length !== 3) throw new DelimitedParseError(r.line, `expected 3 values (channel, gainDb, phaseDeg), found ${r.values.length}`);
    const [channel, gainDb, phaseDeg] = r.values as [number, number, number];
    const parsed = ChannelOffsetSchema.safeParse({ channel, gainDb, phaseDeg });
    if (!parsed.success) {
      const issue = parsed.error.issues[0]!;
      throw new DelimitedParseError(r.line, `${String(issue.path[0])} ${issue.message}`);
    }
    if (seen.has(channel)) throw new DelimitedParseError(r.line, `channel ${channel} is listed twice`);
    seen.add(channel);
    return parsed.data;
  });
}
