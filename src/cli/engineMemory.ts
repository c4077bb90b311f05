/**
 * HyperFormula's memory on large sheets: two changes to how it holds what every formula shares.
 *
 * At 100,000 formulas HyperFormula 3.x holds about 3 KB per formula row. Two parts of that are
 * copies of nothing:
 *
 * 1. **Formula trees.** The parser caches one tree per formula shape (relative references, so
 *    `=A2*2` and `=A3*2` share it) but then copies the whole tree for every cell
 *    (`convertReversedRangesToRegularRanges`), with two new addresses per range, even where no
 *    range is reversed. Here a subtree whose ranges are already in order is returned as it is,
 *    so cells of one shape share the cached tree; a subtree with a reversed range (`B5:A1`) is
 *    still rewritten by HyperFormula's own code. A HYPERLINK call is always copied, because its
 *    evaluation writes its URL onto its own node.
 * 2. **Range caches.** Every range vertex (one per distinct range, so one per row for `A2:B2`)
 *    creates two Maps and a Set for the results of functions such as SUMIF over it, nearly
 *    always left empty. Here they are made on first use; until then the vertex reads as having
 *    empty caches, exactly as before.
 *
 * Neither changes a result: the trees are immutable once parsed (HyperFormula's structural
 * transformations build new trees), and the caches behave as the original collections. Where
 * HyperFormula's internals do not have the shape this relies on (another version), nothing is
 * changed. Measured figures are in bench/README.md.
 */
import { HyperFormula } from 'hyperformula';

/** The fields of a cell address in a formula tree (HyperFormula's CellAddress). */
interface TreeAddress {
  col: number;
  row: number;
  type: string;
  sheet: number | undefined;
}

/** A node of HyperFormula's formula tree, as far as this module reads it. */
interface TreeNode {
  type: string;
  procedureName?: string;
  start?: TreeAddress;
  end?: TreeAddress;
  value?: TreeNode;
  left?: TreeNode;
  right?: TreeNode;
  expression?: TreeNode;
  args?: TreeNode[] | TreeNode[][];
}

interface ParserInternals {
  convertReversedRangesToRegularRanges(ast: TreeNode): TreeNode;
  orderCellRangeEnds(a: TreeAddress, b: TreeAddress): unknown;
}

const UNARY = new Set(['PERCENT_OP', 'PLUS_UNARY_OP', 'MINUS_UNARY_OP']);
const BINARY = new Set([
  'CONCATENATE_OP',
  'EQUALS_OP',
  'NOT_EQUAL_OP',
  'LESS_THAN_OP',
  'GREATER_THAN_OP',
  'LESS_THAN_OR_EQUAL_OP',
  'GREATER_THAN_OR_EQUAL_OP',
  'MINUS_OP',
  'PLUS_OP',
  'TIMES_OP',
  'DIV_OP',
  'POWER_OP',
]);
const LEAVES = new Set([
  'EMPTY',
  'NUMBER',
  'STRING',
  'ERROR',
  'ERROR_WITH_RAW_INPUT',
  'CELL_REFERENCE',
  'NAMED_EXPRESSION',
]);

/**
 * True where HyperFormula's ordering would leave the range's ends as they are: both ends of
 * the same reference type (so the formula's own position cancels out), the start at or above
 * and left of the end, one sheet. Other ranges (mixed `A$1:B2`, reversed) are left to it.
 */
export function rangeInOrder(start: TreeAddress, end: TreeAddress): boolean {
  return start.type === end.type && start.sheet === end.sheet && start.col <= end.col && start.row <= end.row;
}

/** The same node where nothing in it changed, else a copy with the changed parts. */
function shareUnchanged(
  this: ParserInternals,
  original: (ast: TreeNode) => TreeNode,
  ast: TreeNode,
): TreeNode {
  const convert = (n: TreeNode) => this.convertReversedRangesToRegularRanges(n);
  const t = ast.type;
  if (LEAVES.has(t)) return ast;
  if (t === 'CELL_RANGE' && ast.start !== undefined && ast.end !== undefined)
    return rangeInOrder(ast.start, ast.end) ? ast : original.call(this, ast);
  if (UNARY.has(t) && ast.value !== undefined) {
    const value = convert(ast.value);
    return value === ast.value ? ast : { ...ast, value };
  }
  if (BINARY.has(t) && ast.left !== undefined && ast.right !== undefined) {
    const left = convert(ast.left);
    const right = convert(ast.right);
    return left === ast.left && right === ast.right ? ast : { ...ast, left, right };
  }
  if (t === 'PARENTHESES' && ast.expression !== undefined) {
    const expression = convert(ast.expression);
    return expression === ast.expression ? ast : { ...ast, expression };
  }
  if (t === 'FUNCTION_CALL' && Array.isArray(ast.args) && ast.procedureName !== 'HYPERLINK') {
    const old = ast.args as TreeNode[];
    const args = old.map(convert);
    return args.every((a, i) => a === old[i]) ? ast : { ...ast, args };
  }
  if (t === 'ARRAY' && Array.isArray(ast.args)) {
    const old = ast.args as TreeNode[][];
    const args = old.map((row) => row.map(convert));
    return args.every((row, i) => row.every((a, j) => a === old[i]?.[j])) ? ast : { ...ast, args };
  }
  // Column and row ranges, HYPERLINK, and anything this version does not know: HyperFormula's way.
  return original.call(this, ast);
}

/** The caches of a range vertex, made on first use (HyperFormula's RangeVertex). */
interface RangeVertexInternals {
  range: unknown;
  clearCache(): void;
  getFunctionValue(name: string): unknown;
  getCriterionFunctionValues(key: string): Map<string, unknown>;
  lazyFunctionCache?: Map<string, unknown>;
  lazyCriterionCache?: Map<string, Map<string, unknown>>;
  lazyDependentRanges?: Set<RangeVertexInternals>;
}

