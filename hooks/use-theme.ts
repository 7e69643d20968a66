import { useSyncExternalStore } from 'react';
import { Appearance } from 'react-native';
import { colors, type Theme } from '@/constants/theme';

function subscribe(onChange: () => void): () => void {
  const subscription = Appearance.addChangeListener(onChange);
  return () => subscription.remove();
}

const systemScheme = () => (Appearance.getColorScheme() === 'dark' ? 'dark' : 'light');
// Pre-rendered web pages are light; taking one over, React starts from that and then follows the system.
const prerenderedScheme = () => 'light' as const;

/** The colour tokens for the system's light or dark appearance. */
export function useTheme(): Theme {
  const scheme = useSyncExternalStore(subscribe, systemScheme, prerenderedScheme);
  return { scheme, colors: colors[scheme] };
}
