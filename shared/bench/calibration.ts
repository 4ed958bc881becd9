/**
 * Per-channel calibration offsets measured on the bench: the gain (dB) and the phase (degrees) a channel
 * adds on its own at code 0. Channels are numbered from 1, in the engine's channel order.
 */
import { z } from 'zod';
import { BenchInputError } from './bench-input-error.ts';

export const ChannelOffsetSchema = z
  .object({
    channel: z.int({ error: 'must be a channel number from 1' }).min(1, 'must be a channel number from 1'),
    gainDb: z
      .number({ error: 'must be a number from -60 to 60 (dB)' })
      .min(-60, 'must be a number from -60 to 60 (dB)')
      .max(60, 'must be a number from -60 to 60 (dB)'),
    phaseDeg: z
      .number({ error: 'must be a number from -360 to 360 (degrees)' })
      .min(-360, 'must be a number from -360 to 360 (degrees)')
      .max(360, 'must be a number from -360 to 360 (degrees)'),
  })
  .strict();
export type ChannelOffset = z.output<typeof ChannelOffsetSchema>;

export const CalibrationSchema = z
  .array(ChannelOffsetSchema, { error: 'must be a list of {channel, gainDb, phaseDeg}' })
  .max(4096, 'must hold at most 4096 channels');
export type Calibration = ChannelOffset[];

export interface OffsetArrays {
  gainDb: Float64Array;
  phaseDeg: Float64Array;
}

/** Offsets as arrays indexed by channel (0-based); channels not listed have no offset. */
export function offsetArrays(calibration: Calibration | null | undefined, channels: number, field = 'calibration'): OffsetArrays {
  const gainDb = new Float64Array(channels);
  const phaseDeg = new Float64Array(channels);
  const seen = new Set<number>();
  (calibration ?? []).forEach((o, i) => {
    if (o.channel > channels) throw new BenchInputError(`${field}[${i}].channel`, `must be from 1 to ${channels} (this candidate has ${channels} channels)`);
    if (seen.has(o.channel)) throw new BenchInputError(`${field}[${i}].channel`, `channel ${o.channel} is listed twice`);
    seen.add(o.channel);
    gainDb[o.channel - 1] = o.gainDb;
    phaseDeg[o.channel - 1] = o.phaseDeg;
  });
  return { gainDb, phaseDeg };
}
