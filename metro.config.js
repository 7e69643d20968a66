// Metro configuration: Expo's defaults plus one bundle-size fix.
const path = require('node:path');
const { getDefaultConfig } = require('expo/metro-config');

const config = getDefaultConfig(__dirname);

// zod 4 re-exports every locale (about 300 KB) through `locales/index`; Ritorno only uses the English
// messages, which zod imports from `locales/en` directly. Point the index at an empty module.
const zodLocalesIndex = /[\\/]zod[\\/]v4[\\/]locales[\\/]index\.c?js$/;
const emptyLocales = path.resolve(__dirname, 'lib/stubs/zod-locales.js');

const resolveRequest = config.resolver.resolveRequest;
config.resolver.resolveRequest = (context, moduleName, platform) => {
  const resolved = resolveRequest
    ? resolveRequest(context, moduleName, platform)
    : context.resolveRequest(context, moduleName, platform);
  if (resolved.type === 'sourceFile' && zodLocalesIndex.test(resolved.filePath)) {
    return { type: 'sourceFile', filePath: emptyLocales };
  }
  return resolved;
};

module.exports = config;
