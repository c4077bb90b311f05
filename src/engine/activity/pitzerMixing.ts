/**
 * The Pitzer model for mixed electrolytes (Harvie, Møller & Weare 1984 form): single-ion
 * activity coefficients and the osmotic coefficient of a composition row, with θ, ψ and the
 * unsymmetrical-mixing terms Eθ(I), Eθ'(I) of Pitzer, J. Solution Chem. 4, 249 (1975).
 *
 * Single-ion activity coefficients follow the Pitzer/HMW convention: they are the
 * coefficients the HMW equations give for each ion (no extra-thermodynamic splitting
 * beyond that of the equations themselves); only neutral combinations (γ±, a_w) are
 * measurable, and these agree with the single-salt model for one salt.
 *
 * For cation M, anion X (m in mol/kg, Z = Σ m|z|):
 *   ln γM = zM² F + Σa ma(2B_Ma + Z C_Ma) + Σc mc(2Φ_Mc + Σa ma ψ_Mca) + Σa<a' ma ma' ψ_aa'M
 *           + |zM| Σc Σa mc ma C_ca
 *   F     = f^γ + Σc Σa mc ma B'_ca + Σc<c' mc mc' Φ'_cc' + Σa<a' ma ma' Φ'_aa'
 *   Σm(φ−1) = 2[−A_φ I^{3/2}/(1+b√I) + Σc Σa mc ma(B^φ_ca + Z C_ca)
 *              + Σc<c' mc mc'(Φ^φ_cc' + Σa ma ψ_cc'a) + Σa<a' ma ma'(Φ^φ_aa' + Σc mc ψ_aa'c)]
 * with B = β0 + β1 g(α1√I) + β2 g(α2√I), g(x) = 2[1 − (1+x)e^{−x}]/x²,
 * B' = [β1 g'(α1√I) + β2 g'(α2√I)]/I, g'(x) = −2[1 − (1 + x + x²/2)e^{−x}]/x², C = Cφ/(2√|zMzX|),
 * Φ = θ + Eθ, Φ' = Eθ', Φ^φ = θ + Eθ + I Eθ'.
 */
import { EngineError, quote } from '../errors';
import { formatSpecies, parseSpecies } from '../notation/species';
import {
  PITZER_B,
  PITZER_BINARY,
  PITZER_MIXTURE_MAX_IONIC_STRENGTH,
  PITZER_MIXING_SOURCE,
  PITZER_PSI,
  PITZER_THETA,
  type PitzerBinaryRow,
} from '../data/pitzerParameters';
import { binaryAt, pitzerAphi, pitzerPair, type ActivityOptions } from './pitzer';
import { checkCompositionValue, finiteResult } from './checks';

const THETA = new Map<string, number>();
for (const r of PITZER_THETA) THETA.set(pairKey(r.ions[0], r.ions[1]), r.theta);
const PSI = new Map<string, number>();
for (const r of PITZER_PSI) PSI.set(`${pairKey(r.pair[0], r.pair[1])}|${r.common}`, r.psi);

function pairKey(a: string, b: string): string {
  return a < b ? `${a}&${b}` : `${b}&${a}`;
}

/**
 * J(x) and J'(x) of the unsymmetrical-mixing integral, by the approximation of Pitzer 1975,
 * eq. 47 (from memory): J(x) = x / (4 + 4.581 x^−0.7237 exp(−0.0120 x^0.528)).
 * Writes [J, J'] into `out`.
 *
 * @example
 * const o = new Float64Array(2); pitzerJ(1, o); // o[0] ≈ 0.1164
 */
export function pitzerJ(x: number, out: Float64Array): void {
  if (x <= 0) {
    out[0] = 0;
    out[1] = 0;
    return;
  }
  const c1 = 4.581;
  const c2 = 0.7237;
  const c3 = 0.012;
  const c4 = 0.528;
  const t = c1 * Math.pow(x, -c2) * Math.exp(-c3 * Math.pow(x, c4));
  const d = 4 + t;
  const dd = t * (-c2 / x - c3 * c4 * Math.pow(x, c4 - 1));
  out[0] = x / d;
  out[1] = (d - x * dd) / (d * d);
}

const jScratch = new Float64Array(2);

