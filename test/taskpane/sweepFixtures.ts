/**
 * A case-series form as the pane holds it (Cu2+/Cu, log sweep of a(Cu2+) from 1e-6 to 1 in
 * 25 points at 25 °C), with any field replaced, and the input it reads to.
 */
import { readSweepForm, type SweepForm, type SweepInput } from '../../src/taskpane/sweepPlan';

export function form(over: Partial<SweepForm> = {}): SweepForm {
  return {
    reaction: 'Cu2+/Cu',
    variable: { kind: 'activity', species: 'Cu2+', scale: 'log' },
    from: '1e-6',
    to: '1',
    points: '25',
    tempC: '25',
    species: [{ name: 'Cu2+', value: '1' }],
    table: '',
    ...over,
  };
}

/** The form read to an input; throws with the form's messages where it does not read. */
export function input(over: Partial<SweepForm> = {}): SweepInput {
  const r = readSweepForm(form(over));
  if (!r.ok) throw new Error(r.errors.map((e) => `${e.field}: ${e.message}`).join('\n'));
  return r.input;
}
