/**
 * An E–pH diagram as an SVG document (a string; no DOM), for the runner and the task pane.
 *
 * Regions are filled by class with colour-blind-safe tints and a pattern each (immunity: plain
 * blue; corrosion: orange with diagonal hatching; passivation: green with dots), and labelled
 * with their species; boundaries are solid, the water lines dashed; axes E (V vs SHE) and pH,
 * an optional second E axis on another reference scale, the title with element, activity and
 * temperature, and the caution.
 */
import { EngineError } from '../errors';
import { convertPotentialV, findReference } from '../references';
import type { EphClass, EphDiagram } from './diagram';

/** Options of {@link renderEphSvg}. */
export interface EphSvgOptions {
  /** Width in px (default 720; 320–4000). */
  readonly widthPx?: number;
  /** Height in px (default 600; 280–4000). */
  readonly heightPx?: number;
  /** A reference electrode for a second potential axis on the right (e.g. "SCE", "CSE"). */
  readonly referenceScale?: string;
}

/** The caution printed on every diagram. */
export const EPH_CAUTION =
  'Thermodynamic estimate; kinetics and local chemistry decide; follow applicable standards.';

/** Fill colours and patterns by class (Okabe–Ito hues, lightened). */
export const EPH_CLASS_STYLE: Readonly<Record<EphClass, { fill: string; ink: string; label: string }>> =
  Object.freeze({
    immunity: { fill: '#cfe3f3', ink: '#0072b2', label: 'immunity' },
    corrosion: { fill: '#fbd9b5', ink: '#d55e00', label: 'corrosion' },
    passivation: { fill: '#cdeedd', ink: '#009e73', label: 'passivation' },
  });

