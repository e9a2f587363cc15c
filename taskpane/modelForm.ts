/**
 * The "Workbook cosmology" form as data: fields ↔ model spec text, validation with the core's own
 * words (the same messages the worksheet functions show), and the derived values shown live.
 */
import {
  Cosmology,
  findPreset,
  formatModelSpec,
  parseModelSpec,
  type ModelParameters,
} from "../core/index.js";

/** Form fields, as the text in each input. OL is a number or "flat". */
export interface FormValues {
  preset: string; // "" for none
  H0: string;
  Om: string;
  OL: string;
  w0: string;
  wa: string;
  Tcmb: string;
  Neff: string;
  mnu: string;
  Ob: string;
}

/** The editable numeric fields, in display order. */
export const formFields = ["H0", "Om", "OL", "w0", "wa", "Tcmb", "Neff", "mnu", "Ob"] as const;
export type FormField = (typeof formFields)[number];

const show = (x: number | undefined) => (x === undefined || Number.isNaN(x) ? "" : String(x));

/** The form showing a spec (as parsed; OL "flat" when the model is flat by construction). */
export function formFromSpec(spec: string): FormValues {
  const p = parseModelSpec(spec);
  const m = new Cosmology(p);
  return {
    preset: p.preset ?? "",
    H0: show(p.H0),
    Om: show(p.Om),
    OL: p.OL !== undefined ? show(p.OL) : p.Ok !== undefined ? show(m.OL) : "flat",
    w0: show(p.w0),
    wa: show(p.wa),
    Tcmb: show(p.Tcmb),
    Neff: show(p.Neff),
    mnu: p.mnu.length ? p.mnu.join(",") : "0",
    Ob: show(p.Ob),
  };
}

/**
 * A field's text as a person would type it: each number to at most 6 significant digits
 * ("0.048974681618696" → "0.0489747"), a list item by item, other text ("flat", "") as it is.
 */
export function shownText(exact: string): string {
  return exact
    .split(",")
    .map((part) => {
      const x = Number(part);
      return part.trim() !== "" && Number.isFinite(x) ? String(Number(x.toPrecision(6))) : part;
    })
    .join(",");
}

/** Result of reading the form: the model, or messages for the fields that are wrong. */
export interface FormResult {
  spec?: string;
  model?: Cosmology;
  /** Field name (or "model" for the model as a whole) → message in the core's words. */
  errors: Partial<Record<FormField | "model", string>>;
}

/** Reads the form: builds the spec text (relative to the chosen preset) and the model. */
export function modelFromForm(v: FormValues): FormResult {
  const errors: FormResult["errors"] = {};
  const preset = v.preset ? findPreset(v.preset) : undefined;
  const pairs: string[] = [];
  for (const field of formFields) {
    const text = v[field].trim();
    if (text === "" || (field === "OL" && text.toLowerCase() === "flat")) continue;
    pairs.push(`${field}=${text}`);
  }
  let p: ModelParameters;
  try {
    p = parseModelSpec([...(preset ? [preset.name] : []), ...pairs].join("; "));
    if (v.OL.trim().toLowerCase() === "flat") delete p.OL;
    if (v.Ob.trim() === "") delete p.Ob;
  } catch (e) {
    const message = (e as Error).message;
    const field = formFields.find((f) => message.startsWith(`${f}:`) || message.startsWith(`${f} `));
    errors[field ?? "model"] = message;
    return { errors };
  }
  try {
    const model = new Cosmology(p);
    return { spec: formatModelSpec(p), model, errors };
  } catch (e) {
    const message = (e as Error).message;
    const field = formFields.find((f) => message.startsWith(`${f} `) || message.startsWith(`${f} =`));
    errors[field ?? "model"] = message;
    return { errors };
  }
}

const fmt = (x: number, digits = 5) => (Number.isFinite(x) ? Number(x.toPrecision(digits)).toString() : "∞");

/** The derived values shown under the form. */
export function derivedValues(m: Cosmology): { label: string; value: string }[] {
  return [
    { label: "Ωk (curvature)", value: fmt(m.Ok) },
    { label: "Ωr (photons + massless ν)", value: m.Or === 0 ? "0 (no radiation)" : m.Or.toExponential(3) },
    { label: "Age today", value: `${fmt(m.ageTodayGyr)} Gyr` },
    { label: "Hubble time 1/H0", value: `${fmt(m.hubbleTimeGyr)} Gyr` },
    { label: "Hubble distance c/H0", value: `${fmt(m.hubbleDistanceMpc)} Mpc` },
    { label: "Matter–radiation equality z_eq", value: Number.isFinite(m.equalityRedshift) ? fmt(m.equalityRedshift) : "none (Tcmb = 0)" },
  ];
}
