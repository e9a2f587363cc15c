/**
 * The "Workbook cosmology" panel: the stored model in a form (a preset and its parameters, in our
 * groups), the core's messages inline, live derived values, the spec text to copy, and Apply, which
 * stores the model in the workbook and recalculates. Below it the workbook's own models: save the
 * form under a name, list them, delete one (with a warning when cells still name it).
 */
import { presets } from "../core/index.js";
import { defaultModelSpec, readActiveModel } from "../functions/activeModel.js";
import { modelNameProblem, noWorkbookModels, type WorkbookModels } from "../functions/workbookModels.js";
import { $, el, plural } from "./dom.js";
import { readModelSetting, recalculateWorkbook, writeModelSetting, writeWorkbookModels, type Recalculation } from "./excelHost.js";
import { countCellsNaming, gapSentence } from "./workbookScan.js";
import { changedFields, derivedValues, formFields, formFromSpec, formGroups, modelFromForm, shownText, unusableReason, type FormValues } from "./modelForm.js";

const fieldLabels: Record<(typeof formFields)[number], string> = {
  H0: "H0 (km/s/Mpc)", Om: "Om (matter incl. ν)", OL: "OL (or “flat”)", w0: "w0", wa: "wa",
  Tcmb: "Tcmb (K; 0 = no radiation)", Neff: "Neff", mnu: "mnu (eV, or list)", Ob: "Ob (optional; used by SOUND_HORIZON only)",
};

let currentSpec: string | undefined;

/** The form's values: a field still showing the rounded text it was filled with stands for its exact value. */
function readForm(): FormValues {
  const v = { preset: $<HTMLSelectElement>("preset").value } as FormValues;
  for (const f of formFields) {
    const input = $<HTMLInputElement>(`f-${f}`);
    v[f] = input.value === input.dataset.shown ? (input.dataset.exact ?? input.value) : input.value;
  }
  return v;
}

/** The choice of "Start from" the form shows (a choice that cannot be shown is undone to it). */
let shownPreset = "";

/** Shows a model in the form: each number as a person would type it, the exact value kept behind. */
function fillForm(v: FormValues): void {
  $<HTMLSelectElement>("preset").value = shownPreset = v.preset;
  for (const f of formFields) {
    const input = $<HTMLInputElement>(`f-${f}`);
    input.value = input.dataset.shown = shownText(v[f]);
    input.dataset.exact = v[f];
  }
  refreshForm();
}

/** The workbook's own models, as last read from the settings. */
let workbookModels: WorkbookModels = noWorkbookModels;

function refreshForm(): void {
  const result = modelFromForm(readForm(), workbookModels.named);
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
  describeChoice();
  ($("apply") as HTMLElement & { disabled: boolean }).disabled = !result.spec;
  showNotApplied();
}

/** The chosen preset's description and source (or a workbook model's spec) in full, under the short name in the list. */
function describeChoice(): void {
  const name = $<HTMLSelectElement>("preset").value;
  const builtIn = presets.find((p) => p.name === name);
  $("preset-description").textContent = builtIn ? builtIn.description : name ? `defined in this workbook: ${workbookModels.specs.get(name) ?? ""}` : "";
}

/** The model the workbook uses (as stored, or the default), for the "not applied" mark. */
let appliedSpec = defaultModelSpec;

/** Marks a form that differs from the workbook's model, naming what differs; clears the mark otherwise. */
function showNotApplied(): void {
  const mark = $("not-applied");
  let applied: FormValues | undefined;
  try {
    applied = formFromSpec(appliedSpec, workbookModels.named);
  } catch {
    applied = undefined;
  }
  const changed = applied ? changedFields(readForm(), applied) : ["preset" as const];
  mark.hidden = changed.length === 0;
  const names = changed.map((k) => (k === "preset" ? "Start from" : k));
  mark.textContent = changed.length === 0 ? "" : `Not applied — the workbook still uses ${appliedSpec}. Changed here: ${names.join(", ")}.`;
}

