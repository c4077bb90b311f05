/**
 * The declarative form of a worksheet function (docs/design.md, "Function specs"): what each
 * parameter holds (its kind, unit, default, domain, whether it varies per case, its
 * description), the shape of the result, examples with independently known results, and the
 * computation. Everything else — argument reading, broadcasting, the Excel wrappers and their
 * formula-bar metadata, the runner's spill prediction, the docs and the bad-input catalogue —
 * is derived from it.
 */
import type { Arg, ErrorCode, Result, ResultCell, Scalar, TableCells } from '../cellTypes';

/** The kinds of parameter (their units, domains and readers are in kinds.ts). */
export type KindName =
  | 'reaction'
  | 'reactionOrPotential'
  | 'species'
  | 'speciesHeader'
  | 'values'
  | 'temperature'
  | 'potential'
  | 'activity'
  | 'molality'
  | 'molarity'
  | 'ionicStrength'
  | 'currentDensity'
  | 'current'
  | 'charge'
  | 'mass'
  | 'length'
  | 'time'
  | 'fraction'
  | 'count'
  | 'electrons'
  | 'number'
  | 'pH'
  | 'ionSize'
  | 'choice'
  | 'text'
  | 'reference'
  | 'salt'
  | 'element'
  | 'flag'
  | 'table'
  | 'numberList';

/** A closed or open numeric bound. */
export interface NumericDomain {
  readonly min?: number;
  readonly max?: number;
  /** True where `min` itself is excluded. */
  readonly minExclusive?: boolean;
  /** True where `max` itself is excluded. */
  readonly maxExclusive?: boolean;
  /** Whole numbers only. */
  readonly integer?: boolean;
  /** Zero excluded (a signed electron count). */
  readonly nonZero?: boolean;
}

/** One parameter of a function. */
export interface ParamSpec {
  /** Name as users see it in the formula bar, e.g. "temp_C". One name for one thing. */
  readonly name: string;
  readonly kind: KindName;
  /** User-facing description (formula bar and docs); the unit and default are added from the spec. */
  readonly description: string;
  /** True where the argument may be left out. */
  readonly optional?: boolean;
  /** The value used where the argument is omitted or blank (shown in the docs). */
  readonly default?: number | string | boolean;
  /** Text for the docs where the default is not a plain value, e.g. "from the reaction". */
  readonly defaultText?: string;
  /** Unit, where it differs from the kind's (e.g. "µA/cm²"). */
  readonly unit?: string;
  /** Domain, where it differs from the kind's. */
  readonly domain?: NumericDomain;
  /** Overrides the kind's per-case default (one cell or a column of cases vs one value for all). */
  readonly perCase?: boolean;
  /** For `choice`: the accepted values (shown in the docs), and the parser of the text. */
  readonly choices?: readonly string[];
  readonly parseChoice?: (text: string | null) => unknown;
  /** For `values`: the parameter holding the species header of the columns. */
  readonly headerParam?: string;
  /** For `potential`: allow magnitudes beyond ±10 V (no "millivolts typed as volts?" hint). */
  readonly allowBeyond10V?: boolean;
  /** For `temperature`: the `flag` parameter that, when TRUE, allows any physical temperature. */
  readonly extrapolateParam?: string;
  /** What to give, for messages ("a couple such as \"Ag+/Ag\""); the kind's noun where absent. */
  readonly noun?: string;
}

/**
 * The shape of a result, which the runner reserves before any value is known.
 * - `perCase`: one row per case; `width` cells per row (default 1), or as many as the
 *   header named by `widthFrom` lists.
 * - `single`: one cell whatever the arguments.
 * - `list`: up to as many rows as the parameter `heightFrom` has (or `rows`), `width` cells.
 * - `fixed`: the size the function gives when called with no arguments (a listing).
 */
export type ResultShape =
  | { readonly kind: 'perCase'; readonly width?: number; readonly widthFrom?: string }
  | { readonly kind: 'single' }
  | { readonly kind: 'list'; readonly heightFrom?: string; readonly rows?: number; readonly width?: number }
  | { readonly kind: 'fixed' };

/** An example call with a result known independently of the engine. */
export interface ExampleSpec {
  /** The arguments, in parameter order, as literals. */
  readonly args: readonly Arg[];
  /** The result known from outside the engine (a number, or text for text results). */
  readonly expected: number | string;
  /** Absolute tolerance for a numeric `expected`. */
  readonly tolerance?: number;
  /** Where `expected` comes from (a publication, a derivation from named constants). */
  readonly source: string;
  /** One line saying what the example shows. */
  readonly note?: string;
}