function esc(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

function num(x: number): string {
  return (Math.round(x * 100) / 100).toString();
}

/** An activity as people write it: 1e-6, 0.01, 1. */
function activityText(a: number): string {
  return a < 1e-3
    ? a
        .toExponential()
        .replace(/\.?0+e/, 'e')
        .replace('e-', 'e-')
    : String(a);
}

function niceStep(span: number, target: number): number {
  const raw = span / target;
  const p = Math.pow(10, Math.floor(Math.log10(raw)));
  const m = raw / p;
  return (m < 1.5 ? 1 : m < 3 ? 2 : m < 7 ? 5 : 10) * p;
}

function ticks(lo: number, hi: number, target: number): number[] {
  const step = niceStep(hi - lo, target);
  const out: number[] = [];
  for (let v = Math.ceil(lo / step - 1e-9) * step; v <= hi + 1e-9; v += step)
    out.push(Math.round(v / step) * step);
  return out;
}

function checkSize(v: number | undefined, def: number, lo: number, name: string): number {
  const x = v ?? def;
  if (!Number.isFinite(x) || x < lo || x > 4000) {
    throw new EngineError('argument', `${name} must be between ${lo} and 4000 px; got ${String(v)}.`, name);
  }
  return x;
}

/**
 * Renders a diagram (from `ephDiagram`) as a standalone SVG 1.1 document.
 *
 * @param diagram the diagram to draw
 * @param options `{ widthPx, heightPx, referenceScale }`; the reference scale adds a right-hand
 *   axis in V vs that electrode at the diagram's temperature (pH-dependent scales such as the
 *   RHE are refused: use the left axis)
 * @throws EngineError (`argument` bad size or a pH-dependent scale; `notFound`/`ambiguous` for
 *   an unknown reference name)
 * @example
 * const svg = renderEphSvg(ephDiagram('Fe'), { widthPx: 720, heightPx: 600, referenceScale: 'SCE' });
 */
export function renderEphSvg(diagram: EphDiagram, options: EphSvgOptions = {}): string {
  const W = checkSize(options.widthPx, 720, 320, 'widthPx');
  const H = checkSize(options.heightPx, 600, 280, 'heightPx');
  const ref = options.referenceScale ? findReference(options.referenceScale, 'referenceScale') : null;
  if (ref?.needsPH) {
    throw new EngineError(
      'argument',
      `${ref.id} depends on pH, so it cannot be a second potential axis; choose a fixed reference such as SCE.`,
      'referenceScale',
    );
  }
  const w = diagram.window;
  const left = 64;
  const right = ref ? 70 : 24;
  const top = 48;
  const bottom = 96;
  const pw = W - left - right;
  const ph = H - top - bottom;
  const X = (pH: number): number => left + ((pH - w.pHMin) / (w.pHMax - w.pHMin)) * pw;
  const Y = (e: number): number => top + ((w.eMaxV - e) / (w.eMaxV - w.eMinV)) * ph;
  const el = diagram.element;
  const out: string[] = [];
  out.push(
    `<svg xmlns="http://www.w3.org/2000/svg" width="${W}" height="${H}" viewBox="0 0 ${W} ${H}" font-family="sans-serif" font-size="12" role="img">`,
  );
  const title = `E–pH diagram of ${el.name} (${el.symbol}), dissolved species at activity ${activityText(diagram.activity)}, ${diagram.tempC} °C`;
  out.push(`<title>${esc(title)}</title>`);
  out.push('<defs>');
  out.push(
    `<pattern id="eph-hatch" patternUnits="userSpaceOnUse" width="8" height="8"><rect width="8" height="8" fill="${EPH_CLASS_STYLE.corrosion.fill}"/><path d="M0 8 L8 0" stroke="${EPH_CLASS_STYLE.corrosion.ink}" stroke-width="0.7" stroke-opacity="0.5"/></pattern>`,
  );
  out.push(
    `<pattern id="eph-dots" patternUnits="userSpaceOnUse" width="8" height="8"><rect width="8" height="8" fill="${EPH_CLASS_STYLE.passivation.fill}"/><circle cx="4" cy="4" r="1" fill="${EPH_CLASS_STYLE.passivation.ink}" fill-opacity="0.55"/></pattern>`,
  );
  out.push(`<clipPath id="eph-plot"><rect x="${left}" y="${top}" width="${pw}" height="${ph}"/></clipPath>`);
  out.push('</defs>');
  out.push(`<rect width="${W}" height="${H}" fill="#ffffff"/>`);
  const fillOf = (c: EphClass): string =>
    c === 'corrosion'
      ? 'url(#eph-hatch)'
      : c === 'passivation'
        ? 'url(#eph-dots)'
        : EPH_CLASS_STYLE.immunity.fill;
  out.push('<g class="regions">');
  for (const r of diagram.regions) {
    const pts = r.polygon.map((p) => `${num(X(p.pH))},${num(Y(p.E))}`).join(' ');
    out.push(
      `<polygon class="region ${r.cls}" data-species="${esc(r.species)}" data-class="${r.cls}" points="${pts}" fill="${fillOf(r.cls)}" stroke="none"/>`,
    );
  }
  out.push('</g>');
  out.push('<g class="boundaries" stroke="#222222" stroke-width="1.6" fill="none">');
  for (const b of diagram.boundaries) {
    out.push(
      `<line class="boundary" data-a="${esc(b.speciesA)}" data-b="${esc(b.speciesB)}" x1="${num(X(b.from.pH))}" y1="${num(Y(b.from.E))}" x2="${num(X(b.to.pH))}" y2="${num(Y(b.to.E))}"/>`,
    );
  }
  out.push('</g>');
  out.push(
    '<g class="water" stroke="#555555" stroke-width="1.2" stroke-dasharray="6 4" clip-path="url(#eph-plot)">',
  );
  for (const l of diagram.waterLines) {
    out.push(
      `<line class="water-line" data-couple="${esc(l.couple)}" x1="${num(X(l.from.pH))}" y1="${num(Y(l.from.E))}" x2="${num(X(l.to.pH))}" y2="${num(Y(l.to.E))}"/>`,
    );
  }
  out.push('</g>');
  out.push('<g class="labels" text-anchor="middle" font-size="12" fill="#111111">');
  for (const r of diagram.regions) {
    const text = r.species.replace(/\((s|aq)\)$/, '');
    // tiny regions get no label inside: the label would cover the neighbours
    const widthPH = Math.max(...r.polygon.map((p) => p.pH)) - Math.min(...r.polygon.map((p) => p.pH));
    const small = X(w.pHMin + widthPH) - X(w.pHMin) < text.length * 6;
    out.push(
      `<text class="label" data-species="${esc(r.species)}" x="${num(Math.min(Math.max(X(r.centroid.pH), left + text.length * 3.5), left + pw - text.length * 3.5))}" y="${num(Y(r.centroid.E) + 4)}"${small ? ' font-size="9"' : ''}>${esc(text)}</text>`,
    );
  }
  out.push('</g>');
  // frame and axes
  out.push(`<rect x="${left}" y="${top}" width="${pw}" height="${ph}" fill="none" stroke="#000000"/>`);
  out.push('<g class="axis pH" font-size="11" text-anchor="middle">');
  for (const t of ticks(w.pHMin, w.pHMax, 8)) {
    out.push(
      `<line x1="${num(X(t))}" y1="${top + ph}" x2="${num(X(t))}" y2="${top + ph + 5}" stroke="#000000"/>`,
    );
    out.push(`<text class="tick" x="${num(X(t))}" y="${top + ph + 18}">${num(t)}</text>`);
  }
  out.push(`<text class="axis-title" x="${left + pw / 2}" y="${top + ph + 36}" font-size="12">pH</text>`);
  out.push('</g>');
  out.push('<g class="axis E" font-size="11" text-anchor="end">');
  for (const t of ticks(w.eMinV, w.eMaxV, 8)) {
    out.push(`<line x1="${left - 5}" y1="${num(Y(t))}" x2="${left}" y2="${num(Y(t))}" stroke="#000000"/>`);
    out.push(`<text class="tick" x="${left - 8}" y="${num(Y(t) + 4)}">${num(t)}</text>`);
  }
  out.push(
    `<text class="axis-title" x="16" y="${top + ph / 2}" text-anchor="middle" transform="rotate(-90 16 ${top + ph / 2})" font-size="12">E (V vs SHE)</text>`,
  );
  out.push('</g>');
  if (ref) {
    const shift = convertPotentialV(0, 'SHE', ref.id, diagram.tempC);
    const lo = w.eMinV + shift;
    const hi = w.eMaxV + shift;
    out.push(`<g class="axis ref" data-reference="${esc(ref.id)}" font-size="11" text-anchor="start">`);
    for (const t of ticks(lo, hi, 8)) {
      const y = Y(t - shift);
      out.push(
        `<line x1="${left + pw}" y1="${num(y)}" x2="${left + pw + 5}" y2="${num(y)}" stroke="#000000"/>`,
      );
      out.push(`<text class="tick" x="${left + pw + 8}" y="${num(y + 4)}">${num(t)}</text>`);
    }
    const xr = W - 14;
    out.push(
      `<text class="axis-title" x="${xr}" y="${top + ph / 2}" text-anchor="middle" transform="rotate(90 ${xr} ${top + ph / 2})" font-size="12">E (V vs ${esc(ref.id)})</text>`,
    );
    out.push('</g>');
  }
  out.push(
    `<text class="title" x="${W / 2}" y="20" text-anchor="middle" font-size="14" font-weight="bold">${esc(`E–pH diagram: ${el.name} (${el.symbol})`)}</text>`,
  );
  out.push(
    `<text class="subtitle" x="${W / 2}" y="37" text-anchor="middle" font-size="12">${esc(`dissolved species at activity ${activityText(diagram.activity)}, ${diagram.tempC} °C, 1 bar; dashed: water stability (H2, O2 at 1 bar)`)}</text>`,
  );
  // legend
  const ly = H - 40;
  let lx = left;
  out.push('<g class="legend" font-size="11">');
  for (const c of ['immunity', 'corrosion', 'passivation'] as const) {
    out.push(
      `<rect x="${lx}" y="${ly}" width="14" height="12" fill="${fillOf(c)}" stroke="#000000" stroke-width="0.5"/>`,
    );
    out.push(`<text x="${lx + 20}" y="${ly + 10}">${EPH_CLASS_STYLE[c].label}</text>`);
    lx += 110;
  }
  out.push('</g>');
  out.push(
    `<text class="caution" x="${left}" y="${H - 10}" font-size="11" fill="#333333">${esc(EPH_CAUTION)}</text>`,
  );
  out.push('</svg>');
  return out.join('\n') + '\n';
}