/** Builds the form, shows the stored model (or the fallback with its warning) and wires Apply. */
export function setupCosmology(): void {
  const preset = $<HTMLSelectElement>("preset");
  const fields = $("fields");
  for (const group of formGroups) {
    const box = el("fieldset", undefined, "group grid");
    box.append(el("legend", group.legend));
    for (const f of group.fields) {
      const field = el("div", undefined, "field");
      const label = el("label", fieldLabels[f]) as HTMLLabelElement;
      label.htmlFor = `f-${f}`;
      const input = document.createElement("input");
      input.id = `f-${f}`;
      input.setAttribute("aria-describedby", `e-${f}`);
      input.addEventListener("input", refreshForm);
      const err = el("p", "", "field-error");
      err.id = `e-${f}`;
      err.hidden = true;
      field.append(label, input, err);
      box.append(field);
    }
    fields.append(box);
  }
  preset.addEventListener("change", () => {
    if (preset.value) {
      // a stored model that cannot be built is not selectable; should it be chosen all the same, the
      // form keeps the model it shows (Apply applies only what the form shows) and says why
      let form: FormValues;
      try {
        form = formFromSpec(preset.value, workbookModels.named);
      } catch (e) {
        const refusedChoice = preset.value;
        preset.value = shownPreset;
        const modelError = $("model-error");
        modelError.textContent = `${refusedChoice} cannot be used: ${(e as Error).message}. The form still shows ${shownPreset || "its parameters"}.`;
        modelError.hidden = false;
        return;
      }
      fillForm(form);
    } else {
      shownPreset = "";
      refreshForm();
    }
    describeChoice();
  });

  // The settings were written by whoever last saved the workbook: whatever they hold, the form
  // starts, says what is wrong, and keeps every control working so a valid model can be applied.
  const setting = readActiveModel();
  const stored = readModelSetting();
  workbookModels = setting.models ?? noWorkbookModels;
  const warnings = [...(setting.warning ? [`${setting.warning}. Nothing has been overwritten; apply a model to store one.`] : []), ...workbookModels.problems];
  showModelChoices();
  try {
    fillForm(formFromSpec(setting.spec, workbookModels.named));
    showBadge(setting.spec);
  } catch (e) {
    fillForm(formFromSpec(defaultModelSpec));
    showBadge(defaultModelSpec);
    warnings.push(`The stored model cannot be shown (${(e as Error).message}); the form shows ${defaultModelSpec}.`);
  }
  if (warnings.length) {
    const w = $("settings-warning");
    w.textContent = warnings.join(" ");
    w.hidden = false;
  } else if (stored === undefined) {
    $("apply-status").textContent = `This workbook stores no cosmology yet: formulas use ${defaultModelSpec}.`;
  }

  setupWorkbookModels();

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
    } catch (e) {
      status.textContent = `Not applied: ${(e as Error).message}`;
      return;
    }
    $("settings-warning").hidden = true;
    showBadge(spec);
    try {
      status.textContent = `Applied ${spec}; ${recalculated(await recalculateWorkbook())}`;
    } catch (e) {
      // the model is stored; only the request to recalculate failed: say exactly that
      status.textContent = `Applied ${spec}: it is stored in the workbook, but Excel did not recalculate (${(e as Error).message}). Cells show values of the previous model until the workbook recalculates.`;
    }
  });
}

/** The preset list (built in, then this workbook's models) and the list of this workbook's models. */
function showModelChoices(): void {
  const preset = $<HTMLSelectElement>("preset");
  const chosen = preset.value;
  preset.replaceChildren(new Option("(no preset: parameters only)", ""));
  const builtIn = document.createElement("optgroup");
  builtIn.label = "Built in";
  for (const p of presets) builtIn.append(new Option(p.name, p.name));
  preset.append(builtIn);
  const list = $("workbook-models");
  list.replaceChildren();
  if (workbookModels.specs.size) {
    const own = document.createElement("optgroup");
    own.label = "Defined in this workbook";
    for (const [name, spec] of workbookModels.specs) {
      // each model is built before it is offered: one that cannot be built is listed with the reason, not selectable
      const unusable = unusableReason(spec);
      const option = new Option(unusable ? `${name} (cannot be used)` : name, name);
      option.disabled = unusable !== undefined;
      own.append(option);
      const item = el("li");
      const remove = el("fluent-button", "Delete");
      remove.append(el("span", ` ${name}`, "visually-hidden")); // its accessible name says which model
      remove.addEventListener("click", () => void askToDelete(name));
      item.append(el("span", unusable ? `${name}: ${spec} — cannot be used: ${unusable}` : `${name}: ${spec}`), remove);
      list.append(item);
    }
    preset.append(own);
  } else {
    list.append(el("li", "None yet."));
  }
  preset.value = chosen;
}

