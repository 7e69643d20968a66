import { useEffect } from 'react';
import { Platform } from 'react-native';
import { QueryClientProvider } from '@tanstack/react-query';
import { DarkTheme, DefaultTheme, Slot, ThemeProvider } from 'expo-router';
import { FontDisplay, useFonts, type FontSource } from 'expo-font';
import * as SplashScreen from 'expo-splash-screen';
import { StatusBar } from 'expo-status-bar';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import { fontFiles } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import { queryClient } from '@/lib/query-client';

// Hold the splash screen until the fonts are in, so text never jumps from one face to another.
SplashScreen.preventAutoHideAsync().catch(() => undefined);

// On the web, waiting for four font files before the first paint cost seconds on a slow phone
// connection: there every family is followed by a system stack (constants/theme.ts), text shows at once
// in it and the face swaps in when it arrives (font-display: swap). Native apps keep the splash hold.
const onWeb = Platform.OS === 'web';
const fontSources: Record<string, FontSource> = onWeb
  ? Object.fromEntries(Object.entries(fontFiles).map(([name, uri]) => [name, { uri, display: FontDisplay.SWAP }]))
  : fontFiles;

export default function RootLayout() {
  const [fontsLoaded, fontError] = useFonts(fontSources);
  const { scheme, colors } = useTheme();

  useEffect(() => {
    if (fontsLoaded || fontError) SplashScreen.hideAsync().catch(() => undefined);
  }, [fontsLoaded, fontError]);

  if (!fontsLoaded && !fontError && !onWeb) return null;

  const base = scheme === 'dark' ? DarkTheme : DefaultTheme;
  const navigationTheme = {
    ...base,
    colors: {
      ...base.colors,
      primary: colors.primary,
      background: colors.background,
      card: colors.surface,
      text: colors.text,
      border: colors.border,
      notification: colors.accent,
    },
  };

  return (
    <SafeAreaProvider>
      <QueryClientProvider client={queryClient}>
        <ThemeProvider value={navigationTheme}>
          <StatusBar style={scheme === 'dark' ? 'light' : 'dark'} />
          <Slot />
        </ThemeProvider>
      </QueryClientProvider>
    </SafeAreaProvider>
  );
}
