/**
 * The "This cell" panel: the active cell's ZC formula explained call by call — equation, arguments
 * with units, model, conventions, method, and the result or the reason for an error.
 */
import { readActiveModel } from "../functions/activeModel.js";
import { callsZcFunction } from "../functions/storedFormula.js";
import { splitAddress } from "./cellAddress.js";
import { $, el } from "./dom.js";
import { readActiveCell, readReference } from "./excelHost.js";
import { explainFormula, type CallExplanation } from "./explainCall.js";

/** Explains the active cell when the panel is showing (called on selection changes and tab switches). */
export async function explainActiveCell(): Promise<void> {
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

