export type Alignment = 'peak' | 'angle';

export interface Series {
  angleDeg: number[];
  powerDb: number[];
}

/**
 * Measured and model cuts ready to draw on one chart. normalise puts each cut's peak at 0 dB;
 * 'peak' alignment shifts the measured angles so its peak sits on the model's, 'angle' keeps them as measured.
 */
export function overlayCuts(
  measured: Series & { peakDeg: number; peakDb: number },
  model: Series & { peakDeg: number; peakDb: number },
  options: { normalise: boolean; align: Alignment },
): { measured: Series; model: Series; shiftDeg: number } {
  const shiftDeg = options.align === 'peak' ? model.peakDeg - measured.peakDeg : 0;
  const mOffset = options.normalise ? measured.peakDb : 0;
  const pOffset = options.normalise ? model.peakDb : 0;
  return {
    measured: { angleDeg: measured.angleDeg.map((a) => a + shiftDeg), powerDb: measured.powerDb.map((p) => p - mOffset) },
    model: { angleDeg: [...model.angleDeg], powerDb: model.powerDb.map((p) => p - pOffset) },
    shiftDeg,
  };
}
