/**
 * The hydrogen | HCl | silver-chloride cell without liquid junction,
 *   Pt | H2(g, 1 bar) | HCl(m) | AgCl | Ag,   H2 + 2 AgCl → 2 Ag + 2 H+ + 2 Cl-,
 *   E = E°(AgCl/Ag) − (2RT ln10 / F)·log10(m·γ±),
 * with measured mean activity coefficients, and E°(AgCl/Ag) against temperature.
 *
 * Sources: E°(AgCl/Ag) at 5–60 °C, Bates & Bower, J. Res. NBS 53, 283 (1954) (seen);
 * γ± of HCl at 25 °C, Kaye & Laby §3.9.6 (seen; stated accuracy ±0.002).
 */
import {
  bindSpecies,
  compiledReaction,
  meanActivityCoefficient,
  potentialV,
  standardPotentialV,
} from '../../src/engine';
import { expectNear } from './support';
import { BATES_BOWER_AGCL_E0_V, F, R } from '../support';

// SI 2019 exact constants, written out here so that expectations are independent of the engine.
/** RT ln10 / F in V (derived from the SI exact constants). */
const s = (tC: number) => (R * (tC + 273.15) * Math.LN10) / F;

/** E°(AgCl/Ag) at 25 °C, Bates & Bower 1954 (seen). */
const E0_BB = 0.22234;
/** A user potentials table holding the Bates & Bower value (the built-in row is OSX's 0.22233). */
const BB_TABLE: unknown[][] = [
  ['half-reaction', 'E0 (V)', 'dE0/dT (mV/K)', 'source'],
  ['AgCl(s) + e- -> Ag + Cl-', E0_BB, null, 'Bates & Bower, J. Res. NBS 53, 283 (1954)'],
];

/** Kaye & Laby §3.9.6 (seen): HCl mean activity coefficients at 25 °C. */
const KL_HCL: readonly (readonly [number, number])[] = [
  [0.01, 0.904],
  [0.05, 0.83],
];

/** The EMF by hand: E° − 2S·log10(m·γ±) (derived from the SI exact constants). */
function harnedByHand(e0V: number, m: number, gamma: number, tC = 25): number {
  return e0V - 2 * s(tC) * Math.log10(m * gamma);
}

function emf(
  text: string,
  table: unknown[][] | null,
  headers: readonly string[],
  row: readonly number[],
  tC = 25,
) {
  return potentialV(bindSpecies(compiledReaction(text, table), headers), row, tC);
}

