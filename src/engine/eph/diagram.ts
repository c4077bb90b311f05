/**
 * E–pH (Pourbaix) diagrams: which species of an element is thermodynamically stable at a
 * potential E (V vs SHE) and a pH, computed exactly from Gibbs energies of formation.
 *
 * ## The planes (derivation)
 *
 * Each species X of element M, with c atoms of M, is taken per one atom of M through its
 * formation half-reaction from the metal, written as an oxidation:
 *
 *     M + o H2O → (1/c) X + h H+ + n e-
 *
 * Balancing O: o = O(X)/c. Balancing H: 2o = H(X)/c + h, so h = 2o − H(X)/c. Balancing
 * charge: 0 = z(X)/c + h − n, so n = z(X)/c + h (the oxidation state of M in X).
 *
 * At a potential E vs SHE the electrons' molar Gibbs energy is −F·E (SHE convention:
 * ΔfG°(H+) = ΔfG°(H2) = 0 at every temperature, so ΔfG°(e-) = 0 and only the potential
 * counts), and μ(H+) = RT ln a(H+) = −RT ln10 · pH. The reaction's Gibbs energy is
 *
 *     ΔG_X(pH, E) = (1/c)[ΔfG°_X(T) + RT ln a_X] − o ΔfG°_H2O(T) − h RT ln10 pH − n F E
 *
 * (a_X = the given activity for dissolved species, 1 for solids; ΔfG°(M) = 0). Divided by F,
 * in volts:  g_X = G0_X − h·s·pH − n·E  with  G0_X = ΔG_X(0, 0)/F  and  s = RT ln10 / F.
 * The metal itself has g = 0. The stable species minimises g: the planes' lower envelope.
 *
 * Two species X, Y share a boundary where g_X = g_Y:
 *
 *     E = (G0_X − G0_Y)/(n_X − n_Y) − s (h_X − h_Y)/(n_X − n_Y) · pH
 *
 * e.g. Fe/Fe2+: E = ΔfG°(Fe2+)/(2F) + (s/2) log a, and Fe2O3/Fe2+ (per Fe: o = 3/2, h = 3,
 * n = 3 against h = 0, n = 2): slope −3s = −0.1775 V per pH at 25 °C; where n_X = n_Y the
 * boundary is vertical (pH = (G0_X − G0_Y)/(s (h_X − h_Y))).
 *
 * ## Regions
 *
 * The region of X is {(pH, E) in the window : g_X ≤ g_Y for all Y}, an intersection of
 * half-planes: a convex polygon, found by clipping the window rectangle by one half-plane per
 * other species. Each edge remembers which species' half-plane made it, and the species across
 * an edge is confirmed at its midpoint, so boundaries meet exactly at triple points and a
 * species whose polygon is empty (it never predominates) simply has no region.
 */
import { EngineError, quote } from '../errors';
import { FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K, ZERO_CELSIUS_K } from '../constants';
import { elementsOf, parseSpecies, phaseOf } from '../notation/species';
import { findSpeciesRecord } from '../data/species/index';
import type { SpeciesThermoRecord } from '../data/species/types';
import { EPH_ELEMENTS, type EphElement } from './elements';

/**
 * ΔfG° of a species in kJ/mol at a temperature in °C. The diagram code depends on this
 * interface only, so that the species data layer's own lookup can replace the default.
 */
export type SpeciesGibbs = (speciesText: string, tempC: number) => number;

/** The reference temperature of the records, K. */
const T0_K = 298.15;

/** The elements' reference states, for formation entropies and heat capacities. */
const ELEMENT_STATE: Readonly<Record<string, { species: string; per: number }>> = {
  H: { species: 'H2(g)', per: 0.5 },
  O: { species: 'O2(g)', per: 0.5 },
};

interface FormationTerms {
  readonly gKJ: number;
  /** ΔfS°, kJ/(mol·K) */
  readonly sKJK: number;
  /** ΔfCp°, kJ/(mol·K) */
  readonly cpKJK: number;
}

/** A species' record by its text ("Fe2+", "Fe2O3(s)", "H2(g)"); throws where there is none. */
export type SpeciesRecordLookup = (speciesText: string) => SpeciesThermoRecord;

/** The species data layer's record of a species written as in the element sets ("Fe2+", "Fe2O3(s)"). */
function registryRecord(speciesText: string): SpeciesThermoRecord {
  return findSpeciesRecord(speciesText, 'species');
}

