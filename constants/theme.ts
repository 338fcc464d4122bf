// Overstrand's look (docs/product.md "Look"): calm light paper for the app, chalk on slate for the
// canvas. One place for colours, type and spacing so screens never invent their own.

/** The light, typographic UI around the canvas. */
export const colors = {
  paper: '#F6F4EF',
  surface: '#FFFFFF',
  sunken: '#EEEBE4',
  line: '#DEDAD1',
  ink: '#1C2227',
  inkMuted: '#59636B',
  inkFaint: '#8A9298',
  accent: '#1F5F74',
  accentPressed: '#184C5D',
  accentSoft: '#E1ECEF',
  onAccent: '#FFFFFF',
  danger: '#A4321F',
  dangerSoft: '#F8E7E2',
  success: '#2D6E47',
  successSoft: '#E3F0E7',
  /** Behind a dialog or sheet. */
  scrim: 'rgba(28,34,39,0.45)',
} as const;

/** Shadows of raised pieces: a dialog card, the chosen option of a segmented choice. */
export const shadows = {
  card: '0 12px 40px rgba(28,34,39,0.25)',
  chosen: '0 1px 2px rgba(28,34,39,0.12)',
} as const;

/** The Slate: a dark board surface the chalk strands are drawn on. */
export const slate = {
  surface: '#22292E',
  raised: '#2C343A',
  grid: '#37414858',
  chalkDim: '#9AA4AA',
  /** A drawing problem marked on the canvas (a retrace, a crossing that cannot be read). */
  warn: '#FF8A73',
  warnFill: '#FF8A7333',
  warnText: '#FFB3A3',
  /** Bands (Bands tool): a violet apart from every chalk colour, drawn as a translucent ribbon. */
  band: '#C9A7FF',
} as const;

/**
 * One chalk colour per link component, in this order. Based on the Okabe-Ito palette
 * (Okabe & Ito, "Color Universal Design", 2002/2008), which stays distinguishable under the
 * common colour-vision deficiencies; each hue is lightened so it reads on the dark slate
 * (contrast >= 4.5:1 against slate.surface). Black becomes chalk white.
 */
export const chalk = [
  '#F3F0E8', // white (Okabe-Ito black)
  '#F5B335', // orange
  '#8FD3F7', // sky blue
  '#2FC79C', // bluish green
  '#F2E76B', // yellow
  '#5EA2EC', // blue
  '#F27D42', // vermillion
  '#E49BCB', // reddish purple
] as const;

/** Chalk colour of component i (wraps after eight; the Readout labels components by number too). */
export function chalkFor(component: number): string {
  return chalk[((component % chalk.length) + chalk.length) % chalk.length];
}

/** Font families as loaded by the root layout (names match the useFonts map). */
export const fonts = {
  regular: 'PlexSans-Regular',
  medium: 'PlexSans-Medium',
  semibold: 'PlexSans-SemiBold',
  mono: 'PlexMono-Regular',
  monoMedium: 'PlexMono-Medium',
} as const;

export const type = {
  display: { fontFamily: fonts.semibold, fontSize: 28, lineHeight: 34, letterSpacing: -0.3 },
  title: { fontFamily: fonts.semibold, fontSize: 20, lineHeight: 26 },
  heading: { fontFamily: fonts.medium, fontSize: 16, lineHeight: 22 },
  body: { fontFamily: fonts.regular, fontSize: 16, lineHeight: 24 },
  small: { fontFamily: fonts.regular, fontSize: 14, lineHeight: 20 },
  label: { fontFamily: fonts.medium, fontSize: 13, lineHeight: 18, letterSpacing: 0.2 },
  caps: { fontFamily: fonts.medium, fontSize: 12, lineHeight: 16, letterSpacing: 1.1, textTransform: 'uppercase' as const },
  code: { fontFamily: fonts.mono, fontSize: 14, lineHeight: 20 },
} as const;

export const space = { xs: 4, sm: 8, md: 12, lg: 16, xl: 24, xxl: 32, xxxl: 48 } as const;
export const radius = { sm: 6, md: 10, lg: 14, pill: 999 } as const;

/** Width at which the app switches from bottom tabs to a side rail with split panes. */
export const WIDE_BREAKPOINT = 1024;
/** A detail page wide enough, beside the list pane, for two columns of its own (a shared sketch and its discussion). */
export const TWO_COLUMN_BREAKPOINT = 1280;
/** Readable line length for forms and text columns. */
export const COLUMN_MAX = 560;
/** Smallest comfortable touch target (one-handed use on a phone). */
export const TOUCH = 48;
