/**
 * Task pane entry point (shared runtime: this page also runs functions.js). Wires the four panels —
 * workbook cosmology, this cell, what-if tables, freeze — to the host through excelHost.ts.
 * Outside Office the page says so and lists the worksheet functions.
 */
import "@fluentui/web-components/button.js";
import { setTheme } from "@fluentui/web-components";
import { webDarkTheme, webLightTheme } from "@fluentui/tokens";
import { parseModelSpec, presets } from "../core/index.js";
import { defaultModelSpec, readActiveModel } from "../functions/activeModel.js";
import { zcellVersion } from "../functions/describeModel.js";
import { callsZcFunction } from "../functions/storedFormula.js";
import {
  freezeCells,
  onSelectionChanged,
  readActiveCell,
  readModelSetting,
  readReference,
  readSelection,
  recalculateWorkbook,
  splitAddress,
  writeBlock,
  writeModelSetting,
} from "./excelHost.js";
import { explainFormula, type CallExplanation } from "./explainCall.js";
import { derivedValues, formFields, formFromSpec, modelFromForm, type FormValues } from "./modelForm.js";
import { provenanceNote } from "./provenanceNote.js";
import { applyOfficeTheme } from "./theme.js";
import { columnName, columnNumber, planTableForColumn, planTableWithRedshifts, redshiftSteps, tableQuantities, type TablePlan } from "./whatIfTable.js";

declare const __ZC_FUNCTIONS__: { name: string; description: string }[];

const $ = <T extends HTMLElement = HTMLElement>(id: string) => document.getElementById(id) as T;
const el = (tag: string, text?: string, cls?: string) => {
  const e = document.createElement(tag);
  if (text !== undefined) e.textContent = text;
  if (cls) e.className = cls;
  return e;
};

const fieldLabels: Record<(typeof formFields)[number], string> = {
  H0: "H0 (km/s/Mpc)", Om: "Om (matter incl. ν)", OL: "OL (or “flat”)", w0: "w0", wa: "wa",
  Tcmb: "Tcmb (K; 0 = no radiation)", Neff: "Neff", mnu: "mnu (eV, or list)", Ob: "Ob (optional)",
};

// ---------------------------------------------------------------- tabs
function setupTabs(): void {
  const tabs = [...document.querySelectorAll<HTMLButtonElement>('[role="tab"]')];
  const select = (tab: HTMLButtonElement) => {
    for (const t of tabs) {
      const on = t === tab;
      t.setAttribute("aria-selected", String(on));
      t.tabIndex = on ? 0 : -1;
      $(t.getAttribute("aria-controls")!).hidden = !on;
    }
    tab.focus();
    if (tab.id === "tab-cell") void explainActiveCell();
  };
  tabs.forEach((tab, i) => {
    tab.addEventListener("click", () => select(tab));
    tab.addEventListener("keydown", (e) => {
      const step = e.key === "ArrowRight" ? 1 : e.key === "ArrowLeft" ? -1 : 0;
      if (step) select(tabs[(i + step + tabs.length) % tabs.length]);
    });
  });
}

// ---------------------------------------------------------------- workbook cosmology
let currentSpec: string | undefined;

function readForm(): FormValues {
  const v = { preset: $<HTMLSelectElement>("preset").value } as FormValues;
  for (const f of formFields) v[f] = $<HTMLInputElement>(`f-${f}`).value;
  return v;
}

function fillForm(v: FormValues): void {
  $<HTMLSelectElement>("preset").value = v.preset;
  for (const f of formFields) $<HTMLInputElement>(`f-${f}`).value = v[f];
  refreshForm();
}

