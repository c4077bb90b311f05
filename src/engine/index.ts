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
  standardSpecies,
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
export { isFiniteColumn } from './thermo/sweep';
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

// activity: Pitzer model, water activity, molality (issue 13)
export {
  pitzerAphi,
  pitzerMeanActivityCoefficient,
  pitzerOsmoticCoefficient,
  pitzerMeanActivityCoefficients,
  compilePitzerSalt,
  APHI_TEMP_RANGE_C,
  type CompiledPitzerSalt,
} from './activity/pitzer';
export {
  pitzerMixture,
  pitzerIonActivityCoefficients,
  type PitzerMixtureResult,
} from './activity/pitzerMixing';
export {
  waterActivity,
  osmoticCoefficient,
  WATER_MOLAR_MASS_KG_PER_MOL,
  waterElectrolyteOf,
} from './activity/waterActivity';
export { molalityFromMolarity, saltMolarMass, heldSolutionDensity } from './activity/molality';
export { parseSalt, type SaltIons } from './activity/salt';
export { PITZER_BINARY, PITZER_THETA, PITZER_PSI, type PitzerBinaryRow } from './data/pitzerParameters';
export { ACTIVITY_MODEL_RANGES, type ActivityModelRange } from './data/activityData';
export { SOLUTION_DENSITIES } from './data/solutionDensities';
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
// beyond equilibrium: Faraday's law, corrosion rates, anodes, capacity and energy,
// electrode kinetics, inverse Nernst, junction potentials, ion-selective electrodes
export { molarMassOfFormula, molarMassOfSpecies } from './faraday/molarMass';
export { type FaradayPlan, faradayPlan, depositMassG, plateTimeS, thicknessUm } from './faraday/faraday';
export { specificCapacityMAhG } from './faraday/capacity';
export { asIons, cellEnergyPlan, specificEnergyWhKg, type CellEnergyPlan } from './faraday/specificEnergy';
export {
  G102_K1,
  G102_K2,
  corrodingMetal,
  equivalentWeightOfComposition,
  corrosionRateMmY,
  massLossRateGm2d,
  type CorrodingMetal,
} from './corrosion/corrosionRate';
export { HOURS_PER_YEAR, anodeCapacityAhKg, anodeUtilisation, anodeLifeYears } from './corrosion/anodeLife';
export {
  KINETICS_RANGE_C,
  type KineticParams,
  kineticParams,
  butlerVolmerCurrent,
  overpotentialV,
  tafelSlopeV,
} from './kinetics/butlerVolmer';
export { type MixedPotential, mixedPotential } from './kinetics/mixedPotential';
export { type SolvedUnknown, solveForUnknown } from './measurement/solveFor';
export { junctionPotentialV } from './measurement/junction';
export { iseResponseV } from './measurement/ionSelective';
export {
  MAX_POTENTIAL_V,
  AQUEOUS_RANGE_C,
  potentialInVolts,
  celsiusInRange,
  fraction as fractionInUnitInterval,
} from './measurement/guards';
export { ATOMIC_WEIGHTS, ATOMIC_WEIGHTS_SOURCE } from './data/atomicWeights';
export { METAL_DENSITIES_G_CM3 } from './data/metalDensities';
export { ALLOYS, G102_VALENCES } from './data/alloys';
export { ANODE_MATERIALS, ANODE_UTILISATION, DEFAULT_UTILISATION } from './data/anodes';
export { LIMITING_IONIC_CONDUCTIVITY_S_CM2_MOL } from './data/conductivities';
export { tableCycleProblems, CYCLE_TOLERANCE_V } from './table/cycles';
export { columnLetters } from './a1';
export { cellOf, pairKernel, pairColumn, type PairKernel } from './thermo/sweep';
export { inlineDiagramKernel, readInlineAmounts, inlineDiagramValue, type InlineDiagramKernel } from './cache';
