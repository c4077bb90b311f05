/**
 * The inline chart's layout: round ticks (steps of 1, 2 or 5 × 10^k, common practice for
 * chart axes), the data mapped into the plot box, and a text summary for screen readers.
 */
import { chartModel, niceTicks, tickLabel } from '../../src/taskpane/chart';

describe('niceTicks', () => {
  test.each([
    [0, 14, 5, [0, 5, 10]],
    [-6, 0, 6, [-6, -5, -4, -3, -2, -1, 0]],
    [0.2, 0.9, 4, [0.2, 0.4, 0.6, 0.8]],
    [0.65, 0.89, 3, [0.7, 0.8]],
  ])('[%s, %s] about %s ticks → %j', (min, max, target, ticks) => {
    expect(niceTicks(min, max, target)).toEqual(ticks);
  });

  test('a flat series gets a range around its value; non-finite ends give no ticks', () => {
    const t = niceTicks(0.337, 0.337, 4);
    expect(t.length).toBeGreaterThanOrEqual(2);
    expect(Math.min(...t)).toBeLessThanOrEqual(0.337);
    expect(Math.max(...t)).toBeGreaterThanOrEqual(0.337);
    expect(niceTicks(Number.NaN, 1)).toEqual([]);
  });

  test('labels carry the decimals the step needs and a true minus sign', () => {
    expect(tickLabel(-0.2, 0.1)).toBe('\u22120.2');
    expect(tickLabel(5, 5)).toBe('5');
    expect(tickLabel(0, 0.05)).toBe('0.00');
  });
});

describe('chartModel', () => {
  const pts = [
    { x: -6, y: 0.1595 },
    { x: -3, y: 0.2482 },
    { x: 0, y: 0.337 },
  ];

  test('points fall inside the plot box; higher E is higher on the page', () => {
    const m = chartModel(pts, { width: 320, xTitle: 'log10 a(Cu2+)', yTitle: 'E / V vs SHE' });
    expect(m).not.toBeNull();
    const xy = (m?.polyline ?? '').split(' ').map((p) => p.split(',').map(Number));
    expect(xy).toHaveLength(3);
    for (const [x, y] of xy) {
      expect(x).toBeGreaterThanOrEqual(m?.plot.left ?? Infinity);
      expect(x).toBeLessThanOrEqual(m?.plot.right ?? -Infinity);
      expect(y).toBeGreaterThanOrEqual(m?.plot.top ?? Infinity);
      expect(y).toBeLessThanOrEqual(m?.plot.bottom ?? -Infinity);
    }
    expect((xy[2]?.[1] as number) < (xy[0]?.[1] as number)).toBe(true);
    expect(m?.xTicks.map((t) => t.label)).toContain('\u22126');
    expect(m?.summary).toBe(
      'Line chart of E / V vs SHE against log10 a(Cu2+), 3 cases: 0.1595 at \u22126, 0.337 at 0; E / V vs SHE from 0.1595 to 0.337.',
    );
  });

  test('non-finite points are left out; fewer than two finite points give no chart', () => {
    expect(
      chartModel(
        [
          { x: 0, y: 1 },
          { x: 1, y: Number.NaN },
        ],
        { width: 300, xTitle: 'x', yTitle: 'y' },
      ),
    ).toBeNull();
    const m = chartModel([...pts, { x: 1, y: Number.NaN }], { width: 300, xTitle: 'x', yTitle: 'y' });
    expect(m?.polyline.split(' ')).toHaveLength(3);
  });

  test('the width follows the pane (not below 150 px), and narrower plots get fewer ticks', () => {
    const wide = chartModel(pts, { width: 600, xTitle: 'x', yTitle: 'y' });
    const narrow = chartModel(pts, { width: 100, xTitle: 'x', yTitle: 'y' });
    expect(narrow?.width).toBe(150);
    expect((narrow?.xTicks.length ?? 0) <= (wide?.xTicks.length ?? 0)).toBe(true);
  });
});