/**
 * "4 formulas recalculated." as the status says it; where the count could not read every cell (a
 * sheet beyond the scan's cell limit), that every formula was recalculated, the count so far and
 * where it did not look.
 */
function recalculated({ count, gaps }: Recalculation): string {
  if (count === undefined) return "the workbook recalculated.";
  if (!gaps.length) return `${plural(count, "formula")} recalculated.`;
  return `the workbook recalculated (${plural(count, "ZC formula")} counted).${gapSentence(gaps)}`;
}

/** Stores a new set of workbook models, re-reads them as the functions will, and recalculates. */
async function storeWorkbookModels(specs: Map<string, string>): Promise<Recalculation> {
  await writeWorkbookModels(specs);
  workbookModels = readActiveModel().models ?? noWorkbookModels;
  showModelChoices();
  return recalculateWorkbook();
}

function setupWorkbookModels(): void {
  const status = $("model-name-status");
  $("save-model").addEventListener("click", async () => {
    const name = $<HTMLInputElement>("model-name").value.trim();
    const problem = modelNameProblem(name);
    const spec = currentSpec;
    if (problem || !spec) {
      status.textContent = problem ?? "The form does not hold a valid model yet.";
      return;
    }
    const upper = name.toUpperCase();
    // stored as the canonical spec on the built-in presets alone, never on another workbook model
    const resolved = modelFromForm(readForm(), workbookModels.named).model!.spec;
    const specs = new Map(workbookModels.specs);
    const replaced = specs.has(upper);
    specs.set(upper, resolved);
    try {
      const done = await storeWorkbookModels(specs);
      status.textContent = `${replaced ? "Updated" : "Saved"} ${upper} = ${resolved} in this workbook; ${recalculated(done)} Use it as "${upper}" in any model argument.`;
    } catch (e) {
      status.textContent = `Not saved: ${(e as Error).message}`;
    }
  });

  let deleting: string | undefined;
  askToDelete = async (name: string) => {
    status.textContent = "";
    const used = await countCellsNaming(name);
    if (used === 0) return deleteModel(name);
    deleting = name;
    $("delete-confirm-text").textContent = `${plural(used, "cell")} in this workbook ${used === 1 ? "names" : "name"} ${name}: after deleting it ${used === 1 ? "that formula" : "those formulas"} will show #VALUE!. Delete ${name} anyway?`;
    $("delete-confirm").hidden = false;
    $("delete-go").focus();
  };
  const deleteModel = async (name: string) => {
    const specs = new Map(workbookModels.specs);
    specs.delete(name);
    try {
      status.textContent = `Deleted ${name}; ${recalculated(await storeWorkbookModels(specs))}`;
    } catch (e) {
      status.textContent = `Not deleted: ${(e as Error).message}`;
    }
  };
  $("delete-go").addEventListener("click", async () => {
    $("delete-confirm").hidden = true;
    if (deleting) await deleteModel(deleting);
    deleting = undefined;
  });
  $("delete-cancel").addEventListener("click", () => {
    deleting = undefined;
    $("delete-confirm").hidden = true;
    status.textContent = "Nothing deleted.";
  });
}

let askToDelete: (name: string) => Promise<void> = async () => undefined;

/** The header badge naming the workbook's model (and the "not applied" mark measured against it). */
export function showBadge(spec: string): void {
  $("model-badge").textContent = `Workbook model: ${spec}`;
  appliedSpec = spec;
  showNotApplied();
}

