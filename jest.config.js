/** @type {import('jest').Config} */
module.exports = {
  testEnvironment: 'node',
  roots: ['<rootDir>/test'],
  testMatch: ['**/*.test.ts'],
  transform: {
    '^.+\\.ts$': ['ts-jest', { tsconfig: 'tsconfig.json', diagnostics: { warnOnly: false } }],
  },
  moduleFileExtensions: ['ts', 'js', 'json'],
  testTimeout: 60000,
  // Two workers even on two cores: many suites wait on child processes (the runner, webpack,
  // LibreOffice, the browser) rather than compute.
  maxWorkers: 2,
};