/**
 * A {@link SpeciesGibbs} built on any record lookup (by default the species data layer's
 * registry, `findSpeciesRecord`, the one data set of the potentials table): Gibbs–Helmholtz with a constant heat capacity
 * of formation,
 * ΔfG°(T) = ΔfG° − (T − T0)·ΔfS° + ΔfCp°·[(T − T0) − T ln(T/T0)], T0 = 298.15 K.
 *
 * ΔfS° and ΔfCp° are those of the formation from the elements (H2(g), O2(g), the metal(s)) and,
 * for an ion, the electrons of the SHE convention (S°(e-) = ½S°(H2), Cp°(e-) = ½Cp°(H2),
 * ΔfG°(e-) = 0). ΔfS° from the absolute S°; where a record has no S°, (ΔfH° − ΔfG°)/T0; where
 * it has neither, 0 (ΔfG° keeps its 25 °C value: the E–pH counterpart of the potentials
 * table's rule that a row with a species without S° keeps its 25 °C E°; the reaction
 * functions (ΔG, K, ΔH, ΔS off 25 °C) refuse such a reaction instead). A species without Cp° contributes none, so
 * that Σν·ΔfG°(T) over a reaction is the reaction's own Gibbs–Helmholtz expression with
 * ΔrS° = Σν·S° and ΔrCp° = Σν·Cp° (element and electron terms cancel).
 *
 * @example
 * const gibbs = makeSpeciesGibbs((t) => myRecords.get(t)!);
 * gibbs('H2O(l)', 60) // ≈ −231.41 kJ/mol
 */
export function makeSpeciesGibbs(lookup: SpeciesRecordLookup): SpeciesGibbs {
  const cache = new Map<string, FormationTerms>();
  const terms = (speciesText: string): FormationTerms => {
    const hit = cache.get(speciesText);
    if (hit) return hit;
    const r = lookup(speciesText);
    const sp = parseSpecies(speciesText);
    const h2 = lookup('H2(g)');
    // elements -> X^z + z e-: the electrons count on the product side (z < 0 for anions)
    let sEl = (sp.charge * (h2.sJK ?? 0)) / 2;
    let cpEl = (sp.charge * (h2.cpJK ?? 0)) / 2;
    for (const [el, count] of elementsOf(sp)) {
      const state = ELEMENT_STATE[el];
      const ref = lookup(state ? state.species : `${el}(s)`);
      const per = state ? state.per : 1;
      sEl -= count * per * (ref.sJK ?? 0);
      cpEl -= count * per * (ref.cpJK ?? 0);
    }
    let sJK: number;
    if (r.sJK !== undefined) sJK = r.sJK + sEl;
    else if (r.dfHkJ !== undefined) sJK = ((r.dfHkJ - r.dfGkJ) / T0_K) * 1000;
    else sJK = 0;
    const t = { gKJ: r.dfGkJ, sKJK: sJK / 1000, cpKJK: ((r.cpJK ?? 0) + cpEl) / 1000 };
    cache.set(speciesText, t);
    return t;
  };
  return (speciesText, tempC) => {
    const f = terms(speciesText);
    const tK = tempC + ZERO_CELSIUS_K;
    if (tK === T0_K) return f.gKJ;
    return f.gKJ - (tK - T0_K) * f.sKJK + f.cpKJK * (tK - T0_K - tK * Math.log(tK / T0_K));
  };
}

/**
 * The default {@link SpeciesGibbs}: {@link makeSpeciesGibbs} on the species data layer's
 * registry (the standard list and the E–pH list, one record per species).
 * Domain 0–100 °C (checked by callers).
 *
 * @throws EngineError (`notFound`) for a species without a record
 * @example
 * defaultSpeciesGibbs('H2O(l)', 25) // −237.129
 * defaultSpeciesGibbs('H2O(l)', 60) // ≈ −231.41
 */
export const defaultSpeciesGibbs: SpeciesGibbs = makeSpeciesGibbs(registryRecord);

/** Whether a species is the metal, a dissolved species or a solid other than the metal. */
export type EphPhaseKind = 'metal' | 'dissolved' | 'solid';

/** The trade's class of a predominance region. */
export type EphClass = 'immunity' | 'corrosion' | 'passivation';

