/**
 * Thermodynamic cycles among the rows of a user's table: where one row equals a
 * combination of two others (Gibbs energies add: n·E° adds), or two rows are the acid and
 * base forms of one couple (they differ by water ionisation, pKw), their E° must agree. A
 * disagreement beyond 2 mV is reported, naming the rows, for CHECKTABLE.
 */
import { type Rational, div, neg, sign, toNumber, ONE } from '../rational';
import { type PotentialTable, type TableRow, type TableProblem } from './potentialTable';
import { MEDIUM_KEYS, combineMaps, electronsOf, proportionality, scaleMap } from './halfReaction';
import { pKw } from '../thermo/water';
import { slopePerElectronAtKelvin } from '../constants';

/** Cycles whose E° disagree by more than this are reported (V). */
export const CYCLE_TOLERANCE_V = 2e-3;

function rowNo(r: TableRow): number {
  return r.origin.kind === 'user' ? r.origin.row : -1;
}

function fmt(x: number): string {
  return String(Number(x.toFixed(4)));
}

/**
 * The cycle problems of a table's user rows (empty where every cycle closes within 2 mV).
 *
 * @example
 * tableCycleProblems(readUserTable([['Fe3+ + e- -> Fe2+', 0.771], ['Fe2+ + 2 e- -> Fe', -0.447], ['Fe3+ + 3 e- -> Fe', -0.02]]))
 * // [{ row: 3, message: 'rows 1, 2 and 3 … disagree by 1.7 mV …' }] where beyond 2 mV
 */
export function tableCycleProblems(table: PotentialTable): TableProblem[] {
  const rows = table.rows.filter((r) => r.origin.kind === 'user');
  const out: TableProblem[] = [];
  const seen = new Set<string>();
  const s25 = slopePerElectronAtKelvin(298.15);
  const pkw = pKw(25);
  for (let i = 0; i < rows.length; i++) {
    for (let j = 0; j < rows.length; j++) {
      if (i === j) continue;
      const a = rows[i]!;
      const b = rows[j]!;
      // acid and base forms: a − b per electron is x·(H2O -> H+ + OH-) reversed or not
      if (i < j) {
        const d = combineMaps(a.perElectron, ONE, b.perElectron, neg(ONE));
        const keys = [...d.keys()];
        const h = d.get('H|1');
        const oh = d.get('OH|-1');
        if (h && oh && keys.every((k) => MEDIUM_KEYS.has(k)) && toNumber(h.nu) === toNumber(oh.nu)) {
          // E°(a) − E°(b) = −ν(H+)·(RT ln10/F)·pKw per electron (ν(H+) < 0 where a is the acid form)
          const expected = -toNumber(h.nu) * s25 * pkw;
          const diff = a.e0V - b.e0V - expected;
          if (Math.abs(diff) > CYCLE_TOLERANCE_V) {
            out.push({
              row: rowNo(b),
              message: `rows ${rowNo(a)} and ${rowNo(b)} are the acid and base forms of one couple, but their E° differ by ${fmt((a.e0V - b.e0V) * 1000)} mV where water ionisation (pKw ${fmt(pkw)} at 25 °C) requires ${fmt(expected * 1000)} mV: ${fmt(diff * 1000)} mV apart; check one of them.`,
            });
          }
        }
      }
      // a + f·b cancels a species they share; compare with any third row of that result
      for (const [k, va] of a.map) {
        if (MEDIUM_KEYS.has(k)) continue;
        const vb = b.map.get(k);
        if (!vb) continue;
        const f: Rational = neg(div(va.nu, vb.nu));
        const m = combineMaps(a.map, ONE, b.map, f);
        const e = electronsOf(m);
        if (sign(e) <= 0) continue;
        const per = scaleMap(m, div(ONE, e));
        const n = toNumber(e);
        const eDerived = (a.n * a.e0V + toNumber(f) * b.n * b.e0V) / n;
        for (const c of rows) {
          if (c === a || c === b || !proportionality(per, c.perElectron)) continue;
          const ids = [rowNo(a), rowNo(b), rowNo(c)].sort((x, y) => x - y);
          const key = ids.join(',');
          if (seen.has(key)) continue;
          seen.add(key);
          const diff = c.e0V - eDerived;
          if (Math.abs(diff) > CYCLE_TOLERANCE_V) {
            out.push({
              row: rowNo(c),
              message: `row ${rowNo(c)} (${c.text}, ${fmt(c.e0V)} V) disagrees by ${fmt(diff * 1000)} mV with rows ${rowNo(a)} and ${rowNo(b)}, which give ${fmt(eDerived)} V by Gibbs-energy additivity (n·E° adds); check the three rows (more than ${CYCLE_TOLERANCE_V * 1000} mV).`,
            });
          }
        }
      }
    }
  }
  return out.sort((x, y) => x.row - y.row);
}
