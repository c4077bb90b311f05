/**
 * Formula text as a spreadsheet file stores it, made ready for HyperFormula.
 *
 * One pass over the text, outside string literals ("...", with "" for a quote) and quoted
 * sheet names ('...'):
 * - the prefixes files put before newer or add-in functions are dropped: `_xlfn.`, `_xlws.`
 *   and `_xldudf_` (an add-in function; `_xldudf_ECHEM_POTENTIAL` is also read as
 *   `ECHEM.POTENTIAL`);
 * - number literals are written the way HyperFormula reads them: the exponent mark in
 *   lower case (`1E-6` → `1e-6`, `2.5E+3` → `2.5e+3`, as spreadsheet programs save them)
 *   and a leading zero before a bare decimal point (`.5` → `0.5`);
 * - the logical constants TRUE and FALSE, which files store bare, are written as the
 *   functions HyperFormula reads (`TRUE()`, `FALSE()`).
 * Text inside string literals is never changed.
 */

const PREFIXES = ['_xlfn.', '_xlws.', '_xldudf_'];

function isDigit(ch: string | undefined): boolean {
  return ch !== undefined && ch >= '0' && ch <= '9';
}

/** Characters that continue a name, a cell reference or a number: a number cannot start after one. */
function isNameChar(ch: string | undefined): boolean {
  return ch !== undefined && /[A-Za-z0-9_.$\\]/.test(ch);
}

/**
 * True where {@link rewriteFormulaText} could change the text: a `_` (a file prefix), the
 * words TRUE or FALSE, a digit before an exponent mark, or a bare decimal point before a
 * digit. Anything else it copies unchanged, so such a formula is returned as it is.
 */
const MAY_CHANGE = /_|true|false|[0-9]e|(?:^|[^A-Za-z0-9_.$\\])\.[0-9]/i;

/**
 * The formula with file prefixes dropped and number literals in HyperFormula's form.
 *
 * @example
 * normalizeFormulaText('=ECHEM.POTENTIAL("Zn2+/Zn","Zn2+",1E-6)') // '=ECHEM.POTENTIAL("Zn2+/Zn","Zn2+",1e-6)'
 */
export function normalizeFormulaText(formula: string): string {
  return MAY_CHANGE.test(formula) ? rewriteFormulaText(formula) : formula;
}

/**
 * The pass {@link normalizeFormulaText} makes over a formula that may need it (exported for
 * the test that checks the two agree on every formula).
 *
 * @example
 * rewriteFormulaText('_xlfn.STDEV.S(A1:A3)') // 'STDEV.S(A1:A3)'
 */
export function rewriteFormulaText(formula: string): string {
  // Pieces joined once at the end: a flat string (appending piece by piece would keep a
  // chain of partial strings per formula, about 1 KB each, for as long as the text lives).
  const out: string[] = [];
  let i = 0;
  const n = formula.length;
  while (i < n) {
    const ch = formula[i] as string;
    if (ch === '"' || ch === "'") {
      // A string literal or a quoted sheet name: copied as it is, doubled quotes included.
      let j = i + 1;
      while (j < n) {
        if (formula[j] === ch) {
          if (formula[j + 1] === ch) j += 2;
          else break;
        } else j++;
      }
      out.push(formula.slice(i, Math.min(n, j + 1)));
      i = j + 1;
      continue;
    }
    if (ch === '_' && !isNameChar(formula[i - 1])) {
      const lower = formula.slice(i, i + 8).toLowerCase();
      const prefix = PREFIXES.find((p) => lower.startsWith(p));
      if (prefix !== undefined) {
        i += prefix.length;
        if (prefix === '_xldudf_' && /^ECHEM_/i.test(formula.slice(i, i + 6))) {
          out.push(`${formula.slice(i, i + 5)}.`);
          i += 6;
        }
        continue;
      }
    }
    if (/[A-Za-z]/.test(ch) && !isNameChar(formula[i - 1])) {
      // A name, function or reference: copied whole, except the logical constants, which
      // files store bare (TRUE) and HyperFormula reads as functions (TRUE()).
      let j = i + 1;
      while (isNameChar(formula[j])) j++;
      const name = formula.slice(i, j);
      const upper = name.toUpperCase();
      const next = formula[j];
      out.push((upper === 'TRUE' || upper === 'FALSE') && next !== '(' && next !== '!' ? `${upper}()` : name);
      i = j;
      continue;
    }
    const startsNumber = isDigit(ch) || (ch === '.' && isDigit(formula[i + 1]));
    if (startsNumber && !isNameChar(formula[i - 1])) {
      let j = i;
      while (isDigit(formula[j])) j++;
      if (formula[j] === '.') {
        j++;
        while (isDigit(formula[j])) j++;
      }
      let mantissa = formula.slice(i, j);
      let exponent = '';
      if (
        (formula[j] === 'e' || formula[j] === 'E') &&
        (isDigit(formula[j + 1]) ||
          ((formula[j + 1] === '+' || formula[j + 1] === '-') && isDigit(formula[j + 2])))
      ) {
        let k = j + 1;
        if (formula[k] === '+' || formula[k] === '-') k++;
        while (isDigit(formula[k])) k++;
        exponent = `e${formula.slice(j + 1, k)}`;
        j = k;
      }
      // A number directly followed by a name character is part of something else (e.g. "1A").
      if (isNameChar(formula[j]) && formula[j] !== '.') {
        out.push(formula.slice(i, j));
        i = j;
        continue;
      }
      if (mantissa.startsWith('.')) mantissa = `0${mantissa}`;
      out.push(mantissa + exponent);
      i = j;
      continue;
    }
    out.push(ch);
    i++;
  }
  return out.join('');
}

