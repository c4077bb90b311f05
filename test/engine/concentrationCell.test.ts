/**
 * Concentration cells: two like electrodes that differ in one species' activity (or a gas's
 * pressure). EMF = E(right) − E(left) (IUPAC), so the sign follows from the half-reaction:
 * cation-reversible (Ag+/Ag) → the more concentrated side is positive; anion-reversible
 * (AgCl/Ag, Cl-) → the more dilute side is; for H2 the lower pressure is positive.
 */
import {
  bindSpecies,
  compiledReaction,
  concentrationCellEmfV,
  planConcentrationCell,
  potentialV,
} from '../../src/engine';
import { s, S25, engineErrorOf, expectNear } from './support';

function ccell(couple: string, species: string | null, left: number, right: number, tempC = 25): number {
  return concentrationCellEmfV(
    planConcentrationCell(compiledReaction(couple, null), species),
    left,
    right,
    tempC,
  );
}

function emf(text: string, headers: readonly string[], row: readonly number[], tempC = 25): number {
  return potentialV(bindSpecies(compiledReaction(text, null), headers), row, tempC);
}

describe('EMF of concentration cells at 25 °C', () => {
  // Each expectation: EMF = −S·(ν/n)·(log10 a_right − log10 a_left), with ν the species'
  // stoichiometric number in the reduction (products +, reactants −), written out by hand
  // (derived from the SI exact constants and the IUPAC sign convention).
  test.each([
    // cation-reversible, one decade more concentrated on the right: +S = +59.16 mV
    ['Ag+/Ag', null, 0.01, 0.1, +S25],
    // the same cell turned round
    ['Ag+/Ag', 'Ag+', 0.1, 0.01, -S25],
    // two decades
    ['Ag+/Ag', null, 0.001, 0.1, +2 * S25],
    // anion-reversible: AgCl + e- -> Ag + Cl-, the sign is opposite
    ['AgCl/Ag', null, 0.01, 0.1, -S25],
    ['AgCl/Ag', 'Cl-', 0.1, 0.01, +S25],
    // Cu2+ + 2e- -> Cu: half the slope per decade
    ['Cu2+/Cu', null, 0.01, 0.1, +S25 / 2],
    // 2 H+ + 2e- -> H2 by pressure: H2 1 bar left, 0.1 bar right: +S/2 (n = 2, product gas)
    ['H+/H2', 'H2', 1, 0.1, +S25 / 2],
    ['2 H+ + 2 e- -> H2(g)', 'H2(g)', 0.1, 1, -S25 / 2],
    // the same electrode by a(H+): ν = 2, n = 2 → S per decade, like a cation electrode
    ['H+/H2', 'H+', 0.01, 0.1, +S25],
    // equal activities: exactly zero
    ['Ag+/Ag', null, 0.05, 0.05, 0],
    ['H+/H2', 'H2', 0.3, 0.3, 0],
  ])('%s varying %p: left %d, right %d → %d V (derived)', (couple, species, left, right, expected) => {
    expectNear(ccell(couple, species, left, right), expected, 1e-15);
  });

  test('the Ag+/Ag cell gives 0.05916 V per decade (slope 59.15935 mV, derived from the SI exact constants)', () => {
    expectNear(ccell('Ag+/Ag', null, 0.01, 0.1), 0.05916, 5e-6);
  });

  test.each([0, 37, 50, 100])(
    'at %d °C the EMF scales with the slope RT ln10 / F at that temperature (derived)',
    (tC) => {
      expectNear(ccell('Ag+/Ag', null, 0.01, 0.1, tC), s(tC), 1e-15);
      expectNear(ccell('AgCl/Ag', null, 0.01, 0.1, tC), -s(tC), 1e-15);
    },
  );

  test('in a diagram the two E°(T) cancel: at 60 °C only the slope at 60 °C remains (Ag+/Ag dE°/dT −0.989 mV/K from memory; derived)', () => {
    const b = bindSpecies(compiledReaction('Ag | Ag+ || Ag+ | Ag', null), ['left:Ag+', 'right:Ag+']);
    expectNear(potentialV(b, [0.01, 0.01], 60), 0, 1e-15);
    expectNear(potentialV(b, [0.01, 0.1], 60), s(60), 1e-14);
    expectNear(potentialV(b, [0.01, 0.1], 60), ccell('Ag+/Ag', null, 0.01, 0.1, 60), 1e-14);
  });
});

