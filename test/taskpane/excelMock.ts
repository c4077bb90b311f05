/**
 * A recording Excel for the task pane's unit tests, built from office-addin-mock's
 * OfficeMockObject: `Excel.run`, `context.sync`, `workbook.worksheets` (load of
 * `items/name`, `add`), and per sheet `getRange`, `freezePanes`, `charts.add`, `activate`.
 * Every object the pane touches is an OfficeMockObject, so the pane's property writes
 * (range.values = …, chart.title.text = …) land on them and the tests read them back.
 *
 * Failures can be injected: Excel.run rejecting outright, or the n-th context.sync
 * rejecting, with an Office-style error (code, message, debugInfo.errorLocation).
 */
import { OfficeMockObject } from 'office-addin-mock';

// office-addin-mock takes only the OfficeApp enum from office-addin-manifest, whose package
// entry also loads an ES-module-only dependency that jest (CommonJS, Node 20) cannot require.
// Give it the enum's own module, which has no dependencies.
jest.mock('office-addin-manifest', () => jest.requireActual('office-addin-manifest/lib/officeApp'));

/** An Office-style error, as Excel.run rejects with. */
export interface MockOfficeError {
  name: string;
  code: string;
  message: string;
  debugInfo: { code: string; message: string; errorLocation: string };
}

export function officeError(code: string, message: string, errorLocation: string): MockOfficeError {
  return { name: 'RichApi.Error', code, message, debugInfo: { code, message, errorLocation } };
}

/* eslint-disable @typescript-eslint/no-explicit-any */
/** A range as the pane left it (`recordedAddress` is the mock's note of where it is). */
export interface RecordedRange {
  recordedAddress: string;
  values?: unknown[][];
  formulas?: unknown[][];
  numberFormat?: unknown[][];
  format: { font: { bold?: boolean; italic?: boolean }; autofitted?: boolean };
}

export interface RecordedSeries {
  name?: string;
  xValues?: string;
  values?: string;
}

export interface RecordedChart {
  type: string;
  source: string;
  seriesBy: string;
  title: { text?: string };
  legend: { visible?: boolean };
  axes: { categoryAxis: { title: { text?: string } }; valueAxis: { title: { text?: string } } };
  series: RecordedSeries[];
  position?: { topLeft: string; bottomRight: string };
}

export interface RecordedSheet {
  name: string;
  /** true for sheets the pane added (false for the workbook's own). */
  added: boolean;
  ranges: RecordedRange[];
  charts: RecordedChart[];
  frozenRows: number;
  activated: boolean;
}

export interface MockExcel {
  /** Install as global Excel. */
  readonly excel: any;
  readonly sheets: RecordedSheet[];
  /** Calls in order, e.g. "worksheets.load(items/name)", "sync#1", "worksheets.add(Potentials (2))". */
  readonly calls: string[];
  /** A sheet by name (throws where there is none). */
  sheet(name: string): RecordedSheet;
  /** The block written at exactly this address on that sheet. */
  range(sheetName: string, address: string): RecordedRange;
}

export interface MockOptions {
  /** Excel.run itself rejects with this. */
  runRejects?: MockOfficeError;
  /** The n-th context.sync (1-based) rejects with `error`. */
  syncRejects?: { nth: number; error: MockOfficeError };
}

/**
 * A workbook holding sheets of the given names, recording what the pane writes.
 */
