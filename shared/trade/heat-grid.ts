/**
 * A metric over two parameters with the other parameters held: the cells of the heat map.
 * Pure, so the chart only draws and the test checks the numbers.
 */
import type { TradeDesign } from './trade-design.ts';
import { TRADE_FIELDS, numericValue, tradeField, type TradeField } from './trade-fields.ts';

export type Level = number | string | boolean | null;

export interface VaryingParam {
  key: string;
  values: Level[];
}

const order = (a: Level, b: Level) =>
  typeof a === 'number' && typeof b === 'number' ? a - b : String(a).localeCompare(String(b));

/** The parameter fields that take more than one value across the rows, each with its sorted distinct values. */
export function varyingParams(rows: readonly TradeDesign[]): VaryingParam[] {
  return TRADE_FIELDS.filter((f) => f.group === 'Parameters')
    .map((f) => ({ key: f.key, values: [...new Set(rows.map((r) => f.get(r)))].sort(order) }))
    .filter((p) => p.values.length > 1);
}

export interface HeatCell {
  xi: number;
  yi: number;
  value: number | null;
  designIndex: number;
  /** Designs that fell in this cell (more than one when a parameter is left free). */
  count: number;
}

export interface HeatGrid {
  xs: Level[];
  ys: Level[];
  cells: HeatCell[];
}

/**
 * Cells of `metricKey` over (xKey, yKey) among the rows whose other parameters equal `held`.
 * When several rows share a cell, the best by the metric's better direction is kept (the first when it has none).
 */
export function heatGrid(
  rows: readonly TradeDesign[],
  xKey: string,
  yKey: string,
  metricKey: string,
  held: Readonly<Record<string, Level>>,
): HeatGrid {
  const fx = tradeField(xKey);
  const fy = tradeField(yKey);
  const fm = tradeField(metricKey);
  if (!fx || !fy || !fm) throw new RangeError('invalid field');
  const heldFields = Object.entries(held)
    .filter(([k]) => k !== xKey && k !== yKey)
    .map(([k, v]) => [tradeField(k), v] as [TradeField | undefined, Level]);
  const kept = rows.filter((r) => heldFields.every(([f, v]) => !f || f.get(r) === v));
  const xs = [...new Set(kept.map((r) => fx.get(r)))].sort(order);
  const ys = [...new Set(kept.map((r) => fy.get(r)))].sort(order);
  const xIndex = new Map(xs.map((v, i) => [v, i]));
  const yIndex = new Map(ys.map((v, i) => [v, i]));
  const byCell = new Map<string, HeatCell>();
  const better = (a: number | null, b: number | null): boolean => {
    if (a === null) return false;
    if (b === null) return true;
    return fm.better === 'max' ? a > b : fm.better === 'min' ? a < b : false;
  };
  for (const r of kept) {
    const xi = xIndex.get(fx.get(r))!;
    const yi = yIndex.get(fy.get(r))!;
    const key = `${xi},${yi}`;
    const value = numericValue(fm, r);
    const cell = byCell.get(key);
    if (!cell) byCell.set(key, { xi, yi, value, designIndex: r.designIndex, count: 1 });
    else {
      cell.count++;
      if (better(value, cell.value)) Object.assign(cell, { value, designIndex: r.designIndex });
    }
  }
  return { xs, ys, cells: [...byCell.values()] };
}
