/**
 * The cost-and-power model against hand-worked examples: every expected value below is worked out by hand in the
 * comment above it (plain arithmetic, no published table), and the tolerance is stated in the assertion.
 */
import { describe, expect, it } from 'vitest';
import {
  CostModelSchema,
  DEMO_COST_MODEL,
  beamformerChips,
  boardAreaMm2,
  costOfDesign,
  costOfModule,
  dcPowerW,
  deviceCost,
  heatWPerCm2,
  paDcPowerW,
  type CostModel,
} from '../../shared/cost/index.ts';
import { evaluateDesign } from '../../shared/engine/index.ts';
import { DesignSchema } from '../../shared/schemas/design.ts';

const model = (m: Partial<CostModel> = {}): CostModel => ({ ...DEMO_COST_MODEL, ...m });

describe('beamformerChips(channels, channelsPerChip)', () => {
  it('rounds a part-used chip up to a whole chip', () => {
    // Hand-worked: 10 channels on 4-channel chips = 2.5 chips, so 3 chips; 8 on 4 = exactly 2; 1 on 16 = 1; 0 = 0.
    expect(beamformerChips(10, 4)).toBe(3);
    expect(beamformerChips(8, 4)).toBe(2);
    expect(beamformerChips(1, 16)).toBe(1);
    expect(beamformerChips(0, 8)).toBe(0);
    // Hand-worked: 64 channels on 16-channel chips = 4; one more channel needs a fifth chip.
    expect(beamformerChips(65, 16)).toBe(5);
  });

  it('refuses counts that are not whole numbers', () => {
    expect(() => beamformerChips(2.5, 4)).toThrow(RangeError);
    expect(() => beamformerChips(4, 0)).toThrow(RangeError);
  });
});

describe('boardAreaMm2(apertureX, apertureY, margin)', () => {
  it('adds the margin on every side of the aperture', () => {
    // Hand-worked: 21.4 × 5.35 mm aperture, 2 mm margin → (21.4 + 4) × (5.35 + 4) = 25.4 × 9.35 = 237.49 mm².
    expect(boardAreaMm2(21.4, 5.35, 2)).toBeCloseTo(237.49, 9);
    expect(boardAreaMm2(10, 10, 0)).toBe(100);
  });
});

describe('paDcPowerW(conductedPowerDbm, paEfficiency)', () => {
  it('divides the conducted power by the efficiency', () => {
    // Hand-worked: 20 dBm = 100 mW = 0.1 W; at η = 0.2 the PAs draw 0.1 / 0.2 = 0.5 W.
    expect(paDcPowerW(20, 0.2)).toBeCloseTo(0.5, 12);
    // Hand-worked: 30 dBm = 1 W at η = 1 → 1 W (an ideal PA draws what it delivers).
    expect(paDcPowerW(30, 1)).toBeCloseTo(1, 12);
  });

  it('counts each channel at its own tapered power a_ch²·P_ch', () => {
    // Hand-worked: four channels at 10 dBm (10 mW) with amplitudes 0.5, 1, 1, 0.5: Σ a² = 0.25 + 1 + 1 + 0.25 = 2.5,
    // so the PAs deliver 2.5 × 10 mW = 25 mW (conducted power 10 + 10·log10 2.5 dBm); at η = 0.25 they draw 0.1 W.
    const amplitudes = [0.5, 1, 1, 0.5];
    const conductedDbm = 10 + 10 * Math.log10(amplitudes.reduce((s, a) => s + a * a, 0));
    expect(paDcPowerW(conductedDbm, 0.25)).toBeCloseTo(0.1, 12);
  });

  it('refuses an efficiency outside (0, 1]', () => {
    expect(() => paDcPowerW(20, 0)).toThrow(RangeError);
    expect(() => paDcPowerW(20, 1.5)).toThrow(RangeError);
  });
});