/** A documented error case (the docs list these beside the bad-input catalogue's). */
export interface ErrorNote {
  readonly when: string;
  readonly code: ErrorCode;
}

/** A temperature in °C, read and checked at the boundary (docs/design.md, "Argument kinds"). */
export type TempC = number & { readonly __unit: 'degC' };
/** A potential in V, read and checked at the boundary. */
export type PotentialV = number & { readonly __unit: 'V' };

/** Reads typed arguments for one case (see reader.ts). */
export interface CaseArgs {
  /** The case index (0-based). */
  readonly i: number;
  /** The raw cell of a cell parameter for this case (null where omitted). */
  cell(name: string): Scalar;
  /** A number of any numeric kind, checked against its domain; the default where blank. */
  num(name: string): number;
  /** The same, null where blank and there is no default. */
  optNum(name: string): number | null;
  /** A `temperature` parameter (default `temp_C`), checked once: °C, in its domain. */
  tempC(name?: string): TempC;
  /** A `potential` parameter, checked once: V, within ±10 V unless allowed. */
  potentialV(name: string): PotentialV;
  /** Text (reaction, species, reference, choice text…), trimmed; the default where blank. */
  text(name: string): string;
  /** The same, null where blank and there is no default. */
  optText(name: string): string | null;
  /** A choice parsed by its parameter's `parseChoice`. */
  choice<T>(name: string): T;
  /** A boolean flag. */
  flag(name: string): boolean;
  /** The values row of this case (raw cells), or null where no species were given. */
  row(name?: string): readonly Scalar[] | null;
  /** The values row of this case read as numbers in the parameter's unit. */
  numbers(name?: string): number[];
}

/** Arguments that are read once for the whole call. */
export interface CallArgs {
  /** The number of cases. */
  readonly cases: number;
  /** The potentials table cells, or null for the built-in table. */
  table(name?: string): TableCells;
  /** Species headers, canonical spelling (`left:Ag+`, `pH`). */
  headers(name?: string): string[];
  /** The values rows (raw cells), or null where no species were given. */
  rows(name?: string): readonly Scalar[][] | null;
  /** A list argument (one row or one column) read as numbers. */
  numberList(name: string): number[];
  /** The raw argument as the host gave it. */
  raw(name: string): Arg;
  /** A column argument as given (one cell or one per case), or null where omitted. */
  column(name: string): readonly Scalar[] | null;
  /** A typed reader for case i. */
  at(i: number): CaseArgs;
}

/** One worksheet function: its declaration and its computation. */
export interface FunctionSpec {
  /**
   * `id`: the id in the ECHEM namespace, fixed once released, e.g. "POTENTIAL"; `family`: the
   * docs group (and spec file), e.g. "Nernst"; `summary`: one sentence for the formula bar, what
   * the function returns; `returns`: what the result holds, with its unit, e.g. "E in V vs SHE".
   */
  readonly id: string;
  readonly params: readonly ParamSpec[];
  readonly result: ResultShape;
  readonly family: string;
  readonly summary: string;
  readonly returns: string;
  /** At least one; the first is the formula bar's example. */
  readonly examples: readonly ExampleSpec[];
  /** Longer notes for the docs page (conventions, where a default comes from). */
  readonly notes?: readonly string[];
  readonly errors?: readonly ErrorNote[];
  /**
   * The computation for one case, from typed arguments (most functions). Throw an
   * EngineError for a bad case: it becomes that case's error cell.
   */
  readonly perCase?: (a: CaseArgs, call: CallArgs) => ResultCell | ResultCell[];
  /** The computation over all cases at once (sweeps, listings). */
  readonly run?: (call: CallArgs) => Result;
  /**
   * Optional, before any argument is read: the same result as the computation for a call of a
   * shape it recognises (a repeated sweep), or null. It must apply the same checks and the
   * error policy itself (reader.ts `propagateInputErrors`).
   */
  readonly fast?: (args: readonly Arg[]) => Result | null;
  /**
   * Optional, for the Excel wrappers (excelErrors.ts `callFromExcel`): the arguments exactly as
   * Excel passes them (matrices, error values not yet turned into their codes). A result only
   * where every cell is a finite number, the same the computation gives; null for anything
   * else (then the arguments are converted and the computation runs with its checks and
   * messages).
   */
  readonly host?: (args: readonly unknown[]) => Result | null;
}
