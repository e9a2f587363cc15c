/**
 * The "Workbook cosmology" panel: the stored model in a form (a preset and its parameters), the
 * core's messages inline, live derived values, the spec text to copy, and Apply, which stores the
 * model in the workbook and recalculates.
 */
import { presets } from "../core/index.js";
import { defaultModelSpec, readActiveModel } from "../functions/activeModel.js";
import { $, el, plural } from "./dom.js";
import { readModelSetting, recalculateWorkbook, writeModelSetting } from "./excelHost.js";
import { derivedValues, formFields, formFromSpec, modelFromForm, shownText, type FormValues } from "./modelForm.js";

const fieldLabels: Record<(typeof formFields)[number], string> = {
  H0: "H0 (km/s/Mpc)", Om: "Om (matter incl. ν)", OL: "OL (or “flat”)", w0: "w0", wa: "wa",
  Tcmb: "Tcmb (K; 0 = no radiation)", Neff: "Neff", mnu: "mnu (eV, or list)", Ob: "Ob (optional)",
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

/** Shows a model in the form: each number as a person would type it, the exact value kept behind. */
function fillForm(v: FormValues): void {
  $<HTMLSelectElement>("preset").value = v.preset;
  for (const f of formFields) {
    const input = $<HTMLInputElement>(`f-${f}`);
    input.value = input.dataset.shown = shownText(v[f]);
    input.dataset.exact = v[f];
  }
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

/** Builds the form, shows the stored model (or the fallback with its warning) and wires Apply. */
export function setupCosmology(): void {
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
      status.textContent = `Applied ${spec}; ${plural(count, "formula")} recalculated.`;
    } catch (e) {
      status.textContent = `Not applied: ${(e as Error).message}`;
    }
  });
}

/** The header badge naming the workbook's model. */
export function showBadge(spec: string): void {
  $("model-badge").textContent = `Workbook model: ${spec}`;
}