export function createExcelMock(existingSheets: readonly string[], options: MockOptions = {}): MockExcel {
  const sheets: RecordedSheet[] = [];
  const calls: string[] = [];
  const sheetMocks = new Map<string, any>();
  let syncs = 0;
  let pendingNameLoad = false;

  function makeSheet(name: string, added: boolean): any {
    const record: RecordedSheet = { name, added, ranges: [], charts: [], frozenRows: 0, activated: false };
    sheets.push(record);
    const mock: any = new OfficeMockObject({
      name,
      getRange(address: string) {
        calls.push(`${name}.getRange(${address})`);
        // As in Office, `address` is not readable without load + sync; the mock notes it aside.
        const range: any = new OfficeMockObject({
          format: {
            font: {},
            autofitColumns() {
              this.autofitted = true;
            },
          },
        });
        Object.defineProperty(range, 'recordedAddress', { value: address });
        record.ranges.push(range as RecordedRange);
        return range;
      },
      freezePanes: {
        freezeRows(n: number) {
          calls.push(`${name}.freezeRows(${n})`);
          record.frozenRows = n;
        },
      },
      charts: {
        add(type: string, source: any, seriesBy: string) {
          calls.push(`${name}.charts.add(${type}, ${source.recordedAddress}, ${seriesBy})`);
          const series: RecordedSeries = {};
          const seriesMock: any = new OfficeMockObject({
            setXAxisValues(r: any) {
              series.xValues = r.recordedAddress;
            },
            setValues(r: any) {
              series.values = r.recordedAddress;
            },
          });
          const chart: any = new OfficeMockObject({
            title: {},
            legend: {},
            axes: { categoryAxis: { title: {} }, valueAxis: { title: {} } },
            series: {
              getItemAt(i: number) {
                if (i !== 0) throw new Error('only one series in the mock');
                return seriesMock;
              },
            },
            setPosition(topLeft: string, bottomRight: string) {
              this.position = { topLeft, bottomRight };
            },
          });
          chart.type = type;
          chart.source = source.recordedAddress;
          chart.seriesBy = seriesBy;
          // the series' name is set on the mock object; read it back through a getter
          Object.defineProperty(chart, 'recordedSeries', {
            get: () => [{ ...series, name: seriesMock.name }],
          });
          record.charts.push(chart as RecordedChart);
          return chart;
        },
      },
      activate() {
        calls.push(`${name}.activate()`);
        record.activated = true;
      },
    });
    sheetMocks.set(name.toLowerCase(), mock);
    return mock;
  }

  for (const n of existingSheets) makeSheet(n, false);

  const excel: any = new OfficeMockObject({
    context: {
      workbook: {
        worksheets: {
          load(what: string) {
            calls.push(`worksheets.load(${what})`);
            pendingNameLoad = true;
            return this;
          },
          add(name: string) {
            calls.push(`worksheets.add(${name})`);
            if (sheetMocks.has(name.toLowerCase())) {
              throw officeError(
                'ItemAlreadyExists',
                'A resource with the same name or identifier already exists.',
                'WorksheetCollection.add',
              );
            }
            return makeSheet(name, true);
          },
        },
      },
      async sync() {
        syncs++;
        calls.push(`sync#${syncs}`);
        if (options.syncRejects && options.syncRejects.nth === syncs) throw options.syncRejects.error;
        if (pendingNameLoad) {
          excel.context.workbook.worksheets.items = sheets.map((s) => ({ name: s.name }));
          pendingNameLoad = false;
        }
      },
    },
    async run(batch: (context: any) => Promise<unknown>) {
      calls.push('Excel.run');
      if (options.runRejects) throw options.runRejects;
      return batch(this.context);
    },
  });

  return {
    excel,
    sheets,
    calls,
    sheet(name: string) {
      const s = sheets.find((x) => x.name === name);
      if (!s) throw new Error(`no sheet named ${name}; sheets: ${sheets.map((x) => x.name).join(', ')}`);
      return s;
    },
    range(sheetName: string, address: string) {
      const s = this.sheet(sheetName);
      const r = s.ranges.filter(
        (x) => x.recordedAddress === address && (x.values || x.formulas || x.format.autofitted),
      );
      if (r.length === 0) {
        throw new Error(
          `nothing written at ${sheetName}!${address}; written: ${s.ranges.map((x) => x.recordedAddress).join(', ')}`,
        );
      }
      return r[r.length - 1] as RecordedRange;
    },
  };
}

/** The chart's series as recorded (name, x and y ranges). */
export function seriesOf(chart: RecordedChart): RecordedSeries[] {
  return (chart as unknown as { recordedSeries: RecordedSeries[] }).recordedSeries;
}

/** Install the mock as the global Excel for one test. */
export function installExcel(mock: MockExcel): void {
  (globalThis as any).Excel = mock.excel;
}

export function uninstallExcel(): void {
  delete (globalThis as any).Excel;
}
/* eslint-enable @typescript-eslint/no-explicit-any */
