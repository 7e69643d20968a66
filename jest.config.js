/** One jest run, two projects: "node" for shared/ and server/, "app" for components (jest-expo). */
const esmPackages = [
  'better-auth',
  '@better-auth',
  'better-call',
  'jose',
  'nanostores',
  '@noble',
  'defu',
  'rou3',
  'uncrypto',
  'kysely',
];

// Two cores shared by both projects and the servers some tests start: give each test room.
const testTimeout = 30_000;

module.exports = {
  testTimeout,
  projects: [
    {
      displayName: 'node',
      testEnvironment: 'node',
      roots: ['<rootDir>/tests/shared', '<rootDir>/tests/server'],
      transform: {
        '^.+\\.(mjs|cjs|js|jsx|ts|tsx)$': [
          'babel-jest',
          { presets: ['babel-preset-expo'], plugins: ['dynamic-import-node'] },
        ],
      },
      transformIgnorePatterns: [`/node_modules/(?!(${esmPackages.join('|')})/)`],
      moduleNameMapper: { '^@/(.*)$': '<rootDir>/$1' },
    },
    {
      displayName: 'app',
      preset: 'jest-expo',
      roots: ['<rootDir>/tests/app'],
      moduleNameMapper: {
        // The same zod stand-ins as the web bundle (metro.config.js), so these tests prove the forms and
        // the API client work without zod's locale index, JSON Schema conversion and compiler.
        '^\\.\\./locales/index\\.c?js$': '<rootDir>/lib/stubs/zod-locales.js',
        '^(\\.\\./core/|\\./)(json-schema-processors|to-json-schema|json-schema-generator|from-json-schema)\\.c?js$':
          '<rootDir>/lib/stubs/zod-json-schema.js',
        '^\\./compile\\.c?js$': '<rootDir>/lib/stubs/zod-compile.js',
        '^@/(.*)$': '<rootDir>/$1',
      },
    },
  ],
};
