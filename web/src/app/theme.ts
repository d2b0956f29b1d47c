import type { ThemeConfig } from 'antd';

/** Loftwright's colours by role (see docs/architecture.md, "Look"). Components read them as tokens. */
export const palette = {
  deepLagoon: '#0E6E73',
  firstLight: '#D98E04',
  ember: '#C2410C',
  ground: '#F4F6F5',
  ink: '#1D2B2F',
  rule: '#D5DDDB',
  approvedGreen: '#2F7D4F',
  draftGrey: '#6B7A7E',
} as const;

export const FONT_SANS = "'IBM Plex Sans', system-ui, -apple-system, 'Segoe UI', sans-serif";
export const FONT_MONO = "'IBM Plex Mono', ui-monospace, 'SFMono-Regular', Menlo, monospace";

export const theme: ThemeConfig = {
  cssVar: { key: 'lw' },
  token: {
    colorPrimary: palette.deepLagoon,
    colorInfo: palette.deepLagoon,
    colorWarning: palette.firstLight,
    colorError: palette.ember,
    colorSuccess: palette.approvedGreen,
    colorBgLayout: palette.ground,
    colorText: palette.ink,
    colorTextHeading: palette.ink,
    colorBorder: palette.rule,
    colorBorderSecondary: palette.rule,
    colorSplit: palette.rule,
    fontFamily: FONT_SANS,
    fontFamilyCode: FONT_MONO,
    borderRadius: 4,
  },
  components: {
    Layout: { siderBg: '#FFFFFF', bodyBg: palette.ground, headerBg: palette.ground },
    Menu: {
      itemSelectedColor: palette.deepLagoon,
      itemSelectedBg: '#E2EFEF',
      activeBarBorderWidth: 0,
    },
  },
};
