/**
 * The workbook's model: which cosmology a cell without a model argument is computed under, read from
 * the workbook's add-in settings (written by whoever saved the file). Documented in
 * functions/activeModel.ts and README ("The model travels with the file"); the fallback sentence is
 * zcell's (functions/messages.ts activeModelFallback), pinned here as the interface. Office is
 * replaced by small objects holding just Office.context.document.settings.get, which returns null for
 * a key never set (Office.Settings.get, Office JavaScript API reference). When formulas wait for the
 * settings: test/formulasWaitForSettings.test.ts and test/formulasOutsideOffice.test.ts.
 */
import { afterEach, describe, expect, test } from "vitest";
import { Cosmology } from "../core/index.js";
import { readActiveModel } from "../functions/activeModel.js";
import { definitions } from "../functions/definitions.js";
import { evaluate } from "../functions/evaluate.js";
import { maxSpecLength, noWorkbookModels } from "../functions/workbookModels.js";

const g = globalThis as { Office?: unknown };
const saved = g.Office;
afterEach(() => {
  if (saved === undefined) delete g.Office;
  else g.Office = saved;
});

/** An Office whose settings hold `stored` (key → value; a key not there reads as null). */
function officeWith(stored: Record<string, unknown>) {
  g.Office = { context: { document: { settings: { get: (key: string) => (key in stored ? stored[key] : null) } } } };
}
const fallback = (detail: string) => `the workbook's stored cosmology could not be read (${detail}); using P18-CMB (the default) until one is applied`;

describe("where the settings cannot be reached, cells use the default model, P18-CMB, without a warning", () => {
  test.each([
    // Office as it is                               | where
    [undefined,                                        "outside Office (tests, a bundle run in Node)"],
    [{},                                               "an Office with no context yet"],
    [{ context: {} },                                  "a context with no document"],
    [{ context: { document: {} } },                    "a document with no settings"],
  ])("%j (%s)", (office, _where) => {
    if (office === undefined) delete g.Office;
    else g.Office = office;
    const active = readActiveModel();
    expect(active).toEqual({ spec: "P18-CMB", stored: false, models: noWorkbookModels });
  });

  test("settings that throw when read give the default with the reason", () => {
    g.Office = { context: { document: { settings: { get: () => { throw new Error("the settings are locked"); } } } } };
    expect(readActiveModel()).toEqual({ spec: "P18-CMB", stored: false, models: noWorkbookModels, warning: fallback("Error: the settings are locked") });
  });
});

describe("the stored model", () => {
  test.each([
    // stored value                  | the model cells use | stored | warning
    [null,                             "P18-CMB",            false,   undefined],                        // never set
    [undefined,                        "P18-CMB",            false,   undefined],                        // a host that answers undefined
    ["W9-ALL",                         "W9-ALL",             true,    undefined],
    ["P18-BAO; H0=73",                 "P18-BAO; H0=73",     true,    undefined],
    [42,                               "P18-CMB",            false,   fallback("not text")],
    ["H0=70; Om=0; OL=2",              "P18-CMB",            false,   fallback("no big bang: H²(z) ≤ 0 at z = 0.4142 (the model bounces); check Om, OL/Ok, w0, wa")], // H²/H0² = OL + Ok(1+z)² = 2 − (1+z)² vanishes at z = √2 − 1 (Friedmann equation, Om = 0)
  ])("%j: cells use %s (stored %s)", (value, spec, stored, warning) => {
    officeWith({ "zcell.activeModel": value });
    const active = readActiveModel();
    expect(active.spec).toBe(spec);
    expect(active.stored).toBe(stored);
    expect(active.warning).toBe(warning);
  });

  test(`a stored spec of ${maxSpecLength} characters is used; one character more is not read`, () => {
    const exactly = `P18-BAO; H0=70.${"0".repeat(maxSpecLength - "P18-BAO; H0=70.".length)}`;
    expect(exactly).toHaveLength(maxSpecLength);
    officeWith({ "zcell.activeModel": exactly });
    expect(readActiveModel()).toMatchObject({ spec: exactly, stored: true });
    officeWith({ "zcell.activeModel": `${exactly}0` });
    expect(readActiveModel()).toMatchObject({ spec: "P18-CMB", stored: false, warning: fallback("longer than 500 characters") });
  });

  test("a stored model naming one of the workbook's own models computes cells under its parameters", () => {
    officeWith({ "zcell.activeModel": "TEAM; Om=0.3", "zcell.workbookModels": { TEAM: "P18-BAO; H0=73" } });
    const active = readActiveModel();
    expect(active).toMatchObject({ spec: "TEAM; Om=0.3", stored: true });
    expect(evaluate(definitions.AGE, [0], active)[0][0]).toBe(Cosmology.fromSpec("P18-BAO; H0=73; Om=0.3").ageTodayGyr);
  });

  test("a workbook model with no big bang is as unusable as bad text when it is the workbook's model", () => {
    officeWith({ "zcell.activeModel": "BOUNCE", "zcell.workbookModels": { BOUNCE: "H0=70; Om=0; OL=2" } });
    const active = readActiveModel();
    expect(active).toMatchObject({ spec: "P18-CMB", stored: false });
    expect(active.warning).toMatch(/^the workbook's stored cosmology could not be read \(no big bang: /);
    expect([...active.models!.specs.keys()]).toEqual(["BOUNCE"]); // still listed: a cell may name it and be told why it fails
  });
});

describe("a formula per row reads the setting each time: it is read again only when it changed", () => {
  test("the same stored values give the same reading; a change to either gives a new one", () => {
    const stored: Record<string, unknown> = { "zcell.activeModel": "TEAM", "zcell.workbookModels": { TEAM: "W9-ALL" } };
    officeWith(stored);
    const first = readActiveModel();
    expect(readActiveModel()).toBe(first);

    stored["zcell.workbookModels"] = { TEAM: "P18-BAO; H0=73" }; // the team redefines its model: the same active text
    const redefined = readActiveModel();
    expect(redefined).not.toBe(first);
    expect(redefined.models!.specs.get("TEAM")).toBe("P18-BAO; H0=73");
    expect(evaluate(definitions.AGE, [0], redefined)[0][0]).toBe(Cosmology.fromSpec("P18-BAO; H0=73").ageTodayGyr);

    stored["zcell.activeModel"] = "EDS";
    expect(readActiveModel()).toMatchObject({ spec: "EDS", stored: true });
  });
});
