// Sightline's own palette (listed in DEVELOPERS.md). State is always also written in words.
// Every text/background pair used is checked against WCAG 2.1 contrast in tests/shared/contrast.test.ts.
export const colors = {
  ink: '#1B2430',
  paper: '#F7F5F0',
  surface: '#FFFFFF',
  accent: '#B85227',
  pass: '#2F7D4F',
  rework: '#96600F',
  fail: '#B42318',
  muted: '#636A77',
  line: '#DDD8CE',
  focus: '#1F5FBF',
  // Tints and the dark sidebar.
  selectedRow: '#FDF5F1',
  suggestion: '#FDF6F2',
  plot: '#FBFAF7',
  sidebarActive: '#2A3544',
  sidebarText: '#C9CED6',
} as const;

// Public Sans arrives just after the first screen (see app/_layout.tsx); until then, and if it
// ever fails, the system's sans-serif face stands in.
const withFallback = (face: string) => `${face}, system-ui, -apple-system, "Segoe UI", Roboto, sans-serif`;
export const fonts = {
  regular: withFallback('PublicSans_400Regular'),
  semibold: withFallback('PublicSans_600SemiBold'),
  bold: withFallback('PublicSans_700Bold'),
} as const;

export const space = { xs: 4, sm: 8, md: 12, lg: 16, xl: 24, xxl: 32 } as const;

export const WIDE_BREAKPOINT = 1024;
// Below this width, the Queue, Jobs and Users lists are cards rather than tables.
export const CARDS_BELOW = 700;

// The pairs the screens put together: text (4.5:1) or large text and UI parts (3:1).
export const CONTRAST_PAIRS: { name: string; foreground: string; background: string; minimum: 4.5 | 3 }[] = [
  ...(['ink', 'muted', 'accent', 'pass', 'rework', 'fail', 'focus'] as const).flatMap((fg) =>
    (['surface', 'paper', 'selectedRow', 'suggestion', 'plot'] as const).map((bg) => ({
      name: `${fg} on ${bg}`,
      foreground: colors[fg],
      background: colors[bg],
      minimum: 4.5 as const,
    })),
  ),
  ...(['accent', 'pass', 'rework', 'fail', 'ink', 'muted'] as const).map((fill) => ({
    name: `white text on ${fill}`,
    foreground: colors.surface,
    background: colors[fill],
    minimum: 4.5 as const,
  })),
  { name: 'sidebar text on ink', foreground: colors.sidebarText, background: colors.ink, minimum: 4.5 },
  { name: 'sidebar text on active item', foreground: colors.sidebarText, background: colors.sidebarActive, minimum: 4.5 },
  { name: 'white on active sidebar item', foreground: colors.surface, background: colors.sidebarActive, minimum: 4.5 },
  { name: 'field border on surface', foreground: colors.muted, background: colors.surface, minimum: 3 },
  { name: 'focus ring on surface', foreground: colors.focus, background: colors.surface, minimum: 3 },
  { name: 'focus ring on paper', foreground: colors.focus, background: colors.paper, minimum: 3 },
  // On dark fills the ring is drawn with a white halo (components/ui/focus-style): white vs ink.
  { name: 'focus halo on ink', foreground: colors.surface, background: colors.ink, minimum: 3 },
];
