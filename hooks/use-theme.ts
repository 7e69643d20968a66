import { useColorScheme } from 'react-native';
import { colors, type Theme } from '@/constants/theme';

/** The colour tokens for the system's light or dark appearance. */
export function useTheme(): Theme {
  const scheme = useColorScheme() === 'dark' ? 'dark' : 'light';
  return { scheme, colors: colors[scheme] };
}
