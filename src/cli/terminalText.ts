/**
 * Text made safe for a terminal: a workbook's cells, sheet names and formulas are echoed in
 * messages, and a control character among them (an escape sequence that clears the screen,
 * moves the cursor or retitles the window; a carriage return that hides a line; a bidi
 * override that reorders it) must not act on the user's terminal.
 */

// C0 controls except tab and line feed, DEL, C1 controls, and the bidirectional overrides.
// eslint-disable-next-line no-control-regex
const UNSAFE = /[\u0000-\u0008\u000b-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/g;

/**
 * The text without control characters (tab and line feed kept).
 *
 * @example
 * forTerminal('A\u001b[2JB\n') // 'A[2JB\n'
 */
export function forTerminal(text: string): string {
  return text.replace(UNSAFE, '');
}