/** One species normalised to one atom of the element, with its plane at (activity, T). */
export interface EphPlane {
  /** The species text as in the data ("Fe2O3(s)"). */
  readonly species: string;
  readonly kind: EphPhaseKind;
  readonly cls: EphClass;
  /** Atoms of the element per formula unit (c). */
  readonly atoms: number;
  /** H+ released per atom of the element (h). */
  readonly hPlus: number;
  /** Electrons released per atom of the element (n, the oxidation state). */
  readonly electrons: number;
  /** G0 in volts: the plane's value at pH 0, E = 0. */
  readonly g0V: number;
}

/** Bounds of accepted arguments: the Atlas's pH span, the aqueous 0–100 °C range. */
export const EPH_LIMITS = Object.freeze({
  pHMin: -2,
  pHMax: 16,
  tempMinC: 0,
  tempMaxC: 100,
  potentialMaxAbsV: 10,
  defaultActivity: 1e-6,
});

const BY_SYMBOL = new Map<string, EphElement>(EPH_ELEMENTS.map((e) => [e.symbol.toLowerCase(), e]));
for (const e of EPH_ELEMENTS) BY_SYMBOL.set(e.name.toLowerCase(), e);
BY_SYMBOL.set('aluminum', EPH_ELEMENTS.find((e) => e.symbol === 'Al') as EphElement);

/**
 * The diagram definition of an element, by symbol or English name (case-insensitive).
 *
 * @throws EngineError (`notFound`) listing the elements that have diagrams
 * @example
 * findEphElement('fe').symbol // 'Fe'
 */
export function findEphElement(element: string): EphElement {
  const text = typeof element === 'string' ? element.trim() : String(element);
  const hit = BY_SYMBOL.get(text.toLowerCase());
  if (!hit) {
    throw new EngineError(
      'notFound',
      `No E–pH diagram for element ${quote(text)}: give one of ${EPH_ELEMENTS.map((e) => e.symbol).join(', ')}.`,
      'element',
    );
  }
  return hit;
}

/**
 * Checks a temperature for E–pH work (0–100 °C).
 *
 * @throws EngineError (`argument`) outside 0–100 °C or not finite
 * @example
 * checkEphTemp(25) // 25
 */
export function checkEphTemp(tempC: number): number {
  if (
    typeof tempC !== 'number' ||
    !Number.isFinite(tempC) ||
    tempC < EPH_LIMITS.tempMinC ||
    tempC > EPH_LIMITS.tempMaxC
  ) {
    const hint =
      typeof tempC === 'number' && tempC > 250 && tempC < 400 ? ' It looks like kelvin: give °C.' : '';
    throw new EngineError(
      'argument',
      `temp_C must be between 0 and 100 °C for aqueous E–pH diagrams; got ${String(tempC)}.${hint}`,
      'temp_C',
    );
  }
  return tempC;
}

/**
 * Checks the activity of the dissolved species: 0 < a ≤ 1.
 *
 * @throws EngineError (`argument`)
 * @example
 * checkEphActivity(1e-6) // 1e-6
 */
export function checkEphActivity(activity: number): number {
  if (typeof activity !== 'number' || !Number.isFinite(activity) || activity <= 0 || activity > 1) {
    throw new EngineError(
      'argument',
      `activity must be above 0 and at most 1 (dissolved species, e.g. 1e-6 as usual in corrosion work); got ${String(activity)}.`,
      'activity',
    );
  }
  return activity;
}

/**
 * Checks a pH for E–pH work (−2 to 16, the Atlas's span).
 *
 * @throws EngineError (`argument`)
 * @example
 * checkEphPH(7) // 7
 */
export function checkEphPH(pH: number, argName = 'pH'): number {
  if (typeof pH !== 'number' || !Number.isFinite(pH) || pH < EPH_LIMITS.pHMin || pH > EPH_LIMITS.pHMax) {
    throw new EngineError('argument', `${argName} must be between −2 and 16; got ${String(pH)}.`, argName);
  }
  return pH;
}

/**
 * Checks a potential in V vs SHE (finite, within ±10 V).
 *
 * @throws EngineError (`argument`)
 * @example
 * checkEphPotential(-0.5) // -0.5
 */
