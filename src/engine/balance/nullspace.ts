/**
 * Exact null space of a rational matrix (Gauss–Jordan elimination on bigint
 * rationals), for balancing reactions without any float tolerance.
 */
import { type Rational, ZERO, ONE, sub, mul, div, isZero, neg, lcm, gcd, rat } from '../rational';

/**
 * A basis of { x : M·x = 0 } for an m × n matrix given as rows.
 *
 * @returns basis vectors of length n (empty where only x = 0 solves)
 * @example
 * nullSpace([[rat(1n), rat(-1n)]]) // [[1, 1]]
 */
export function nullSpace(matrix: readonly (readonly Rational[])[], columns: number): Rational[][] {
  const a: Rational[][] = matrix.map((row) => row.slice());
  const pivotCols: number[] = [];
  let r = 0;
  for (let c = 0; c < columns && r < a.length; c++) {
    let p = -1;
    for (let i = r; i < a.length; i++)
      if (!isZero(a[i]![c]!)) {
        p = i;
        break;
      }
    if (p < 0) continue;
    [a[r], a[p]] = [a[p]!, a[r]!];
    const pivotRow = a[r]!;
    const pv = pivotRow[c]!;
    for (let j = 0; j < columns; j++) pivotRow[j] = div(pivotRow[j]!, pv);
    for (let i = 0; i < a.length; i++) {
      if (i === r) continue;
      const row = a[i]!;
      const f = row[c]!;
      if (isZero(f)) continue;
      for (let j = 0; j < columns; j++) row[j] = sub(row[j]!, mul(f, pivotRow[j]!));
    }
    pivotCols.push(c);
    r++;
  }
  const free: number[] = [];
  for (let c = 0; c < columns; c++) if (!pivotCols.includes(c)) free.push(c);
  return free.map((fc) => {
    const v: Rational[] = new Array<Rational>(columns).fill(ZERO);
    v[fc] = ONE;
    pivotCols.forEach((pc, i) => {
      v[pc] = neg(a[i]![fc]!);
    });
    return v;
  });
}

/**
 * Scale a rational vector to the smallest integers with the same direction.
 *
 * @example
 * toSmallestIntegers([rat(1n, 2n), rat(1n)]) // [1n, 2n]
 */
export function toSmallestIntegers(v: readonly Rational[]): bigint[] {
  let l = 1n;
  for (const x of v) l = lcm(l, x.den);
  const ints = v.map((x) => (x.num * l) / x.den);
  let g = 0n;
  for (const x of ints) g = gcd(g, x);
  if (g === 0n) return ints;
  return ints.map((x) => x / g);
}

/** Rational from bigint. */
export const fromBig = (n: bigint): Rational => rat(n, 1n);
