/**
 * Reporting what the pane did, or why Excel refused: every workbook action runs through
 * {@link runReported}, which shows a success line or the error in the pane's status area;
 * no failure is swallowed. DOM-free: the page passes a sink that writes to its status element.
 */

export type StatusKind = 'info' | 'success' | 'error';

/** Where status lines go (the page's status area; a recording array in tests). */
export interface StatusSink {
  show(kind: StatusKind, text: string): void;
}

interface OfficeErrorLike {
  name?: unknown;
  code?: unknown;
  message?: unknown;
  debugInfo?: { errorLocation?: unknown; statement?: unknown } | undefined;
}

/**
 * A readable sentence from whatever an Office call rejected with: Office's own errors
 * carry a code and a location (e.g. "Worksheet.add"); other errors their message.
 *
 * @example
 * describeOfficeError({ code: 'InvalidArgument', message: 'The argument is invalid.' })
 * // 'The argument is invalid. (Excel error InvalidArgument)'
 */
export function describeOfficeError(error: unknown): string {
  if (typeof error === 'string') return error || 'Unknown error.';
  if (typeof error !== 'object' || error === null) return `Unknown error (${String(error)}).`;
  const e = error as OfficeErrorLike;
  const message =
    typeof e.message === 'string' && e.message.trim() !== '' ? e.message.trim() : 'Unknown error.';
  const parts: string[] = [];
  if (typeof e.code === 'string' && e.code !== '') parts.push(`Excel error ${e.code}`);
  const where = e.debugInfo?.errorLocation;
  if (typeof where === 'string' && where !== '') parts.push(`at ${where}`);
  return parts.length > 0 ? `${message} (${parts.join(' ')})` : message;
}

/**
 * Run a workbook action, showing progress, then its success text or its error.
 * Resolves to the action's result, or undefined where it failed (the error was shown).
 *
 * @param what what the action does, for the messages ("Inserting the potentials sheet")
 */
export async function runReported<T>(
  what: string,
  action: () => Promise<T>,
  sink: StatusSink,
  success: (result: T) => string,
): Promise<T | undefined> {
  sink.show('info', `${what}…`);
  let result: T;
  try {
    result = await action();
  } catch (error) {
    sink.show('error', `${what} failed: ${describeOfficeError(error)}`);
    return undefined;
  }
  sink.show('success', success(result));
  return result;
}