export function checkEphPotential(potentialV: number, argName = 'E_V'): number {
  if (
    typeof potentialV !== 'number' ||
    !Number.isFinite(potentialV) ||
    Math.abs(potentialV) > EPH_LIMITS.potentialMaxAbsV
  ) {
    throw new EngineError(
      'argument',
      `${argName} must be a potential in V vs SHE within ±10 V; got ${String(potentialV)}. Give volts, not millivolts.`,
      argName,
    );
  }
  return potentialV;
}

interface Stoich {
  readonly atoms: number;
  readonly o: number;
  readonly h: number;
  readonly n: number;
  readonly kind: EphPhaseKind;
}

const stoichCache = new Map<string, Stoich>();

/** c, o, h, n and the kind of one species of element `symbol` (see the derivation above). */
export function ephStoichiometry(speciesText: string, symbol: string): Stoich {
  const key = `${symbol}|${speciesText}`;
  const hit = stoichCache.get(key);
  if (hit) return hit;
  const sp = parseSpecies(speciesText);
  const counts = elementsOf(sp);
  const atoms = counts.get(symbol) ?? 0;
  for (const el of counts.keys()) {
    if (el !== symbol && el !== 'O' && el !== 'H') {
      throw new EngineError(
        'argument',
        `E–pH species ${quote(speciesText)} holds ${el}; only ${symbol}, O and H are allowed.`,
        'species',
      );
    }
  }
  if (atoms <= 0)
    throw new EngineError('argument', `E–pH species ${quote(speciesText)} holds no ${symbol}.`, 'species');
  const o = (counts.get('O') ?? 0) / atoms;
  const h = 2 * o - (counts.get('H') ?? 0) / atoms;
  const n = sp.charge / atoms + h;
  const phase = phaseOf(sp);
  const kind: EphPhaseKind = phase === 'aq' ? 'dissolved' : n === 0 && counts.size === 1 ? 'metal' : 'solid';
  const st = Object.freeze({ atoms, o, h, n, kind });
  stoichCache.set(key, st);
  return st;
}

/** The class of a region from the kind of its species. */
export function classOfKind(kind: EphPhaseKind): EphClass {
  return kind === 'metal' ? 'immunity' : kind === 'dissolved' ? 'corrosion' : 'passivation';
}

/** RT ln10 / F in V at a temperature in °C (no checks). */
function slopeV(tempC: number): number {
  return (GAS_CONSTANT_J_PER_MOL_K * (tempC + ZERO_CELSIUS_K) * Math.LN10) / FARADAY_C_PER_MOL;
}

/** One element's planes at an activity and temperature. Frozen. */
export interface EphPlanes {
  readonly element: EphElement;
  readonly activity: number;
  readonly tempC: number;
  /** RT ln10 / F at tempC, V. */
  readonly slopeV: number;
  readonly planes: readonly EphPlane[];
}

const planeCache = new Map<string, EphPlanes>();
const PLANE_CACHE_LIMIT = 256;

/**
 * The planes g_X(pH, E) = G0_X − h_X·s·pH − n_X·E (volts) of an element's species at an
 * activity and temperature; cached per (element, activity, temperature) for the default data.
 *
 * Domain: activity in (0, 1]; temp_C 0–100. Precision: float64 from the data's ΔfG°.
 *
 * @param gibbs the ΔfG°(T) source (default: the species data layer's registry)
 * @throws EngineError for an unknown element or an argument out of range
 * @example
 * ephPlanes('Fe', 1e-6, 25).planes.length // 9
 */
export function ephPlanes(
  element: string,
  activity: number = EPH_LIMITS.defaultActivity,
  tempC = 25,
  gibbs: SpeciesGibbs = defaultSpeciesGibbs,
): EphPlanes {
  const el = findEphElement(element);
  checkEphActivity(activity);
  checkEphTemp(tempC);
  const useCache = gibbs === defaultSpeciesGibbs;
  const key = `${el.symbol}|${activity}|${tempC}`;
  if (useCache) {
    const hit = planeCache.get(key);
    if (hit) return hit;
  }
  const tK = tempC + ZERO_CELSIUS_K;
  const rtKJ = (GAS_CONSTANT_J_PER_MOL_K * tK) / 1000;
  const gWater = gibbs('H2O(l)', tempC);
  const planes = el.species.map((sp): EphPlane => {
    const st = ephStoichiometry(sp, el.symbol);
    const lnA = st.kind === 'dissolved' ? Math.log(activity) : 0;
    const gKJ = (gibbs(sp, tempC) + rtKJ * lnA) / st.atoms - st.o * gWater;
    return Object.freeze({
      species: sp,
      kind: st.kind,
      cls: classOfKind(st.kind),
      atoms: st.atoms,
      hPlus: st.h,
      electrons: st.n,
      g0V: (gKJ * 1000) / FARADAY_C_PER_MOL,
    });
  });
  const result: EphPlanes = Object.freeze({
    element: el,
    activity,
    tempC,
    slopeV: slopeV(tempC),
    planes: Object.freeze(planes),
  });
  if (useCache) {
    if (planeCache.size >= PLANE_CACHE_LIMIT) planeCache.clear();
    planeCache.set(key, result);
  }
  return result;
}

