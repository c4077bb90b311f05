/** @type {import('jest').Config} */
module.exports = {
  testEnvironment: 'node',
  roots: ['<rootDir>/test'],
  testMatch: ['**/*.test.ts'],
  // The benchmark harness (spawns the runner and LibreOffice, 70–215 s) is not part of the
  // default run: `npm run test:bench` runs it.
  testPathIgnorePatterns: ['/node_modules/', '<rootDir>/test/bench/'],
  transform: {
    '^.+\\.ts$': ['ts-jest', { tsconfig: 'tsconfig.jest.json', diagnostics: { warnOnly: false } }],
  },
  moduleFileExtensions: ['ts', 'js', 'json'],
  // Generous: a busy shared machine runs the spawning suites several times slower.
  testTimeout: 120000,
  // Two workers even on two cores: many suites wait on child processes (the runner, webpack,
  // LibreOffice, the browser) rather than compute.
  maxWorkers: 2,
};
