/**
 * The user's number locale, for reading what they type: where the locale writes decimals
 * with a comma (de-DE, fr-FR, …: "0,01"), the pane reads a comma as the decimal separator,
 * as Excel there does. DOM-free except for the optional look-up of the host's language.
 */

/**
 * The decimal separator of a BCP 47 locale, from the platform's Intl data; "." where the
 * locale is unknown or malformed.
 *
 * @example
 * decimalSeparatorOf('de-DE') // ','
 * decimalSeparatorOf('en-US') // '.'
 */
export function decimalSeparatorOf(locale: string): '.' | ',' {
  try {
    const parts = new Intl.NumberFormat(locale).formatToParts(1.5);
    return parts.find((p) => p.type === 'decimal')?.value === ',' ? ',' : '.';
  } catch {
    return '.';
  }
}

/**
 * The locale the pane follows: Office's display language where Office gives one, else the
 * browser's language, else "en-US".
 */
export function hostLocale(): string {
  const g = globalThis as {
    Office?: { context?: { displayLanguage?: unknown } };
    navigator?: { language?: unknown };
  };
  const office = g.Office?.context?.displayLanguage;
  if (typeof office === 'string' && office.trim() !== '') return office;
  const browser = g.navigator?.language;
  return typeof browser === 'string' && browser.trim() !== '' ? browser : 'en-US';
}

/**
 * A number for display in the locale's decimal separator (point or comma), with no
 * grouping, so that what the pane shows can be typed back.
 *
 * @example
 * localNumber('0.01', ',') // '0,01'
 */
export function localNumber(text: string, separator: '.' | ','): string {
  return separator === ',' && /^[+-]?\d*\.\d+(?:[eE][+-]?\d+)?$/.test(text) ? text.replace('.', ',') : text;
}
