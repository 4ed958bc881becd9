/** How the studies list shows the shared columns: text columns sized to their content, every cell's full text on hover. */
import type { ColDef } from 'ag-grid-community';
import type { StudyRow } from '@/stores/studies';

/** Columns whose text is sized to fit rather than cut off (up to a width where the tooltip takes over). */
export const FIT_TO_CONTENT = ['name', 'owner', 'targetSheet'];
export const MAX_FIT_WIDTH = 460;

export function listColumns(cols: ColDef<StudyRow>[]): ColDef<StudyRow>[] {
  return cols.map((c) => {
    const out: ColDef<StudyRow> = {
      ...c,
      tooltip: c.tooltip ?? ((p) => (p.valueFormatted ?? (p.value == null ? '' : String(p.value))) || null),
    };
    if (FIT_TO_CONTENT.includes(c.colId ?? '')) {
      // A flex column takes its share of the width, not its content's; autoSizeColumns needs it fixed.
      delete out.flex;
      out.maxWidth = MAX_FIT_WIDTH;
    }
    return out;
  });
}
