/**
 * The starting cost model and the note beside each field. Prices are invented for the demo study (no real part,
 * vendor or quote); the electrical defaults are rough figures recalled from memory of common practice, marked so.
 * A team replaces all of them with its own quotes and measurements.
 */
import type { CostModel, CostModelField } from './cost-model.ts';

export type CostBasis = 'invented' | 'common practice, recalled from memory';

export interface CostFieldNote {
  label: string;
  unit: string;
  basis: CostBasis;
  note: string;
}

export const DEMO_COST_MODEL: CostModel = {
  currency: 'USD',
  channelsPerChip: 4,
  chipPrice: 18,
  elementPrice: 0.4,
  boardPricePerMm2: 0.002,
  boardMarginMm: 2,
  modulePrice: 6,
  paEfficiency: 0.2,
  channelOverheadW: 0.05,
  chipOverheadW: 0.1,
  txDutyCycle: 0.25,
};

const invented = (label: string, unit: string, note = 'invented demo figure, not a quote'): CostFieldNote => ({
  label,
  unit,
  basis: 'invented',
  note,
});
const recalled = (label: string, unit: string, note: string): CostFieldNote => ({
  label,
  unit,
  basis: 'common practice, recalled from memory',
  note,
});

/** Labels, units and the basis of each demo value, in the order the editor shows them. */
export const COST_FIELD_NOTES: Record<CostModelField, CostFieldNote> = {
  currency: invented('Currency', 'ISO 4217 code', 'the currency every price below is in'),
  channelsPerChip: invented('Channels per beamformer chip', 'channels', 'invented demo chip; beamformer chips commonly come with 4, 8 or 16 channels'),
  chipPrice: invented('Price per beamformer chip', 'currency'),
  elementPrice: invented('Price per radiating element', 'currency'),
  boardPricePerMm2: invented('Antenna board price', 'currency per mm²'),
  boardMarginMm: invented('Board margin', 'mm, each side', 'invented: ground clearance and mounting around the elements'),
  modulePrice: invented('Fixed price per module', 'currency', 'invented: connector, assembly and test'),
  paEfficiency: recalled('PA efficiency (P_out / P_dc)', 'fraction 0–1', 'mm-wave silicon PAs at their working back-off are often quoted around 10–25 %; 0.2 is a round figure from memory, not a datasheet value'),
  channelOverheadW: recalled('Overhead per channel', 'W', 'phase shifter, LNA and bias: tens of mW per channel is the usual order, recalled from memory'),
  chipOverheadW: recalled('Overhead per chip', 'W', 'control logic, references and bias of one chip, order of magnitude recalled from memory'),
  txDutyCycle: recalled('Transmit duty cycle', 'fraction 0–1', 'share of time the PAs transmit; a handset in a downlink-heavy TDD pattern transmits roughly a quarter of the time (recalled from memory)'),
};

export const COST_FIELDS = Object.keys(COST_FIELD_NOTES) as CostModelField[];
