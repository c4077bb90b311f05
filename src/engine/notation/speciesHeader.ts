/**
 * The one grammar of a species header: the name above a column of values (docs/notation.md,
 * "Species headers").
 *
 *   header  := [side ":"] body
 *   side    := "left" | "right" | "l" | "r"      (any case, spaces around ":" allowed)
 *   body    := "pH" (any case) | species text (docs/notation.md, "Species")
 *
 * `left:Ag+` / `right:Ag+` name a species that stands in both half-cells; `pH` sets
 * a(H+) = 10^−pH. Every function that takes a species header reads it through
 * {@link splitSpeciesHeader}, so `l:Ag+` and `left:pH` mean the same everywhere.
 */

/** A species header split into its parts (the body is not parsed as a species here). */
export interface SpeciesHeaderParts {
  /** The header as written, trimmed. */
  readonly text: string;
  /** Which half-cell a qualified header names, or null. */
  readonly side: 'left' | 'right' | null;
  /** True for a pH column. */
  readonly isPH: boolean;
  /** The species text after the side qualifier (trimmed); "pH" for a pH column. */
  readonly body: string;
}

const SIDE = /^(left|right|l|r)\s*:\s*(.*)$/is;
const PH = /^ph$/i;

/**
 * Split a species header into side, pH flag and species text.
 *
 * Domain: any string. Precision: exact (text only).
 *
 * @example
 * splitSpeciesHeader('l: Ag+') // { text: 'l: Ag+', side: 'left', isPH: false, body: 'Ag+' }
 * splitSpeciesHeader('right:PH').isPH // true
 */
export function splitSpeciesHeader(header: string): SpeciesHeaderParts {
  const text = header.trim();
  // SIDE needs an l or r first and PH two characters: most headers skip the patterns
  const first = text.charCodeAt(0) | 0x20;
  const m = first === 0x6c || first === 0x72 ? SIDE.exec(text) : null;
  const side = m ? (m[1]!.toLowerCase().startsWith('l') ? 'left' : 'right') : null;
  const body = m ? m[2]!.trim() : text;
  const isPH = body.length === 2 && PH.test(body);
  return { text, side, isPH, body: isPH ? 'pH' : body };
}

/**
 * The canonical spelling of a header: `left:`/`right:` spelled out, `pH` in that case.
 *
 * @example
 * canonicalSpeciesHeader(' r:ph ') // 'right:pH'
 */
export function canonicalSpeciesHeader(header: string): string {
  const p = splitSpeciesHeader(header);
  return p.side ? `${p.side}:${p.body}` : p.body;
}
