/**
 * Potentia engine: the one entry point for functions/, taskpane/ and cli/.
 * Pure TypeScript; no Office, no DOM.
 */
export { EngineError, isEngineError, type EngineErrorKind } from './errors';
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

// species-header grammar (i11): one reading of `left:Ag+`, `l:Ag+`, `pH`, `left:pH`
export {
  type SpeciesHeaderParts,
  splitSpeciesHeader,
  canonicalSpeciesHeader,
} from './notation/speciesHeader';

// E–pH (Pourbaix) diagrams
export { EPH_ELEMENTS, type EphElement } from './eph/elements';
export {
  type SpeciesGibbs,
  type EphPhaseKind,
  type EphClass,
  type EphPlane,
  type EphPlanes,
  type EphPoint,
  type EphWindow,
  type EphRegion,
  type EphBoundary,
  type EphWaterLine,
  type EphDiagram,
  EPH_LIMITS,
  DEFAULT_EPH_WINDOW,
  defaultSpeciesGibbs,
  makeSpeciesGibbs,
  type SpeciesRecordLookup,
  defaultEphWindow,
  findEphElement,
  ephPlanes,
  ephDiagram,
  predominantSpecies,
  waterLines,
  clearEphCache,
} from './eph/diagram';
export {
  type EphMode,
  type CaseColumn,
  type EphLineRow,
  EPH_LINE_HEADER,
  predominantCases,
  classifySpecies,
  ephLineRows,
} from './eph/cases';
export { type EphSvgOptions, EPH_CAUTION, EPH_CLASS_STYLE, renderEphSvg } from './eph/svg';
export { EPH_SPECIES } from './data/species/ephSpecies';
