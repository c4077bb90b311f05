/**
 * HyperFormula's memory on large sheets (src/cli/engineMemory.ts): formulas of one shape share
 * their tree, ranges make their caches on first use, short edge lists are exact-size copies
 * (graphEdges.ts). None of this may change a result: every expected value here is plain
 * arithmetic written out in the test, and the formulas are read back as HyperFormula prints them.
 */
import { HyperFormula } from 'hyperformula';
import { leanEngineMemory, rangeInOrder } from '../../src/cli/engineMemory';
import { indexGraphEdges } from '../../src/cli/graphEdges';

const CONFIG = { licenseKey: 'gpl-v3' } as const;

interface VertexLike {
  formula?: unknown;
}

function formulaTree(hf: HyperFormula, row: number, col: number): unknown {
  const mapping = (hf.dependencyGraph as unknown as { addressMapping: { getCell(a: unknown): VertexLike } })
    .addressMapping;
  return mapping.getCell({ sheet: 0, row, col }).formula;
}

beforeAll(() => {
  expect(indexGraphEdges()).toBe(true);
  expect(leanEngineMemory()).toEqual({ sharedTrees: true, lazyRangeCaches: true });
});

describe('rangeInOrder', () => {
  const rel = (col: number, row: number) => ({ col, row, type: 'CELL_REFERENCE', sheet: undefined });
  const abs = (col: number, row: number) => ({ col, row, type: 'CELL_REFERENCE_ABSOLUTE', sheet: undefined });
  test.each([
    ['A1:B2 relative', rel(0, 0), rel(1, 1), true],
    ['$A$1:$B$2 absolute', abs(0, 0), abs(1, 1), true],
    ['one cell', rel(0, 0), rel(0, 0), true],
    ['B2:A1 reversed', rel(1, 1), rel(0, 0), false],
    ['A2:B1 rows reversed', rel(0, 1), rel(1, 0), false],
    ['$A$1:B2 mixed types (left to HyperFormula)', abs(0, 0), rel(1, 1), false],
  ])('%s', (_what, start, end, expected) => {
    expect(rangeInOrder(start, end)).toBe(expected);
  });
});