/** Eθ and Eθ' of two like-signed ions of charge magnitudes zi, zj at I (writes [Eθ, Eθ']). */
export function pitzerETheta(zi: number, zj: number, I: number, aphi: number, out: Float64Array): void {
  if (zi === zj || I <= 0) {
    out[0] = 0;
    out[1] = 0;
    return;
  }
  const s = 6 * aphi * Math.sqrt(I);
  const xij = zi * zj * s;
  const xii = zi * zi * s;
  const xjj = zj * zj * s;
  pitzerJ(xij, jScratch);
  const jij = jScratch[0] as number;
  const dij = jScratch[1] as number;
  pitzerJ(xii, jScratch);
  const jii = jScratch[0] as number;
  const dii = jScratch[1] as number;
  pitzerJ(xjj, jScratch);
  const jjj = jScratch[0] as number;
  const djj = jScratch[1] as number;
  const e = ((zi * zj) / (4 * I)) * (jij - 0.5 * jii - 0.5 * jjj);
  out[0] = e;
  out[1] = -e / I + ((zi * zj) / (8 * I * I)) * (xij * dij - 0.5 * xii * dii - 0.5 * xjj * djj);
}

interface Ion {
  label: string;
  z: number;
  m: number;
}

/** The result of a mixture evaluation. */
export interface PitzerMixtureResult {
  /** γ per input species (1 for neutral species), in input order. */
  readonly gamma: number[];
  /** The osmotic coefficient φ of the solution. */
  readonly osmoticCoefficient: number;
  /** Ionic strength, mol/kg. */
  readonly ionicStrengthMolKg: number;
  /** Σ mᵢ over the solutes (ions and neutral solutes other than water), mol/kg. */
  readonly totalMolalityMolKg: number;
}

const labelCache = new Map<
  string,
  { label: string; z: number; neutral: boolean; water: boolean; ph: boolean }
>();

function readSpecies(text: string) {
  const hit = labelCache.get(text);
  if (hit) return hit;
  if (typeof text !== 'string') {
    throw new EngineError('parse', `species must be text such as "Na+"; got ${String(text)}.`, 'species');
  }
  let info;
  if (/^\s*ph\s*$/i.test(text)) info = { label: 'pH', z: 0, neutral: true, water: false, ph: true };
  else {
    const s = parseSpecies(text, 'species');
    if (s.isElectron) {
      throw new EngineError(
        'argument',
        'species "e-" is the electron, which has no activity in solution.',
        'species',
      );
    }
    const label = formatSpecies(s, false);
    const phase = s.phase;
    const water = s.formula === 'H2O' || phase === 's' || phase === 'l' || phase === 'g';
    info = { label, z: s.charge, neutral: s.charge === 0, water, ph: false };
  }
  if (labelCache.size >= 4096) labelCache.clear();
  labelCache.set(text, info);
  return info;
}

function fmt(x: number): string {
  return Number(x.toPrecision(6)).toString();
}

const et = new Float64Array(2);

/**
 * Evaluate the Pitzer model for a composition row.
 *
 * Domain: species as IONICSTR takes them (ions by formula; a `pH` column, water, gases,
 * solids and liquids pass through with γ = 1 and are left out of the sums; neutral solutes
 * get γ = 1 and count in Σm for the osmotic coefficient); molalities ≥ 0 in mol/kg; the row
 * electrically neutral (within 1% of its equivalents); every cation–anion pair present held
 * in the binary table (θ, ψ not held are 0, common practice). Ionic strength at most the
 * largest binary limit of the pairs present, and at most 6 mol/kg; 25 °C for a true
 * mixture (the mixing parameters are 25 °C values), the pair's own range for a single salt.
 * Outside these, an argument error unless `extrapolate`.
 *
 * @param species species texts
 * @param molalities mol/kg, one per species
 * @param tempC temperature in °C (default 25)
 * @param opts `{ extrapolate: true }` to accept results outside the ranges
 * @throws EngineError `shape`, `parse`, `argument` (range, neutrality, missing pair), `range`
 * @example
 * pitzerMixture(['Na+', 'Cl-'], [1, 1]).gamma // [0.6555…, 0.6555…] (single-salt γ± for NaCl)
 */
