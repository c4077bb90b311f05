/**
 * Text descriptions of a resolution: where each E° came from (for SOURCE) and
 * the IUPAC cell diagram with activities (for CELLNOTATION).
 */
import { type Resolved, type ResolvedHalf, halfE0V25, halfSlopeMvPerK } from '../table/resolve';
import { describeOrigin } from '../table/potentialTable';
import { formatReaction, withActivity } from '../notation/reaction';
import { type Species, formatSpecies, phaseOf, elementsOf } from '../notation/species';
import { type Binding } from './nernstForm';
import { pKw } from './water';
import { waterActivity } from '../activity/waterActivity';

function fmtV(x: number): string {
  return `${Number(x.toFixed(6))} V`;
}

function fmtE(x: number): string {
  return String(Number(x.toFixed(5)));
}

/** How a half's E° moves with temperature, for SOURCE. */
function temperatureNote(h: ResolvedHalf): string {
  const bases = new Set(h.shares.map((s) => s.row.temperature.basis));
  const slope = halfSlopeMvPerK(h);
  const cpMissing = new Set<string>();
  const sMissing = new Set<string>();
  for (const s of h.shares) {
    s.row.temperature.cpMissing.forEach((x) => cpMissing.add(x));
    if (s.row.temperature.basis !== 'species') s.row.temperature.entropyMissing.forEach((x) => sMissing.add(x));
  }
  const parts: string[] = [];
  if (bases.has('species')) {
    parts.push(
      `E°(T) by Gibbs–Helmholtz from the species data (ΔrS°, constant ΔrCp°; valid 0–100 °C), dE°/dT = ${Number(slope.slope.toFixed(4))} mV/K at 25 °C`,
    );
    parts.push(
      cpMissing.size === 0
        ? 'ΔrCp° from the Cp° of every species'
        : `no Cp° for ${[...cpMissing].join(', ')}: left out of ΔrCp°`,
    );
  }
  if (bases.has('row')) parts.push('the dE°/dT of your table row is used (linear)');
  if (bases.has('none'))
    parts.push(
      sMissing.size > 0
        ? `no S° for ${[...sMissing].join(', ')} and no dE°/dT: E°(25 °C) is used at every temperature`
        : 'no dE°/dT and species not all in the species data: E°(25 °C) is used at every temperature',
    );
  return `; ${parts.join('; ')}`;
}

function describeHalf(h: ResolvedHalf): string {
  const e0 = halfE0V25(h);
  const rows = h.shares
    .map(
      (s) =>
        `${s.row.text}, E° = ${fmtE(s.row.e0V)} V${s.row.dE0dTmVperK !== null ? `, dE°/dT = ${Number(s.row.dE0dTmVperK.toFixed(3))} mV/K` : ''} (${describeOrigin(s.row.origin)}: ${s.row.source})`,
    )
    .join('; ');
  return `${formatReaction(h.reaction)}: E° = ${fmtV(e0)} from ${rows}${h.derivation ? `; ${h.derivation}` : ''}${temperatureNote(h)}`;
}

/**
 * Provenance of every standard potential used: table rows (built-in row number or
 * the user's table row), their sources, derivations, and the temperature treatment.
 *
 * @example
 * describeSource(resolveReaction('Cu2+/Cu', defaultTable()))
 * // 'Cu2+ + 2 e- -> Cu: E° = 0.337 V from Cu2+ + 2 e- -> Cu, E° = 0.337 V, … (built-in row …: OpenStax Chemistry 2e, Appendix L) …'
 */
export function describeSource(r: Resolved): string {
  if (r.kind === 'half') return describeHalf(r.half);
  const e0 = halfE0V25(r.right) - halfE0V25(r.left);
  return `cell: E° = E°(right) − E°(left) = ${fmtV(e0)}, n = ${r.n}, reaction ${formatReaction(r.reaction)}. Right (reduction): ${describeHalf(r.right)}. Left (oxidation): ${describeHalf(r.left)}.`;
}

