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
      moduleNameMapper: { '^@/(.*)$': '<rootDir>/$1' },
    },
  ],
};
