/**
 * `cli codes --candidate FILE --beams SPEC [--threshold DEG] [--calibration FILE]`: the bench-codes
 * table as CSV on stdout. FILE is a design in the engine's JSON (or a saved candidate with a `design`
 * field); SPEC is START:STOP:STEP in azimuth degrees at elevation 0, or a JSON file of {azDeg, elDeg}.
 * Bad input: UsageError, so exit 2 with one "field: rule" line.
 */
import { existsSync, readFileSync } from 'node:fs';
import { basename } from 'node:path';
import { parseArgs } from 'node:util';
import { BenchInputError } from '../../../shared/bench/bench-input-error.ts';
import { BeamListSchema, type Beam } from '../../../shared/bench/beam.ts';
import { CalibrationSchema, type Calibration } from '../../../shared/bench/calibration.ts';
import { codesCsv } from '../../../shared/bench/codes-csv.ts';
import { codesTable } from '../../../shared/bench/codes-table.ts';
import { DelimitedParseError } from '../../../shared/bench/delimited-parse-error.ts';
import { parseBeamRange } from '../../../shared/bench/parse-beam-range.ts';
import { parseCalibrationCsv } from '../../../shared/bench/parse-calibration-csv.ts';
import { DesignSchema, type Design } from '../../../shared/schemas/design.ts';
import { formatIssue } from '../../../shared/schemas/format-issue.ts';
import { UsageError } from '../usage-error.ts';

function readJson(path: string, field: string): unknown {
  if (!existsSync(path)) throw new UsageError(`${field}: file not found (${path})`);
  try {
    return JSON.parse(readFileSync(path, 'utf8'));
  } catch (err) {
    throw new UsageError(`${field}: must be a JSON file (${err instanceof Error ? err.message.split('\n')[0] : 'parse error'})`);
  }
}

function readDesign(path: string): { design: Design; name: string } {
  const raw = readJson(path, 'candidate');
  // A saved candidate carries its design in a field; a bare design is the engine's own JSON.
  const body = raw !== null && typeof raw === 'object' && 'design' in raw ? (raw as { design: unknown }).design : raw;
  const parsed = DesignSchema.safeParse(body);
  if (!parsed.success) throw new UsageError(`candidate.${formatIssue(parsed.error)}`);
  // The header names the saved candidate, or the file for a bare design.
  const named = raw !== null && typeof raw === 'object' && typeof (raw as { name?: unknown }).name === 'string' ? (raw as { name: string }).name : null;
  return { design: parsed.data, name: named ?? basename(path).replace(/\.json$/i, '') };
}

function readBeams(spec: string): Beam[] {
  if (!existsSync(spec)) {
    if (/\.json$/i.test(spec)) throw new UsageError(`beams: file not found (${spec})`);
    return parseBeamRange(spec);
  }
  const parsed = BeamListSchema.safeParse(readJson(spec, 'beams'));
  if (!parsed.success) throw new UsageError(`beams${formatIssue(parsed.error).replace(/^(\[|)/, (m) => (m === '[' ? '[' : ': '))}`);
  return parsed.data;
}

function readCalibration(path: string): Calibration {
  if (!existsSync(path)) throw new UsageError(`calibration: file not found (${path})`);
  const text = readFileSync(path, 'utf8');
  if (/\.json$/i.test(path)) {
    const parsed = CalibrationSchema.safeParse(readJson(path, 'calibration'));
    if (!parsed.success) throw new UsageError(`calibration${formatIssue(parsed.error).replace(/^(\[|)/, (m) => (m === '[' ? '[' : ': '))}`);
    return parsed.data;
  }
  try {
    return parseCalibrationCsv(text);
  } catch (err) {
    if (err instanceof DelimitedParseError) throw new UsageError(`calibration: ${err.message}`);
    throw err;
  }
}

const OPTIONS = ['candidate', 'beams', 'threshold', 'calibration'];

/** "--beams -60:60:15" would read -60 as an option: glue each known option to its value first. */
function glued(argv: string[]): string[] {
  const out: string[] = [];
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i]!;
    const next = argv[i + 1];
    if (OPTIONS.includes(a.replace(/^--/, '')) && a.startsWith('--') && next !== undefined) {
      out.push(`${a}=${next}`);
      i++;
    } else out.push(a);
  }
  return out;
}

export async function codesCommand(argv: string[]): Promise<number> {
  try {
    return run(glued(argv));
  } catch (err) {
    if (err instanceof BenchInputError) throw new UsageError(err.message);
    throw err;
  }
}

function run(argv: string[]): number {
  let values: { candidate?: string; beams?: string; threshold?: string; calibration?: string };
  try {
    ({ values } = parseArgs({
      args: argv,
      options: { candidate: { type: 'string' }, beams: { type: 'string' }, threshold: { type: 'string' }, calibration: { type: 'string' } },
      strict: true,
      allowPositionals: false,
    }));
  } catch (err) {
    throw new UsageError(`codes: ${err instanceof Error ? err.message.split('\n')[0] : 'bad option'} (usage: codes --candidate FILE --beams SPEC)`);
  }
  if (!values.candidate) throw new UsageError('candidate: is required (--candidate FILE, a design JSON file)');
  if (!values.beams) throw new UsageError('beams: is required (--beams START:STOP:STEP or a JSON file of {azDeg, elDeg})');
  const threshold = values.threshold === undefined ? null : Number(values.threshold);
  if (threshold !== null && !(threshold >= 0)) throw new UsageError('threshold: must be a number of degrees from 0');
  const { design, name } = readDesign(values.candidate);
  const beams = readBeams(values.beams);
  const calibration = values.calibration ? readCalibration(values.calibration) : null;
  process.stdout.write(codesCsv(codesTable(design, beams, { calibration, pointingThresholdDeg: threshold, candidate: name })));
  return 0;
}