describe('the same cell written as a diagram agrees with CONCCELL', () => {
  test.each([
    ['Ag | Ag+(aq, 0.01 M) || Ag+(aq, 0.1 M) | Ag', [], [], 'Ag+/Ag', null, 0.01, 0.1],
    ['Ag | Ag+ || Ag+ | Ag', ['left:Ag+', 'right:Ag+'], [0.01, 0.1], 'Ag+/Ag', null, 0.01, 0.1],
    ['Ag(s) | Ag+(aq) || Ag+(aq) | Ag(s)', ['right:Ag+', 'left:Ag+'], [0.1, 0.01], 'Ag+/Ag', null, 0.01, 0.1],
    ['Ag | AgCl | Cl-(aq, 0.01 M) || Cl-(aq, 0.1 M) | AgCl | Ag', [], [], 'AgCl/Ag', null, 0.01, 0.1],
    ['Ag | AgCl | KCl(aq, 0.01 M) || KCl(aq, 0.1 M) | AgCl | Ag', [], [], 'AgCl/Ag', null, 0.01, 0.1],
    ['Cu | Cu2+ || Cu2+ | Cu', ['left:Cu2+', 'right:Cu2+'], [0.001, 0.1], 'Cu2+/Cu', null, 0.001, 0.1],
    ['Pt | H2(g, 1 bar) | H+(aq, 1 M) || H+(aq, 1 M) | H2(g, 0.1 bar) | Pt', [], [], 'H+/H2', 'H2', 1, 0.1],
    ['Pt | H2 | H+ || H+ | H2 | Pt', ['left:H2', 'right:H2', 'H+'], [1, 0.1, 0.5], 'H+/H2', 'H2', 1, 0.1],
  ])(
    '%s with %j = %j equals the concentration cell of %s (IUPAC sign convention; derived)',
    (diagram, headers, values, couple, species, left, right) => {
      const byDiagram = emf(diagram, headers, values);
      expectNear(byDiagram, ccell(couple, species, left, right), 1e-14);
      // and both equal the hand value −S·(ν/n)·Δlog10 a
      const perDecade =
        couple === 'AgCl/Ag' ? -1 : couple === 'Ag+/Ag' ? 1 : couple === 'Cu2+/Cu' ? 1 / 2 : -1 / 2;
      expectNear(byDiagram, perDecade * S25 * (Math.log10(right) - Math.log10(left)), 1e-14);
    },
  );
});

describe('bad input', () => {
  test('a cell is not an electrode: argument error (docs/functions/CONCCELL.md)', () => {
    const err = engineErrorOf(() =>
      planConcentrationCell(compiledReaction('Zn | Zn2+ || Cu2+ | Cu', null), null),
    );
    expect(err.kind).toBe('argument');
  });

  test('a couple with two species that could differ needs one named: argument error listing them', () => {
    const err = engineErrorOf(() => planConcentrationCell(compiledReaction('H+/H2', null), null));
    expect(err.kind).toBe('argument');
    expect(err.message).toContain('H+');
    expect(err.message).toContain('H2');
  });

  test('a named species that is not in the couple: argument error (docs/design.md, Errors)', () => {
    const err = engineErrorOf(() => planConcentrationCell(compiledReaction('Ag+/Ag', null), 'Cu2+'));
    expect(err.kind).toBe('argument');
    expect(err.message).toContain('Cu2+');
  });

  test('a named species that is not a valid formula: parse error (docs/notation.md)', () => {
    expect(engineErrorOf(() => planConcentrationCell(compiledReaction('Ag+/Ag', null), '3xx')).kind).toBe(
      'parse',
    );
  });

  test.each([
    ['Ag+/Ag', null, 0, 0.1, 'value_left', 'Ag+'],
    ['Ag+/Ag', null, 0.1, -0.1, 'value_right', 'Ag+'],
    ['Ag+/Ag', null, Number.NaN, 0.1, 'value_left', 'Ag+'],
    ['H+/H2', 'H2', 1, 0, 'value_right', 'H2'],
    ['AgCl/Ag', null, Number.POSITIVE_INFINITY, 0.1, 'value_left', 'Cl-'],
  ])(
    '%s (%p) with left %p, right %p: argument error naming %s and %s',
    (couple, species, left, right, arg, name) => {
      const err = engineErrorOf(() => ccell(couple, species, left, right));
      expect(err.kind).toBe('argument');
      expect(err.message).toContain(arg);
      expect(err.message).toContain(name);
    },
  );

  test('a gas gives "partial pressure" in its message (docs/design.md, Conventions: gases in bar)', () => {
    expect(engineErrorOf(() => ccell('H+/H2', 'H2', 0, 1)).message).toContain('pressure');
  });

  test.each([-273.15, -500, Number.NaN])('temperature %p °C: argument error (T > 0 K)', (tC) => {
    expect(engineErrorOf(() => ccell('Ag+/Ag', null, 0.01, 0.1, tC)).kind).toBe('argument');
  });

  test('extreme but valid activities give a finite EMF (docs/design.md, Errors: no NaN or ±Infinity)', () => {
    for (const [l, r] of [
      [1e-300, 1e300],
      [1e300, 1e-300],
      [5e-324, 1],
    ] as const) {
      const e = ccell('Ag+/Ag', null, l, r);
      expect(Number.isFinite(e)).toBe(true);
      expectNear(e, S25 * (Math.log10(r) - Math.log10(l)), 1e-10);
    }
  });
});
