// Metro configuration: Expo's defaults plus bundle-size fixes, all in zod: parts of it the app never runs.
const path = require('node:path');
const { getDefaultConfig } = require('expo/metro-config');

const config = getDefaultConfig(__dirname);

// zod 4 re-exports every locale (about 300 KB) through `locales/index`; Ritorno only uses the English
// messages, which zod imports from `locales/en` directly. Point the index at an empty module.
const zodLocalesIndex = /[\\/]zod[\\/]v4[\\/]locales[\\/]index\.c?js$/;
const emptyLocales = path.resolve(__dirname, 'lib/stubs/zod-locales.js');

// zod's conversion to and from JSON Schema (about 38 KB) rides along with every schema class, but the
// app never converts a schema: the three modules that hold it (and the generator built on them) are
// replaced by one that throws if called. The server, under Node, keeps the real ones.
const zodJsonSchema = /[\\/]zod[\\/]v4[\\/](core[\\/](json-schema-processors|to-json-schema|json-schema-generator)|classic[\\/]from-json-schema)\.c?js$/;
const jsonSchemaStub = path.resolve(__dirname, 'lib/stubs/zod-json-schema.js');

// zod's ahead-of-time compiler (`z.compile`, about 30 KB) is opt-in and unused here; parsing never calls it.
const zodCompile = /[\\/]zod[\\/]v4[\\/]core[\\/]compile\.c?js$/;
const compileStub = path.resolve(__dirname, 'lib/stubs/zod-compile.js');

const resolveRequest = config.resolver.resolveRequest;
config.resolver.resolveRequest = (context, moduleName, platform) => {
  const resolved = resolveRequest
    ? resolveRequest(context, moduleName, platform)
    : context.resolveRequest(context, moduleName, platform);
  if (resolved.type === 'sourceFile' && zodLocalesIndex.test(resolved.filePath)) {
    return { type: 'sourceFile', filePath: emptyLocales };
  }
  if (resolved.type === 'sourceFile' && zodJsonSchema.test(resolved.filePath)) {
    return { type: 'sourceFile', filePath: jsonSchemaStub };
  }
  if (resolved.type === 'sourceFile' && zodCompile.test(resolved.filePath)) {
    return { type: 'sourceFile', filePath: compileStub };
  }
  return resolved;
};

module.exports = config;
