// A small in-memory Office/Excel host for the browser tests, served in place of office.js.
// State lives in window.__fake: cells per sheet, the selection, settings, and what the pane asked for.
(function () {
  const init = window.__fakeInit || {};
  const fake = (window.__fake = {
    sheets: init.sheets || { Sheet1: {} },
    selection: init.selection || "Sheet1!A1",
    settings: Object.assign({}, init.settings || {}),
    saved: null,
    calculations: [],
    notes: [],
    comments: [],
    handlers: [],
    select(address) {
      this.selection = address;
      for (const h of this.handlers) h({ type: "documentSelectionChanged" });
    },
  });

  const colNum = (s) => [...s].reduce((n, c) => n * 26 + c.charCodeAt(0) - 64, 0);
  const colName = (n) => {
    let s = "";
    for (let k = n; k > 0; k = Math.floor((k - 1) / 26)) s = String.fromCharCode(65 + ((k - 1) % 26)) + s;
    return s;
  };
  function parse(address) {
    let sheet = null;
    let local = address;
    const bang = address.lastIndexOf("!");
    if (bang >= 0) {
      sheet = address.slice(0, bang).replace(/^'(.*)'$/, "$1").replace(/''/g, "'");
      local = address.slice(bang + 1);
    }
    const [a, b = a] = local.replace(/\$/g, "").split(":");
    const p = (x) => {
      const m = /^([A-Z]+)(\d+)$/.exec(x);
      return { c: colNum(m[1]), r: Number(m[2]) };
    };
    const s = p(a), e = p(b);
    return { sheet, r0: s.r, c0: s.c, r1: e.r, c1: e.c };
  }
  function makeRange(sheetName, area) {
    const cells = fake.sheets[sheetName] || (fake.sheets[sheetName] = {});
    const key = (r, c) => colName(c) + r;
    const grid = (pick) => {
      const out = [];
      for (let r = area.r0; r <= area.r1; r++) {
        const row = [];
        for (let c = area.c0; c <= area.c1; c++) row.push(pick(cells[key(r, c)]));
        out.push(row);
      }
      return out;
    };
    const local = key(area.r0, area.c0) + (area.r1 !== area.r0 || area.c1 !== area.c0 ? ":" + key(area.r1, area.c1) : "");
    return {
      isNullObject: false,
      address: (/[^A-Za-z0-9_]/.test(sheetName) ? "'" + sheetName + "'" : sheetName) + "!" + local,
      rowCount: area.r1 - area.r0 + 1,
      columnCount: area.c1 - area.c0 + 1,
      load() { return this; },
      get formulas() { return grid((x) => (x ? (x.formula !== undefined ? x.formula : x.value) : "")); },
      set formulas(m) {
        m.forEach((row, i) => row.forEach((v, j) => {
          const k = key(area.r0 + i, area.c0 + j);
          if (typeof v === "string" && v.startsWith("=")) cells[k] = { formula: v, value: 0 };
          else if (v === "") delete cells[k];
          else cells[k] = { value: v };
        }));
      },
      get values() { return grid((x) => (x ? x.value : "")); },
      set values(m) {
        m.forEach((row, i) => row.forEach((v, j) => (cells[key(area.r0 + i, area.c0 + j)] = { value: v })));
      },
      getSpillParentOrNullObject() { return { isNullObject: true, load() { return this; } }; },
    };
  }
  function worksheet(name) {
    return {
      name,
      load() { return this; },
      getRange(address) { return makeRange(name, parse(address)); },
      getUsedRangeOrNullObject() {
        const keys = Object.keys(fake.sheets[name] || {});
        if (!keys.length) return { isNullObject: true, load() { return this; } };
        const ps = keys.map((k) => parse(k));
        const area = { r0: Math.min(...ps.map((p) => p.r0)), c0: Math.min(...ps.map((p) => p.c0)), r1: Math.max(...ps.map((p) => p.r0)), c1: Math.max(...ps.map((p) => p.c0)) };
        return makeRange(name, area);
      },
      notes: { add(address, text) { fake.notes.push({ address, text }); } },
    };
  }
  const selectedSheet = () => parse(fake.selection).sheet || "Sheet1";
  function context() {
    const workbook = {
      getActiveCell() {
        const a = parse(fake.selection);
        return makeRange(a.sheet || "Sheet1", { r0: a.r0, c0: a.c0, r1: a.r0, c1: a.c0 });
      },
      getSelectedRange() {
        const a = parse(fake.selection);
        return makeRange(a.sheet || "Sheet1", a);
      },
      worksheets: {
        get items() { return Object.keys(fake.sheets).map(worksheet); },
        load() { return this; },
        getItem(name) { return worksheet(name); },
        getActiveWorksheet() { return worksheet(selectedSheet()); },
      },
      names: { getItem(name) { throw new Error("no name " + name); } },
      application: { calculate(type) { fake.calculations.push(type); } },
      comments: { add(address, text) { fake.comments.push({ address, text }); } },
    };
    return { workbook, sync: () => Promise.resolve() };
  }

  window.Office = {
    HostType: { Excel: "Excel" },
    EventType: { DocumentSelectionChanged: "documentSelectionChanged" },
    AsyncResultStatus: { Succeeded: "succeeded", Failed: "failed" },
    onReady: () => Promise.resolve({ host: "Excel", platform: "OfficeOnline" }),
    context: {
      officeTheme: init.theme,
      requirements: { isSetSupported: (name, version) => name === "ExcelApi" && Number(version) <= (init.excelApi || 1.18) },
      document: {
        settings: {
          get: (k) => (k in fake.settings ? fake.settings[k] : null),
          set: (k, v) => { fake.settings[k] = v; },
          saveAsync: (cb) => { fake.saved = Object.assign({}, fake.settings); cb({ status: "succeeded" }); },
        },
        addHandlerAsync: (_type, handler) => fake.handlers.push(handler),
      },
    },
  };
  window.Excel = {
    CalculationType: { full: "Full", recalculate: "Recalculate" },
    run: async (callback) => callback(context()),
  };
  window.CustomFunctions = {
    associate() {},
    Error: class { constructor(code, message) { this.code = code; this.message = message; } },
    ErrorCode: { invalidValue: "#VALUE!", notAvailable: "#N/A", invalidNumber: "#NUM!" },
  };
})();
