// The app's entry (package.json "main"): expo-router's own entry, with its modules run in steps on the web.
// `@expo/metro-runtime` must come first (expo-router/entry-classic says why).
import '@expo/metro-runtime';
import { startInSteps, type Step } from '@/lib/start-in-steps';

/* eslint-disable @typescript-eslint/no-require-imports -- requires run the modules one step at a time. */

function render(): void {
  const { App } = require('expo-router/build/qualified-entry');
  const { renderRootComponent } = require('expo-router/build/renderRootComponent');
  renderRootComponent(App);
}

if (process.env.EXPO_OS === 'web' && typeof window !== 'undefined') {
  const { libraryModules } = require('./lib/start/modules') as typeof import('./lib/start/modules');
  const { ctx } = require('expo-router/_ctx') as { ctx: { keys(): string[]; (key: string): unknown } };
  // expo-router reads every route module before its first render; here each is its own step.
  const routeModules = ctx.keys().map((key): [string, Step] => [key, () => ctx(key)]);
  // The page arrives drawn by the server, with the data it was drawn with (server/middleware/web-export.ts).
  // The app draws its own copy in a render React can pause, and swaps it in whole (the server's page is
  // not hydrated: see DEVELOPERS.md, "Taking the page over"). The copy must be the same page: the
  // data goes into the query cache first, and a signed-in page waits for the signed-in screens, or the
  // copy would be the "Opening Ritorno" stand-in.
  const firstReads: Step = () => {
    const { readsInPage, seedFirstReads } = require('./hooks/use-first-reads') as typeof import('./hooks/use-first-reads');
    const { queryClient } = require('./lib/query-client') as typeof import('./lib/query-client');
    const { followPreviewScroll } = require('./lib/preview-scroll') as typeof import('./lib/preview-scroll');
    followPreviewScroll();
    const reads = readsInPage();
    seedFirstReads(queryClient, reads);
    if (!reads?.['/api/me']) return undefined;
    const { loadSignedInScreens } = require('./components/layout/lazy-screens') as typeof import('./components/layout/lazy-screens');
    // A failed download is the session gate's to show (it asks again).
    return loadSignedInScreens().catch(() => undefined);
  };
  // Each step is marked on the performance timeline ("start:<step>"), to see what a slow start spends.
  const steps = [...libraryModules, ...routeModules, ['first reads', firstReads] as [string, Step], ['render', render] as [string, Step]].map(
    ([name, step]): Step =>
      () => {
        performance.mark(`start:${name}`);
        return step();
      },
  );
  // A failing module is thrown again outside the promise, as an uncaught error like any other.
  startInSteps(steps).catch((error: unknown) => {
    setTimeout(() => {
      throw error;
    });
  });
} else {
  render();
}
