/**
 * A stand-in for Excel's `CustomFunctions` global: an `Error` class with code and message,
 * the `ErrorCode` values Excel uses, and an `associate` that records id → function.
 */

export const ERROR_CODES = {
  invalidValue: '#VALUE!',
  notAvailable: '#N/A',
  divisionByZero: '#DIV/0!',
  invalidNumber: '#NUM!',
  nullReference: '#NULL!',
  invalidName: '#NAME?',
  invalidReference: '#REF!',
} as const;

export class StubError {
  readonly code: string;
  readonly message: string | undefined;
  constructor(code: string, message?: string) {
    this.code = code;
    this.message = message;
  }
}

export interface CustomFunctionsStub {
  Error: typeof StubError;
  ErrorCode: typeof ERROR_CODES;
  associate: (id: string, fn: (...args: unknown[]) => unknown) => void;
  /** What `associate` was called with, in order. */
  readonly calls: [string, (...args: unknown[]) => unknown][];
  readonly associations: Map<string, (...args: unknown[]) => unknown>;
}

export function makeCustomFunctionsStub(): CustomFunctionsStub {
  const calls: [string, (...args: unknown[]) => unknown][] = [];
  const associations = new Map<string, (...args: unknown[]) => unknown>();
  return {
    Error: StubError,
    ErrorCode: ERROR_CODES,
    associate(id, fn) {
      calls.push([id, fn]);
      associations.set(id, fn);
    },
    calls,
    associations,
  };
}

/** Installs a fresh stub as the global `CustomFunctions` and returns it. */
export function installCustomFunctionsStub(): CustomFunctionsStub {
  const stub = makeCustomFunctionsStub();
  (globalThis as unknown as { CustomFunctions: CustomFunctionsStub }).CustomFunctions = stub;
  return stub;
}
