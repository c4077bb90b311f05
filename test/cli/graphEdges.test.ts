/**
 * The edge index on HyperFormula's dependency graph (src/cli/graphEdges.ts): a cell read by
 * many formulas loads in linear time, and every change HyperFormula makes to the graph
 * afterwards (formulas replaced, removed, entered again) still reaches every dependent.
 * Expected values are plain arithmetic written out here.
 */
import { HyperFormula } from 'hyperformula';
import { INDEXED_EDGES_FROM, indexGraphEdges } from '../../src/cli/graphEdges';

const N = 4 * INDEXED_EDGES_FROM;

function build(): HyperFormula {
  // A1 = 2; B(i) = A1 * i for i = 1..N, so that A1 has N dependents (an indexed edge array).
  const rows: (number | string)[][] = [[2]];
  for (let i = 1; i <= N; i++) rows.push([i, `=$A$1*A${i + 1}`]);
  return HyperFormula.buildFromSheets({ S: rows }, { licenseKey: 'gpl-v3' });
}

function column(hf: HyperFormula): unknown[] {
  return Array.from({ length: N }, (_, k) => hf.getCellValue({ sheet: 0, row: k + 1, col: 1 }));
}

describe('indexGraphEdges', () => {
  beforeAll(() => {
    expect(indexGraphEdges()).toBe(true);
  });

  test('installs once; a second call reports the same', () => {
    expect(indexGraphEdges()).toBe(true);
  });

  test('every dependent of a much-read cell is computed and follows its changes', () => {
    const hf = build();
    try {
      expect(column(hf)).toEqual(Array.from({ length: N }, (_, k) => 2 * (k + 1)));
      hf.setCellContents({ sheet: 0, row: 0, col: 0 }, 3);
      expect(column(hf)).toEqual(Array.from({ length: N }, (_, k) => 3 * (k + 1)));
    } finally {
      hf.destroy();
    }
  });

  test('formulas removed and entered again (edges deleted, then added back) still follow the cell', () => {
    const hf = build();
    try {
      // Remove the dependency of the last half (their edges from A1 are deleted) ...
      for (let i = N / 2 + 1; i <= N; i++) hf.setCellContents({ sheet: 0, row: i, col: 1 }, 0);
      hf.setCellContents({ sheet: 0, row: 0, col: 0 }, 5);
      const half = column(hf);
      expect(half.slice(0, N / 2)).toEqual(Array.from({ length: N / 2 }, (_, k) => 5 * (k + 1)));
      expect(half.slice(N / 2)).toEqual(new Array(N / 2).fill(0));
      // ... then enter them again: the index must not believe the old edges are still there.
      for (let i = N / 2 + 1; i <= N; i++) hf.setCellContents({ sheet: 0, row: i, col: 1 }, `=$A$1*A${i + 1}`);
      hf.setCellContents({ sheet: 0, row: 0, col: 0 }, 7);
      expect(column(hf)).toEqual(Array.from({ length: N }, (_, k) => 7 * (k + 1)));
      // Formulas changed in place to read another cell, then back (the same vertices).
      for (let i = 1; i <= N; i++) hf.setCellContents({ sheet: 0, row: i, col: 1 }, `=A${i + 1}*10`);
      hf.setCellContents({ sheet: 0, row: 0, col: 0 }, 8);
      expect(column(hf)).toEqual(Array.from({ length: N }, (_, k) => 10 * (k + 1)));
      for (let i = 1; i <= N; i++) hf.setCellContents({ sheet: 0, row: i, col: 1 }, `=$A$1*A${i + 1}`);
      hf.setCellContents({ sheet: 0, row: 0, col: 0 }, 7);
      expect(column(hf)).toEqual(Array.from({ length: N }, (_, k) => 7 * (k + 1)));
      // A formula that reads the cell twice holds one edge: still computed once, right.
      hf.setCellContents({ sheet: 0, row: 1, col: 1 }, '=$A$1+$A$1');
      expect(hf.getCellValue({ sheet: 0, row: 1, col: 1 })).toBe(14);
    } finally {
      hf.destroy();
    }
  });

  test('rows inserted above the dependents keep every dependency', () => {
    const hf = build();
    try {
      hf.addRows(0, [1, 3]);
      hf.setCellContents({ sheet: 0, row: 0, col: 0 }, 11);
      const values = Array.from({ length: N }, (_, k) => hf.getCellValue({ sheet: 0, row: k + 4, col: 1 }));
      expect(values).toEqual(Array.from({ length: N }, (_, k) => 11 * (k + 1)));
    } finally {
      hf.destroy();
    }
  });
});