const INERT: Species = Object.freeze({ formula: 'Pt', charge: 0, phase: 's', isElectron: false });

function isMetalElement(s: Species): boolean {
  return phaseOf(s) === 's' && s.charge === 0 && elementsOf(s).size === 1;
}

function electrodePhases(
  h: ResolvedHalf,
  side: 'left' | 'right',
  activityOf: (key: string, s: Species, side: 'left' | 'right') => number | null,
): string[] {
  const metals: string[] = [];
  const solids: string[] = [];
  const liquids: string[] = [];
  const gases: string[] = [];
  const solution: string[] = [];
  for (const [key, v] of h.map) {
    const s = v.species;
    if (s.isElectron || (s.formula === 'H2O' && s.charge === 0)) continue;
    const p = phaseOf(s);
    const a = activityOf(key, s, side);
    const text =
      a !== null && (p === 'aq' || p === 'g')
        ? withActivity(s, a, formatSpecies(s, false), true)
        : formatSpecies({ ...s, phase: p }, true);
    if (p === 'aq') solution.push(text);
    else if (p === 'g') gases.push(text);
    else if (p === 'l') liquids.push(text);
    else if (isMetalElement(s)) metals.push(text);
    else solids.push(text);
  }
  const conductor =
    metals.length > 0 || liquids.some((l) => l.startsWith('Hg')) ? [] : [formatSpecies(INERT, true)];
  // from the electrode outward: conductor/metal | solids | gas | solution
  const outward = [
    ...conductor,
    ...(metals.length ? [metals.join(', ')] : []),
    ...(liquids.length ? [liquids.join(', ')] : []),
    ...(solids.length ? [solids.join(', ')] : []),
    ...(gases.length ? [gases.join(', ')] : []),
    ...(solution.length ? [solution.join(', ')] : []),
  ];
  return side === 'left' ? outward : outward.slice().reverse();
}

/**
 * The IUPAC cell diagram of a resolution with activities: for a cell or full
 * reaction, oxidation on the left; for a single electrode, against the SHE on the left.
 *
 * @example
 * describeDiagram(resolveReaction('Zn + Cu2+ -> Zn2+ + Cu', defaultTable()), null, null)
 * // 'Zn(s) | Zn2+(aq, 1 M) || Cu2+(aq, 1 M) | Cu(s)'
 */
export function describeDiagram(
  r: Resolved,
  binding: Binding | null,
  row: ArrayLike<unknown> | null,
): string {
  const activityOf = (key: string, _s: Species, side: 'left' | 'right'): number | null => {
    if (binding && row) {
      const terms = binding.form.terms;
      for (let i = 0; i < terms.length; i++) {
        const t = terms[i]!;
        if (t.key !== key || (t.side !== null && t.side !== side)) continue;
        const c = binding.column[i]!;
        if (c >= 0) {
          const v = row[c];
          if (typeof v === 'number')
            return binding.isPH[i] === 1
              ? Math.pow(10, -v)
              : binding.isPH[i] === 2
                ? Math.pow(10, v - pKw(25))
                : binding.isPH[i] === 3
                  ? waterActivity(binding.electrolyte[i]!, v)
                  : v;
        }
        if (t.inline !== undefined) return t.inline;
      }
    }
    const h = r.kind === 'half' ? r.half : side === 'left' ? r.left : r.right;
    return h.inline.get(key) ?? 1;
  };
  if (r.kind === 'half') {
    const she = 'Pt(s) | H2(g, 1 bar) | H+(aq, 1 M)';
    return `${she} || ${electrodePhases(r.half, 'right', activityOf).join(' | ')}`;
  }
  return `${electrodePhases(r.left, 'left', activityOf).join(' | ')} || ${electrodePhases(r.right, 'right', activityOf).join(' | ')}`;
}