export function pitzerMixture(
  species: readonly string[],
  molalities: readonly number[],
  tempC = 25,
  opts?: ActivityOptions,
): PitzerMixtureResult {
  if (species.length !== molalities.length) {
    throw new EngineError(
      'shape',
      `species has ${species.length} entries but values has ${molalities.length}; give one molality per species.`,
      'values',
    );
  }
  const extrapolate = opts?.extrapolate === true;
  const aphi = pitzerAphi(tempC);
  const cations: Ion[] = [];
  const anions: Ion[] = [];
  const index: number[] = new Array<number>(species.length).fill(-1);
  let neutralSum = 0;
  for (let i = 0; i < species.length; i++) {
    const info = readSpecies(species[i] as string);
    const m = molalities[i] as number;
    checkCompositionValue(m, info.label, info.ph);
    if (info.ph) continue;
    if (info.neutral) {
      if (!info.water) neutralSum += m;
      continue;
    }
    const list = info.z > 0 ? cations : anions;
    let k = list.findIndex((x) => x.label === info.label);
    if (k < 0) {
      k = list.length;
      list.push({ label: info.label, z: Math.abs(info.z), m: 0 });
    }
    (list[k] as Ion).m += m;
    index[i] = info.z > 0 ? k : -2 - k;
  }
  const nc = cations.length;
  const na = anions.length;
  let I2 = 0;
  let Z = 0;
  let pos = 0;
  let neg = 0;
  let ionSum = 0;
  for (const c of cations) {
    I2 += c.m * c.z * c.z;
    Z += c.m * c.z;
    pos += c.m * c.z;
    ionSum += c.m;
  }
  for (const a of anions) {
    I2 += a.m * a.z * a.z;
    Z += a.m * a.z;
    neg += a.m * a.z;
    ionSum += a.m;
  }
  const I = 0.5 * I2;
  if (Math.abs(pos - neg) > 1e-9 + 0.01 * Math.max(pos, neg)) {
    throw new EngineError(
      'argument',
      `the Pitzer model needs an electrically neutral solution; the cations carry ${fmt(pos)} and the anions ` +
        `${fmt(neg)} mol/kg of charge. Add the counter-ions (e.g. Cl- or Na+) so that both balance.`,
      'values',
    );
  }
  // binary parameters of every pair present, at tempC
  const pairs: (Float64Array | null)[] = new Array<Float64Array | null>(nc * na).fill(null);
  const alphas = new Float64Array(nc * na * 2);
  let maxI = 0;
  let mixture = nc > 1 || na > 1;
  const rowsUsed: PitzerBinaryRow[] = [];
  for (let i = 0; i < nc; i++)
    for (let j = 0; j < na; j++) {
      const c = cations[i] as Ion;
      const a = anions[j] as Ion;
      if (c.m === 0 || a.m === 0) continue;
      const row = pitzerPair(c.label, a.label);
      if (row === undefined) {
        throw new EngineError(
          'argument',
          `no Pitzer parameters are held for the pair ${c.label} – ${a.label}; the pairs held are ` +
            `${PITZER_BINARY.map((r) => `${r.cation} – ${r.anion}`).join(', ')}. Use model "davies" below I = 0.5 mol/kg.`,
          'species',
        );
      }
      rowsUsed.push(row);
      const p = new Float64Array(4);
      binaryAt(row, tempC, p);
      pairs[i * na + j] = p;
      alphas[2 * (i * na + j)] = row.alpha1;
      alphas[2 * (i * na + j) + 1] = row.alpha2;
      maxI = Math.max(maxI, (row.maxMolalityMolKg * 0.5 * (c.z * a.z) * (c.z + a.z)) / gcdIons(c.z, a.z));
    }
  if (!extrapolate) {
    const limit = Math.min(PITZER_MIXTURE_MAX_IONIC_STRENGTH, rowsUsed.length === 0 ? Infinity : maxI);
    if (I > limit + 1e-12) {
      throw new EngineError(
        'argument',
        `ionic strength ${fmt(I)} mol/kg is beyond the Pitzer model's range for this solution (I ≤ ${fmt(limit)} ` +
          `mol/kg: the largest binary limit of its salts, and 6 mol/kg for mixtures, ${PITZER_MIXING_SOURCE}); ` +
          `set extrapolate to TRUE to accept an extrapolation.`,
        'values',
      );
    }
    if (rowsUsed.length > 1) mixture = true;
    const lo = mixture ? 25 : Math.max(...rowsUsed.map((r) => r.tempRangeC[0]));
    const hi = mixture ? 25 : Math.min(...rowsUsed.map((r) => r.tempRangeC[1]));
    if (rowsUsed.length > 0 && (tempC < lo - 1e-9 || tempC > hi + 1e-9)) {
      const range = lo === hi ? `${lo} °C only` : `${lo}–${hi} °C`;
      throw new EngineError(
        'argument',
        `temp_C ${fmt(tempC)} °C is outside the range of the Pitzer parameters for this solution (${range}; the ` +
          `mixing parameters are 25 °C values, ${PITZER_MIXING_SOURCE}); use 25 °C, model "davies" (0–100 °C, ` +
          `I ≤ 0.5 mol/kg), or set extrapolate to TRUE to use the 25 °C parameters.`,
        'temp_C',
      );
    }
  }
  const sI = Math.sqrt(I);
  const bs = 1 + PITZER_B * sI;
  const fgam = I > 0 ? -aphi * (sI / bs + (2 / PITZER_B) * Math.log(bs)) : 0;
  // per-pair B, B', Bφ, C
  const B = new Float64Array(nc * na);
  const Bp = new Float64Array(nc * na);
  const Bphi = new Float64Array(nc * na);
  const C = new Float64Array(nc * na);
  for (let i = 0; i < nc; i++)
    for (let j = 0; j < na; j++) {
      const p = pairs[i * na + j];
      if (!p || I === 0) continue;
      const k = i * na + j;
      const b0 = p[0] as number;
      const b1 = p[1] as number;
      const b2 = p[2] as number;
      const x1 = (alphas[2 * k] as number) * sI;
      const e1 = Math.exp(-x1);
      let bb = b0 + b1 * gFun(x1, e1);
      let bpp = (b1 * gpFun(x1, e1)) / I;
      let bf = b0 + b1 * e1;
      if (b2 !== 0) {
        const x2 = (alphas[2 * k + 1] as number) * sI;
        const e2 = Math.exp(-x2);
        bb += b2 * gFun(x2, e2);
        bpp += (b2 * gpFun(x2, e2)) / I;
        bf += b2 * e2;
      }
      B[k] = bb;
      Bp[k] = bpp;
      Bphi[k] = bf;
      C[k] = (p[3] as number) / (2 * Math.sqrt((cations[i] as Ion).z * (anions[j] as Ion).z));
    }
  // like-charge Φ (θ + Eθ) and Φ' (Eθ') of the cations and of the anions
  const [phiC, phiCp] = likeChargePhi(cations, I, aphi);
  const [phiA, phiAp] = likeChargePhi(anions, I, aphi);
  const psi = (x: string, y: string, common: string): number => PSI.get(`${pairKey(x, y)}|${common}`) ?? 0;

  let F = fgam;
  let CC = 0;
  let osm = I > 0 ? (-aphi * I * sI) / bs : 0;
  for (let i = 0; i < nc; i++)
    for (let j = 0; j < na; j++) {
      const k = i * na + j;
      const mm = (cations[i] as Ion).m * (anions[j] as Ion).m;
      F += mm * (Bp[k] as number);
      CC += mm * (C[k] as number);
      osm += mm * ((Bphi[k] as number) + Z * (C[k] as number));
    }
  const sumsC = likeChargeSums(cations, anions, phiC, phiCp, I, psi);
  const sumsA = likeChargeSums(anions, cations, phiA, phiAp, I, psi);
  F += sumsC[0] + sumsA[0];
  osm += sumsC[1] + sumsA[1];
  // ln γ of one ion (Harvie, Møller & Weare 1984, eqs. 3 and 4): the cation and anion
  // equations are mirrors, so one function serves both with the roles of the ions swapped.
  const lnGamma = (
    self: Ion,
    selfIndex: number,
    own: readonly Ion[],
    other: readonly Ion[],
    phiOwn: Float64Array,
    pairIndex: (o: number) => number,
  ): number => {
    const n = own.length;
    let v = self.z * self.z * F + self.z * CC;
    for (let o = 0; o < other.length; o++) {
      const ij = pairIndex(o);
      v += (other[o] as Ion).m * (2 * (B[ij] as number) + Z * (C[ij] as number));
    }
    for (let k = 0; k < n; k++) {
      if (k === selfIndex) continue;
      const c = own[k] as Ion;
      let sum = 2 * (phiOwn[selfIndex * n + k] as number);
      for (const a of other) sum += a.m * psi(self.label, c.label, a.label);
      v += c.m * sum;
    }
    for (let j = 0; j < other.length; j++)
      for (let k = j + 1; k < other.length; k++)
        v +=
          (other[j] as Ion).m *
          (other[k] as Ion).m *
          psi((other[j] as Ion).label, (other[k] as Ion).label, self.label);
    return v;
  };
  const lnC = new Float64Array(nc);
  for (let i = 0; i < nc; i++)
    lnC[i] = lnGamma(cations[i] as Ion, i, cations, anions, phiC, (j) => i * na + j);
  const lnA = new Float64Array(na);
  for (let j = 0; j < na; j++)
    lnA[j] = lnGamma(anions[j] as Ion, j, anions, cations, phiA, (i) => i * na + j);
  const total = ionSum + neutralSum;
  const phi = ionSum > 0 ? 1 + (2 * osm) / total : 1;
  const gamma = new Array<number>(species.length);
  for (let i = 0; i < species.length; i++) {
    const k = index[i] as number;
    let g = 1;
    if (k >= 0) g = Math.exp(lnC[k] as number);
    else if (k <= -2) g = Math.exp(lnA[-2 - k] as number);
    if (!(g > 0) || !Number.isFinite(g)) {
      throw new EngineError(
        'range',
        `the Pitzer model gives an activity coefficient outside the number range for ${quote(String(species[i]))}.`,
        'values',
      );
    }
    gamma[i] = g;
  }
  const osmotic = finiteResult(
    phi,
    'the Pitzer model gives an osmotic coefficient outside the number range.',
    'values',
  );
  return { gamma, osmoticCoefficient: osmotic, ionicStrengthMolKg: I, totalMolalityMolKg: total };
}

