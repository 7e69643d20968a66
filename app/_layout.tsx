import { useEffect } from 'react';
import { Platform } from 'react-native';
import { QueryClientProvider } from '@tanstack/react-query';
import { DarkTheme, DefaultTheme, Slot, ThemeProvider } from 'expo-router';
import { FontDisplay, loadAsync, useFonts } from 'expo-font';
import Head from 'expo-router/head';
import * as SplashScreen from 'expo-splash-screen';
import { StatusBar } from 'expo-status-bar';
import { fontFiles } from '@/constants/theme';
import { useTheme } from '@/hooks/use-theme';
import { queryClient } from '@/lib/query-client';

// Hold the splash screen until the fonts are in, so text never jumps from one face to another.
SplashScreen.preventAutoHideAsync().catch(() => undefined);

// On the web, waiting for four font files before the first paint cost seconds on a slow phone
// connection: there every family is followed by a system stack (constants/theme.ts), text shows at once
// in it and the face swaps in when it arrives (font-display: swap). Native apps keep the splash hold.
// The web pages are pre-rendered, and the fonts are asked for only in the browser, once this module
// runs: registered during pre-rendering, every page would preload them and they would compete with the
// app's script on a slow connection. (The icon font: components/ui/icon.tsx.)
const onWeb = Platform.OS === 'web';
if (onWeb && typeof window !== 'undefined') {
  const webFonts = Object.entries(fontFiles).map(([name, uri]) => [name, { uri, display: FontDisplay.SWAP }]);
  loadAsync(Object.fromEntries(webFonts)).catch(() => undefined);
}

export default function RootLayout() {
  const [fontsLoaded, fontError] = useFonts(onWeb ? {} : fontFiles);
  const { scheme, colors } = useTheme();

  useEffect(() => {
    if (fontsLoaded || fontError) SplashScreen.hideAsync().catch(() => undefined);
  }, [fontsLoaded, fontError]);

  // Wide and dark screens keep the pre-rendered (phone, light) page hidden until React has redrawn it
  // for them (+html.tsx): they see the page once, as before, instead of a phone page that then changes.
  // Effects run once React has taken the page over; the screens below find the width and scheme changed
  // in their own effects, just before this one, and React redraws them before the browser paints again.
  // (A state flip here instead would draw the whole app a second time.)
  useEffect(() => {
    if (onWeb) document.getElementById('root')?.setAttribute('data-ready', 'true');
  }, []);

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
    // expo-router already wraps the app in the safe-area provider the screens read their insets from.
    <>
      <Head>
        <title>Ritorno</title>
      </Head>
      <QueryClientProvider client={queryClient}>
        <ThemeProvider value={navigationTheme}>
          <StatusBar style={scheme === 'dark' ? 'light' : 'dark'} />
          <Slot />
        </ThemeProvider>
      </QueryClientProvider>
    </>
  );
}
