/** Cost and power of a design under a study's cost model: pure, one rule per file. */
export { CostModelSchema, type CostModel, type CostModelField, type CostModelView, type SweepCostBasis } from './cost-model.ts';
export { beamformerChips } from './beamformer-chips.ts';
export { boardAreaMm2 } from './board-area-mm2.ts';
export { paDcPowerW, dbmToW } from './pa-dc-power-w.ts';
export { dcPowerW, type DcPowerInput } from './dc-power-w.ts';
export { heatWPerCm2 } from './heat-w-per-cm2.ts';
export { costOfDesign, type CostDesign, type CostMetrics, type CostFigures, type CostBreakdown } from './cost-of-design.ts';
export { deviceCost, type DeviceCost } from './device-cost.ts';
export { DEMO_COST_MODEL, COST_FIELD_NOTES, COST_FIELDS, type CostFieldNote, type CostBasis } from './demo-cost-model.ts';
export { costOfModule } from './cost-of-module.ts';