function refreshForm(): void {
  const result = modelFromForm(readForm());
  for (const f of formFields) {
    const input = $<HTMLInputElement>(`f-${f}`);
    const message = result.errors[f];
    input.setAttribute("aria-invalid", String(Boolean(message)));
    const err = $(`e-${f}`);
    err.textContent = message ?? "";
    err.hidden = !message;
  }
  const modelError = $("model-error");
  modelError.textContent = result.errors.model ?? "";
  modelError.hidden = !result.errors.model;
  const derived = $("derived");
  derived.replaceChildren();
  if (result.model) {
    for (const d of derivedValues(result.model)) derived.append(el("dt", d.label), el("dd", d.value));
  }
  currentSpec = result.spec;
  $<HTMLInputElement>("spec").value = result.spec ?? "";
  ($("apply") as HTMLElement & { disabled: boolean }).disabled = !result.spec;
}

function setupCosmology(): void {
  const preset = $<HTMLSelectElement>("preset");
  preset.append(new Option("(no preset: parameters only)", ""));
  for (const p of presets) preset.append(new Option(`${p.name} — ${p.description}`, p.name));
  const fields = $("fields");
  for (const f of formFields) {
    const box = el("div", undefined, "field");
    const label = el("label", fieldLabels[f]) as HTMLLabelElement;
    label.htmlFor = `f-${f}`;
    const input = document.createElement("input");
    input.id = `f-${f}`;
    input.setAttribute("aria-describedby", `e-${f}`);
    input.addEventListener("input", refreshForm);
    const err = el("p", "", "field-error");
    err.id = `e-${f}`;
    err.hidden = true;
    box.append(label, input, err);
    fields.append(box);
  }
  preset.addEventListener("change", () => {
    if (preset.value) fillForm(formFromSpec(preset.value));
    else refreshForm();
  });

  const setting = readActiveModel();
  const stored = readModelSetting();
  fillForm(formFromSpec(setting.spec));
  showBadge(setting.spec);
  if (setting.warning) {
    const w = $("settings-warning");
    w.textContent = `${setting.warning}. Nothing has been overwritten; apply a model to store one.`;
    w.hidden = false;
  } else if (stored === undefined) {
    $("apply-status").textContent = `This workbook stores no cosmology yet: formulas use ${defaultModelSpec}.`;
  }

  $("copy-spec").addEventListener("click", async () => {
    const spec = $<HTMLInputElement>("spec");
    try {
      await navigator.clipboard.writeText(spec.value);
    } catch {
      spec.select();
      document.execCommand("copy");
    }
    $("apply-status").textContent = `Copied: ${spec.value}`;
  });

  $("apply").addEventListener("click", async () => {
    const spec = currentSpec;
    if (!spec) return;
    const status = $("apply-status");
    status.textContent = "Applying…";
    try {
      await writeModelSetting(spec);
      $("settings-warning").hidden = true;
      showBadge(spec);
      const count = await recalculateWorkbook();
      status.textContent = `Applied ${spec}; ${count} formula${count === 1 ? "" : "s"} recalculated.`;
    } catch (e) {
      status.textContent = `Not applied: ${(e as Error).message}`;
    }
  });
}

function showBadge(spec: string): void {
  $("model-badge").textContent = `Workbook model: ${spec}`;
}

// ---------------------------------------------------------------- this cell
async function explainActiveCell(): Promise<void> {
  if ($("panel-cell").hidden) return;
  const out = $("cell-explanation");
  try {
    const cell = await readActiveCell();
    const formula = cell.formulas[0]?.[0];
    const sheet = splitAddress(cell.address).sheet ?? "";
    $("cell-address").textContent = cell.spillAnchor
      ? `${cell.address}: part of a spilled range; explaining its anchor ${cell.spillAnchor}.`
      : cell.address;
    if (!callsZcFunction(formula)) {
      out.replaceChildren(el("p", "This cell has no ZC formula."));
      return;
    }
    const read = async (ref: string) => (await readReference(ref, sheet)).values;
    const calls = await explainFormula(String(formula), read, readActiveModel(), cell.values[0]?.[0]);
    out.replaceChildren(el("p", "Formula:"), el("code", String(formula)), ...calls.map(renderCall));
  } catch (e) {
    out.replaceChildren(el("p", `Could not read the cell: ${(e as Error).message}`, "error"));
  }
}

