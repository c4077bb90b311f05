/*
 * Stand-in for office.js in the browser test (served in place of the platform script, so the
 * test uses no network): Office.onReady reports Excel, and Excel.run runs the pane's batch
 * against a small recording workbook. Everything the pane writes is kept in
 * globalThis.__potentiaMock.sheets, where the test reads it back.
 *
 * Before the page loads, the test may set globalThis.__potentiaExisting (names of the
 * workbook's own sheets). Setting __potentiaMock.failNextRun to an error object makes the
 * next Excel.run reject with it. globalThis.__potentiaLocale, where set before the page loads,
 * is Office.context.displayLanguage. Reading a range back (range.load('values') and sync)
 * gives the values the pane wrote there, "" elsewhere: the pane reads only, never writes,
 * a sheet it did not create (the test checks the recorded writes).
 */
(function () {
  'use strict';
  const g = globalThis;
  const state = { sheets: [], calls: [], syncs: 0, failNextRun: null };
  g.__potentiaMock = state;

  function makeSheet(name, added) {
    const sheet = { name: name, added: added, ranges: [], charts: [], frozenRows: 0, activated: false };
    state.sheets.push(sheet);
    return sheet;
  }
  (g.__potentiaExisting || ['Sheet1']).forEach(function (n) {
    makeSheet(n, false);
  });

  function colNumber(letters) {
    let n = 0;
    for (let i = 0; i < letters.length; i++) n = n * 26 + (letters.toUpperCase().charCodeAt(i) - 64);
    return n;
  }
  function parseAddress(address) {
    const m = /^\$?([A-Za-z]+)\$?(\d+)(?::\$?([A-Za-z]+)\$?(\d+))?$/.exec(address);
    if (!m) throw { code: 'InvalidArgument', message: 'The argument is invalid or missing.' };
    const c0 = colNumber(m[1]);
    const r0 = Number(m[2]);
    return { c0: c0, r0: r0, c1: m[3] ? colNumber(m[3]) : c0, r1: m[4] ? Number(m[4]) : r0 };
  }
  /** The values of `address` on `sheet`, from what was written there. */
  function readBack(sheet, address) {
    const want = parseAddress(address);
    const cells = {};
    sheet.ranges.forEach(function (r) {
      if (r.read || !r.values) return;
      const at = parseAddress(r.address);
      r.values.forEach(function (row, i) {
        row.forEach(function (v, j) {
          cells[at.r0 + i + ',' + (at.c0 + j)] = v;
        });
      });
    });
    const out = [];
    for (let r = want.r0; r <= want.r1; r++) {
      const row = [];
      for (let c = want.c0; c <= want.c1; c++) {
        const v = cells[r + ',' + c];
        row.push(v === undefined ? '' : v);
      }
      out.push(row);
    }
    return out;
  }

  const pendingLoads = [];

  function rangeOf(sheet, address) {
    const range = {
      address: address,
      load: function (what) {
        state.calls.push('range.load(' + what + ')@' + sheet.name + '!' + address);
        range.read = true;
        pendingLoads.push(function () {
          // not enumerable: a read is not a write, and the recorded writes stay as they were
          Object.defineProperty(range, 'values', {
            value: readBack(sheet, address),
            enumerable: false,
            writable: true,
          });
        });
        return range;
      },
      format: {
        font: {},
        autofitColumns: function () {
          range.autofitted = true;
        },
      },
    };
    sheet.ranges.push(range);
    return range;
  }

  function sheetApi(sheet) {
    return {
      getRange: function (address) {
        return rangeOf(sheet, address);
      },
      freezePanes: {
        freezeRows: function (n) {
          sheet.frozenRows = n;
        },
      },
      charts: {
        add: function (type, source, seriesBy) {
          const series = {};
          const chart = {
            type: type,
            source: source.address,
            seriesBy: seriesBy,
            title: {},
            legend: {},
            axes: { categoryAxis: { title: {} }, valueAxis: { title: {} } },
            recordedSeries: series,
            series: {
              getItemAt: function () {
                return {
                  set name(v) {
                    series.name = v;
                  },
                  setXAxisValues: function (r) {
                    series.xValues = r.address;
                  },
                  setValues: function (r) {
                    series.values = r.address;
                  },
                };
              },
            },
            setPosition: function (a, b) {
              chart.position = [a, b];
            },
          };
          sheet.charts.push(chart);
          return chart;
        },
      },
      activate: function () {
        sheet.activated = true;
      },
    };
  }

  let pendingNames = false;
  const worksheets = {
    items: undefined,
    load: function (what) {
      state.calls.push('worksheets.load(' + what + ')');
      pendingNames = true;
      return worksheets;
    },
    add: function (name) {
      state.calls.push('worksheets.add(' + name + ')');
      const clash = state.sheets.some(function (s) {
        return s.name.toLowerCase() === String(name).toLowerCase();
      });
      if (clash) {
        throw { code: 'ItemAlreadyExists', message: 'A resource with the same name already exists.' };
      }
      return sheetApi(makeSheet(name, true));
    },
  };
  worksheets.getItemOrNullObject = function (name) {
    const sheet = state.sheets.find(function (s) {
      return s.name.toLowerCase() === String(name).toLowerCase();
    });
    if (!sheet) return { isNullObject: true };
    const api = sheetApi(sheet);
    api.isNullObject = false;
    return api;
  };
  worksheets.getActiveWorksheet = function () {
    return sheetApi(state.sheets[0]);
  };
  const names = {
    getItemOrNullObject: function () {
      return { isNullObject: true };
    },
  };
  const context = {
    workbook: { worksheets: worksheets, names: names },
    sync: function () {
      state.syncs++;
      while (pendingLoads.length > 0) pendingLoads.shift()();
      if (pendingNames) {
        worksheets.items = state.sheets.map(function (s) {
          return { name: s.name };
        });
        pendingNames = false;
      }
      return Promise.resolve();
    },
  };

  g.Excel = {
    run: function (batch) {
      state.calls.push('Excel.run');
      if (state.failNextRun) {
        const e = state.failNextRun;
        state.failNextRun = null;
        return Promise.reject(e);
      }
      return Promise.resolve().then(function () {
        return batch(context);
      });
    },
  };
  g.Office = {
    HostType: { Excel: 'Excel' },
    context: {
      displayLanguage: g.__potentiaLocale || 'en-US',
      requirements: {
        isSetSupported: function () {
          return true;
        },
      },
    },
    onReady: function (callback) {
      const info = { host: 'Excel', platform: 'PC' };
      if (callback) callback(info);
      return Promise.resolve(info);
    },
  };
})();
