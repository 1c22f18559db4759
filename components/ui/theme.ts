// Sightline's own palette (listed in DEVELOPERS.md). State is always also written in words.
export const colors = {
  ink: '#1B2430',
  paper: '#F7F5F0',
  surface: '#FFFFFF',
  accent: '#C4572A',
  pass: '#2F7D4F',
  rework: '#A86A12',
  fail: '#B42318',
  muted: '#6B7280',
  line: '#DDD8CE',
  focus: '#1F5FBF',
} as const;

export const fonts = {
  regular: 'PublicSans_400Regular',
  semibold: 'PublicSans_600SemiBold',
  bold: 'PublicSans_700Bold',
} as const;

export const space = { xs: 4, sm: 8, md: 12, lg: 16, xl: 24, xxl: 32 } as const;

export const WIDE_BREAKPOINT = 1024;
