/**
 * The chart the pane draws inline: an XY line chart of E against the varied quantity,
 * laid out as plain numbers (axes, ticks, the polyline) from the same values the preview
 * computes. DOM-free; taskpane.ts turns the model into SVG elements.
 */

/** One tick of an axis: its value, its label and its position in pixels. */
export interface Tick {
  readonly value: number;
  readonly label: string;
  readonly position: number;
}

/** The titles of a chart's two axes, e.g. "pH" and "E / V vs SHE" (the pane's chart and Excel's alike). */
export interface AxisTitles {
  readonly xTitle: string;
  readonly yTitle: string;
}

/** The plot area inside the chart's box, in pixels: x from left to right, y from top to bottom. */
export interface PlotArea {
  readonly left: number;
  readonly top: number;
  readonly right: number;
  readonly bottom: number;
}

/** Everything needed to draw the chart, in pixels of a `width` × `height` box. */
export interface ChartModel extends AxisTitles {
  readonly width: number;
  readonly height: number;
  readonly plot: PlotArea;
  readonly xTicks: readonly Tick[];
  readonly yTicks: readonly Tick[];
  /** The data as SVG polyline points ("x,y x,y …"). */
  readonly polyline: string;
  /** A sentence describing the chart for screen readers. */
  readonly summary: string;
}

/**
 * Round tick values covering [min, max]: steps of 1, 2 or 5 times a power of ten, about
 * `target` of them. A zero-width range is widened by one step around its value.
 *
 * @example
 * niceTicks(0, 14, 5) // [0, 5, 10]
 */
export function niceTicks(min: number, max: number, target = 5): number[] {
  if (!Number.isFinite(min) || !Number.isFinite(max)) return [];
  if (max < min) [min, max] = [max, min];
  if (max === min) {
    const pad = min === 0 ? 1 : Math.abs(min) * 0.1;
    min -= pad;
    max += pad;
  }
  const raw = (max - min) / Math.max(1, target);
  const power = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 5, 10].map((m) => m * power).find((s) => s >= raw) ?? 10 * power;
  const first = Math.ceil(min / step - 1e-9) * step;
  const out: number[] = [];
  for (let v = first; v <= max + step * 1e-9; v += step) out.push(Number(v.toPrecision(12)) || 0);
  return out;
}

/** A tick label: as many decimals as the step needs, with a true minus sign. */
export function tickLabel(value: number, step: number): string {
  const decimals = Math.max(0, Math.min(6, -Math.floor(Math.log10(step) + 1e-9)));
  return value
    .toFixed(decimals)
    .replace(/^-(?=0(?:\.0+)?$)/, '')
    .replace('-', '\u2212');
}

/**
 * Lay out the chart of `points` (non-finite points are left out) in a box `width` pixels
 * wide; null where fewer than two points are finite.
 *
 * @example
 * chartModel([{ x: 0, y: 0.8 }, { x: 14, y: 0 }], { width: 300, xTitle: 'pH', yTitle: 'E / V vs SHE' })
 */
export function chartModel(
  points: readonly { readonly x: number; readonly y: number }[],
  opts: AxisTitles & { readonly width: number; readonly height?: number },
): ChartModel | null {
  const pts = points.filter((p) => Number.isFinite(p.x) && Number.isFinite(p.y));
  if (pts.length < 2) return null;
  const width = Math.max(150, Math.round(opts.width));
  const height = Math.round(opts.height ?? Math.min(240, Math.max(170, width * 0.62)));
  const plot: PlotArea = { left: 58, top: 12, right: width - 14, bottom: height - 46 };
  const xs = pts.map((p) => p.x);
  const ys = pts.map((p) => p.y);
  const xTarget = Math.max(2, Math.floor((plot.right - plot.left) / 64));
  const yTarget = Math.max(2, Math.floor((plot.bottom - plot.top) / 30));
  let xt = niceTicks(Math.min(...xs), Math.max(...xs), xTarget);
  let yt = niceTicks(Math.min(...ys), Math.max(...ys), yTarget);
  const x0 = Math.min(...xs, ...xt);
  const x1 = Math.max(...xs, ...xt);
  const y0 = Math.min(...ys, ...yt);
  const y1 = Math.max(...ys, ...yt);
  const sx = (x: number) => plot.left + ((x - x0) / (x1 - x0 || 1)) * (plot.right - plot.left);
  const sy = (y: number) => plot.bottom - ((y - y0) / (y1 - y0 || 1)) * (plot.bottom - plot.top);
  const xStep = xt.length > 1 ? (xt[1] as number) - (xt[0] as number) : 1;
  const yStep = yt.length > 1 ? (yt[1] as number) - (yt[0] as number) : 1;
  xt = xt.filter((v) => v >= x0 && v <= x1);
  yt = yt.filter((v) => v >= y0 && v <= y1);
  const round = (v: number) => Math.round(v * 10) / 10;
  const first = pts[0] as { x: number; y: number };
  const last = pts[pts.length - 1] as { x: number; y: number };
  const fmt = (v: number) => String(Number(v.toPrecision(4))).replace('-', '\u2212');
  return {
    width,
    height,
    plot,
    xTicks: xt.map((v) => ({ value: v, label: tickLabel(v, xStep), position: round(sx(v)) })),
    yTicks: yt.map((v) => ({ value: v, label: tickLabel(v, yStep), position: round(sy(v)) })),
    polyline: pts.map((p) => `${round(sx(p.x))},${round(sy(p.y))}`).join(' '),
    xTitle: opts.xTitle,
    yTitle: opts.yTitle,
    summary:
      `Line chart of ${opts.yTitle} against ${opts.xTitle}, ${pts.length} cases: ` +
      `${fmt(first.y)} at ${fmt(first.x)}, ${fmt(last.y)} at ${fmt(last.x)}; ` +
      `${opts.yTitle} from ${fmt(Math.min(...ys))} to ${fmt(Math.max(...ys))}.`,
  };
}