/** Clears the cache of planes (for tests and memory). */
export function clearEphCache(): void {
  planeCache.clear();
}

/** Index of the plane with the lowest g at (pH, E): the stable species. */
export function stableIndex(p: EphPlanes, pH: number, potentialV: number): number {
  const planes = p.planes;
  const sPH = p.slopeV * pH;
  let best = 0;
  let bestG = Infinity;
  for (let i = 0; i < planes.length; i++) {
    const q = planes[i] as EphPlane;
    const g = q.g0V - q.hPlus * sPH - q.electrons * potentialV;
    if (g < bestG) {
      bestG = g;
      best = i;
    }
  }
  return best;
}

/**
 * The stable species of an element at one (E, pH): the one whose formation plane is lowest.
 *
 * Domain: E_V within ±10 V vs SHE; pH −2…16; activity (0, 1] (default 1e-6); temp_C 0–100.
 * On a boundary the species listed first in the element's set wins (ties are measure zero).
 *
 * @returns the species text, e.g. "Fe2O3(s)", and its class
 * @throws EngineError (`notFound` unknown element; `argument` out of range)
 * @example
 * predominantSpecies('Fe', 0.5, 7) // { species: 'Fe2O3(s)', cls: 'passivation' }
 * predominantSpecies('Fe', -1, 7) // { species: 'Fe(s)', cls: 'immunity' }
 */
export function predominantSpecies(
  element: string,
  potentialV: number,
  pH: number,
  activity: number = EPH_LIMITS.defaultActivity,
  tempC = 25,
  gibbs: SpeciesGibbs = defaultSpeciesGibbs,
): { species: string; cls: EphClass } {
  const p = ephPlanes(element, activity, tempC, gibbs);
  checkEphPotential(potentialV);
  checkEphPH(pH);
  const q = p.planes[stableIndex(p, pH, potentialV)] as EphPlane;
  return { species: q.species, cls: q.cls };
}

/** A point (pH, E). */
export interface EphPoint {
  readonly pH: number;
  readonly E: number;
}

/** The plotting window: pH and E (V vs SHE) ranges. */
export interface EphWindow {
  readonly pHMin: number;
  readonly pHMax: number;
  readonly eMinV: number;
  readonly eMaxV: number;
}

/** One predominance region: a convex polygon (counter-clockwise in (pH, E)). */
export interface EphRegion {
  readonly species: string;
  readonly cls: EphClass;
  readonly kind: EphPhaseKind;
  readonly polygon: readonly EphPoint[];
  /** Area in pH·V. */
  readonly area: number;
  /** The polygon's centroid, for a label. */
  readonly centroid: EphPoint;
}

/** A boundary between two regions: a straight segment E = intercept + slope·pH. */
export interface EphBoundary {
  readonly speciesA: string;
  readonly speciesB: string;
  readonly from: EphPoint;
  readonly to: EphPoint;
  /** dE/dpH in V per pH unit; null for a vertical (pH-only) boundary. */
  readonly slopeVPerPH: number | null;
  /** E at pH 0, V; null for a vertical boundary. */
  readonly interceptV: number | null;
  /** pH of a vertical boundary, otherwise null. */
  readonly pHVertical: number | null;
}

/** A water-stability line across the window. */
export interface EphWaterLine {
  readonly name: 'hydrogen' | 'oxygen';
  /** "H+/H2(g)" or "O2(g)/H2O(l)". */
  readonly couple: string;
  readonly interceptV: number;
  readonly slopeVPerPH: number;
  readonly from: EphPoint;
  readonly to: EphPoint;
}

