/**
 * The case series' preview through the catalogue (ECHEM.POTENTIAL and ECHEM.NERNSTSLOPE
 * via callFunction, as the sheet formula computes), with published checks.
 *
 * Sources: RT ln10/F = 59.15935 mV at 25 °C and 64.1199 mV at 50 °C, derived from the SI
 * 2019 exact constants (F = N_A·e, R = N_A·k). E° values: OpenStax Chemistry 2e, Appendix L
 * (seen: Cu2+/Cu +0.34 V, Zn2+/Zn −0.7618 V, O2/H2O +1.229 V, O2/OH- +0.401 V, MnO4-/Mn2+
 * +1.507 V). The built-in E° of Cu2+/Cu and O2/H2O come from the species data (NBS 1982,
 * Wagman et al., from memory): ΔfG°(Cu2+) = 65.49 kJ/mol gives 65.49/(2F) = 0.33938 V, and
 * ΔfG°(H2O, l) = −237.129 kJ/mol gives 2·237.129/(4F) = 1.22883 V; each is checked exactly
 * against that derivation and against the printed value within 1 mV.
 */
import { nernstSlope, potentialArgs, previewValues, seriesSlope } from '../../src/taskpane/seriesPreview';
import { planSweep, type SweepInput } from '../../src/taskpane/sweepPlan';
import { input } from './sweepFixtures';
import { F } from '../support';

const SLOPE_25 = 0.05915935; // V per decade, derived from the SI exact constants
const SLOPE_50 = 0.0641199; // V per decade at 50 °C, derived likewise
/** E°(Cu2+/Cu) from ΔfG°(Cu2+) = 65.49 kJ/mol (NBS 1982, from memory): 0.33938 V. */
const E0_CU_SPECIES = 65.49e3 / (2 * F);
/** E°(O2/H2O) from ΔfG°(H2O, l) = −237.129 kJ/mol (NBS 1982, from memory): 1.22883 V. */
const E0_O2_SPECIES = (2 * 237.129e3) / (4 * F);

function slopeOf(i: SweepInput): number | undefined {
  const layout = planSweep(i);
  return seriesSlope(i, layout, previewValues(i, layout, null))?.slopeV;
}

describe('preview through the catalogue, and slopes (published checks)', () => {
  test('Cu2+/Cu: E° = +0.34 V (species data 0.33938 V) at unit activity; 0.05916/2 V per decade at 25 °C', () => {
    const i = input({ points: '7' });
    const values = previewValues(i, planSweep(i), null);
    expect(values).toHaveLength(7);
    const e = values.map((v) => (v.ok ? v.e : NaN));
    expect(e[6]).toBeCloseTo(E0_CU_SPECIES, 12); // species data, derived above
    // species-data E° 0.33938 V vs OpenStax Appendix L +0.34 V (printed to 10 mV): within 1 mV
    expect(Math.abs((e[6] as number) - 0.34)).toBeLessThan(0.001);
    expect(e[4]).toBeCloseTo(E0_CU_SPECIES - SLOPE_25, 6); // a = 0.01: 0.28022 V
    for (let k = 1; k < 7; k++) expect((e[k] as number) - (e[k - 1] as number)).toBeCloseTo(SLOPE_25 / 2, 7);
    expect(slopeOf(i)).toBeCloseTo(SLOPE_25 / 2, 7);
    expect(seriesSlope(i, planSweep(i), values)?.per).toBe('V per decade');
  });

  test('O2/H2O against pH: −0.05916 V/pH, reaching E°(O2/OH-) = +0.401 V at pH 14', () => {
    const i = input({
      reaction: 'O2(g) + 4 H+ + 4 e- -> 2 H2O',
      variable: { kind: 'pH' },
      from: '0',
      to: '14',
      points: '15',
      species: [{ name: 'O2(g)', value: '1' }],
    });
    const e = previewValues(i, planSweep(i), null).map((v) => (v.ok ? v.e : NaN));
    expect(e[0]).toBeCloseTo(E0_O2_SPECIES, 12); // species data, derived above
    // species-data E° 1.22883 V vs OpenStax Appendix L +1.229 V: within 0.2 mV
    expect(Math.abs((e[0] as number) - 1.229)).toBeLessThan(0.0002);
    expect(e[14]).toBeCloseTo(0.401, 2); // OpenStax: O2 + 2 H2O + 4 e- -> 4 OH-, +0.401 V (within 1 mV)
    expect(Math.abs((e[14] as number) - 0.401)).toBeLessThan(0.001);
    expect(slopeOf(i)).toBeCloseTo(-SLOPE_25, 7);
  });

  test('MnO4-/Mn2+ against pH: −(8/5)·0.05916 V/pH', () => {
    const i = input({
      reaction: 'MnO4-/Mn2+',
      variable: { kind: 'pH' },
      from: '0',
      to: '7',
      points: '8',
      species: [
        { name: 'MnO4-', value: '1' },
        { name: 'H+', value: '1' },
        { name: 'Mn2+', value: '1' },
      ],
    });
    expect(i.fixed.map((f) => f.name)).toEqual(['MnO4-', 'Mn2+']);
    const e = previewValues(i, planSweep(i), null).map((v) => (v.ok ? v.e : NaN));
    expect(e[0]).toBeCloseTo(1.507, 12); // OpenStax Appendix L
    expect((e[7] as number) - (e[0] as number)).toBeCloseTo(-7 * 1.6 * SLOPE_25, 6);
    expect(slopeOf(i)).toBeCloseTo(-1.6 * SLOPE_25, 7);
  });

  test('the slope follows the temperature: H+/H2 at 50 °C falls 64.12 mV per pH', () => {
    const i = input({
      reaction: '2 H+ + 2 e- -> H2(g)',
      variable: { kind: 'pH' },
      from: '0',
      to: '10',
      points: '11',
      tempC: '50',
      species: [{ name: 'H2(g)', value: '1' }],
    });
    expect(slopeOf(i)).toBeCloseTo(-SLOPE_50, 6);
    const e = previewValues(i, planSweep(i), null).map((v) => (v.ok ? v.e : NaN));
    expect(e[0]).toBeCloseTo(0, 12); // SHE: zero at every temperature (IUPAC)
    expect(e[10]).toBeCloseTo(-10 * SLOPE_50, 5);
  });

  test('Daniell-type cell: 1.0988 V at unit activities, +0.05916/2 V per decade of Cu2+', () => {
    const i = input({
      reaction: 'Zn | Zn2+ || Cu2+ | Cu',
      from: '0.01',
      to: '1',
      points: '3',
      species: [
        { name: 'Cu2+', value: '1' },
        { name: 'Zn2+', value: '1' },
      ],
    });
    const e = previewValues(i, planSweep(i), null).map((v) => (v.ok ? v.e : NaN));
    // E°(Cu2+/Cu) from the species data (derived above), E°(Zn2+/Zn) −0.7618 V (OpenStax, which
    // the species data take as measured): 1.10118 V; with OpenStax's +0.34 V, 1.1018 V
    expect(e[2]).toBeCloseTo(E0_CU_SPECIES + 0.7618, 10);
    expect(Math.abs((e[2] as number) - (0.34 + 0.7618))).toBeLessThan(0.001); // "about 1.10 V"
    expect((e[2] as number) - (e[0] as number)).toBeCloseTo(SLOPE_25, 7);
    expect(slopeOf(i)).toBeCloseTo(SLOPE_25 / 2, 7);
  });

  test('a missing species makes every preview case report the engine message', () => {
    const i = input({
      reaction: 'Fe3+/Fe2+',
      species: [{ name: 'Fe3+', value: '1' }],
      variable: { kind: 'pH' },
    });
    const values = previewValues(i, planSweep(i), null);
    expect(values.every((v) => !v.ok && v.message.includes('Fe2+'))).toBe(true);
  });
});

