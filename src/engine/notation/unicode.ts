/**
 * Unicode normalisation of reaction text: super/subscript digits and signs,
 * the Unicode minus and dashes, arrows, fraction characters and spaces.
 */

const SUBSCRIPTS: Record<string, string> = {
  '₀': '0',
  '₁': '1',
  '₂': '2',
  '₃': '3',
  '₄': '4',
  '₅': '5',
  '₆': '6',
  '₇': '7',
  '₈': '8',
  '₉': '9',
};
const SUPERSCRIPTS: Record<string, string> = {
  '⁰': '0',
  '¹': '1',
  '²': '2',
  '³': '3',
  '⁴': '4',
  '⁵': '5',
  '⁶': '6',
  '⁷': '7',
  '⁸': '8',
  '⁹': '9',
  '⁺': '+',
  '⁻': '-',
};
const FRACTIONS: Record<string, string> = { '½': '1/2', '⅓': '1/3', '¼': '1/4', '¾': '3/4', '⅔': '2/3' };

/**
 * Rewrite Unicode notation as ASCII the parser reads, keeping one output
 * character per input character where possible so that error positions still
 * point into the user's text. A run of superscripts becomes a caret charge:
 * "Cu²⁺" → "Cu^2+", "SO₄²⁻" → "SO4^2-".
 *
 * Returns the text and, for each output index, the 0-based index in the input.
 *
 * @example
 * normalizeNotation('Fe³⁺ + e⁻ → Fe²⁺').text // 'Fe^3+ + e^- -> Fe^2+'
 */
export function normalizeNotation(input: string): { text: string; origin: number[] } {
  // One entry per output character; joined once at the end (linear in the input).
  const out: string[] = [];
  const origin: number[] = [];
  const push = (s: string, at: number) => {
    for (const ch of s) {
      out.push(ch);
      origin.push(at);
    }
  };
  const chars = Array.from(input);
  let idx = 0; // index into input in UTF-16 units
  let prevSuper = false;
  for (const ch of chars) {
    const at = idx;
    idx += ch.length;
    const sup = SUPERSCRIPTS[ch];
    if (sup !== undefined) {
      if (!prevSuper) push('^', at);
      push(sup, at);
      prevSuper = true;
      continue;
    }
    prevSuper = false;
    const sub = SUBSCRIPTS[ch];
    if (sub !== undefined) {
      push(sub, at);
      continue;
    }
    const frac = FRACTIONS[ch];
    if (frac !== undefined) {
      // A mixed number "1½" is 3/2: fold the whole part written just before. The digits are
      // found by stepping back over the output (never by a search of the whole text), and
      // the whole part is read as a bigint, so the fraction stays exact at any length.
      let runStart = out.length;
      while (runStart > 0 && isAsciiDigit(out[runStart - 1] as string)) runStart--;
      if (runStart < out.length) {
        const run = out.slice(runStart).join('');
        const [num, den] = frac.split('/').map((x) => BigInt(x)) as [bigint, bigint];
        const start = origin[runStart] ?? at;
        out.length = runStart;
        origin.length = runStart;
        push(`${BigInt(run) * den + num}/${den} `, start);
      } else push(frac + ' ', at);
      continue;
    }
    switch (ch) {
      case '\u2212': // minus sign
      case '\u2013': // en dash
      case '\u2010':
      case '\u2011':
        push('-', at);
        break;
      case '\u2192': // →
      case '\u27f6': // ⟶
        push('->', at);
        break;
      case '\u21cc': // ⇌
      case '\u21c4': // ⇄
      case '\u2194': // ↔
        push('<=>', at);
        break;
      case '\u00b7': // middle dot (hydrates)
      case '\u2022':
      case '\u22c5':
        push('·', at);
        break;
      case '\u00a0':
      case '\u2009':
      case '\u202f':
      case '\t':
      case '\n':
      case '\r':
        push(' ', at);
        break;
      case '\u2016': // ‖ double vertical line (salt bridge)
        push('||', at);
        break;
      case '\u2502':
      case '\u2223':
        push('|', at);
        break;
      default:
        push(ch, at);
    }
  }
  return { text: out.join(''), origin };
}

function isAsciiDigit(ch: string): boolean {
  return ch >= '0' && ch <= '9' && ch.length === 1;
}
