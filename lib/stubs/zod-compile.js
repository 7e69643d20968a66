// Stands in for zod's opt-in ahead-of-time compiler (`z.compile`, about 30 KB) in the app bundle (see
// metro.config.js). Parsing never goes through it unless a schema is compiled, and the app compiles none.
'use strict';

function unavailable() {
  throw new Error('zod compile() is not part of the web bundle (metro.config.js).');
}

class ZodCompileAsyncError extends Error {}
class ZodCompileUnsupportedError extends Error {}

Object.defineProperty(exports, '__esModule', { value: true });
exports.INVALID = Symbol.for('zod.compile.invalid');
exports.ZodCompileAsyncError = ZodCompileAsyncError;
exports.ZodCompileUnsupportedError = ZodCompileUnsupportedError;
exports.compile = unavailable;
exports.withParser = unavailable;
exports.compileFn = unavailable;
