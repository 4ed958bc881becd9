import type { ArrayModel } from '../array/array-model.ts';

/**
 * The factor that turns the model's pattern power |AF|²·E into gain, and the gain of the same array steered
 * to broadside. With G_e(û) = G_e0·E(û)/E(0) and G(û) = G_e(û)·|AF(û)|²/Σa²:
 * G(û) = perPower·|AF(û)|²·E(û), perPower = G_e0/(E(0)·Σa²); broadside G_bs = G_e0·(Σa)²/Σa².
 */
export function gainScale(model: ArrayModel, elementGainDbi: number): { perPower: number; broadsideDbi: number } {
  const { cRe, cIm } = model;
  let s1 = 0;
  let s2 = 0;
  for (let i = 0; i < cRe.length; i++) {
    const p = cRe[i]! * cRe[i]! + cIm[i]! * cIm[i]!;
    s2 += p;
    s1 += Math.sqrt(p);
  }
  const ge0 = 10 ** (elementGainDbi / 10);
  return { perPower: ge0 / (model.element(0, 0) * s2), broadsideDbi: elementGainDbi + 10 * Math.log10((s1 * s1) / s2) };
}