/** A whole diagram. Frozen. */
export interface EphDiagram {
  readonly element: EphElement;
  readonly activity: number;
  readonly tempC: number;
  readonly window: EphWindow;
  /** Non-empty regions, in the element's species order. */
  readonly regions: readonly EphRegion[];
  /** Species of the set that have no region in the window. */
  readonly absent: readonly string[];
  readonly boundaries: readonly EphBoundary[];
  readonly waterLines: readonly EphWaterLine[];
}

interface Vertex {
  x: number;
  y: number;
  /** label of the edge from this vertex to the next: −1 window, else a plane index. */
  edge: number;
}

/** g_i − g_j as a·x + b·y + c (x = pH, y = E). */
function diffCoeffs(p: EphPlanes, i: number, j: number): [number, number, number] {
  const a = p.planes[i] as EphPlane;
  const b = p.planes[j] as EphPlane;
  return [-(a.hPlus - b.hPlus) * p.slopeV, -(a.electrons - b.electrons), a.g0V - b.g0V];
}

/** Clip a convex polygon by {a x + b y + c ≤ 0}, labelling the new edge `label`. */
function clip(poly: Vertex[], a: number, b: number, c: number, label: number, eps: number): Vertex[] {
  const out: Vertex[] = [];
  const m = poly.length;
  for (let k = 0; k < m; k++) {
    const P = poly[k] as Vertex;
    const Q = poly[(k + 1) % m] as Vertex;
    const fp = a * P.x + b * P.y + c;
    const fq = a * Q.x + b * Q.y + c;
    const pin = fp <= eps;
    const qin = fq <= eps;
    if (pin) out.push({ x: P.x, y: P.y, edge: P.edge });
    if (pin !== qin) {
      const t = fp / (fp - fq);
      const I = { x: P.x + t * (Q.x - P.x), y: P.y + t * (Q.y - P.y), edge: pin ? label : P.edge };
      out.push(I);
    }
  }
  return dedupe(out);
}

/** Drops consecutive (near-)coincident vertices, keeping the later edge label. */
function dedupe(poly: Vertex[]): Vertex[] {
  const tol = 1e-12;
  const res: Vertex[] = [];
  for (const v of poly) {
    const last = res[res.length - 1];
    if (last && Math.abs(last.x - v.x) < tol && Math.abs(last.y - v.y) < tol) {
      last.edge = v.edge;
    } else res.push({ ...v });
  }
  while (res.length > 1) {
    const first = res[0] as Vertex;
    const last = res[res.length - 1] as Vertex;
    if (Math.abs(last.x - first.x) < tol && Math.abs(last.y - first.y) < tol) res.pop();
    else break;
  }
  return res;
}

function polygonArea(poly: readonly { x: number; y: number }[]): number {
  let s = 0;
  for (let k = 0; k < poly.length; k++) {
    const P = poly[k] as { x: number; y: number };
    const Q = poly[(k + 1) % poly.length] as { x: number; y: number };
    s += P.x * Q.y - Q.x * P.y;
  }
  return s / 2;
}

function centroidOf(poly: readonly { x: number; y: number }[], area: number): EphPoint {
  let cx = 0;
  let cy = 0;
  for (let k = 0; k < poly.length; k++) {
    const P = poly[k] as { x: number; y: number };
    const Q = poly[(k + 1) % poly.length] as { x: number; y: number };
    const w = P.x * Q.y - Q.x * P.y;
    cx += (P.x + Q.x) * w;
    cy += (P.y + Q.y) * w;
  }
  return { pH: cx / (6 * area), E: cy / (6 * area) };
}

/**
 * Checks a plotting window.
 *
 * @throws EngineError (`argument`) for a bound out of range or min ≥ max
 */
export function checkEphWindow(w: EphWindow): EphWindow {
  checkEphPH(w.pHMin, 'pH_min');
  checkEphPH(w.pHMax, 'pH_max');
  if (!(w.pHMin < w.pHMax)) {
    throw new EngineError('argument', `pH_min (${w.pHMin}) must be below pH_max (${w.pHMax}).`, 'pH_min');
  }
  checkEphPotential(w.eMinV, 'E_min');
  checkEphPotential(w.eMaxV, 'E_max');
  if (!(w.eMinV < w.eMaxV)) {
    throw new EngineError('argument', `E_min (${w.eMinV} V) must be below E_max (${w.eMaxV} V).`, 'E_min');
  }
  return w;
}

