/** Beamformer chips a design needs: every RF channel sits on a chip, a part-used chip still counts whole. */
export function beamformerChips(channels: number, channelsPerChip: number): number {
  if (!Number.isInteger(channels) || channels < 0) throw new RangeError('invalid channels');
  if (!Number.isInteger(channelsPerChip) || channelsPerChip < 1) throw new RangeError('invalid channelsPerChip');
  return Math.ceil(channels / channelsPerChip);
}
