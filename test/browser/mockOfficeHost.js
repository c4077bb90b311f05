/*
 * Stand-in for office.js in the browser test (served in place of the platform script, so the
 * test uses no network): Office.onReady reports Excel, and Excel.run runs the pane's batch
 * against a small recording workbook. Everything the pane writes is kept in
 * globalThis.__potentiaMock.sheets, where the test reads it back.
 *
 * Before the page loads, the test may set globalThis.__potentiaExisting (names of the
 * workbook's own sheets). Setting __potentiaMock.failNextRun to an error object makes the
 * next Excel.run reject with it.
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

  function rangeOf(sheet, address) {
    const range = {
      address: address,
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
  const context = {
    workbook: { worksheets: worksheets },
    sync: function () {
      state.syncs++;
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
