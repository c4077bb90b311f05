/**
 * Status lines: Office errors described, every outcome shown, nothing swallowed.
 */
import { describeOfficeError, runReported, type StatusKind } from '../../src/taskpane/status';

describe('describeOfficeError', () => {
  test('Office errors: message, code and location', () => {
    expect(
      describeOfficeError({
        name: 'RichApi.Error',
        code: 'ItemAlreadyExists',
        message: 'A resource with the same name or identifier already exists.',
        debugInfo: { errorLocation: 'WorksheetCollection.add' },
      }),
    ).toBe(
      'A resource with the same name or identifier already exists. (Excel error ItemAlreadyExists at WorksheetCollection.add)',
    );
  });
  test('plain errors, strings and odd values', () => {
    expect(describeOfficeError(new Error('boom'))).toBe('boom');
    expect(describeOfficeError('text')).toBe('text');
    expect(describeOfficeError(undefined)).toBe('Unknown error (undefined).');
    expect(describeOfficeError({})).toBe('Unknown error.');
  });
});

describe('runReported', () => {
  function sink() {
    const lines: [StatusKind, string][] = [];
    return { lines, show: (k: StatusKind, t: string) => lines.push([k, t]) };
  }
  test('progress, then success text from the result', async () => {
    const s = sink();
    const r = await runReported(
      'Doing it',
      async () => 42,
      s,
      (n) => `Did ${n}.`,
    );
    expect(r).toBe(42);
    expect(s.lines).toEqual([
      ['info', 'Doing it…'],
      ['success', 'Did 42.'],
    ]);
  });
  test('a rejection is shown as an error and resolves to undefined', async () => {
    const s = sink();
    const r = await runReported(
      'Doing it',
      () => Promise.reject(new Error('no permission')),
      s,
      () => 'never',
    );
    expect(r).toBeUndefined();
    expect(s.lines.at(-1)).toEqual(['error', 'Doing it failed: no permission']);
  });
});
