/**
 * Text made safe for a terminal: a workbook's cells, sheet names and formulas are echoed in
 * messages, and a control character among them (an escape sequence that clears the screen,
 * moves the cursor or retitles the window; a carriage return that hides a line; a bidi
 * override that reorders it) must not act on the user's terminal.
 */

// C0 controls except tab, line feed and a carriage return that ends a line (CRLF, the line end
// of RFC 4180 CSV: it moves nothing on a terminal), DEL, C1 controls, and the bidirectional
// overrides. A lone carriage return (one that could hide a line) is removed.
// eslint-disable-next-line no-control-regex
const UNSAFE = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]|\r(?!\n)/g;

/**
 * The text without control characters (tab, line feed and CRLF line ends kept).
 *
 * @example
 * forTerminal('A\u001b[2JB\n') // 'A[2JB\n'
 * forTerminal('a,b\r\nc\rd') // 'a,b\r\ncd'
 */
export function forTerminal(text: string): string {
  return text.replace(UNSAFE, '');
}
