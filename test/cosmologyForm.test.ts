/**
 * The "Workbook cosmology" form of the pane (taskpane/modelForm.ts): what each field shows for a
 * model, the spec the form writes back (a workbook model left unchanged by its name), the field a
 * message lands on, the derived values shown under the form and the entries marked as not applied.
 * Messages are the core's own (core/model/modelSpec.ts, core/model/ExpansionRate.ts), pinned here as
 * the interface the pane shows; numbers name their closed form.
 */
import { describe, expect, test } from "vitest";
import { Cosmology, parseModelSpec } from "../core/index.js";
import { readWorkbookModels } from "../functions/workbookModels.js";
import { changedFields, derivedValues, formFromSpec, modelFromForm, shownText, unusableReason, type FormValues } from "../taskpane/modelForm.js";

/** A workbook's own models (invented for these tests): one on a preset, one open, one of plain keys with Ob. */
const workbook = () =>
  readWorkbookModels({ mine: "P18-BAO; H0=70", open: "H0=70; Om=0.3; OL=0.6", plain: "H0=70; Om=0.3; Ob=0.05" }).named;

describe("the form shows a model's fields", () => {
  test("a spec of keys alone shows no base; a flat model shows OL as flat, one that gives OL or Ok shows its OL", () => {
    //  spec                            preset   OL       mnu
    const shown: [string, string, string, string][] = [
      ["H0=70; Om=0.3",                 "",      "flat",  "0"],
      ["H0=70; Om=0.3; OL=0.6",         "",      "0.6",   "0"],
      ["H0=70; Om=0.3; Ok=0.1",         "",      "0.6",   "0"],         // OL = 1 − Om − Ok (no radiation: Tcmb = 0)
      ["P18-BAO; mnu=0.05,0.01",        "P18-BAO", "flat", "0.05,0.01"], // a list of masses, heaviest first
      ["P18-BAO",                       "P18-BAO", "flat", "0.06"],
    ];
    for (const [spec, preset, OL, mnu] of shown) expect(formFromSpec(spec), spec).toMatchObject({ preset, OL, mnu });
  });

  test("a spec that starts from a workbook model shows that model's name, as the workbook names it, whatever the case and spaces typed", () => {
    const named = workbook();
    for (const spec of ["mine ; H0=73", " MINE;H0=73", "Mine; H0=73"]) {
      expect(formFromSpec(spec, named), spec).toMatchObject({ preset: "MINE", H0: "73", Om: "0.3111" });
    }
    expect(formFromSpec("plain", named)).toMatchObject({ preset: "PLAIN", Ob: "0.05", OL: "flat" });
    expect(formFromSpec("open", named)).toMatchObject({ preset: "OPEN", OL: "0.6" });
  });
});

describe("a field's text as a person would type it: at most 6 significant digits", () => {
  //  exact text                          shown
  const cases: [string, string][] = [
    ["0.04897468161869667",               "0.0489747"],
    ["67.66",                             "67.66"],
    ["1.23456789",                        "1.23457"],
    ["0.0123456789,0.001",                "0.0123457,0.001"],   // a list item by item
    ["0.05,0.01",                         "0.05,0.01"],
    ["flat",                              "flat"],               // text that is not a number stays
    ["",                                  ""],
    [" ",                                 " "],                  // a blank stays blank, not 0
    ["0.05,",                             "0.05,"],
  ];
  test.each(cases)("%j is shown as %j", (exact, shown) => {
    expect(shownText(exact)).toBe(shown);
  });
});

describe("a stored model that cannot be used says why, in the core's words", () => {
  test("a model that builds has no reason; one that does not gives the message the functions give", () => {
    const named = workbook();
    //  stored spec                          named?   reason
    const cases: [string, boolean, string | undefined][] = [
      ["P18-BAO",                            false,   undefined],
      ["mine; H0=73",                        true,    undefined],
      ["H0=5; Om=0.3",                       false,   "H0 = 5 km/s/Mpc is outside 10 … 1000 km/s/Mpc (H0 is in km/s/Mpc: h = 5 is H0=500)"],
      ["P18-BAO; H0=1e999",                  false,   'H0: "1e999" is too large a number'],
      // E² = OL + Ok (1+z)² = 2 − (1+z)² is 0 at z = √2 − 1 = 0.4142 (closed form)
      ["H0=70; Om=0; OL=2",                  false,   "no big bang: H²(z) ≤ 0 at z = 0.4142 (the model bounces); check Om, OL/Ok, w0, wa"],
    ];
    for (const [spec, withNamed, reason] of cases) expect(unusableReason(spec, withNamed ? named : undefined), spec).toBe(reason);
    expect(unusableReason("mine")).toMatch(/^unknown preset "mine": use one of P18-CMB/);
  });
});