/**
 * Φ_ij = θ_ij + Eθ_ij(I) and Φ'_ij = Eθ'_ij(I) of every pair of like-charged ions (Pitzer 1975;
 * θ from Harvie, Møller & Weare 1984, 0 where not held), as symmetric n×n matrices.
 */
function likeChargePhi(ions: readonly Ion[], I: number, aphi: number): [Float64Array, Float64Array] {
  const n = ions.length;
  const phi = new Float64Array(n * n);
  const phip = new Float64Array(n * n);
  for (let i = 0; i < n; i++)
    for (let k = i + 1; k < n; k++) {
      const a = ions[i] as Ion;
      const b = ions[k] as Ion;
      pitzerETheta(a.z, b.z, I, aphi, et);
      phi[i * n + k] = phi[k * n + i] = (THETA.get(pairKey(a.label, b.label)) ?? 0) + (et[0] as number);
      phip[i * n + k] = phip[k * n + i] = et[1] as number;
    }
  return [phi, phip];
}

/**
 * The like-charge terms of one sign (Harvie, Møller & Weare 1984, eqs. 2 and 5): Σ m m' Φ' for
 * F, and Σ m m' (Φ + I Φ' + Σ m'' ψ) for the osmotic sum, `other` the ions of the other sign.
 */
function likeChargeSums(
  own: readonly Ion[],
  other: readonly Ion[],
  phi: Float64Array,
  phip: Float64Array,
  I: number,
  psi: (x: string, y: string, common: string) => number,
): [number, number] {
  const n = own.length;
  let f = 0;
  let osm = 0;
  for (let i = 0; i < n; i++)
    for (let k = i + 1; k < n; k++) {
      const a = own[i] as Ion;
      const b = own[k] as Ion;
      const mm = a.m * b.m;
      f += mm * (phip[i * n + k] as number);
      let sum = (phi[i * n + k] as number) + I * (phip[i * n + k] as number);
      for (const o of other) sum += o.m * psi(a.label, b.label, o.label);
      osm += mm * sum;
    }
  return [f, osm];
}

