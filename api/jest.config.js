/** Jest in ESM mode (NestJS 12 is ESM-only): ts-jest compiles, `.js` import suffixes map back to `.ts`. */
export default {
  testEnvironment: 'node',
  rootDir: '.',
  roots: ['<rootDir>/src', '<rootDir>/test'],
  testMatch: ['**/*.spec.ts', '**/*.e2e-spec.ts'],
  extensionsToTreatAsEsm: ['.ts'],
  moduleNameMapper: { '^(\\.{1,2}/.*)\\.js$': '$1' },
  transform: {
    '^.+\\.ts$': ['ts-jest', { useESM: true, isolatedModules: true, tsconfig: '<rootDir>/tsconfig.json' }],
  },
  // Demo-data suites hash eight passwords with scrypt at start; on a busy two-core machine that alone can take 30 s.
  testTimeout: 90000,
  maxWorkers: 2,
};
