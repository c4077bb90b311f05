/**
 * Strong electrolytes written by formula in a cell diagram (`HCl(aq, 0.01 M)`,
 * `ZnSO4`, `Cu(NO3)2`) are split into their ions, each at c·ν (ideal solution),
 * so that `Pt | H2 | HCl(aq, 0.01 M) | AgCl | Ag` reads as H+ and Cl- at 0.01.
 */
import { type Species, parseSpecies } from './species';

const CATION_TEXTS = [
  'H+',
  'Li+',
  'Na+',
  'K+',
  'Rb+',
  'Cs+',
  'NH4+',
  'Ag+',
  'Tl+',
  'Cu+',
  'Mg2+',
  'Ca2+',
  'Sr2+',
  'Ba2+',
  'Zn2+',
  'Cd2+',
  'Cu2+',
  'Fe2+',
  'Ni2+',
  'Co2+',
  'Mn2+',
  'Pb2+',
  'Sn2+',
  'Hg2+',
  'Fe3+',
  'Al3+',
  'Cr3+',
  'Ce3+',
  'In3+',
];
const ANION_TEXTS = ['Cl-', 'Br-', 'I-', 'F-', 'NO3-', 'ClO4-', 'OH-', 'HSO4-', 'SO4^2-', 'CO3^2-'];

let ions: { readonly cations: readonly Species[]; readonly anions: readonly Species[] } | null = null;

/** The listed cations and anions, parsed on first use (not at load). */
function listedIons(): { readonly cations: readonly Species[]; readonly anions: readonly Species[] } {
  ions ??= { cations: CATION_TEXTS.map((t) => parseSpecies(t)), anions: ANION_TEXTS.map((t) => parseSpecies(t)) };
  return ions;
}

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

function part(formula: string, count: number): string[] {
  if (count === 1) return [formula];
  const polyatomic = !/^[A-Z][a-z]?$/.test(formula);
  return polyatomic ? [`(${formula})${count}`, `${formula}${count}`] : [`${formula}${count}`];
}

/**
 * The ions of a neutral strong electrolyte, with their stoichiometric numbers, or
 * null where the formula is not one of the listed cation–anion salts or acids.
 *
 * @example
 * splitElectrolyte('Na2SO4') // [{ ion: Na+, count: 2 }, { ion: SO4^2-, count: 1 }]
 */
export function splitElectrolyte(formula: string): { ion: Species; count: number }[] | null {
  const { cations, anions } = listedIons();
  for (const c of cations) {
    if (!formula.startsWith(c.formula.replace(/\d+$/, ''))) continue;
    for (const a of anions) {
      const za = -a.charge;
      const g = gcd(c.charge, za);
      const p = za / g;
      const q = c.charge / g;
      for (const cp of part(c.formula, p))
        for (const ap of part(a.formula, q))
          if (cp + ap === formula)
            return [
              { ion: c, count: p },
              { ion: a, count: q },
            ];
    }
  }
  return null;
}
