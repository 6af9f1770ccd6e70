/**
 * ESM all the way (Nest 12 ships only ESM): run with NODE_OPTIONS=--experimental-vm-modules.
 * tsconfig's isolatedModules makes ts-jest transpile file by file; tsc -b does the type check.
 */
export default {
  rootDir: '.',
  testEnvironment: 'node',
  testMatch: ['<rootDir>/test/**/*.e2e-spec.ts'],
  extensionsToTreatAsEsm: ['.ts'],
  // Sources import each other as './x.js' (NodeNext); jest resolves the .ts file instead.
  moduleNameMapper: { '^(\\.{1,2}/.*)\\.js$': '$1' },
  transform: {
    '^.+\\.ts$': ['ts-jest', { useESM: true, tsconfig: 'tsconfig.json' }],
  },
  testTimeout: 30000,
};