describe("the spec the form writes", () => {
  const p18 = () => formFromSpec("P18-BAO");

  test("spaces around a field's text are not part of it; a blank field keeps the base's value", () => {
    expect(modelFromForm({ ...p18(), H0: " 73 " }).spec).toBe("P18-BAO; H0=73");
    expect(modelFromForm({ ...p18(), H0: "   " }).spec).toBe("P18-BAO");
    expect(modelFromForm({ ...p18(), OL: " Flat " }).spec).toBe("P18-BAO");
  });

  test("a workbook model left unchanged is written by its name (upper case, as the workbook names it); a change writes the spec", () => {
    const named = workbook();
    //  form                                                         spec written
    const cases: [FormValues, string][] = [
      [formFromSpec("mine", named),                                  "MINE"],
      [{ ...formFromSpec("mine", named), preset: "mine" },           "MINE"],
      [{ ...formFromSpec("mine", named), H0: "73" },                 "P18-BAO; H0=73"],
      [formFromSpec("open", named),                                  "OPEN"],
      [{ ...formFromSpec("open", named), OL: "flat" },               "H0=70; Om=0.3"],   // flat drops the base's OL
      [{ ...formFromSpec("open", named), OL: " FLAT " },             "H0=70; Om=0.3"],
      [formFromSpec("plain", named),                                 "PLAIN"],
      [{ ...formFromSpec("plain", named), Ob: "" },                  "H0=70; Om=0.3"],   // a blank Ob drops the base's Ob
      [{ ...formFromSpec("plain", named), Ob: "  " },                "H0=70; Om=0.3"],
    ];
    for (const [form, spec] of cases) expect(modelFromForm(form, named).spec, JSON.stringify(form)).toBe(spec);
  });

  test("a model named neither as a preset nor in the workbook is no base: the fields alone make the spec", () => {
    expect(modelFromForm({ ...formFromSpec("H0=70; Om=0.3"), preset: "nowhere" }).spec).toBe("H0=70; Om=0.3");
  });
});

describe("a message of the core lands on the field it is about", () => {
  const p18 = () => formFromSpec("P18-BAO");
  //  change to the P18-BAO form                      field     message (the core's words)
  const cases: [Partial<FormValues>, string, string][] = [
    [{ H0: "flat" },                                  "H0",     'H0: "flat" is not a number'],   // "flat" is a word of OL alone
    [{ H0: "70; Om=0.4" },                            "Om",     "Om is given twice"],
    [{ H0: "70; x" },                                 "model",  '"x" is not key=value (a preset name may only come first)'],
    [{ preset: "", H0: "" },                          "H0",     'H0 is required (or start from a preset, e.g. "P18-CMB; Om=0.3111; w0=-1; wa=0; Tcmb=2.7255; Neff=3.046; mnu=0.06; Ob=0.04897468161869667")'],
    [{ H0: "5" },                                     "H0",     "H0 = 5 km/s/Mpc is outside 10 … 1000 km/s/Mpc (H0 is in km/s/Mpc: h = 5 is H0=500)"],
    [{ Om: "30" },                                    "Om",     "Om = 30: a density parameter is a fraction (30 → 0.3), |Om| ≤ 5"],
    [{ Om: "0.4", Ob: "0.5" },                        "Ob",     "Ob must be between 0 and Om (Om = 0.4); got 0.5"],
    [{ Tcmb: "0" },                                   "mnu",    "mnu > 0 needs Tcmb > 0: the neutrino density is set by the CMB temperature"],
    // E² = 2 − (1+z)² is 0 at z = √2 − 1 (closed form)
    [{ preset: "", Om: "0", OL: "2", Tcmb: "0", mnu: "0", Ob: "" }, "model", "no big bang: H²(z) ≤ 0 at z = 0.4142 (the model bounces); check Om, OL/Ok, w0, wa"],
  ];
  test.each(cases)("%j: %s shows the message", (change, field, message) => {
    const result = modelFromForm({ ...p18(), ...change });
    expect(result.errors).toEqual({ [field]: message });
    expect(result.model).toBeUndefined();
    expect(result.spec).toBeUndefined();
  });
});

