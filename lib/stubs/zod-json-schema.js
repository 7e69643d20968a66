// Stands in for zod's JSON Schema conversion (to and from JSON Schema, about 38 KB) in the app bundle
// (see metro.config.js). The app only parses and validates; nothing on the client converts a schema.
// Every export of the replaced modules is kept by name, so a caller fails loudly rather than on
// `undefined is not a function`.
'use strict';

function unavailable() {
  throw new Error('zod JSON Schema conversion is not part of the web bundle (metro.config.js).');
}

const functionNames = [
  // core/json-schema-processors
  'aggregateChecks', 'stringProcessor', 'numberProcessor', 'booleanProcessor', 'bigintProcessor',
  'symbolProcessor', 'nullProcessor', 'undefinedProcessor', 'voidProcessor', 'neverProcessor',
  'anyProcessor', 'unknownProcessor', 'dateProcessor', 'enumProcessor', 'literalProcessor', 'nanProcessor',
  'templateLiteralProcessor', 'fileProcessor', 'successProcessor', 'customProcessor', 'functionProcessor',
  'transformProcessor', 'mapProcessor', 'setProcessor', 'arrayProcessor', 'objectProcessor',
  'unionProcessor', 'intersectionProcessor', 'tupleProcessor', 'recordProcessor', 'nullableProcessor',
  'nonoptionalProcessor', 'defaultProcessor', 'prefaultProcessor', 'catchProcessor', 'pipeProcessor',
  'readonlyProcessor', 'promiseProcessor', 'optionalProcessor', 'lazyProcessor', 'toJSONSchema',
  // core/to-json-schema
  'initializeContext', 'handleUnrepresentable', 'processSchema', 'process', 'extractDefs', 'finalize',
  // classic/from-json-schema and core/json-schema-generator
  'fromJSONSchema', 'JSONSchemaGenerator',
];

Object.defineProperty(exports, '__esModule', { value: true });
for (const name of functionNames) exports[name] = unavailable;
exports.allProcessors = {};
// Called when a schema is built or its `~standard` property is read: they must return a function.
exports.createToJSONSchemaMethod = () => unavailable;
exports.createStandardJSONSchemaMethod = () => unavailable;