describe('dcPowerW(...)', () => {
  it('applies the duty cycle to the PAs only and adds the always-on overheads', () => {
    // Hand-worked: PAs 0.5 W at 25 % duty = 0.125 W; 8 channels × 0.05 W = 0.4 W; 2 chips × 0.1 W = 0.2 W;
    // total 0.125 + 0.4 + 0.2 = 0.725 W.
    const p = dcPowerW({ paDcPowerW: 0.5, channels: 8, chips: 2, channelOverheadW: 0.05, chipOverheadW: 0.1, txDutyCycle: 0.25 });
    expect(p).toBeCloseTo(0.725, 12);
    // Hand-worked: with the PAs always on (duty 1) the same module draws 0.5 + 0.4 + 0.2 = 1.1 W.
    expect(dcPowerW({ paDcPowerW: 0.5, channels: 8, chips: 2, channelOverheadW: 0.05, chipOverheadW: 0.1, txDutyCycle: 1 })).toBeCloseTo(1.1, 12);
  });
});

describe('heatWPerCm2(dcPowerW, radiatedW, boardAreaMm2)', () => {
  it('spreads the dissipated power (DC less radiated RF) over the outline in cm²', () => {
    // Hand-worked: 0.725 W drawn, 0.025 W radiated → 0.7 W of heat over 237.49 mm² = 2.3749 cm² → 0.29475 W/cm².
    expect(heatWPerCm2(0.725, 0.025, 237.49)).toBeCloseTo(0.7 / 2.3749, 12);
    expect(heatWPerCm2(0.725, 0.025, 237.49)).toBeCloseTo(0.29475, 5);
    // Hand-worked: 2 W over a 20 × 10 mm outline = 2 cm² → 1 W/cm².
    expect(heatWPerCm2(2, 0, 200)).toBeCloseTo(1, 12);
  });

  it('has no density for an outline of no area', () => {
    expect(heatWPerCm2(1, 0, 0)).toBeNull();
  });
});

describe('costOfDesign(design, metrics, model)', () => {
  // A 1×4 handset module: 4 elements at 5.35 mm, one channel each, 10 dBm per channel, uniform (Σ a² = 4).
  const design = { nx: 4, ny: 1 };
  const metrics = { channels: 4, apertureXMm: 21.4, apertureYMm: 5.35, conductedPowerDbm: 10 + 10 * Math.log10(4) };

  it('adds chips, elements, board and module into the module cost', () => {
    // Hand-worked with the demo model: 1 chip × 18 = 18; 4 elements × 0.4 = 1.6; board 237.49 mm² × 0.002 = 0.47498;
    // module 6; total 18 + 1.6 + 0.47498 + 6 = 26.07498.
    const c = costOfDesign(design, metrics, model());
    expect(c.beamformerChips).toBe(1);
    expect(c.breakdown.board).toBeCloseTo(0.47498, 9);
    expect(c.costUsd).toBeCloseTo(26.07498, 9);
    expect(c.currency).toBe('USD');
  });

  it('reports the average DC power and the heat density of the module', () => {
    // Hand-worked with the demo model: conducted 4 × 10 mW = 40 mW; PAs 0.04 / 0.2 = 0.2 W, at 25 % duty 0.05 W;
    // overheads 4 × 0.05 + 1 × 0.1 = 0.3 W; DC 0.35 W. Radiated 0.25 × 0.04 = 0.01 W, heat 0.34 W over 2.3749 cm²
    // = 0.143164 W/cm².
    const c = costOfDesign(design, metrics, model());
    expect(c.dcPowerW).toBeCloseTo(0.35, 12);
    expect(c.breakdown.paW).toBeCloseTo(0.05, 12);
    expect(c.breakdown.overheadW).toBeCloseTo(0.3, 12);
    expect(c.heatWPerCm2).toBeCloseTo(0.34 / 2.3749, 12);
  });

  it('rounds chips per the model: 8 channels on 3-channel chips need 3 chips', () => {
    // Hand-worked: ceil(8 / 3) = 3 chips × 18 = 54 for the chips alone.
    const c = costOfDesign({ nx: 8, ny: 1 }, { ...metrics, channels: 8 }, model({ channelsPerChip: 3 }));
    expect(c.beamformerChips).toBe(3);
    expect(c.breakdown.chips).toBe(54);
  });

  it('leaves DC power and heat unknown without a conducted power, but still prices the module', () => {
    const c = costOfDesign(design, { ...metrics, conductedPowerDbm: null }, model());
    expect(c.dcPowerW).toBeNull();
    expect(c.heatWPerCm2).toBeNull();
    expect(c.costUsd).toBeCloseTo(26.07498, 9);
  });
});