/** The default window: pH 0–14, E −2.0 to +2.0 V vs SHE. */
export const DEFAULT_EPH_WINDOW: EphWindow = Object.freeze({ pHMin: 0, pHMax: 14, eMinV: -2, eMaxV: 2 });

/**
 * An element's default window: pH 0–14 (or the given pH range), E from the element's
 * lowest potential (−2 V; −3 V for Al and Mg, whose immunity lies below −2 V) to +2 V.
 *
 * @example
 * defaultEphWindow('Mg').eMinV // -3
 */
export function defaultEphWindow(element: string, pHMin = 0, pHMax = 14): EphWindow {
  const el = findEphElement(element);
  return Object.freeze({ pHMin, pHMax, eMinV: el.eMinV, eMaxV: 2 });
}

/**
 * The two water-stability lines at a temperature, p(H2) = p(O2) = 1 bar:
 * hydrogen E = −s·pH (E°(H+/H2) = 0 at every T by the SHE convention) and oxygen
 * E = −ΔfG°(H2O, T)/(2F) − s·pH (1.229 − 0.05916 pH at 25 °C).
 *
 * @example
 * waterLines(25, DEFAULT_EPH_WINDOW)[1].interceptV // ≈ 1.2288
 */
export function waterLines(
  tempC: number,
  w: EphWindow,
  gibbs: SpeciesGibbs = defaultSpeciesGibbs,
): EphWaterLine[] {
  checkEphTemp(tempC);
  const s = slopeV(tempC);
  const e0O2 = (-gibbs('H2O(l)', tempC) * 1000) / (2 * FARADAY_C_PER_MOL);
  const line = (name: 'hydrogen' | 'oxygen', couple: string, b: number): EphWaterLine =>
    Object.freeze({
      name,
      couple,
      interceptV: b,
      slopeVPerPH: -s,
      from: { pH: w.pHMin, E: b - s * w.pHMin },
      to: { pH: w.pHMax, E: b - s * w.pHMax },
    });
  return [line('hydrogen', 'H+/H2(g)', 0), line('oxygen', 'O2(g)/H2O(l)', e0O2)];
}

/**
 * The exact E–pH diagram of an element: predominance regions (convex polygons from
 * half-plane intersection), their boundary segments with slopes and intercepts, the species
 * that never predominate in the window, and the water lines.
 *
 * Domain: activity (0, 1] (default 1e-6); temp_C 0–100 (default 25); window pH within −2…16
 * and E within ±10 V (default {@link defaultEphWindow}). Precision: vertices to about 1e-12.
 *
 * @throws EngineError (`notFound` unknown element; `argument` out of range)
 * @example
 * const d = ephDiagram('Zn');
 * d.regions.map((r) => r.species) // ['Zn(s)', 'Zn2+', 'ZnO(s)', 'HZnO2-', 'ZnO2 2-']
 */
