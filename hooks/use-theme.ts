import { useSyncExternalStore } from 'react';
import { Appearance } from 'react-native';
import { colors, type Theme } from '@/constants/theme';

function subscribe(onChange: () => void): () => void {
  const subscription = Appearance.addChangeListener(onChange);
  return () => subscription.remove();
}

const systemScheme = () => (Appearance.getColorScheme() === 'dark' ? 'dark' : 'light');
// The server draws web pages light (this is its snapshot); in the browser the app follows the system.
const prerenderedScheme = () => 'light' as const;

/** The colour tokens for the system's light or dark appearance. */
export function useTheme(): Theme {
  const scheme = useSyncExternalStore(subscribe, systemScheme, prerenderedScheme);
  return { scheme, colors: colors[scheme] };
}
