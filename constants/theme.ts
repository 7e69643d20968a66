import { Platform } from 'react-native';

/**
 * Ritorno's design tokens: the only place colours, spacing, radii and type live.
 * A warm paper-and-plum palette; every text/background pair aims at WCAG AA contrast.
 */
const light = {
  background: '#F6F3EE',
  surface: '#FFFDF9',
  surfaceMuted: '#EFE8DE',
  text: '#2A211C',
  textMuted: '#66584E',
  primary: '#6B3A5A',
  primaryPressed: '#542C46',
  onPrimary: '#FFF8FB',
  accent: '#B65F3A',
  border: '#DDD2C5',
  borderStrong: '#B9AA99',
  danger: '#A3261D',
  dangerSurface: '#FBE9E6',
  warning: '#855400',
  warningSurface: '#FBF0D9',
  success: '#3B6E45',
  successSurface: '#E6F1E4',
  info: '#55606E',
  infoSurface: '#ECEDEF',
  focus: '#C0702F',
  overlay: 'rgba(42, 33, 28, 0.35)',
};

export type ColorTokens = typeof light;

const dark: ColorTokens = {
  background: '#1A1512',
  surface: '#25201C',
  surfaceMuted: '#302924',
  text: '#F3ECE4',
  textMuted: '#BBAC9F',
  primary: '#DDB0CD',
  primaryPressed: '#C994B6',
  onPrimary: '#2B1424',
  accent: '#E39A73',
  border: '#3E352F',
  borderStrong: '#5C5048',
  danger: '#F2B6B0',
  dangerSurface: '#3D1E1B',
  warning: '#EBC47C',
  warningSurface: '#3A2D14',
  success: '#A5D4AC',
  successSurface: '#1F3223',
  info: '#C3CAD3',
  infoSurface: '#2A2D31',
  focus: '#F0A868',
  overlay: 'rgba(0, 0, 0, 0.5)',
};

export const colors = { light, dark };
export type ColorSchemeName = keyof typeof colors;

export const spacing = { xxs: 2, xs: 4, sm: 8, md: 12, lg: 16, xl: 24, xxl: 32, xxxl: 48 } as const;

export const radii = { sm: 6, md: 10, lg: 16, pill: 999 } as const;

/** Smallest comfortable touch target (WCAG 2.5.5 and platform guidance agree on about 44 px). */
export const touchTarget = 44;

export const maxContentWidth = 1120;
export const maxFormWidth = 440;
export const sideNavWidth = 248;

export const breakpoints = { medium: 768, wide: 1024 } as const;

const webFallback = 'system-ui, -apple-system, "Segoe UI", Roboto, "Helvetica Neue", Arial, sans-serif';
const webSerifFallback = 'Georgia, "Times New Roman", serif';

/** Names registered with expo-font in app/_layout.tsx; on the web a system stack follows each one. */
export const fontFiles = {
  Figtree_400Regular: require('../assets/fonts/Figtree_400Regular.ttf'),
  Figtree_500Medium: require('../assets/fonts/Figtree_500Medium.ttf'),
  Figtree_600SemiBold: require('../assets/fonts/Figtree_600SemiBold.ttf'),
  Fraunces_600SemiBold: require('../assets/fonts/Fraunces_600SemiBold.ttf'),
};

function family(name: keyof typeof fontFiles, fallback: string): string {
  return Platform.OS === 'web' ? `${name}, ${fallback}` : name;
}

export const fonts = {
  body: family('Figtree_400Regular', webFallback),
  medium: family('Figtree_500Medium', webFallback),
  bold: family('Figtree_600SemiBold', webFallback),
  display: family('Fraunces_600SemiBold', webSerifFallback),
};

export const fontSizes = { xs: 12, sm: 14, md: 16, lg: 18, xl: 22, xxl: 28, display: 34 } as const;
export const lineHeights = { xs: 16, sm: 20, md: 24, lg: 26, xl: 30, xxl: 36, display: 42 } as const;

export interface Theme {
  scheme: ColorSchemeName;
  colors: ColorTokens;
}