describe('H2 | HCl | AgCl | Ag at 25 °C with measured γ± (Kaye & Laby §3.9.6, seen; E° Bates & Bower 1954, seen)', () => {
  // hand values: m = 0.01 → a = 0.00904, E = 0.46416 V; m = 0.05 → a = 0.0415, E = 0.38585 V
  test.each([
    [0.01, 0.904, 0.46416],
    [0.05, 0.83, 0.38585],
  ])('m = %d mol/kg, γ± = %d: the engine gives E = %d V, the hand value to 5 decimals', (m, g, printed) => {
    const e = emf('Pt | H2(g, 1 bar) | HCl | AgCl | Ag', BB_TABLE, ['H+', 'Cl-'], [m * g, m * g]);
    expectNear(e, printed, 5e-6);
    expectNear(harnedByHand(E0_BB, m, g), printed, 5e-6);
  });

  test.each(KL_HCL.map(([m, g]) => [m, g] as const))(
    'm = %d, γ± = %d: the engine, with H+ and Cl- at m·γ±, gives the hand EMF in every notation',
    (m, g) => {
      const a = m * g;
      const expected = harnedByHand(E0_BB, m, g);
      // cell diagram, species columns
      expectNear(
        emf('Pt | H2(g, 1 bar) | HCl | AgCl | Ag', BB_TABLE, ['H+', 'Cl-'], [a, a]),
        expected,
        1e-12,
      );
      // cell diagram, the electrolyte written inline and split by the engine into H+ and Cl-
      expectNear(emf(`Pt | H2(g, 1 bar) | HCl(aq, ${a} M) | AgCl | Ag`, BB_TABLE, [], []), expected, 1e-12);
      // cell diagram without the pressure written, H2 given as a species
      expectNear(
        emf('Pt | H2(g) | HCl(aq) | AgCl(s) | Ag(s)', BB_TABLE, ['Cl-', 'H2', 'H+'], [a, 1, a]),
        expected,
        1e-12,
      );
      // the cell reaction written out, H2 at 1 bar
      expectNear(
        emf('H2 + 2 AgCl -> 2 Ag + 2 H+ + 2 Cl-', BB_TABLE, ['H+', 'Cl-', 'H2'], [a, a, 1]),
        expected,
        1e-12,
      );
      // the cell written the other way round: the sign flips (IUPAC sign convention)
      expectNear(emf(`Ag | AgCl | HCl(aq, ${a} M) | H2(g, 1 bar) | Pt`, BB_TABLE, [], []), -expected, 1e-12);
    },
  );

  test.each(KL_HCL.map(([m, g]) => [m, g] as const))(
    'm = %d, γ± = %d: E° backed out of the engine’s EMF is the Bates & Bower 0.22234 V',
    (m, g) => {
      const a = m * g;
      const e = emf('Pt | H2(g, 1 bar) | HCl | AgCl | Ag', BB_TABLE, ['H+', 'Cl-'], [a, a]);
      expectNear(e + 2 * s(25) * Math.log10(a), E0_BB, 1e-12);
      // with the built-in table (OSX App. L 0.22233, seen) E° comes back within 0.02 mV of BB
      const eBuiltin = emf('Pt | H2(g, 1 bar) | HCl | AgCl | Ag', null, ['H+', 'Cl-'], [a, a]);
      // with the built-in table (E° set from Bates & Bower) E° comes back as BB's
      expectNear(eBuiltin + 2 * s(25) * Math.log10(a), E0_BB, 1e-12);
    },
  );

  test.each([
    [0.01, 0.904, 5.186],
    [0.05, 0.83, 9.575],
  ])(
    'm = %d: taking a = m (ideal) instead of m·γ± (γ± = %d) understates E by %d mV (derived)',
    (m, g, mV) => {
      const ideal = emf('Pt | H2(g, 1 bar) | HCl | AgCl | Ag', BB_TABLE, ['H+', 'Cl-'], [m, m]);
      const real = emf('Pt | H2(g, 1 bar) | HCl | AgCl | Ag', BB_TABLE, ['H+', 'Cl-'], [m * g, m * g]);
      expectNear((ideal - real) * 1000, 2 * s(25) * Math.log10(g) * 1000, 1e-9);
      expectNear((real - ideal) * 1000, mV, 5e-4);
    },
  );

  test.each(KL_HCL.map(([m, g]) => [m, g] as const))(
    'm = %d: the Davies γ± gives an EMF within 1 mV of the one from the measured γ± = %d (Davies 1962, from memory for the page; Kaye & Laby, seen)',
    (m, g) => {
      // I = m for a 1:1 electrolyte
      const gDavies = meanActivityCoefficient(1, -1, m, 'davies', 25);
      const a = m * gDavies;
      const e = emf('Pt | H2(g, 1 bar) | HCl | AgCl | Ag', BB_TABLE, ['H+', 'Cl-'], [a, a]);
      expectNear(e, harnedByHand(E0_BB, m, g), 1e-3);
      // and the measured γ± is matched within the Kaye & Laby accuracy widened for Davies: 0.01
      expectNear(gDavies, g, 0.01);
    },
  );
});

describe('E°(AgCl/Ag) against temperature: Bates & Bower 1954 (seen) vs the species data', () => {
  // The built-in row: E°(25 °C) = 0.22234 V (Bates & Bower), E°(T) by Gibbs–Helmholtz from
  // S° and Cp° of Ag, AgCl, Cl- and the electron (NBS 1982, from memory) with constant ΔrCp°.
  // Deviations (table − BB), mV: 5 °C −0.09, 10 −0.07, 15 −0.06, 20 −0.07, 25 0.00, 30 −0.02,
  // 35 −0.10, 45 −0.16, 50 −0.21, 55 −0.32, 60 −0.43: within 0.5 mV over 0–60 °C.
  const table = (tC: number) => standardPotentialV(compiledReaction('AgCl/Ag', null).resolved, tC);

  test.each(BATES_BOWER_AGCL_E0_V)('at %d °C the table’s E° is within 0.5 mV of Bates & Bower’s %d V', (tC, bb) => {
    expectNear(table(tC), bb, 0.5e-3);
  });

  test('at 35 °C the cell EMF uses E°(35 °C) and the slope at 35 °C; it is within 1 mV of BB’s (Kaye & Laby γ± at 25 °C held fixed)', () => {
    const a = 0.01 * 0.904;
    const e = emf('Pt | H2(g, 1 bar) | HCl | AgCl | Ag', null, ['H+', 'Cl-'], [a, a], 35);
    expectNear(e, table(35) - 2 * s(35) * Math.log10(a), 1e-12);
    expectNear(e, harnedByHand(0.21566, 0.01, 0.904, 35), 1e-3);
  });

  test('a user row without dE°/dT keeps its 25 °C value and takes its temperature dependence from the species data', () => {
    // the user row takes precedence at 25 °C (the potentials table)
    expectNear(standardPotentialV(compiledReaction('AgCl/Ag', BB_TABLE).resolved, 25), E0_BB, 1e-15);
    // every species of AgCl/Ag has S°: E°(T) moves as the built-in row does
    const moved = standardPotentialV(compiledReaction('AgCl/Ag', BB_TABLE).resolved, 35) - E0_BB;
    expectNear(moved, table(35) - table(25), 1e-12);
    expectNear(standardPotentialV(compiledReaction('AgCl/Ag', BB_TABLE).resolved, 35), 0.21566, 0.5e-3); // BB
  });
});
