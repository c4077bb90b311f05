/**
 * A salt formula read into its ions with their stoichiometric numbers, through the
 * notation's strong-electrolyte splitting (the one used for cell diagrams).
 */
import { EngineError, quote } from '../errors';
import { formatSpecies, parseSpecies } from '../notation/species';
import { splitElectrolyte } from '../notation/electrolytes';

/** A neutral salt as cation and anion with stoichiometric numbers. */
export interface SaltIons {
  /** The formula as the engine writes it, e.g. "Na2SO4". */
  readonly formula: string;
  /** Cation, canonical text ("Na+"). */
  readonly cation: string;
  /** Anion, canonical text ("SO4^2-"). */
  readonly anion: string;
  /** Cation charge z+ (> 0). */
  readonly zCation: number;
  /** Anion charge z− (< 0). */
  readonly zAnion: number;
  /** ν+, cations per formula unit. */
  readonly nuCation: number;
  /** ν−, anions per formula unit. */
  readonly nuAnion: number;
}

const cache = new Map<string, SaltIons>();
const CACHE_LIMIT = 1024;

/**
 * Read a salt formula such as "NaCl", "CuSO4", "K2SO4", "ZnCl2", "Cu(NO3)2" (also with
 * Unicode subscripts, "CuSO₄", or a phase, "NaCl(aq)") into its ions.
 *
 * Domain: a neutral strong electrolyte made of one cation and one anion that the notation
 * knows (src/engine/notation/electrolytes.ts). Cached per text.
 *
 * @param text the salt formula
 * @param argName the argument name for messages (default "salt")
 * @throws EngineError `parse` for text that is not a formula; `argument` for a charged
 *   species or a formula that is not a known cation–anion salt
 * @example
 * parseSalt('Na2SO4') // { formula: 'Na2SO4', cation: 'Na+', anion: 'SO4^2-', zCation: 1, zAnion: -2, nuCation: 2, nuAnion: 1 }
 */
export function parseSalt(text: string, argName = 'salt'): SaltIons {
  const hit = cache.get(text);
  if (hit) return hit;
  if (typeof text !== 'string' || text.trim() === '') {
    throw new EngineError(
      'argument',
      `${argName} must be a salt formula such as "NaCl" or "CuSO4".`,
      argName,
    );
  }
  const s = parseSpecies(text.trim(), argName);
  if (s.isElectron || s.charge !== 0) {
    throw new EngineError(
      'argument',
      `${argName} ${quote(text)} is an ion, not a salt; give the neutral salt, e.g. "NaCl" or "CuSO4".`,
      argName,
    );
  }
  const parts = splitElectrolyte(s.formula);
  if (parts === null || parts.length !== 2) {
    throw new EngineError(
      'argument',
      `${argName} ${quote(text)} is not a salt of one known cation and one known anion; write it as e.g. ` +
        `"NaCl", "K2SO4", "ZnCl2" or "CuSO4".`,
      argName,
    );
  }
  const [c, a] = parts as [(typeof parts)[0], (typeof parts)[0]];
  const out: SaltIons = {
    formula: s.formula,
    cation: formatSpecies(c.ion, false),
    anion: formatSpecies(a.ion, false),
    zCation: c.ion.charge,
    zAnion: a.ion.charge,
    nuCation: c.count,
    nuAnion: a.count,
  };
  if (cache.size >= CACHE_LIMIT) cache.clear();
  cache.set(text, out);
  return out;
}
