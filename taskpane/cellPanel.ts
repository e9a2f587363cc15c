/**
 * The "This cell" panel: the active cell's ZC formula explained call by call — equation, arguments
 * with units, model, conventions, method, and the result or the reason for an error.
 */
import { readActiveModel } from "../functions/activeModel.js";
import { callsZcFunction } from "../functions/storedFormula.js";
import { splitAddress } from "./cellAddress.js";
import { $, el } from "./dom.js";
import { readActiveCell, readReferenceBounded } from "./excelHost.js";
import { explainFormula, type CallExplanation } from "./explainCall.js";

/** Explains the active cell when the panel is showing (called on selection changes and tab switches). */
export async function explainActiveCell(): Promise<void> {
  if ($("panel-cell").hidden) return;
  const out = $("cell-explanation");
  try {
    const cell = await readActiveCell();
    const formula = cell.formulas[0]?.[0];
    const sheet = splitAddress(cell.address).sheet ?? "";
    const where = cell.place && `row ${cell.place.row + 1}, column ${cell.place.col + 1} of its formula's result`;
    $("cell-address").textContent = cell.spillAnchor
      ? `${cell.address}: part of a spilled result (${where}); its formula is in ${cell.spillAnchor}.`
      : cell.place
        ? cell.address
        : `${cell.address} (this version of Excel cannot say which cell of a spilled result this is)`;
    if (!callsZcFunction(formula)) {
      out.replaceChildren(el("p", "This cell has no ZC formula."));
      return;
    }
    // each reference's size is asked first: one larger than the inspector's limit is not read
    const read = (ref: string, maxCells: number) => readReferenceBounded(ref, sheet, maxCells);
    const calls = await explainFormula(String(formula), read, readActiveModel(), cell.values[0]?.[0], cell.place);
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
  // the model used ("Model used": the argument above is "model"), or each model of a function of two (RESCALE: "From model", "To model")
  for (const m of c.modelArgs ?? [{ label: "Model used", ...c }]) {
    if (m.model) add(m.label, `${m.model.spec} (${m.model.source}${m.model.where ? `: ${m.model.where}` : ""}): ${m.model.description}`);
    else if (m.modelNote) add(m.label, m.modelNote);
    if (m.models) add(c.modelArgs ? `${m.label}s in this formula` : "Models in this formula", m.models.map((x) => `"${x}"`).join(", "));
  }
  if (c.conventions.length) add("Conventions", c.conventions.join(" "));
  add("Method", c.methodPlain);
  if (c.methodPlain !== c.method) {
    const details = document.createElement("details");
    details.append(el("summary", "How exactly"), el("span", c.method));
    const dd = el("dd", undefined, "method-detail");
    dd.append(details);
    dl.append(el("dt", ""), dd);
  }
  add(c.isError ? "Why the error" : "Result", c.result, c.isError ? "result-error" : undefined);
  if (c.fault?.argument) add("Argument at fault", `${c.fault.argument}${c.fault.text ? `: ${c.fault.text} → ${c.fault.value}` : ""}`);
  if (c.fault) add("How to fix", c.fault.fix);
  if (c.exact) {
    // every digit, one click away and selectable for copying
    const details = document.createElement("details");
    details.append(el("summary", "Exact value"), el("code", c.exact, "exact-value"));
    dl.append(el("dt", ""), Object.assign(document.createElement("dd"), { className: "exact" }));
    (dl.lastElementChild as HTMLElement).append(details);
  }
  box.append(dl);
  return box;
}