describe('deviceCost(modules)', () => {
  it('adds cost, power and chips over the modules and keeps the hottest module', () => {
    const a = costOfDesign({ nx: 4, ny: 1 }, { channels: 4, apertureXMm: 21.4, apertureYMm: 5.35, conductedPowerDbm: 16 }, model());
    const b = costOfDesign({ nx: 2, ny: 4 }, { channels: 8, apertureXMm: 10.7, apertureYMm: 21.4, conductedPowerDbm: 19 }, model());
    const d = deviceCost([a, b]);
    // Hand-worked: sums of the two modules' own figures (each checked above against hand arithmetic).
    expect(d.costUsd).toBeCloseTo(a.costUsd + b.costUsd, 12);
    expect(d.dcPowerW).toBeCloseTo(a.dcPowerW! + b.dcPowerW!, 12);
    expect(d.beamformerChips).toBe(1 + 2);
    expect(d.maxHeatWPerCm2).toBe(Math.max(a.heatWPerCm2!, b.heatWPerCm2!));
    expect(d.modules).toBe(2);
  });

  it('reports an unknown total power when one module has no conducted power', () => {
    const a = costOfDesign({ nx: 1, ny: 1 }, { channels: 1, apertureXMm: 5, apertureYMm: 5, conductedPowerDbm: null }, model());
    expect(deviceCost([a]).dcPowerW).toBeNull();
  });
});

describe('CostModelSchema', () => {
  it('accepts the demo model and names the field and rule of a bad one', () => {
    expect(CostModelSchema.parse(DEMO_COST_MODEL)).toEqual(DEMO_COST_MODEL);
    const r = CostModelSchema.safeParse({ ...DEMO_COST_MODEL, paEfficiency: 0, currency: 'dollars' });
    expect(r.success).toBe(false);
    const paths = r.error!.issues.map((i) => i.path.join('.'));
    expect(paths).toEqual(expect.arrayContaining(['paEfficiency', 'currency']));
    expect(CostModelSchema.safeParse({ ...DEMO_COST_MODEL, channelsPerChip: 2.5 }).success).toBe(false);
  });
});

describe('costOfModule(design, model)', () => {
  it('prices a design from its parameters as the sweep prices it from the engine metrics', () => {
    // Hand-worked (as above): 1×4 uniform at 10 dBm with the demo model costs 26.07498 and draws 0.35 W.
    const plain = DesignSchema.parse({ frequencyGHz: 28, nx: 4, ny: 1, dxMm: 5.35, channelPowerDbm: 10 });
    expect(costOfModule(plain, model()).costUsd).toBeCloseTo(26.07498, 9);
    expect(costOfModule(plain, model()).dcPowerW).toBeCloseTo(0.35, 12);
    // A tapered 8×2 column-grouped design: the same figures as from a full engine evaluation (to 1e-12).
    const tapered = DesignSchema.parse({
      frequencyGHz: 28, nx: 8, ny: 2, dxMm: 5, taperX: { kind: 'taylor', sllDb: 25, nbar: 4 }, grouping: 'column', channelPowerDbm: 12,
    });
    const viaEngine = costOfDesign(tapered, evaluateDesign(tapered), model());
    const direct = costOfModule(tapered, model());
    expect(direct.beamformerChips).toBe(viaEngine.beamformerChips);
    expect(direct.costUsd).toBeCloseTo(viaEngine.costUsd, 12);
    expect(direct.dcPowerW!).toBeCloseTo(viaEngine.dcPowerW!, 12);
  });
});
