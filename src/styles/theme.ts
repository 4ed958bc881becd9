/** Lobewise's own look: deep slate-teal ink, a warm amber accent, Work Sans throughout. */
import type { ThemeConfig } from 'ant-design-vue/es/config-provider/context';

export const palette = {
  ink: '#123f45',
  teal: '#1d7a74',
  sea: '#5fb3a9',
  amber: '#f2b441',
  rust: '#b3472f',
  paper: '#f6f4ef',
  line: '#dcd8cf',
  pass: '#237a4b',
  fail: '#b3472f',
};

export const theme: ThemeConfig = {
  token: {
    colorPrimary: palette.teal,
    colorInfo: palette.teal,
    colorSuccess: '#1f6e44',
    // Set, not derived: the palette derived from this deeper green gives success tags a grey-green background (2.7:1).
    colorSuccessBg: '#e8f3ec',
    colorSuccessBorder: '#a7d3b8',
    colorError: '#b0452c',
    colorWarning: '#b7791f',
    colorBgLayout: palette.paper,
    colorBorderSecondary: palette.line,
    // Secondary text (result subtitles, descriptions) dark enough for WCAG AA (about 5:1 on paper and on white);
    // the library's 45 % black is about 3.3:1 on paper.
    colorTextDescription: '#5b6b6d',
    colorTextTertiary: '#5b6b6d',
    colorTextQuaternary: '#646f70',
    colorTextPlaceholder: '#646f70',
    colorTextDisabled: '#646f70',
    // Text colours on tags, links and danger buttons a shade deeper than the palette, for AA contrast on white,
    // paper and the light tag backgrounds (the palette's rust is 4.1:1 on paper; this is 5.1:1).
    colorLink: '#18706a',
    borderRadius: 6,
    fontFamily: "'Work Sans', system-ui, sans-serif",
    fontSize: 14,
  },
  components: {
    Layout: { colorBgHeader: palette.ink, colorBgBody: palette.paper },
  },
};
