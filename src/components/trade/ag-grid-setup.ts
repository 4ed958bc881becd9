/** AG Grid 33+ wants its modules registered once and a theme object; both live here so every grid looks alike. */
import {
  CellStyleModule,
  ClientSideRowModelModule,
  InfiniteRowModelModule,
  ModuleRegistry,
  NumberFilterModule,
  RenderApiModule,
  RowApiModule,
  RowSelectionModule,
  TooltipModule,
  ValidationModule,
  themeQuartz,
} from 'ag-grid-community';
import { palette } from '@/styles/theme';

// Only the features our grids use (AllCommunityModule is most of the grid's weight). A grid option that needs
// another module logs AG Grid's error #200 naming it; in development ValidationModule explains it in full.
ModuleRegistry.registerModules([
  ClientSideRowModelModule, // studies list, a design's points
  InfiniteRowModelModule, // trade table (server-side pages)
  RowSelectionModule,
  NumberFilterModule,
  TooltipModule,
  CellStyleModule, // cellClass, cellClassRules
  RowApiModule, // forEachNode
  RenderApiModule, // refreshCells
  ...(import.meta.env.DEV ? [ValidationModule] : []),
]);

export const gridTheme = themeQuartz.withParams({
  accentColor: palette.teal,
  fontFamily: "'Work Sans', system-ui, sans-serif",
  fontSize: 13,
  headerBackgroundColor: '#eef3f2',
  headerTextColor: palette.ink,
  borderColor: palette.line,
  rowHoverColor: '#f1f7f6',
  selectedRowBackgroundColor: '#fdf1d6',
});
