/**
 * The sweep builder's form state: species rows from the reaction, vary choices, defaults.
 */
import {
  mergeSpeciesRows,
  rangeDefaults,
  rowRole,
  sweepFormOf,
  unitOf,
  variableOf,
  varyOptions,
  type SpeciesRow,
} from '../../src/taskpane/sweepForm';
import { checkReaction, readSweepForm } from '../../src/taskpane/sweepPlan';

function needed(text: string) {
  const c = checkReaction(text);
  if (!c.ok) throw new Error(c.message);
  return c.species;
}

describe('mergeSpeciesRows', () => {
  test('fills the rows from the reaction at unit activity', () => {
    expect(mergeSpeciesRows([], needed('Fe3+/Fe2+'))).toEqual([
      { name: 'Fe3+', value: '1', origin: 'reaction', gas: false },
      { name: 'Fe2+', value: '1', origin: 'reaction', gas: false },
    ]);
  });
  test('keeps typed values and the user own rows; drops rows the new reaction does not need', () => {
    const rows: SpeciesRow[] = [
      { name: 'Fe3+', value: '0.1', origin: 'reaction' },
      { name: 'Fe2+', value: '0.01', origin: 'reaction' },
      { name: 'Cl-', value: '0.5', origin: 'user' },
    ];
    expect(mergeSpeciesRows(rows, needed('Fe2+ + 2 e- -> Fe'))).toEqual([
      { name: 'Fe2+', value: '0.01', origin: 'reaction', gas: false },
      { name: 'Cl-', value: '0.5', origin: 'user' },
    ]);
  });
});

describe('vary choices and roles', () => {
  const rows: SpeciesRow[] = [
    { name: 'MnO4-', value: '0.01', origin: 'reaction' },
    { name: 'H+', value: '1', origin: 'reaction' },
    { name: 'Mn2+', value: '0.001', origin: 'reaction' },
    { name: 'pH', value: '2', origin: 'user' },
  ];
  test('each species activity, then pH and temperature', () => {
    expect(varyOptions(rows).map((o) => o.value)).toEqual([
      'activity:MnO4-',
      'activity:H+',
      'activity:Mn2+',
      'pH',
      'temperature',
    ]);
    expect(varyOptions(rows)[0]?.label).toBe('Activity of MnO4-');
  });
  test('variables and roles', () => {
    expect(variableOf('activity:Mn2+', 'log')).toEqual({ kind: 'activity', species: 'Mn2+', scale: 'log' });
    expect(variableOf('pH', 'log')).toEqual({ kind: 'pH' });
    expect(rowRole(rows[2]!, variableOf('activity:Mn2+', 'log'))).toBe('varied');
    expect(rowRole(rows[1]!, { kind: 'pH' })).toBe('set by pH');
    expect(rowRole(rows[3]!, { kind: 'pH' })).toBe('set by pH');
    expect(rowRole(rows[0]!, { kind: 'pH' })).toBe('fixed');
    expect(rowRole(rows[1]!, { kind: 'temperature' })).toBe('fixed');
  });
  test('defaults per kind read as a valid sweep', () => {
    for (const choice of ['activity:Mn2+', 'pH', 'temperature']) {
      for (const scale of ['log', 'linear'] as const) {
        const d = rangeDefaults(variableOf(choice, scale));
        const r = readSweepForm(
          sweepFormOf({
            reaction: 'MnO4-/Mn2+',
            choice,
            scale,
            ...d,
            tempC: '25',
            rows: rows.slice(0, 3),
            table: '',
          }),
        );
        expect(r.ok).toBe(true);
      }
    }
    expect(rangeDefaults({ kind: 'pH' })).toEqual({ from: '0', to: '14', points: '29', unit: 'pH' });
  });
});

describe('units of the species rows and of the varied quantity', () => {
  test('a gas is varied by its partial pressure in bar; a solute by its activity; pH rows are pH', () => {
    const rows = mergeSpeciesRows([], needed('O2(g) + 4 H+ + 4 e- -> 2 H2O'));
    expect(rows.map((r) => [r.name, unitOf(r)])).toEqual([
      ['O2', 'bar'],
      ['H+', 'activity'],
    ]);
    expect(varyOptions(rows).map((o) => o.label)).toEqual([
      'Partial pressure of O2 (bar)',
      'Activity of H+',
      'pH',
      'Temperature (°C)',
    ]);
    expect(unitOf({ name: 'pH' })).toBe('pH');
    expect(unitOf({ name: 'Cl2(g)' })).toBe('bar');
    expect(rangeDefaults({ kind: 'activity', species: 'O2', scale: 'log' }, true).unit).toBe('bar');
    expect(rangeDefaults({ kind: 'activity', species: 'Cu2+', scale: 'log' }).unit).toBe('activity');
  });
});
