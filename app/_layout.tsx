import { useEffect, useLayoutEffect, useState } from 'react';
import { Platform } from 'react-native';
import { QueryClientProvider } from '@tanstack/react-query';
import { DarkTheme, DefaultTheme, Slot, ThemeProvider } from 'expo-router';
import { FontDisplay, loadAsync, useFonts } from 'expo-font';
import Head from 'expo-router/head';
import * as SplashScreen from 'expo-splash-screen';
import { StatusBar } from 'expo-status-bar';
import { fontFiles } from '@/constants/theme';
import { seedFirstReads, useServedReads } from '@/hooks/use-first-reads';
import { useTheme } from '@/hooks/use-theme';
import { restorePreviewScroll } from '@/lib/preview-scroll';
import { createQueryClient, queryClient } from '@/lib/query-client';

// Hold the splash screen until the fonts are in, so text never jumps from one face to another.
SplashScreen.preventAutoHideAsync().catch(() => undefined);

// On the web the four faces are declared in every page the server draws, with preloads (expo-font
// collects them while the server renders this layout: registered per render, since each render starts
// afresh). The server's page and the app's copy of it are then drawn in the same faces, and the copy
// does not land as a larger, later paint. font-display: fallback: text waits at most a moment for its
// face, then shows in the system stack that follows every family (constants/theme.ts). Native apps keep
// the splash hold. (The icon font: components/ui/icon.tsx.)
const onWeb = Platform.OS === 'web';
const webFonts = Object.fromEntries(Object.entries(fontFiles).map(([name, uri]) => [name, { uri, display: FontDisplay.FALLBACK }]));
if (onWeb && typeof window !== 'undefined') loadAsync(webFonts).catch(() => undefined);

export default function RootLayout() {
  if (onWeb && typeof window === 'undefined') loadAsync(webFonts).catch(() => undefined);
  const [fontsLoaded, fontError] = useFonts(onWeb ? {} : fontFiles);
  const { scheme, colors } = useTheme();
  // The server draws each page for one visitor: a cache of its own per page it draws, never shared, with
  // the reads it answered for the page in it before anything below asks for them. (In the browser the
  // app's one cache has them already: index.ts puts them in before the first render.)
  const served = useServedReads();
  const [client] = useState(() => {
    if (typeof window !== 'undefined') return queryClient;
    const cache = createQueryClient();
    seedFirstReads(cache, served);
    return cache;
  });

  useEffect(() => {
    if (fontsLoaded || fontError) SplashScreen.hideAsync().catch(() => undefined);
  }, [fontsLoaded, fontError]);

  // The server draws each page for a phone in light mode; wide and dark screens keep it hidden until the
  // app has drawn its own copy for them (+html.tsx), and the copy is scrolled where its preview was left.
  useLayoutEffect(() => {
    if (!onWeb) return;
    restorePreviewScroll();
    document.getElementById('root')?.setAttribute('data-ready', 'true');
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
      <QueryClientProvider client={client}>
        <ThemeProvider value={navigationTheme}>
          <StatusBar style={scheme === 'dark' ? 'light' : 'dark'} />
          <Slot />
        </ThemeProvider>
      </QueryClientProvider>
    </>
  );
}