describe('the preview uses the same function and arguments as the sheet', () => {
  test("the arguments are the sheet formula's: species header, values, temp_C column, table", () => {
    const i = input({ points: '3', species: [{ name: 'Cu2+', value: '1' }] });
    const args = potentialArgs(i, planSweep(i), null);
    expect(args).toEqual(['Cu2+/Cu', [['Cu2+']], [[1e-6], [0.001], [1]], [[25], [25], [25]], undefined]);
  });

  test("the user's table takes precedence: a made-up E° of 0.5 V for Cu2+/Cu moves every case", () => {
    // Fictional table row (E° = 0.500 V instead of OpenStax's +0.34 V); blank rows below it are room to grow.
    const table = [
      ['Cu2+ + 2 e- -> Cu', 0.5, '', 'made-up test row'],
      ['', '', '', ''],
      ['', '', '', ''],
    ];
    const i = input({ points: '3' });
    const layout = planSweep(i);
    const mine = previewValues(i, layout, table).map((v) => (v.ok ? v.e : NaN));
    const builtin = previewValues(i, layout, null).map((v) => (v.ok ? v.e : NaN));
    // a(Cu2+) = 1e-6, 1e-3, 1: E = 0.5 + (s/2)·log10 a with the user's E°, by hand
    [-6, -3, 0].forEach((log10a, k) => expect(mine[k]).toBeCloseTo(0.5 + (SLOPE_25 / 2) * log10a, 7));
    expect(mine[2]).toBeCloseTo(0.5, 12);
    // every case moves by the difference from the built-in E° (species data, derived above)
    for (let k = 0; k < 3; k++)
      expect((mine[k] as number) - (builtin[k] as number)).toBeCloseTo(0.5 - E0_CU_SPECIES, 12);
  });

  test('ECHEM.NERNSTSLOPE gives RT ln10/(nF): 59.159 mV at 25 °C for n = 1, half that for n = 2', () => {
    expect(nernstSlope(25, 1)).toBeCloseTo(SLOPE_25, 7);
    expect(nernstSlope(25, 2)).toBeCloseTo(SLOPE_25 / 2, 7);
    expect(nernstSlope(50, 1)).toBeCloseTo(SLOPE_50, 6);
    expect(nernstSlope(25, null)).toBeNull();
  });

  test('a linear activity series has no single slope; a temperature series gives the mean dE/dT', () => {
    const lin = input({
      variable: { kind: 'activity', species: 'Cu2+', scale: 'linear' },
      from: '0.001',
      to: '0.1',
      points: '5',
    });
    expect(seriesSlope(lin, planSweep(lin), previewValues(lin, planSweep(lin), null))).toBeNull();
    const temp = input({ variable: { kind: 'temperature' }, from: '5', to: '65', points: '13' });
    const s = seriesSlope(temp, planSweep(temp), previewValues(temp, planSweep(temp), null));
    expect(s?.per).toBe('V per °C (mean)');
    expect(Number.isFinite(s?.slopeV)).toBe(true);
  });

  test('a failing case carries the message in sentence case', () => {
    const i = input({
      reaction: 'Fe3+/Fe2+',
      species: [{ name: 'Fe3+', value: '1' }],
      variable: { kind: 'pH' },
    });
    const values = previewValues(i, planSweep(i), null);
    expect(values[0]).toEqual({ ok: false, message: expect.stringMatching(/^[A-Z].*Fe2\+/) });
  });
});
