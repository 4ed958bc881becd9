/** Target sheets: schema, presets, design-level figures and the pass/fail check. */
export { TargetSheetSchema, LIMIT_KEYS, LIMIT_LABELS, type TargetSheet, type TargetSheetInput, type LimitKey, type ScanRange } from './sheet.ts';
export { figuresFromPoints, scanAngleDeg, type DesignFigures, type FigurePoint, type FiguresOptions, type PointMetrics } from './figures.ts';
export { checkAgainstSheet, type SheetCheck, type LimitCheck } from './check.ts';
export { TARGET_PRESETS, HANDSET_28GHZ, SMALL_CELL_39GHZ, findPreset, type TargetPreset, type SourceNote } from './presets.ts';
export { BANDS, bandsFor, type Band } from './bands.ts';
