/** @type {import('jest').Config} */
module.exports = {
  testEnvironment: 'node',
  roots: ['<rootDir>/test'],
  testMatch: ['**/*.test.ts'],
  transform: {
    '^.+\\.ts$': ['ts-jest', { tsconfig: 'tsconfig.json', diagnostics: { warnOnly: false } }],
  },
  moduleFileExtensions: ['ts', 'js', 'json'],
  // Generous: a busy shared machine runs the spawning suites several times slower.
  testTimeout: 120000,
  // Two workers even on two cores: many suites wait on child processes (the runner, webpack,
  // LibreOffice, the browser) rather than compute.
  maxWorkers: 2,
};
