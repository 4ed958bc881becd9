import { describe, expect, it } from 'vitest';
import { arrayModel } from '../../../shared/engine/array/array-model.ts';
import { cutAngle } from '../../../shared/engine/cut/cut-samples.ts';
import { cutCosines, cutSines, elementCutSamples } from '../../../shared/engine/cut/cut-tables.ts';
import { DesignSchema } from '../../../shared/schemas/design.ts';

const modelWith = (element: object) => {
  const d = DesignSchema.parse({ frequencyGHz: 28, nx: 4, dxMm: 5, element });
  return arrayModel(d, new Float64Array(4));
};

describe('shared cut tables', () => {
  it('cutSines and cutCosines hold sin and cos of every cut angle (±1e-15)', () => {
    const s = cutSines(91);
    const c = cutCosines(91);
    for (const i of [0, 17, 45, 90]) {
      expect(s[i]).toBeCloseTo(Math.sin(cutAngle(i, 91)), 15);
      expect(c[i]).toBeCloseTo(Math.cos(cutAngle(i, 91)), 15);
    }
  });
  // cos θ = cos az·cos el from broadside (README conventions); a cos^q θ element is cos^q az·cos^q el in front.
  it('elementCutSamples of a cos^1.5 element in the az cut at el = 20° is (cos az·cos 20°)^1.5 (±1e-12)', () => {
    const out = new Float64Array(181);
    const el = (20 * Math.PI) / 180;
    elementCutSamples(modelWith({ kind: 'cosine', q: 1.5 }), 'az', el, 181, out);
    for (const i of [0, 40, 90, 150]) {
      const a = cutAngle(i, 181);
      expect(out[i]).toBeCloseTo(Math.max(0, Math.cos(a) * Math.cos(el)) ** 1.5, 12);
    }
  });
  // 3GPP TR 38.901 Table 7.3-1: A(θ', φ') = 8 − min(12(θ'/65°)² + 12(φ'/65°)², 30) dBi, here with el and az.
  it('elementCutSamples of the TR 38.901 element in the el cut at az = 30° follows Table 7.3-1 (±1e-12)', () => {
    const out = new Float64Array(181);
    elementCutSamples(modelWith({ kind: 'tr38901' }), 'el', (30 * Math.PI) / 180, 181, out);
    for (const i of [10, 90, 120]) {
      const elDeg = (cutAngle(i, 181) * 180) / Math.PI;
      const db = 8 - Math.min(12 * (elDeg / 65) ** 2 + 12 * (30 / 65) ** 2, 30);
      expect(out[i]).toBeCloseTo(10 ** (db / 10), 12);
    }
  });
});
