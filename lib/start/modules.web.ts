import type { Step } from '@/lib/start-in-steps';

/* eslint-disable @typescript-eslint/no-require-imports -- each step runs its modules when it is called. */

/**
 * The libraries the first screen needs, in the order their modules would run anyway, cut where a step
 * would take a slow phone longer than a frame or two. Each path is a module the app already loads (a
 * path that no longer exists fails the build). Packages with separate builds for `import` and `require`
 * (zod, TanStack Query, the form library) are reached through a file that imports them, so the step runs
 * the same copy as the app rather than bundling a second one.
 */
export const libraryModules: readonly [string, Step][] = [
  ['react-dom', () => require('react-dom/client')],
  ['style prefixes', () => require('react-native-web/dist/modules/prefixStyles')],
  ['style compiler', () => require('react-native-web/dist/exports/StyleSheet/compiler')],
  ['style sheet', () => require('react-native-web/dist/exports/StyleSheet')],
  ['dom props', () => require('react-native-web/dist/modules/createDOMProps')],
  ['view', () => require('react-native-web/dist/exports/View')],
  ['text', () => require('react-native-web/dist/exports/Text')],
  ['text input', () => require('react-native-web/dist/exports/TextInput')],
  ['pressable', () => require('react-native-web/dist/exports/Pressable')],
  ['image', () => require('react-native-web/dist/exports/Image')],
  ['scroll view', () => require('react-native-web/dist/exports/ScrollView')],
  ['virtualized list', () => require('react-native-web/dist/exports/VirtualizedList')],
  ['flat list', () => require('react-native-web/dist/exports/FlatList')],
  ['section list', () => require('react-native-web/dist/exports/SectionList')],
  ['animated', () => require('react-native-web/dist/exports/Animated')],
  ['react-native-web', () => require('react-native')],
  ['expo modules', () => require('expo-modules-core')],
  ['routers', () => require('expo-router/build/react-navigation/routers')],
  ['navigation container', () => require('expo-router/build/react-navigation/core/BaseNavigationContainer')],
  ['navigator builder', () => require('expo-router/build/react-navigation/core/useNavigationBuilder')],
  ['navigation paths', () => require('expo-router/build/react-navigation/core/getStateFromPath')],
  ['navigation core', () => require('expo-router/build/react-navigation/core')],
  ['navigation', () => require('expo-router/build/react-navigation/native')],
  ['navigation elements', () => require('expo-router/build/react-navigation/elements')],
  ['route tree', () => require('expo-router/build/getRoutes')],
  ['router screens', () => require('expo-router/build/useScreens')],
  ['router linking', () => require('expo-router/build/getLinkingConfig')],
  ['router store', () => require('expo-router/build/global-state/router-store')],
  ['router container', () => require('expo-router/build/fork/NavigationContainer')],
  ['router root', () => require('expo-router/build/ExpoRoot')],
  ['router hooks', () => require('expo-router/build/hooks')],
  ['router views', () => require('expo-router/build/views/Sitemap')],
  ['tabs', () => require('expo-router/build/layouts/Tabs')],
  ['stack', () => require('expo-router/build/layouts/experimental-stack')],
  ['link', () => require('expo-router/build/link')],
  ['expo-router', () => require('expo-router')],
  ['zod core', () => require('./zod-core')],
  ['zod', () => require('./zod')],
  ['query', () => require('./query')],
  ['forms', () => require('./forms')],
  // The app's own largest schemas, built when their modules run (the signed-in layout's reads need them).
  ['day schema', () => require('@/shared/schemas/today')],
  ['musician schema', () => require('@/shared/schemas/musician')],
];