export function ephDiagram(
  element: string,
  activity: number = EPH_LIMITS.defaultActivity,
  tempC = 25,
  window: EphWindow = defaultEphWindow(element),
  gibbs: SpeciesGibbs = defaultSpeciesGibbs,
): EphDiagram {
  const p = ephPlanes(element, activity, tempC, gibbs);
  const w = checkEphWindow(window);
  const nPl = p.planes.length;
  const eps = 1e-13;
  const polys: Vertex[][] = [];
  for (let i = 0; i < nPl; i++) {
    let poly: Vertex[] = [
      { x: w.pHMin, y: w.eMinV, edge: -1 },
      { x: w.pHMax, y: w.eMinV, edge: -1 },
      { x: w.pHMax, y: w.eMaxV, edge: -1 },
      { x: w.pHMin, y: w.eMaxV, edge: -1 },
    ];
    for (let j = 0; j < nPl && poly.length >= 3; j++) {
      if (j === i) continue;
      const [a, b, c] = diffCoeffs(p, i, j);
      if (a === 0 && b === 0) {
        // parallel identical-slope planes: i loses everywhere if it is higher (ties go to the earlier)
        if (c > 0 || (c === 0 && j < i)) poly = [];
        continue;
      }
      poly = clip(poly, a, b, c, j, eps);
    }
    polys.push(poly);
  }
  const windowArea = (w.pHMax - w.pHMin) * (w.eMaxV - w.eMinV);
  const minArea = windowArea * 1e-12;
  const regions: EphRegion[] = [];
  const absent: string[] = [];
  const present = new Set<number>();
  for (let i = 0; i < nPl; i++) {
    const poly = polys[i] as Vertex[];
    const q = p.planes[i] as EphPlane;
    const area = poly.length >= 3 ? polygonArea(poly) : 0;
    if (area <= minArea) {
      absent.push(q.species);
      continue;
    }
    present.add(i);
    regions.push(
      Object.freeze({
        species: q.species,
        cls: q.cls,
        kind: q.kind,
        polygon: Object.freeze(poly.map((v) => Object.freeze({ pH: v.x, E: v.y }))),
        area,
        centroid: centroidOf(poly, area),
      }),
    );
  }
  // boundaries: each edge of region i whose label is a plane, with the neighbour confirmed
  const boundaries: EphBoundary[] = [];
  const scaleX = w.pHMax - w.pHMin;
  const scaleY = w.eMaxV - w.eMinV;
  for (const i of present) {
    const poly = polys[i] as Vertex[];
    for (let k = 0; k < poly.length; k++) {
      const P = poly[k] as Vertex;
      const Q = poly[(k + 1) % poly.length] as Vertex;
      if (P.edge < 0) continue;
      const dx = Q.x - P.x;
      const dy = Q.y - P.y;
      if (Math.hypot(dx / scaleX, dy / scaleY) < 1e-9) continue;
      // outward normal of a counter-clockwise polygon: (dy, −dx)
      const len = Math.hypot(dx, dy);
      const mx = (P.x + Q.x) / 2 + (dy / len) * 1e-7 * scaleX;
      const my = (P.y + Q.y) / 2 - (dx / len) * 1e-7 * scaleY;
      // the clipping label names the neighbour; where its region is empty, look across the edge
      let j = P.edge;
      if (!present.has(j)) j = stableIndex(p, mx, my);
      if (!present.has(j) || j === i) continue;
      // each boundary lies on both polygons: take it from the region listed first
      if (j < i) continue;
      const lo = i < j ? i : j;
      const hi = i < j ? j : i;
      const A = p.planes[lo] as EphPlane;
      const B = p.planes[hi] as EphPlane;
      const dn = A.electrons - B.electrons;
      const dh = A.hPlus - B.hPlus;
      let slope: number | null = null;
      let intercept: number | null = null;
      let vertical: number | null = null;
      if (dn !== 0) {
        intercept = (A.g0V - B.g0V) / dn;
        slope = (-p.slopeV * dh) / dn;
      } else {
        vertical = (A.g0V - B.g0V) / (p.slopeV * dh);
      }
      const [f, t] = P.x < Q.x || (P.x === Q.x && P.y < Q.y) ? [P, Q] : [Q, P];
      boundaries.push(
        Object.freeze({
          speciesA: A.species,
          speciesB: B.species,
          from: Object.freeze({ pH: f.x, E: f.y }),
          to: Object.freeze({ pH: t.x, E: t.y }),
          slopeVPerPH: slope,
          interceptV: intercept,
          pHVertical: vertical,
        }),
      );
    }
  }
  // the same boundary seen from both sides: keep one (match by species pair and end points)
  const unique: EphBoundary[] = [];
  for (const b of boundaries) {
    const dup = unique.find(
      (u) =>
        u.speciesA === b.speciesA &&
        u.speciesB === b.speciesB &&
        Math.abs(u.from.pH - b.from.pH) < 1e-9 &&
        Math.abs(u.from.E - b.from.E) < 1e-9 &&
        Math.abs(u.to.pH - b.to.pH) < 1e-9 &&
        Math.abs(u.to.E - b.to.E) < 1e-9,
    );
    if (!dup) unique.push(b);
  }
  return Object.freeze({
    element: p.element,
    activity,
    tempC,
    window: Object.freeze({ ...w }),
    regions: Object.freeze(regions),
    absent: Object.freeze(absent),
    boundaries: Object.freeze(unique),
    waterLines: Object.freeze(waterLines(tempC, w, gibbs)),
  });
}
