/**
 * HyperFormula's dependency graph with an index on the edges of its busiest vertices.
 *
 * HyperFormula 3.x keeps the dependents of every vertex as a plain array and checks it with
 * `includes` before adding an edge (`Graph.addEdge`), so a cell or range read by n formulas
 * (a table of potentials, a header row: `$A$1:$B$1`, `Potentials!$A$2:$D$3`) costs O(n²) to
 * load: 60 % of the runner's time at 100,000 formulas, 5·10⁹ comparisons. This module keeps,
 * beside every edge array of 32 entries or more, a Set of the same ids, so that the check is
 * O(1); the arrays themselves (what the rest of HyperFormula reads) hold the same ids. A
 * shorter array is searched as before and, when an id is added, replaced by an exact-size copy
 * (a pushed array keeps room for 17 ids, 120 bytes a vertex where most hold one or two).
 *
 * The Set always holds exactly the ids of its array: the graph changes an edge array only in
 * `addEdge` (push), `removeEdge` and `removeEdgeIfExists` (delete one entry), all three wrapped
 * here; `fixEdgesArrayForNode` and `removeNode` replace or drop the array, whose Set (keyed by
 * the array object in a WeakMap) is then simply not found and rebuilt from the new array on
 * its next use. Where the graph does not have the shape this relies on (another HyperFormula
 * version), nothing is changed.
 */
import { HyperFormula } from 'hyperformula';

/** The parts of HyperFormula's Graph this module touches. */
interface GraphInternals {
  edgesSparseArray: (number | undefined)[][];
  getNodeIdIfNotNumber(node: unknown): number | undefined;
  addEdge(from: unknown, to: unknown): void;
  removeEdge(from: unknown, to: unknown): void;
  removeEdgeIfExists(from: unknown, to: unknown): void;
}

/** Edge arrays shorter than this are searched as HyperFormula does (no Set). */
export const INDEXED_EDGES_FROM = 32;

const indexes = new WeakMap<(number | undefined)[], Set<number>>();

/** The Set of the ids in `edges`, made on first use. */
function indexOf(edges: (number | undefined)[]): Set<number> {
  let set = indexes.get(edges);
  if (set === undefined) {
    set = new Set<number>();
    for (const id of edges) if (id !== undefined) set.add(id);
    indexes.set(edges, set);
  }
  return set;
}

let installed: boolean | undefined;

function hasGraphShape(proto: Partial<GraphInternals>, graph: Partial<GraphInternals>): boolean {
  return (
    typeof proto.addEdge === 'function' &&
    typeof proto.removeEdge === 'function' &&
    typeof proto.removeEdgeIfExists === 'function' &&
    typeof proto.getNodeIdIfNotNumber === 'function' &&
    Array.isArray(graph.edgesSparseArray)
  );
}

/**
 * Installs the edge index on HyperFormula's Graph (once per process). Returns true where it
 * is installed, false where the graph is not the one this was written for (left unchanged).
 *
 * @example
 * indexGraphEdges(); // before HyperFormula.buildFromSheets(...)
 */
export function indexGraphEdges(): boolean {
  if (installed !== undefined) return installed;
  const probe = HyperFormula.buildEmpty({ licenseKey: 'gpl-v3' });
  const graph = probe.graph as unknown as Partial<GraphInternals>;
  const proto = Object.getPrototypeOf(graph) as GraphInternals;
  probe.destroy();
  installed = hasGraphShape(proto, graph);
  if (!installed) return false;
  const { addEdge, removeEdge, removeEdgeIfExists } = proto;

  proto.addEdge = function (this: GraphInternals, from: unknown, to: unknown): void {
    const fromId = this.getNodeIdIfNotNumber(from);
    const toId = this.getNodeIdIfNotNumber(to);
    const edges = fromId === undefined ? undefined : this.edgesSparseArray[fromId];
    // Every case HyperFormula reports as an error goes the original way.
    if (edges === undefined || toId === undefined || fromId === undefined) {
      addEdge.call(this, from, to);
      return;
    }
    if (edges.length < INDEXED_EDGES_FROM) {
      // A short array is searched as HyperFormula does, and replaced by an exact-size copy
      // with the new id: `push` would give it room for 17 ids, and most vertices keep one or
      // two (about 120 bytes saved per vertex; HyperFormula itself replaces these arrays in
      // `fixEdgesArrayForNode`).
      if (!edges.includes(toId)) this.edgesSparseArray[fromId] = edges.concat(toId);
      return;
    }
    const set = indexOf(edges);
    if (set.has(toId)) return;
    edges.push(toId);
    set.add(toId);
  };

  const forgetting = (original: (from: unknown, to: unknown) => void) =>
    function (this: GraphInternals, from: unknown, to: unknown): void {
      const fromId = this.getNodeIdIfNotNumber(from);
      const toId = this.getNodeIdIfNotNumber(to);
      original.call(this, from, to);
      const edges = fromId === undefined ? undefined : this.edgesSparseArray[fromId];
      const set = edges === undefined ? undefined : indexes.get(edges);
      // The array held toId at most once (addEdge never adds it twice): now it holds it no more.
      if (set !== undefined && toId !== undefined) set.delete(toId);
    };
  proto.removeEdge = forgetting(removeEdge);
  proto.removeEdgeIfExists = forgetting(removeEdgeIfExists);
  return true;
}
