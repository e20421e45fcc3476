/**
 * Dilato's design tokens. The raw palette is graphite neutrals plus the heat-tint colours
 * stainless steel takes on as it is heated (straw, bronze, purple, tempered blue); screens and
 * components use only the semantic names below it, never the palette directly.
 */

export const palette = {
  graphite950: '#121417',
  graphite900: '#1C1F23',
  graphite800: '#2A2E34',
  graphite700: '#3B4048',
  graphite600: '#545A63',
  graphite500: '#6C727C',
  graphite300: '#B9BDC3',
  graphite200: '#D7D9DC',
  graphite100: '#ECEBE7',
  graphite50: '#F6F5F2',
  white: '#FFFFFF',

  straw300: '#F0D98A',
  straw500: '#D9B44A',
  straw100: '#FBF3DA',
  bronze600: '#8A4F1C',
  bronze100: '#F6E6D6',
  temper700: '#1D447E',
  temper800: '#15335F',
  temper100: '#E2EAF6',
  temper300: '#8FB0E0',
  oxide700: '#A12C1B',
  oxide100: '#FBE4DF',
  passive700: '#276140',
  passive100: '#DFF0E5',
} as const;

/** Semantic colours. Text pairs meet WCAG AA (4.5:1) on the surfaces they are used on. */
export const colors = {
  background: palette.graphite50,
  surface: palette.graphite50,
  surfaceRaised: palette.white,
  surfaceSunken: palette.graphite100,
  text: palette.graphite900,
  textMuted: palette.graphite600,
  border: palette.graphite300,
  borderStrong: palette.graphite500,

  primary: palette.temper700,
  primaryPressed: palette.temper800,
  onPrimary: palette.white,
  primarySoft: palette.temper100,

  accent: palette.straw500,
  accentSoft: palette.straw100,

  danger: palette.oxide700,
  dangerSoft: palette.oxide100,
  onDanger: palette.white,
  warning: palette.bronze600,
  warningSoft: palette.bronze100,
  success: palette.passive700,
  successSoft: palette.passive100,

  focus: palette.straw500,

  /** The navigation chrome (side rail, tab bar) is dark graphite with a straw "hot" marker. */
  nav: palette.graphite900,
  navBorder: palette.graphite700,
  navText: palette.graphite200,
  navTextActive: palette.straw300,
  navActiveBackground: palette.graphite800,
  navMarker: palette.straw500,
} as const;

/**
 * Temperature along the pipe in the system drawing: cool graphite through straw and bronze to
 * oxide red, stops in °C. Colours between stops are mixed in the drawing.
 */
export const heatScale = [
  { atC: 20, color: palette.graphite300 },
  { atC: 300, color: palette.straw300 },
  { atC: 550, color: palette.straw500 },
  { atC: 750, color: palette.bronze600 },
  { atC: 950, color: palette.oxide700 },
] as const;

/** The marks of the system drawing. */
export const drawing = {
  pipeOutline: palette.graphite700,
  fixing: palette.graphite900,
  support: palette.temper700,
  joint: palette.temper700,
  nearbyOk: palette.passive700,
  nearbyClose: palette.oxide700,
  text: palette.graphite900,
  textMuted: palette.graphite600,
} as const;

export const spacing = {
  none: 0,
  xxs: 2,
  xs: 4,
  sm: 8,
  md: 12,
  lg: 16,
  xl: 24,
  xxl: 32,
  xxxl: 48,
} as const;

export const radii = {
  sm: 4,
  md: 8,
  lg: 12,
  pill: 999,
} as const;

/** Gloved hands: nothing tappable is smaller than this. */
export const touchTarget = 48;

export const fonts = {
  regular: 'SourceSans3_400Regular',
  semibold: 'SourceSans3_600SemiBold',
  bold: 'SourceSans3_700Bold',
} as const;

export const typography = {
  display: { fontFamily: fonts.bold, fontSize: 34, lineHeight: 40, letterSpacing: -0.3 },
  title: { fontFamily: fonts.bold, fontSize: 26, lineHeight: 32 },
  heading: { fontFamily: fonts.semibold, fontSize: 20, lineHeight: 26 },
  body: { fontFamily: fonts.regular, fontSize: 17, lineHeight: 24 },
  bodyStrong: { fontFamily: fonts.semibold, fontSize: 17, lineHeight: 24 },
  label: { fontFamily: fonts.semibold, fontSize: 15, lineHeight: 20 },
  caption: { fontFamily: fonts.regular, fontSize: 14, lineHeight: 20 },
  overline: { fontFamily: fonts.semibold, fontSize: 13, lineHeight: 16, letterSpacing: 1.2 },
} as const;

export type TypeVariant = keyof typeof typography;

export const layout = {
  /** Width at which the bottom tab bar gives way to a side rail. */
  wideBreakpoint: 1024,
  /** Below this width tables with several columns become stacked cards (phones). */
  phoneMaxWidth: 600,
  railWidth: 232,
  contentMaxWidth: 880,
  wideContentMaxWidth: 1200,
  formMaxWidth: 440,
} as const;
