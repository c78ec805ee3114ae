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
  testTimeout: 30000,
  maxWorkers: 2,
};