describe("the derived values under the form", () => {
  // Closed forms: t_H = 1/H0 and D_H = c/H0 (c exact, SI; 1 Mpc = 648000/π au, IAU 2012 B2 and 2015 B2;
  // the Julian year, IAU); an Einstein–de Sitter age 2/(3 H0) (Hogg 1999, astro-ph/9905116); a de Sitter
  // past (E = 1) is infinite. Values shown to 5 significant digits.
  //  spec                               Ωk      Ωr                   age                          1/H0           c/H0          z_eq
  const rows: [string, string, string, string, string, string, string][] = [
    ["EDS",                              "0",    "0 (no radiation)",  "9.3123 Gyr",                "13.968 Gyr",  "4282.7 Mpc", "none (Tcmb = 0)"],
    ["H0=70; Om=0; OL=1",                "0",    "0 (no radiation)",  "∞ Gyr",                     "13.968 Gyr",  "4282.7 Mpc", "none (Tcmb = 0)"],
    ["H0=70; Om=0; OL=0",                "1",    "0 (no radiation)",  "13.968 Gyr",                "13.968 Gyr",  "4282.7 Mpc", "none (Tcmb = 0)"], // Milne: age = 1/H0
    ["H0=70; Om=0.3; Ok=0.1",            "0.1",  "0 (no radiation)",  "13.062 Gyr",                "13.968 Gyr",  "4282.7 Mpc", "none (Tcmb = 0)"], // age: our integral, as the functions give it
    // an age integral that does not converge numerically (Cosmology.ageTodayGyr is NaN there): the pane says so
    ["H0=70; Om=0; OL=1; w0=-0.99",      "0",    "0 (no radiation)",  "not finite numerically Gyr", "13.968 Gyr", "4282.7 Mpc", "none (Tcmb = 0)"],
  ];
  test.each(rows)("%s", (spec, Ok, Or, age, tH, dH, zEq) => {
    const shown = derivedValues(new Cosmology(parseModelSpec(spec)));
    expect(shown).toEqual([
      { label: "Ωk (curvature)", value: Ok },
      { label: "Ωr (photons + massless ν)", value: Or },
      { label: "Age today", value: age },
      { label: "Hubble time 1/H0", value: tH },
      { label: "Hubble distance c/H0", value: dH },
      { label: "Matter–radiation equality z_eq", value: zEq },
    ]);
  });

  test("Ωr of a model with a CMB is shown to 4 digits and agrees with the black-body density of photons and massless neutrinos", () => {
    // Ωγ = (4σT⁴/c) / (3H0²c²/8πG) (Stefan–Boltzmann), Ων = Neff (7/8)(4/11)^(4/3) Ωγ (standard
    // relativistic neutrinos, e.g. Dodelson & Schmidt, Modern Cosmology, 2nd ed., eq. 2.77);
    // σ, G: CODATA 2018; Mpc from the IAU au and parsec. Tolerance: the 4 digits shown.
    const sigma = 5.670374419e-8, G = 6.6743e-11, c = 299_792_458, mpcM = (648_000 / Math.PI) * 149_597_870_700 * 1e6;
    const H0 = (67.66 * 1000) / mpcM, T = 2.7255, Neff = 3.046;
    const photons = ((4 * sigma * T ** 4) / c) / ((3 * H0 * H0 * c * c) / (8 * Math.PI * G));
    const expected = photons * (1 + Neff * (7 / 8) * (4 / 11) ** (4 / 3));
    const value = derivedValues(new Cosmology(parseModelSpec("P18-BAO; mnu=0")))[1].value;
    expect(value).toMatch(/^\d\.\d{3}e-5$/);
    expect(Math.abs(Number(value) / expected - 1)).toBeLessThan(1e-3);
  });
});

describe("the entries not applied yet", () => {
  test("spaces on either side are not a change", () => {
    const applied = formFromSpec("W9-ALL");
    const spaced: FormValues = { ...applied, preset: " W9-ALL ", H0: " 69.32" };
    expect(changedFields(applied, spaced)).toEqual([]);
    expect(changedFields(spaced, applied)).toEqual([]);
    expect(changedFields({ ...applied, Ob: "0.05", mnu: "0.06" }, spaced)).toEqual(["mnu", "Ob"]);
  });
});
