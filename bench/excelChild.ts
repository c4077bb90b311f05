/**
 * The Excel-shaped benchmarks (call, sweep, diagram) in a process of their own, as the
 * custom-functions runtime holds them: plain Node running compiled JavaScript (no ts-node, so
 * no TypeScript compiler in the heap), the built bundle dist/functions.js loaded under a stub
 * `CustomFunctions` global, its wrappers called with Excel's argument shapes. bench/run.ts
 * compiles this file (tsconfig.bench.json, into build/bench) and starts it with one JSON
 * argument, {@link ChildRequest}; it prints one JSON line, {@link ChildReport}.
 *
 * Why a process of its own: the sweep's cost is mostly allocating the 100,000 one-cell rows a
 * spill must return, and what that costs depends on the state of V8's heap. In the benchmark
 * process, whose heap also holds the TypeScript compiler (50+ MB), the same spill took 31 to
 * 110 ns per case from one run to the next; in a heap holding only the bundle, 31 to 33.
 */
import {
  benchExcelCalls,
  benchInlineDiagram,
  benchSweep,
  useFunctionsModule,
  type CallFigures,
  type DiagramFigures,
  type SweepFigures,
} from './excelBench';
import { checkedCounts } from './stats';

/** What the parent asks for: the bundle to load, the benchmarks and their sizes. */
export interface ChildRequest {
  bundle: string;
  call?: { calls: number; runs: number };
  sweep?: { cases: number; runs: number };
  diagram?: { calls: number; runs: number };
}

/** What the child reports: each benchmark's figures and the outputs it checked. */
export interface ChildReport {
  call?: CallFigures;
  callTable?: CallFigures;
  sweep?: SweepFigures;
  diagram?: DiagramFigures;
  outputsChecked: Record<string, number>;
}

/** Runs the request and returns the report (a check that fails throws). */
export function runChild(req: ChildRequest): ChildReport {
  // the bundle, like the custom-functions runtime, expects a worker-like global `self`
  const g = globalThis as { self?: unknown };
  if (g.self === undefined) g.self = globalThis;
  useFunctionsModule(req.bundle);
  const out: ChildReport = { outputsChecked: {} };
  if (req.call) {
    out.call = benchExcelCalls(req.call.calls, req.call.runs, false);
    out.callTable = benchExcelCalls(req.call.calls, req.call.runs, true);
  }
  if (req.sweep) out.sweep = benchSweep(req.sweep.cases, req.sweep.runs);
  if (req.diagram) out.diagram = benchInlineDiagram(req.diagram.calls, req.diagram.runs);
  out.outputsChecked = checkedCounts();
  return out;
}

if (require.main === module) {
  try {
    const req = JSON.parse(process.argv[2] ?? '') as ChildRequest;
    process.stdout.write(`${JSON.stringify(runChild(req))}\n`);
  } catch (e) {
    process.stderr.write(`${e instanceof Error ? `${e.name}: ${e.message}` : String(e)}\n`);
    process.exit(1);
  }
}
