/**
 * Potentia engine: the one entry point for functions/, taskpane/ and cli/.
 * Pure TypeScript; no Office, no DOM.
 */
export { EngineError, isEngineError, type EngineErrorKind, type EngineHint } from './errors';
export * from './constants';
export { type Rational, formatRational } from './rational';

// notation
export {
  type Species,
  type Phase,
  type InlineActivity,
  parseSpecies,
  formatSpecies,
  phaseOf,
  speciesKey,
  elementsOf,
} from './notation/species';
export {
  type Term,
  type Reaction,
  parseReaction,
  formatReaction,
  stoichiometry,
  electronsConsumed,
} from './notation/reaction';
export { type Couple, parseCouple, formatCouple } from './notation/couple';
export { type CellDiagram, parseCellDiagram, formatCellDiagram } from './notation/cellDiagram';
export { type Notation, parseNotation, formatNotation } from './notation/notation';
export { countElements } from './notation/formula';

// balancing
export {
  type BalanceCheck,
  type Medium,
  checkBalance,
  assertBalanced,
  combineHalfReactions,
  balanceSkeleton,
  parseMedium,
} from './balance/balance';

// table and resolution
export { BUILTIN_POTENTIALS, type BuiltinPotentialRow } from './data/potentials';
export {
  type PotentialTable,
  type TableRow,
  type TableProblem,
  readUserTable,
  defaultTable,
  builtinTable,
  describeOrigin,
} from './table/potentialTable';
export {
  type Resolved,
  type ResolvedHalf,
  resolveReaction,
  standardPotentialV,
  electronCount,
  halfE0V,
  halfE0V25,
  halfSlopeMvPerK,
} from './table/resolve';
export { tableFor, compiledReaction, resolvedReaction, clearCaches } from './cache';

export { filterPotentials, type FilterResult, type FilterRule } from './table/filter';

// thermodynamics
export {
  type NernstForm,
  type Binding,
  type SpeciesHeader,
  nernstForm,
  bindSpecies,
  parseSpeciesHeader,
  weightedLogActivity,
  potentialV,
  log10Quotient,
} from './thermo/nernstForm';
export {
  checkElectrons,
  log10EquilibriumConstant,
  equilibriumConstantFromLog10,
  gibbsEnergyKJ,
  combineStepPotentialsV,
  MAX_LOG10_K,
  MIN_LOG10_K,
} from './thermo/equilibrium';
export {
  planConcentrationCell,
  concentrationCellEmfV,
  type ConcentrationCellPlan,
} from './thermo/concentrationCell';
export { describeSource, describeDiagram } from './thermo/describe';
export {
  linearStandardPotential,
  sweepToColumn,
  sweepCases,
  type LinearStandardPotential,
  type SweepResult,
  type CaseQuantity,
} from './thermo/sweep';

// activity and reference electrodes
export * from './activity';
export * from './references';

// species data layer and reaction thermodynamics (issue 12)
export {
  type SpeciesThermoRecord,
  type RegisteredSpecies,
  type DuplicateSpecies,
  STANDARD_SPECIES,
  speciesRecord,
  findSpeciesRecord,
  listSpecies,
  duplicateSpecies,
  electronThermo,
} from './data/species/index';
export {
  type ReactionThermo,
  type ThermoEntry,
  SPECIES_DATA_RANGE_C,
  reactionThermo,
  isComplete,
  checkSpeciesTemperature,
  cpFactorK,
  gibbsAtJ,
  entropyAtJK,
  enthalpyAtJ,
} from './thermo/reactionThermo';
export { pKw } from './thermo/water';
export { standardPotentialAt } from './thermo/sweep';
export { type RowTemperature, rowE0V } from './table/potentialTable';
export { halfCpModel } from './table/resolve';
export {
  type ReactionEnergy,
  type FormationQuantity,
  reactionEnergy,
  reactionGibbsKJ,
  hasInlineActivities,
  parseFormationQuantity,
  formationValue,
  reactionEnthalpyKJ,
  reactionEntropyJK,
  thermoneutralV,
} from './thermo/reactionEnergy';
// runner and build (issue 10): the cache registry and the parser's limits
export {
  registerCache,
  cacheStats,
  approximateBytes,
  ByteBoundedCache,
  type CacheStats,
  type CacheLimits,
  type RegisteredCache,
} from './cache';
export { MAX_NOTATION_CHARS } from './notation/source';
export { MAX_FORMULA_NESTING, MAX_ATOM_COUNT } from './notation/formula';
export { MAX_CHARGE } from './notation/species';
export { MAX_COEFFICIENT_PART } from './notation/reaction';

// species-header grammar (i11): one reading of `left:Ag+`, `l:Ag+`, `pH`, `left:pH`
export {
  type SpeciesHeaderParts,
  splitSpeciesHeader,
  canonicalSpeciesHeader,
} from './notation/speciesHeader';
export { tableCycleProblems, CYCLE_TOLERANCE_V } from './table/cycles';