describe('leanEngineMemory', () => {
  test('installs once; a second call reports the same', () => {
    expect(leanEngineMemory()).toEqual({ sharedTrees: true, lazyRangeCaches: true });
  });

  test('cells of one formula shape share one tree, and compute their own rows', () => {
    const rows = Array.from({ length: 50 }, (_, i) => [i + 1, 2 * (i + 1), `=SUM(A${i + 1}:B${i + 1})*$D$1`]);
    rows[0]?.push(10);
    const hf = HyperFormula.buildFromSheets({ S: rows }, CONFIG);
    try {
      expect(formulaTree(hf, 10, 2)).toBe(formulaTree(hf, 20, 2));
      for (let i = 0; i < 50; i++)
        expect(hf.getCellValue({ sheet: 0, row: i, col: 2 })).toBe(3 * (i + 1) * 10);
      expect(hf.getCellFormula({ sheet: 0, row: 7, col: 2 })).toBe('=SUM(A8:B8)*$D$1');
    } finally {
      hf.destroy();
    }
  });

  test('reversed and mixed ranges are still put in order, in each cell', () => {
    // Column A holds 1..6; B1 = sum of A1:A3 written backwards; B2 a mixed range; B3 rows reversed.
    const hf = HyperFormula.buildFromSheets(
      { S: [[1, '=SUM(A3:A1)'], [2, '=SUM(A$1:A4)'], [3, '=SUM(B1:A2)'], [4], [5], [6]] },
      CONFIG,
    );
    try {
      expect(hf.getCellValue({ sheet: 0, row: 0, col: 1 })).toBe(1 + 2 + 3);
      expect(hf.getCellValue({ sheet: 0, row: 1, col: 1 })).toBe(1 + 2 + 3 + 4);
      // B1:A2 = A1, B1, A2, B2 = 1 + 6 + 2 + 10
      expect(hf.getCellValue({ sheet: 0, row: 2, col: 1 })).toBe(1 + 6 + 2 + 10);
      expect(hf.getCellFormula({ sheet: 0, row: 0, col: 1 })).toBe('=SUM(A1:A3)');
    } finally {
      hf.destroy();
    }
  });

  test('operators, parentheses, arrays and nested calls of one shape compute per row', () => {
    const rows = Array.from({ length: 20 }, (_, i) => [
      i + 1,
      `=-(A${i + 1}+1)*2^2&""`,
      `=IF(A${i + 1}>10,MAX(A${i + 1},{1,2;3,4}),-A${i + 1})`,
    ]);
    const hf = HyperFormula.buildFromSheets({ S: rows }, CONFIG);
    try {
      for (let i = 0; i < 20; i++) {
        const a = i + 1;
        expect(hf.getCellValue({ sheet: 0, row: i, col: 1 })).toBe(String(-(a + 1) * 4));
        expect(hf.getCellValue({ sheet: 0, row: i, col: 2 })).toBe(a > 10 ? Math.max(a, 4) : -a);
      }
    } finally {
      hf.destroy();
    }
  });

  test('each HYPERLINK cell keeps its own link', () => {
    const rows = Array.from({ length: 5 }, (_, i) => [
      `page${i}`,
      `=HYPERLINK("https://example.org/"&A${i + 1},"go")`,
    ]);
    const hf = HyperFormula.buildFromSheets({ S: rows }, CONFIG);
    try {
      for (let i = 0; i < 5; i++)
        expect(hf.getCellHyperlink({ sheet: 0, row: i, col: 1 })).toBe(`https://example.org/page${i}`);
    } finally {
      hf.destroy();
    }
  });

  test('range caches made on first use follow every change (SUM chains, COUNTIF, SUMIF)', () => {
    // A1:A40 = 1..40; B(i) = SUM(A1:Ai) (HyperFormula chains these ranges and caches partial
    // sums); C1 = COUNTIF(A1:A40,">20"); C2 = SUMIF(A1:A40,">20").
    const n = 40;
    const rows: (number | string)[][] = Array.from({ length: n }, (_, i) => [i + 1, `=SUM(A1:A${i + 1})`]);
    (rows[0] as (number | string)[]).push(`=COUNTIF(A1:A${n},">20")`);
    (rows[1] as (number | string)[]).push(`=SUMIF(A1:A${n},">20")`);
    const hf = HyperFormula.buildFromSheets({ S: rows }, CONFIG);
    const sums = (a: number[]) => a.map((_, i) => a.slice(0, i + 1).reduce((x, y) => x + y, 0));
    const check = (a: number[]) => {
      expect(Array.from({ length: n }, (_, i) => hf.getCellValue({ sheet: 0, row: i, col: 1 }))).toEqual(
        sums(a),
      );
      expect(hf.getCellValue({ sheet: 0, row: 0, col: 2 })).toBe(a.filter((x) => x > 20).length);
      expect(hf.getCellValue({ sheet: 0, row: 1, col: 2 })).toBe(
        a.filter((x) => x > 20).reduce((x, y) => x + y, 0),
      );
    };
    try {
      const a = Array.from({ length: n }, (_, i) => i + 1);
      check(a);
      hf.setCellContents({ sheet: 0, row: 4, col: 0 }, 100);
      a[4] = 100;
      check(a);
      hf.setCellContents({ sheet: 0, row: 30, col: 0 }, 0);
      a[30] = 0;
      check(a);
    } finally {
      hf.destroy();
    }
  });

  test('a range vertex holds no caches until a function caches over it', () => {
    // INDEX reads the range without caching; SUM caches its total on the range's vertex.
    const hf = HyperFormula.buildFromSheets({ S: [[1, 2, '=INDEX(A1:B1,1,2)']] }, CONFIG);
    try {
      const vertex = () =>
        (
          hf.rangeMapping as unknown as { getRangeVertex(s: unknown, e: unknown): object | undefined }
        ).getRangeVertex({ sheet: 0, row: 0, col: 0 }, { sheet: 0, row: 0, col: 1 }) as
          { lazyFunctionCache?: Map<string, unknown> } | undefined;
      expect(Object.prototype.hasOwnProperty.call(vertex(), 'functionCache')).toBe(false);
      expect(hf.getCellValue({ sheet: 0, row: 0, col: 2 })).toBe(2);
      expect(vertex()?.lazyFunctionCache).toBeUndefined();
      hf.setCellContents({ sheet: 0, row: 1, col: 0 }, '=SUM(A1:B1)');
      expect(hf.getCellValue({ sheet: 0, row: 1, col: 0 })).toBe(3);
      expect(vertex()?.lazyFunctionCache?.get('SUM')).toBe(3);
    } finally {
      hf.destroy();
    }
  });
});

describe('exact-size edge lists (graphEdges.ts)', () => {
  test('a cell read by a few formulas has an exact-size list of them, and they follow it', () => {
    const hf = HyperFormula.buildFromSheets({ S: [[5, '=A1*2', '=A1+1', '=A1-1']] }, CONFIG);
    try {
      const graph = hf.graph as unknown as {
        edgesSparseArray: number[][];
        getNodeIdIfNotNumber(n: unknown): number;
      };
      const a1 = (
        hf.dependencyGraph as unknown as { addressMapping: { getCell(a: unknown): unknown } }
      ).addressMapping.getCell({ sheet: 0, row: 0, col: 0 });
      expect(graph.edgesSparseArray[graph.getNodeIdIfNotNumber(a1)]).toHaveLength(3);
      hf.setCellContents({ sheet: 0, row: 0, col: 0 }, 7);
      expect([1, 2, 3].map((col) => hf.getCellValue({ sheet: 0, row: 0, col }))).toEqual([14, 8, 6]);
    } finally {
      hf.destroy();
    }
  });
});