/**
 * Formula text as HyperFormula reads it: a leading "=", then {@link normalizeFormulaText}.
 *
 * @example
 * formulaForEngine('_xlfn.STDEV.S(A1:A3)') // '=STDEV.S(A1:A3)'
 */
export function formulaForEngine(stored: string): string {
  const body = stored.startsWith('=') ? stored.slice(1) : stored;
  return `=${normalizeFormulaText(body)}`;
}

const REF_CANDIDATE = /(([a-z_\-0-9]*)!)?([a-z0-9_$]{2,})([(])?/gi;
const CELL_REF = /^([$])?([a-z]+)([$])?([1-9][0-9]*)$/i;

/** A1 column letters of a 0-based column. */
function letters(col: number): string {
  let n = col + 1;
  let s = '';
  while (n > 0) {
    s = String.fromCharCode(65 + ((n - 1) % 26)) + s;
    n = Math.floor((n - 1) / 26);
  }
  return s;
}

/** 0-based column of A1 column letters. */
function columnIndex(text: string): number {
  let col = 0;
  for (const ch of text.toUpperCase()) col = col * 26 + (ch.charCodeAt(0) - 64);
  return col - 1;
}

function moveReferences(part: string, dRow: number, dCol: number): string {
  return part.replace(REF_CANDIDATE, (whole, sheet: string | undefined, _name: unknown, ref: string, paren?: string) => {
    if (paren) return whole; // a function name
    const m = CELL_REF.exec(ref);
    if (!m || m[2] === undefined || m[4] === undefined) return whole;
    const colText = m[2].toUpperCase();
    if (colText.length > 3 || (colText.length === 3 && colText > 'XFD')) return whole; // a name
    const col = m[1] ? columnIndex(colText) : columnIndex(colText) + dCol;
    const row = m[3] ? Number(m[4]) : Number(m[4]) + dRow;
    if (col < 0 || row < 1) return whole;
    return `${sheet ?? ''}${m[1] ?? ''}${letters(col)}${m[3] ?? ''}${row}`;
  });
}

/**
 * The text of a shared formula for one of its followers: the master's relative references
 * moved by the follower's offset from the master (a file stores a filled-down formula once,
 * on its first cell). Text inside string literals ("Cu2+ + 2e- = Cu") and quoted sheet names
 * is never changed; absolute references (`$A$1`) and function names stay as they are.
 *
 * @param formula the master's formula (no leading "=")
 * @param from the master's 0-based row and column
 * @param to the follower's 0-based row and column
 * @example
 * slideFormula('ECHEM.POTENTIAL("Cu2+ + 2e- = Cu","Cu2+",A2)', { row: 1, col: 1 }, { row: 3, col: 1 })
 * // 'ECHEM.POTENTIAL("Cu2+ + 2e- = Cu","Cu2+",A4)'
 */
export function slideFormula(
  formula: string,
  from: { row: number; col: number },
  to: { row: number; col: number },
): string {
  const dRow = to.row - from.row;
  const dCol = to.col - from.col;
  const out: string[] = [];
  let plain = 0;
  let i = 0;
  while (i < formula.length) {
    const ch = formula[i];
    if (ch !== '"' && ch !== "'") {
      i++;
      continue;
    }
    let j = i + 1;
    while (j < formula.length) {
      if (formula[j] === ch) {
        if (formula[j + 1] === ch) j += 2;
        else break;
      } else j++;
    }
    out.push(moveReferences(formula.slice(plain, i), dRow, dCol), formula.slice(i, j + 1));
    i = j + 1;
    plain = i;
  }
  out.push(moveReferences(formula.slice(plain), dRow, dCol));
  return out.join('');
}
