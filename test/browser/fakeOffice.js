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
    // notes and threaded comments on cells: { address, text }, some possibly crafted by a test
    notes: init.notes ? init.notes.slice() : [],
    comments: init.comments ? init.comments.slice() : [],
    // how many comments each load of a sheet's comments read
    commentReads: [],
    // charts the pane inserted: type, source, titles, position and series (name, x and y ranges)
    charts: [],
    handlers: [],
    // what the pane asked for: the options of each Excel.run, and the cell count of each formulas read
    runs: [],
    reads: [],
    protectedSheets: init.protectedSheets || [],
    // defined names: "BigData" (the workbook's) or "Sheet2!Local" (a sheet's) → the address it stands for
    names: Object.assign({}, init.names || {}),
    // the built functions, as functions.js registers them, and each parameter's dimensionality (functions.json)
    functions: {},
    metadata: null,
    // formulas computed so far, resolved when every pending one is done (await window.__fake.settled())
    pending: [],
    settled() { return Promise.all(this.pending.splice(0)); },
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
    const [a, b = a] = local.replace(/\$/g, "").toUpperCase().split(":");
    // a cell, or a whole column (A:A) or row (1:3) as Excel's sheet is 1,048,576 rows by 16,384 columns ("Excel specifications and limits", from memory)
    const p = (x, end) => {
      const m = /^([A-Z]*)(\d*)$/.exec(x);
      return { c: m[1] ? colNum(m[1]) : end ? 16384 : 1, r: m[2] ? Number(m[2]) : end ? 1048576 : 1 };
    };
    const s = p(a, false), e = p(b, true);
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
    const writable = () => {
      if (fake.protectedSheets.includes(sheetName)) throw Object.assign(new Error("The cell or chart you're trying to change is on a protected sheet."), { code: "AccessDenied" });
    };
    return {
      isNullObject: false,
      address: (/[^A-Za-z0-9_]/.test(sheetName) ? "'" + sheetName + "'" : sheetName) + "!" + local,
      rowCount: area.r1 - area.r0 + 1,
      columnCount: area.c1 - area.c0 + 1,
      // a load of the cells' formulas or values reads them (counted); address and size come without them
      load(props) {
        const loaded = typeof props === "string" ? props.split(",") : [];
        if (loaded.includes("formulas") || loaded.includes("values")) fake.reads.push(this.rowCount * this.columnCount);
        return this;
      },
      getCell(r, c) { return makeRange(sheetName, { r0: area.r0 + r, c0: area.c0 + c, r1: area.r0 + r, c1: area.c0 + c }); },
      getResizedRange(dr, dc) { return makeRange(sheetName, { r0: area.r0, c0: area.c0, r1: area.r1 + dr, c1: area.c1 + dc }); },
      get formulas() { return grid((x) => (x ? (x.formula !== undefined ? x.formula : x.value) : "")); },
      set formulas(m) {
        writable();
        m.forEach((row, i) => row.forEach((v, j) => {
          const k = key(area.r0 + i, area.c0 + j);
          if (typeof v === "string" && v.startsWith("=")) {
            cells[k] = { formula: v, value: 0 };
            compute(sheetName, area.r0 + i, area.c0 + j);
          }
          else if (v === "") delete cells[k];
          else cells[k] = { value: v };
        }));
      },
      get values() { return grid((x) => (x ? x.value : "")); },
      set values(m) {
        writable();
        m.forEach((row, i) => row.forEach((v, j) => (cells[key(area.r0 + i, area.c0 + j)] = { value: v })));
      },
      // the anchor of a spilled result for one cell of it (the anchor itself included), else a null object;
      // ExcelApi 1.12 (@types/office-js, Excel.Range.getSpillParentOrNullObject): an older host lacks it
      getSpillParentOrNullObject() {
        if (minor(init.excelApi || "1.18") < 12) throw Object.assign(new Error("This API is not supported (simulated)."), { code: "ApiNotFound" });
        const single = area.r0 === area.r1 && area.c0 === area.c1;
        const here = single ? cells[key(area.r0, area.c0)] : undefined;
        const own = key(area.r0, area.c0);
        const anchor = here && (here.spilledFrom || (Object.values(cells).some((x) => x.spilledFrom === own) ? own : undefined));
        if (!anchor) return { isNullObject: true, load() { return this; } };
        return makeRange(sheetName, parse(anchor));
      },
    };
  }
  // a range by address or defined name, as Worksheet.getRange takes either ("The string representing the address or name of the range", @types/office-js)
  function rangeOf(sheetName, address) {
    const named = fake.names[sheetName + "!" + address] || fake.names[address];
    if (named === undefined) return makeRange(sheetName, parse(address));
    const a = parse(named);
    return makeRange(a.sheet || sheetName, a);
  }
  // a chart proxy over its record; a title or series is written straight through
  function chartObject(record) {
    const titled = (key) => ({ get text() { return record[key]; }, set text(v) { record[key] = v; } });
    const seriesObject = (s) => ({
      get name() { return s.name; },
      set name(v) { s.name = v; },
      setValues(range) { s.values = range.address; },
      setXAxisValues(range) { s.xValues = range.address; },
      delete() { record.series.splice(record.series.indexOf(s), 1); },
    });
    return {
      title: titled("title"),
      axes: { categoryAxis: { title: titled("xTitle") }, valueAxis: { title: titled("yTitle") } },
      series: {
        load() { return this; },
        get items() { return record.series.map(seriesObject); },
        add(name) { const s = { name, values: null, xValues: null }; record.series.push(s); return seriesObject(s); },
      },
      setPosition(startCell) { record.position = startCell; },
    };
  }
  // ---- ZC formulas computed with the built functions (as the shared runtime would) ----
  // Reads =ZC.NAME(args) (or the stored _xldudf_ZC_NAME) whose arguments are numbers, strings, blanks,
  // cell or range references and nested ZC calls; anything else is left to the value the test gave.
  if (typeof location !== "undefined" && /^https?:/.test(location.protocol)) {
    fake.metadataLoaded = fetch("functions.json").then((r) => r.json()).then((m) => { fake.metadata = m; });
  }
  function parseFormula(text) {
    let i = 1;
    const peek = () => text[i];
    const space = () => { while (/\s/.test(text[i] || "")) i++; };
    function expr() {
      space();
      const rest = text.slice(i);
      let m;
      if ((m = /^(?:ZC\.|_xldudf_ZC_)([A-Za-z_][A-Za-z0-9_]*)\(/i.exec(rest))) {
        i += m[0].length;
        const args = [];
        space();
        if (peek() === ")") { i++; return { call: m[1].toUpperCase(), args }; }
        for (;;) {
          space();
          args.push(peek() === "," || peek() === ")" ? { blank: true } : expr());
          space();
          if (peek() === ",") { i++; continue; }
          if (peek() === ")") { i++; return { call: m[1].toUpperCase(), args }; }
          throw new Error("unreadable");
        }
      }
      if ((m = /^"((?:[^"]|"")*)"/.exec(rest))) { i += m[0].length; return { value: m[1].replace(/""/g, '"') }; }
      if ((m = /^-?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?/.exec(rest))) { i += m[0].length; return { value: Number(m[0]) }; }
      if ((m = /^(?:(?:'(?:[^']|'')+'|[A-Za-z_][\w.]*)!)?\$?[A-Za-z]{1,3}\$?\d+(?::\$?[A-Za-z]{1,3}\$?\d+)?/.exec(rest))) { i += m[0].length; return { ref: m[0] }; }
      throw new Error("unreadable");
    }
    const tree = expr();
    space();
    if (i !== text.length) throw new Error("unreadable");
    return tree;
  }
  const hostValue = (x) => (x && typeof x === "object" && "code" in x ? x.code : x);
  async function evaluateTree(sheetName, node, asMatrix) {
    if (node.blank) return null;
    if (node.value !== undefined) return asMatrix ? [[node.value]] : node.value;
    if (node.ref) {
      const a = parse(node.ref);
      const values = makeRange(a.sheet || sheetName, a).values;
      return asMatrix ? values : values[0][0];
    }
    const fn = fake.functions[node.call];
    const meta = fake.metadata && fake.metadata.functions.find((f) => f.id === node.call);
    if (!fn || !meta) throw new Error("unknown function");
    const args = [];
    for (let k = 0; k < meta.parameters.length; k++) {
      const arg = node.args[k];
      args.push(arg === undefined ? null : await evaluateTree(sheetName, arg, meta.parameters[k].dimensionality === "matrix"));
    }
    const result = (await fn(...args)).map((row) => row.map(hostValue));
    return asMatrix ? result : result[0][0];
  }
  function compute(sheetName, r, c) {
    const cells = fake.sheets[sheetName];
    const key = colName(c) + r;
    const formula = cells[key].formula;
    let tree;
    try {
      tree = parseFormula(formula);
    } catch {
      return; // not a formula the fake can compute: it keeps the value it was given
    }
    fake.pending.push((async () => {
      await fake.metadataLoaded;
      if (!fake.metadata) return;
      let result;
      try {
        result = await evaluateTree(sheetName, tree, true);
      } catch {
        return;
      }
      if (!cells[key] || cells[key].formula !== formula) return; // overwritten meanwhile
      // the anchor holds the formula; a larger result spills into the empty cells beside it
      result.forEach((row, dr) => row.forEach((v, dc) => {
        const k = colName(c + dc) + (r + dr);
        if (dr === 0 && dc === 0) cells[k].value = v;
        else if (!cells[k] || cells[k].spilledFrom === key) cells[k] = { value: v, spilledFrom: key };
      }));
    })());
  }

  function worksheet(name) {
    return {
      name,
      charts: {
        // Excel makes series from the source range itself; here one per column stands in for that guess
        add(type, sourceData, seriesBy) {
          const record = { sheet: name, type, source: sourceData.address, seriesBy, title: "", xTitle: "", yTitle: "", position: null, series: [] };
          for (let c = 0; c < sourceData.columnCount; c++) record.series.push({ name: "Series" + (c + 1), values: sourceData.address, xValues: null });
          fake.charts.push(record);
          return chartObject(record);
        },
      },
      load() { return this; },
      getRange(address) { return rangeOf(name, address); },
      getUsedRangeOrNullObject() {
        const keys = Object.keys(fake.sheets[name] || {});
        if (!keys.length) return { isNullObject: true, load() { return this; } };
        const area = { r0: Infinity, c0: Infinity, r1: 0, c1: 0 };
        for (const k of keys) {
          const p = parse(k);
          area.r0 = Math.min(area.r0, p.r0); area.c0 = Math.min(area.c0, p.c0);
          area.r1 = Math.max(area.r1, p.r0); area.c1 = Math.max(area.c1, p.c0);
        }
        return makeRange(name, area);
      },
      protection: { get protected() { return fake.protectedSheets.includes(name); }, load() { return this; } },
      notes: {
        add(address, text) { fake.notes.push({ address, text }); },
        getItemOrNullObject(address) {
          const note = fake.notes.find((n) => sameCell(n.address, address, name));
          return {
            isNullObject: !note,
            content: note ? note.text : undefined,
            load() { return this; },
            delete() { if (note) fake.notes.splice(fake.notes.indexOf(note), 1); },
          };
        },
      },
      // the sheet's comments: all of them, or a page ($top, $skip: CollectionLoadOptions, @types/office-js);
      // each load records how many comments it read in __fake.commentReads
      comments: sheetComments(name),
    };
  }
  // a sheet's comment collection (only the members Excel.CommentCollection declares; the page loaded is kept aside)
  function sheetComments(name) {
    let page = null;
    const onSheet = () => fake.comments.filter((c) => (parse(c.address).sheet || name) === name);
    const listed = () => {
      const all = onSheet();
      return page ? all.slice(page.skip, page.top === undefined ? undefined : page.skip + page.top) : all;
    };
    return {
      load(options) {
        page = options && typeof options === "object" ? { top: options.$top, skip: options.$skip || 0 } : null;
        fake.commentReads.push(listed().length);
        return this;
      },
      getCount() { return { value: onSheet().length }; },
      get items() {
        return listed().map((c) => ({
          content: c.text,
          getLocation() { return { address: c.address, load() { return this; } }; },
          delete() { fake.comments.splice(fake.comments.indexOf(c), 1); },
        }));
      },
    };
  }
  // two addresses name the same cell (the second relative to `sheet` when it names none)
  function sameCell(a, b, sheet) {
    const p = parse(a), q = parse(b);
    return (p.sheet || sheet) === (q.sheet || sheet) && p.r0 === q.r0 && p.c0 === q.c0;
  }
  const minor = (version) => Number(String(version).split(".")[1] || 0);
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
      names: {
        getItem(name) {
          if (fake.names[name] === undefined) throw Object.assign(new Error("no name " + name), { code: "ItemNotFound" });
          return { name, getRange() { return rangeOf(selectedSheet(), name); } };
        },
      },
      application: {
        calculate(type) {
          if (init.calculateFails) throw Object.assign(new Error("The request could not be completed (simulated)."), { code: "GeneralException" });
          fake.calculations.push(type);
          for (const [name, cells] of Object.entries(fake.sheets)) {
            for (const k of Object.keys(cells)) {
              if (cells[k].formula === undefined) continue;
              const p = parse(k);
              compute(name, p.r0, p.c0);
            }
          }
        },
      },
      comments: { add(address, text) { fake.comments.push({ address, text }); } },
    };
    // init.syncDelayMs stands for a real host's round trip (a long scan then takes a while)
    const sync = () => (init.syncDelayMs ? new Promise((r) => setTimeout(r, init.syncDelayMs)) : Promise.resolve());
    return { workbook, sync };
  }

  window.Office = {
    HostType: { Excel: "Excel" },
    EventType: { DocumentSelectionChanged: "documentSelectionChanged" },
    AsyncResultStatus: { Succeeded: "succeeded", Failed: "failed" },
    onReady: () => Promise.resolve({ host: "Excel", platform: "OfficeOnline" }),
    context: {
      officeTheme: init.theme,
      // versions compare by their minor number ("1.7" < "1.18"); init.excelApi is the host's, as text
      requirements: { isSetSupported: (name, version) => name === "ExcelApi" && minor(version) <= minor(init.excelApi || "1.18") },
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
    // Excel.run(batch) or Excel.run(options, batch); a merged undo group fails where init.undoNotSupported says so
    run: async (options, callback) => {
      if (typeof options === "function") { callback = options; options = undefined; }
      fake.runs.push(options || null);
      if (options && options.mergeUndoGroup && init.undoNotSupported) {
        throw Object.assign(new Error("This operation cannot be undone."), { code: "UndoNotSupported" });
      }
      return callback(context());
    },
  };
  window.CustomFunctions = {
    // the bundle registers each function here, as with the real runtime; the fake computes ZC formulas with them
    associate(id, fn) { fake.functions[String(id).toUpperCase()] = fn; },
    Error: class { constructor(code, message) { this.code = code; this.message = message; } },
    ErrorCode: { invalidValue: "#VALUE!", notAvailable: "#N/A", invalidNumber: "#NUM!" },
  };
})();
