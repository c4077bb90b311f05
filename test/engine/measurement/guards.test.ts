/** Unit-slip guards: millivolts typed as volts, kelvin typed as °C, percentages as fractions. */
import { potentialInVolts, celsiusInRange, fractionInUnitInterval } from '../../../src/engine';
import { engineErrorOf } from '../../support';

describe('unit-slip guards', () => {
  test.each([
    [
      () => potentialInVolts(850, 'E_V'),
      /E_V of 850 V is beyond ±10 V: were millivolts typed as volts\? Give 0.85 for 850 mV/,
    ],
    [
      () => celsiusInRange(298.15, 'temp_C', [0, 100]),
      /got 298.15 °C: it looks like a temperature in kelvin; give it in °C \(298.15 K is 25 °C\)/,
    ],
    [
      () => celsiusInRange(500, 'temp_C', [0, 100]),
      /must be between 0 and 100 °C; got 500 °C, the range of this function/,
    ],
    [() => fractionInUnitInterval(80, 'utilisation'), /For 80 % write 0.8/],
    [() => fractionInUnitInterval(0, 'efficiency'), /efficiency must be a fraction in \(0, 1\]/],
  ])('refused %#', (f, message) => {
    const e = engineErrorOf(f);
    expect(e.kind).toBe('argument');
    expect(e.message).toMatch(message);
  });

  test.each([
    [() => potentialInVolts(-9.99, 'E_V'), -9.99],
    [() => celsiusInRange(100, 'temp_C', [0, 100]), 100],
    [() => celsiusInRange(300, 'temp_C', [-80, 400]), 300], // in range for that function: no kelvin hint
    [() => fractionInUnitInterval(1, 'efficiency'), 1],
  ])('accepted %#', (f, expected) => {
    expect(f()).toBe(expected);
  });
});