function gcdIons(a: number, b: number): number {
  return b === 0 ? a : gcdIons(b, a % b);
}

function gFun(x: number, e: number): number {
  return (2 * (1 - (1 + x) * e)) / (x * x);
}

function gpFun(x: number, e: number): number {
  return (-2 * (1 - (1 + x + 0.5 * x * x) * e)) / (x * x);
}

/**
 * Single-ion activity coefficients (Pitzer/HMW convention, molal, dimensionless) of the
 * species of a composition row, in input order; neutral species, water, gases, solids and a
 * `pH` column get 1. Domain and errors as {@link pitzerMixture}.
 *
 * @param species species texts (as IONICSTR takes them)
 * @param molalities mol/kg, one per species
 * @param tempC temperature in °C (default 25)
 * @param opts `{ extrapolate: true }` to accept results outside the ranges
 * @throws EngineError as {@link pitzerMixture}
 * @example
 * pitzerIonActivityCoefficients(['Na+', 'Cl-'], [0.5, 0.5]) // [0.6796…, 0.6796…]
 */
export function pitzerIonActivityCoefficients(
  species: readonly string[],
  molalities: readonly number[],
  tempC = 25,
  opts?: ActivityOptions,
): number[] {
  return pitzerMixture(species, molalities, tempC, opts).gamma;
}
