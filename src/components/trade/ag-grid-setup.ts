/** AG Grid 33+ wants its modules registered once and a theme object; both live here so every grid looks alike. */
import { AllCommunityModule, ModuleRegistry, themeQuartz } from 'ag-grid-community';
import { palette } from '@/styles/theme';

ModuleRegistry.registerModules([AllCommunityModule]);

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
