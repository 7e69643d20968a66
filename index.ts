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
  // Each step is marked on the performance timeline ("start:<step>"), to see what a slow start spends.
  const steps = [...libraryModules, ...routeModules, ['render', render] as [string, Step]].map(
    ([name, step]): Step =>
      () => {
        performance.mark(`start:${name}`);
        step();
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
