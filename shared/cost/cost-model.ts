/**
 * A study's cost-and-power model: the prices and electrical overheads a team sets once per study. Every price is
 * an input the team types in; nothing here is a built-in fact about any part. Amounts are in `currency`.
 */
import { z } from 'zod';

const PRICE_MAX = 1e9;
const price = (what: string) => {
  const rule = `must be a number from 0 to ${PRICE_MAX} (${what})`;
  return z.number({ error: rule }).min(0, rule).max(PRICE_MAX, rule);
};
const watts = (what: string) => {
  const rule = `must be a number from 0 to 1000 (W ${what})`;
  return z.number({ error: rule }).min(0, rule).max(1000, rule);
};
const fraction = (rule: string, open: boolean) => {
  const base = z.number({ error: rule }).max(1, rule);
  return open ? base.gt(0, rule) : base.min(0, rule);
};

export const CostModelSchema = z
  .object(
    {
      currency: z
        .string({ error: 'must be a three-letter currency code such as "USD" or "EUR"' })
        .regex(/^[A-Z]{3}$/, 'must be a three-letter currency code such as "USD" or "EUR"'),
      channelsPerChip: z
        .number({ error: 'must be an integer from 1 to 1024 (RF channels per beamformer chip)' })
        .int('must be an integer from 1 to 1024 (RF channels per beamformer chip)')
        .min(1, 'must be an integer from 1 to 1024 (RF channels per beamformer chip)')
        .max(1024, 'must be an integer from 1 to 1024 (RF channels per beamformer chip)'),
      chipPrice: price('price of one beamformer chip'),
      elementPrice: price('price per radiating element'),
      boardPricePerMm2: price('price per mm² of antenna board'),
      boardMarginMm: z
        .number({ error: 'must be a number from 0 to 1000 (mm of board beyond the aperture on each side)' })
        .min(0, 'must be a number from 0 to 1000 (mm of board beyond the aperture on each side)')
        .max(1000, 'must be a number from 0 to 1000 (mm of board beyond the aperture on each side)'),
      modulePrice: price('fixed price per module: connector, assembly'),
      paEfficiency: fraction('must be a number greater than 0 and at most 1 (PA efficiency, P_out / P_dc)', true),
      channelOverheadW: watts('per channel'),
      chipOverheadW: watts('per chip'),
      txDutyCycle: fraction('must be a number from 0 to 1 (share of time transmitting)', false),
    },
    { error: 'must be a cost model object' },
  )
  .strict();

export type CostModel = z.output<typeof CostModelSchema>;
export type CostModelField = keyof CostModel;

/** GET/PUT /api/studies/:id/cost-model answer. */
export interface CostModelView {
  studyId: string;
  /** null while the study has no model: cost columns stay empty until one is saved. */
  model: CostModel | null;
  /** Counts saves; sweep figures name the version they were priced with. */
  version: number | null;
  updatedAt: string | null;
  /** Sweeps re-priced by this save (PUT only). */
  repricedSweeps?: number;
  /** PUT only: true when the study's stored designs are many and are being re-priced after the save. */
  repricing?: boolean;
}

/** Which cost model a sweep's figures were priced with (beside GET /api/sweeps/:id/designs rows). */
export interface SweepCostBasis {
  /** The model version the stored figures used; null: priced without a model (cost columns empty). */
  version: number | null;
  /** The study's model version now; null: the study has no model. */
  currentVersion: number | null;
  currency: string | null;
  /** True when the figures are on the study's current model; false while they are being re-priced. */
  current: boolean;
}
