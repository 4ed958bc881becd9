/** Messages to the request worker thread (workers/request.ts) and what it answers. Plain data only. */
import type { Beam } from '../bench/beam.ts';
import type { Calibration } from '../bench/calibration.ts';
import type { MonteCarloChunk } from '../bench/monte-carlo-chunk.ts';
import type { MonteCarloOptions } from '../bench/monte-carlo-schema.ts';
import type { Design } from '../schemas/design.ts';
import type { TargetSheet } from '../targets/sheet.ts';

export type RequestTask =
  | { kind: 'evaluate'; designs: Design[]; single: boolean }
  | { kind: 'codes'; design: Design; beams: Beam[]; calibration: Calibration | null; pointingThresholdDeg: number | null }
  | { kind: 'manual-codes'; design: Design; codes: number[]; calibration: Calibration | null }
  | { kind: 'squint'; design: Design; beam: Beam; band: { lowGHz: number; highGHz: number; points: number }; calibration: Calibration | null }
  | { kind: 'monte-carlo-ideal'; design: Design; options: MonteCarloOptions }
  | { kind: 'monte-carlo'; chunk: MonteCarloChunk }
  | { kind: 'scan-design'; design: Design; sheet: TargetSheet | null }
  | { kind: 'range-analysis'; design: Design; text: string; beam: { azDeg: number; elDeg: number; codes?: number[] | null }; calibration: Calibration | null };

/** A result, or a bench input failure naming its field and rule. */
export type RequestTaskResult = { ok: true; value: unknown } | { ok: false; field: string; rule: string };
