/**
 * Parse time of the notation parser on the worst inputs known, at 1k to 16k characters.
 * Figures, not a test: `npx ts-node --transpile-only scripts/bench-parse.ts`.
 * A linear parser roughly doubles its time from one size to the next.
 */
import { parseNotation } from '../src/engine/index';
import { MAX_NOTATION_CHARS, withNotationLengthLimit } from '../src/engine/notation/source';

const SIZES = [1024, 2048, 4096, 8192, 16384];

/** Texts of about `n` characters that drove earlier versions of the parser to cubic or quadratic time. */
const WORST: Record<string, (n: number) => string> = {
  'digit run then many ½': (n) => `${'1'.repeat(n / 2)} ${'½'.repeat(n / 2 - 10)} H2 -> H2`,
  'digits and ½ alternating': (n) => `${'1½'.repeat(n / 2 - 5)} H2 -> H2`,
  'many "(" with no ")"': (n) => `H${'('.repeat(n - 8)} -> H2`,
  'phase group padded with spaces': (n) => `H2(aq,${' '.repeat(n - 16)}x) -> H2`,
  'digits inside brackets': (n) => `(H${'1'.repeat(n - 12)}) -> H2`,
  'many closing brackets': (n) => `H${')'.repeat(n - 8)} -> H2`,
  'amount of digits then a letter': (n) => `H2(${'1'.repeat(n - 14)}x!) -> H2`,
  'deep nesting': (n) => `${'('.repeat(n / 2 - 4)}H${')'.repeat(n / 2 - 4)} -> H2`,
  'many terms': (n) => `${Array.from({ length: Math.floor(n / 6) }, () => 'H2').join(' + ')} -> H2`,
};

function timeOne(text: string): number {
  const t0 = process.hrtime.bigint();
  try {
    // Past the parser's length limit only for this measurement, so the scanners are timed.
    withNotationLengthLimit(1 << 20, () => parseNotation(text));
  } catch {
    // Refusals (too long, too deep) count: what matters is how long they take.
  }
  return Number(process.hrtime.bigint() - t0) / 1e6;
}

const header = ['input', ...SIZES.map((s) => `${s / 1024}k chars (ms)`)];
const rows: string[][] = [];
for (const [name, make] of Object.entries(WORST)) {
  const row = [name];
  let skip = false;
  for (const n of SIZES) {
    if (skip) {
      row.push('skipped');
      continue;
    }
    const text = make(n);
    timeOne(text); // warm
    const ms = Math.min(...Array.from({ length: 5 }, () => timeOne(text)));
    row.push(ms.toFixed(2));
    if (ms > 5000) skip = true;
  }
  rows.push(row);
}
console.log(
  `Texts longer than ${MAX_NOTATION_CHARS} characters are refused in use; measured here with the limit lifted.`,
);
const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => (r[i] ?? '').length)));
for (const r of [header, ...rows]) console.log(r.map((c, i) => c.padEnd(widths[i] ?? 0)).join('  '));