/** Defines `name` on the prototype as a collection made on first read, kept in `slot`. */
function lazyCollection(
  proto: object,
  name: string,
  slot: 'lazyFunctionCache' | 'lazyCriterionCache' | 'lazyDependentRanges',
  make: () => Map<string, unknown> | Set<unknown>,
): void {
  Object.defineProperty(proto, name, {
    configurable: true,
    get(this: Record<string, unknown>) {
      let c = this[slot];
      if (c === undefined) {
        c = make();
        this[slot] = c;
      }
      return c;
    },
    // The constructor assigns a new empty collection: nothing to keep until it is used.
    set(this: Record<string, unknown>, v: Map<unknown, unknown> | Set<unknown>) {
      this[slot] = v.size === 0 ? undefined : v;
    },
  });
}

/** Installs the lazy caches on the prototype; returns the function that takes them off again. */
function installLazyRangeCaches(vertexProto: RangeVertexInternals): () => void {
  const names = [
    'functionCache',
    'criterionFunctionCache',
    'dependentCacheRanges',
    'getFunctionValue',
    'getCriterionFunctionValues',
    'clearCache',
  ];
  const before = names.map((n) => Object.getOwnPropertyDescriptor(vertexProto, n));
  lazyCollection(vertexProto, 'functionCache', 'lazyFunctionCache', () => new Map());
  lazyCollection(vertexProto, 'criterionFunctionCache', 'lazyCriterionCache', () => new Map());
  lazyCollection(vertexProto, 'dependentCacheRanges', 'lazyDependentRanges', () => new Set());
  vertexProto.getFunctionValue = function (this: RangeVertexInternals, name: string) {
    return this.lazyFunctionCache?.get(name);
  };
  vertexProto.getCriterionFunctionValues = function (this: RangeVertexInternals, key: string) {
    return this.lazyCriterionCache?.get(key) ?? new Map<string, unknown>();
  };
  vertexProto.clearCache = function (this: RangeVertexInternals) {
    this.lazyFunctionCache?.clear();
    this.lazyCriterionCache?.clear();
    const dependents = this.lazyDependentRanges;
    if (dependents !== undefined) {
      dependents.forEach((range) => range.lazyCriterionCache?.clear());
      dependents.clear();
    }
  };
  return () =>
    names.forEach((n, i) => {
      const d = before[i];
      if (d === undefined) delete (vertexProto as unknown as Record<string, unknown>)[n];
      else Object.defineProperty(vertexProto, n, d);
    });
}

let installed: { sharedTrees: boolean; lazyRangeCaches: boolean } | undefined;

type ProbedVertex = (Partial<RangeVertexInternals> & Record<string, unknown>) | undefined;

/** An engine with one range (A1:B1, read by SUM), and that range's vertex. */
function rangeProbe(): { hf: HyperFormula; vertex: ProbedVertex } {
  const hf = HyperFormula.buildFromArray([[1, 2, '=SUM(A1:B1)']], { licenseKey: 'gpl-v3' });
  const mapping = hf.rangeMapping as unknown as { getRangeVertex(s: unknown, e: unknown): unknown };
  const vertex = mapping.getRangeVertex({ sheet: 0, row: 0, col: 0 }, { sheet: 0, row: 0, col: 1 });
  return { hf, vertex: vertex as ProbedVertex };
}

/**
 * Installs both changes on HyperFormula (once per process, before the first workbook is
 * built). Returns which of them are installed; a part whose internals are not the ones this
 * was written for is left unchanged.
 *
 * @example
 * leanEngineMemory(); // { sharedTrees: true, lazyRangeCaches: true }
 */
export function leanEngineMemory(): { sharedTrees: boolean; lazyRangeCaches: boolean } {
  if (installed !== undefined) return installed;
  const { hf: probe, vertex } = rangeProbe();
  let sharedTrees = false;
  let lazyRangeCaches = false;
  try {
    const parser = (probe as unknown as { _parser?: Partial<ParserInternals> })._parser;
    const parserProto = parser === undefined ? undefined : (Object.getPrototypeOf(parser) as ParserInternals);
    if (
      parserProto !== undefined &&
      typeof parserProto.convertReversedRangesToRegularRanges === 'function' &&
      typeof parserProto.orderCellRangeEnds === 'function'
    ) {
      const original = parserProto.convertReversedRangesToRegularRanges;
      parserProto.convertReversedRangesToRegularRanges = function (this: ParserInternals, ast: TreeNode) {
        return shareUnchanged.call(this, original, ast);
      };
      sharedTrees = true;
    }
    if (
      vertex !== undefined &&
      vertex.functionCache instanceof Map &&
      vertex.criterionFunctionCache instanceof Map &&
      vertex.dependentCacheRanges instanceof Set &&
      typeof vertex.clearCache === 'function' &&
      typeof vertex.getFunctionValue === 'function' &&
      typeof vertex.getCriterionFunctionValues === 'function'
    ) {
      const vertexProto = Object.getPrototypeOf(vertex) as RangeVertexInternals;
      const undo = installLazyRangeCaches(vertexProto);
      // The constructor must assign through the accessors (not define own fields): check on a
      // new vertex, and undo the change where it does not.
      const { hf: check, vertex: fresh } = rangeProbe();
      check.destroy();
      lazyRangeCaches = fresh !== undefined && !Object.prototype.hasOwnProperty.call(fresh, 'functionCache');
      if (!lazyRangeCaches) undo();
    }
  } finally {
    probe.destroy();
  }
  installed = { sharedTrees, lazyRangeCaches };
  return installed;
}
