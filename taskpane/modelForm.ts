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
  type NamedModels,
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

/** The form's groups, in our order: expansion, dark energy, radiation and neutrinos, then baryons. */
export const formGroups: readonly { legend: string; fields: readonly FormField[] }[] = [
  { legend: "Expansion", fields: ["H0", "Om", "OL"] },
  { legend: "Dark energy", fields: ["w0", "wa"] },
  { legend: "Radiation and neutrinos", fields: ["Tcmb", "Neff", "mnu"] },
  { legend: "Baryons", fields: ["Ob"] },
];

const noNamed: NamedModels = { find: () => undefined, names: [] };
/** The workbook model a spec starts from, if any (its first part names one). */
function namedHead(spec: string, named: NamedModels): string | undefined {
  const head = spec.split(";", 1)[0].trim().toUpperCase();
  return named.find(head) ? head : undefined;
}

const show = (x: number | undefined) => (x === undefined || Number.isNaN(x) ? "" : String(x));

/**
 * The form showing a spec (as parsed; OL "flat" when the model is flat by construction).
 * @param named the workbook's own models: a spec starting from one shows that name as its base
 */
export function formFromSpec(spec: string, named: NamedModels = noNamed): FormValues {
  const p = parseModelSpec(spec, named);
  const m = new Cosmology(p);
  return {
    preset: namedHead(spec, named) ?? p.preset ?? "",
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
 * Why a stored model cannot be used, or undefined when it can: its spec may parse and still fail to
 * build (H0=1e999 overflows to infinity), as the functions would find on their first cell.
 * @param spec the stored spec text, e.g. "P18-BAO; H0=1e999"
 * @param named the workbook's own models
 */
export function unusableReason(spec: string, named: NamedModels = noNamed): string | undefined {
  try {
    new Cosmology(parseModelSpec(spec, named));
    return undefined;
  } catch (e) {
    return (e as Error).message;
  }
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

/**
 * Reads the form: builds the spec text (relative to the chosen preset) and the model. A workbook
 * model left unchanged is written by its name, so that the workbook follows the name.
 * @param named the workbook's own models
 */
export function modelFromForm(v: FormValues, named: NamedModels = noNamed): FormResult {
  const errors: FormResult["errors"] = {};
  const base = v.preset ? (findPreset(v.preset)?.name ?? (named.find(v.preset) ? v.preset.toUpperCase() : undefined)) : undefined;
  const pairs: string[] = [];
  for (const field of formFields) {
    const text = v[field].trim();
    if (text === "" || (field === "OL" && text.toLowerCase() === "flat")) continue;
    pairs.push(`${field}=${text}`);
  }
  let p: ModelParameters;
  try {
    p = parseModelSpec([...(base ? [base] : []), ...pairs].join("; "), named);
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
    const spec = formatModelSpec(p);
    const namedBase = base && named.find(base);
    return { spec: namedBase && formatModelSpec(namedBase) === spec ? base : spec, model, errors };
  } catch (e) {
    const message = (e as Error).message;
    const field = formFields.find((f) => message.startsWith(`${f} `));
    errors[field ?? "model"] = message;
    return { errors };
  }
}

const fmt = (x: number, digits = 5) => (Number.isFinite(x) ? Number(x.toPrecision(digits)).toString() : Number.isNaN(x) ? "not finite numerically" : "∞");

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

/**
 * The entries of the form that differ from the model the workbook uses (both as the form shows them):
 * "preset" and the parameter fields, in the form's order; empty when the form shows that model.
 * @param form the form as it stands
 * @param applied the workbook's model, as the form would show it
 */
export function changedFields(form: FormValues, applied: FormValues): (keyof FormValues)[] {
  const keys: (keyof FormValues)[] = ["preset", ...formFields];
  return keys.filter((k) => form[k].trim() !== applied[k].trim());
}
