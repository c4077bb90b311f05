/**
 * K beyond the float64 range: the range error writes K = m × 10^p with 5 significant digits,
 * p = floor(log10 K), m = 10^(log10 K − p). Each expected text is worked out by hand below.
 */
import { EngineError, equilibriumConstantFromLog10 } from '../../src/engine';
import { exponentialOfLog10 } from '../../src/engine/thermo/equilibrium';
import { engineErrorOf } from './support';

const RANGE_TEXT = "is outside the spreadsheet's number range (about 2.2e-308 to 1.8e308)";

describe('the message of a K beyond the float64 range', () => {
  test('K = 10^400 (by hand: p = 400, m = 10^0 = 1)', () => {
    const err = engineErrorOf(() => equilibriumConstantFromLog10(400));
    expect(err).toBeInstanceOf(EngineError);
    expect(err.kind).toBe('range');
    expect(err.message).toBe(`K = 1.0000e+400 ${RANGE_TEXT}; log10 K = 400.0000.`);
  });

  test('K = 10^-400 (by hand: p = −400, m = 1)', () => {
    const err = engineErrorOf(() => equilibriumConstantFromLog10(-400));
    expect(err.kind).toBe('range');
    expect(err.message).toBe(`K = 1.0000e-400 ${RANGE_TEXT}; log10 K = -400.0000.`);
  });

  test.each([
    // 10^0.5 = √10 = 3.16227766… (by hand), so 3.1623 to 5 digits
    [400.5, '3.1623e+400'],
    // floor(−400.5) = −401 and −400.5 − (−401) = 0.5: again √10
    [-400.5, '3.1623e-401'],
    // 10^0.25 = √√10 = 1.77827941… (by hand)
    [1234.25, '1.7783e+1234'],
    // 10^0.75 = 10/10^0.25 = 5.62341325… (by hand); floor(−309.25) = −310
    [-309.25, '5.6234e-310'],
    // 10^0.99999999 = 10·10^−1e-8 = 9.99999977 (by hand), which rounds to 10.0000: the
    // mantissa carries into the exponent
    [400.99999999, '1.0000e+401'],
  ])('log10 K = %p gives K = %s', (log10K, text) => {
    expect(exponentialOfLog10(log10K)).toBe(text);
    expect(engineErrorOf(() => equilibriumConstantFromLog10(log10K)).message).toContain(`K = ${text} `);
  });

  test('a log10 K of 1e21 or more, a whole number in float64, is written as a power of ten', () => {
    expect(exponentialOfLog10(2e21)).toBe('10^2.0000e+21');
    expect(exponentialOfLog10(-2e21)).toBe('10^-2.0000e+21');
  });
});