function renderCall(c: CallExplanation): HTMLElement {
  const box = el("article", undefined, "call");
  box.append(el("h3", `${c.name}: ${c.summary}`));
  const dl = document.createElement("dl");
  const add = (term: string, value: string, cls?: string) => dl.append(el("dt", term), el("dd", value, cls));
  add("Computes", c.equation);
  for (const a of c.args) add(a.name, `${a.text} → ${a.value}${a.unit ? ` [${a.unit}]` : ""}`);
  if (c.model) add("Model", `${c.model.spec} (${c.model.source}): ${c.model.description}`);
  if (c.conventions.length) add("Conventions", c.conventions.join(" "));
  add("Method", c.method);
  add(c.isError ? "Why the error" : "Result", c.result, c.isError ? "result-error" : undefined);
  box.append(dl);
  return box;
}

// ---------------------------------------------------------------- tables
let pendingTable: TablePlan | undefined;

function blockAddress(plan: TablePlan, sheet: string | undefined): string {
  const m = /^([A-Z]+)(\d+)$/.exec(plan.anchor)!;
  const lastCol = columnName(columnNumber(m[1]) + plan.cells[0].length - 1);
  const lastRow = Number(m[2]) + plan.cells.length - 1;
  const local = `${plan.anchor}:${lastCol}${lastRow}`;
  return sheet ? `'${sheet.replaceAll("'", "''")}'!${local}` : local;
}

async function planTable(): Promise<{ plan: TablePlan; sheet?: string }> {
  const quantity = $<HTMLSelectElement>("table-quantity").value;
  const models = $<HTMLTextAreaElement>("table-models").value.split("\n").map((s) => s.trim()).filter(Boolean);
  for (const spec of models) parseModelSpec(spec); // a bad model is reported before anything is written
  const selection = await readSelection();
  const { sheet, address } = splitAddress(selection.address);
  const m = /^\$?([A-Z]+)\$?(\d+)/.exec(address)!;
  const col = columnNumber(m[1]);
  const row = Number(m[2]);
  if ($<HTMLInputElement>("source-selection").checked) {
    if (selection.columnCount !== 1) throw new RangeError("select one column of redshifts");
    return { plan: planTableForColumn(quantity, { row, col, rows: selection.rowCount }, models), sheet };
  }
  const num = (id: string) => Number($<HTMLInputElement>(id).value);
  const zs = redshiftSteps(num("table-start"), num("table-stop"), num("table-step"));
  return { plan: planTableWithRedshifts(quantity, zs, models, row, col), sheet };
}

function setupTables(): void {
  const q = $<HTMLSelectElement>("table-quantity");
  for (const [name, label] of Object.entries(tableQuantities)) q.append(new Option(`${label} — ZC.${name}`, name));
  const status = $("table-status");
  let sheetOfPending: string | undefined;
  const write = async (plan: TablePlan, sheet?: string) => {
    await writeBlock(blockAddress(plan, sheet), plan.cells);
    $("table-confirm").hidden = true;
    status.textContent = `Inserted a ${plan.cells.length}-row table with one live formula at ${plan.anchor}.`;
  };
  $("insert-table").addEventListener("click", async () => {
    status.textContent = "";
    try {
      const { plan, sheet } = await planTable();
      const area = sheet ? `'${sheet.replaceAll("'", "''")}'!${plan.area}` : plan.area;
      const existing = await readReference(area, sheet ?? "");
      const occupied = existing.formulas.flat().filter((v) => v !== "" && v !== null).length;
      if (occupied > 0) {
        pendingTable = plan;
        sheetOfPending = sheet;
        $("table-confirm-text").textContent = `${occupied} cell${occupied === 1 ? "" : "s"} in ${plan.area} are not empty. Overwrite them?`;
        $("table-confirm").hidden = false;
        $("table-overwrite").focus();
        return;
      }
      await write(plan, sheet);
    } catch (e) {
      status.textContent = `Not inserted: ${(e as Error).message}`;
    }
  });
  $("table-overwrite").addEventListener("click", async () => {
    if (pendingTable) await write(pendingTable, sheetOfPending);
    pendingTable = undefined;
  });
  $("table-cancel").addEventListener("click", () => {
    pendingTable = undefined;
    $("table-confirm").hidden = true;
    status.textContent = "Nothing written.";
  });
}

// ---------------------------------------------------------------- freeze
function setupFreeze(): void {
  const status = $("freeze-status");
  let pending: { sheet: string; cells: { address: string; value: unknown; note: string }[] } | undefined;
  $("freeze").addEventListener("click", async () => {
    status.textContent = "";
    try {
      const selection = await readSelection();
      const { sheet = "", address } = splitAddress(selection.address);
      const m = /^\$?([A-Z]+)\$?(\d+)/.exec(address)!;
      const col0 = columnNumber(m[1]);
      const row0 = Number(m[2]);
      const active = readActiveModel();
      const read = async (ref: string) => (await readReference(ref, sheet)).values;
      const cells: { address: string; value: unknown; note: string }[] = [];
      const today = new Date().toISOString().slice(0, 10);
      for (let r = 0; r < selection.rowCount; r++) {
        for (let c = 0; c < selection.columnCount; c++) {
          const formula = selection.formulas[r][c];
          if (!callsZcFunction(formula)) continue;
          const calls = await explainFormula(String(formula), read, active);
          const models = calls.flatMap((x) => (x.model ? [x.model.spec] : []));
          cells.push({
            address: `${columnName(col0 + c)}${row0 + r}`,
            value: selection.values[r][c],
            note: provenanceNote(String(formula), models, zcellVersion, today),
          });
        }
      }
      if (cells.length === 0) {
        status.textContent = "The selection has no ZC formulas to freeze.";
        return;
      }
      pending = { sheet, cells };
      $("freeze-confirm-text").textContent = `Replace ${cells.length} ZC formula${cells.length === 1 ? "" : "s"} by ${cells.length === 1 ? "its value" : "their values"}, with a provenance note on each? Excel's Undo brings them back.`;
      $("freeze-confirm").hidden = false;
      $("freeze-go").focus();
    } catch (e) {
      status.textContent = `Not frozen: ${(e as Error).message}`;
    }
  });
  $("freeze-go").addEventListener("click", async () => {
    if (!pending) return;
    try {
      const kind = await freezeCells(pending.sheet, pending.cells);
      status.textContent = `Froze ${pending.cells.length} cell${pending.cells.length === 1 ? "" : "s"}; formula, model and version are in each cell's ${kind}.`;
    } catch (e) {
      status.textContent = `Not frozen: ${(e as Error).message}`;
    }
    pending = undefined;
    $("freeze-confirm").hidden = true;
  });
  $("freeze-cancel").addEventListener("click", () => {
    pending = undefined;
    $("freeze-confirm").hidden = true;
    status.textContent = "Nothing frozen.";
  });
}

// ---------------------------------------------------------------- outside Office
function showOutsideOffice(): void {
  $("outside-office").hidden = false;
  $("model-badge").textContent = "";
  const dl = $("reference");
  for (const f of __ZC_FUNCTIONS__) dl.append(el("dt", `ZC.${f.name}`), el("dd", f.description));
}

async function start(): Promise<void> {
  const office = (globalThis as { Office?: typeof Office }).Office;
  if (!office) return showOutsideOffice();
  const info = await office.onReady();
  if (info.host !== office.HostType.Excel) return showOutsideOffice();
  const dark = applyOfficeTheme(office.context.officeTheme);
  setTheme(dark ? webDarkTheme : webLightTheme);
  $("in-excel").hidden = false;
  setupTabs();
  setupCosmology();
  setupTables();
  setupFreeze();
  onSelectionChanged(() => void explainActiveCell());
}

void start();
