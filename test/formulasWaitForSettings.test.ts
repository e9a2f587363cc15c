/**
 * A formula computed before Office has loaded the workbook's settings waits for them: it returns a
 * Promise of its value (a custom function may return a value or a Promise: ../shared/excel-host-notes.md,
 * "Custom functions"), and once the settings are there, the value itself with no wait. The wait is
 * started once, by the first formula or the first question whether the settings are ready
 * (functions/activeModel.ts, functions/evaluate.ts callFromSheet). The module's state is per load of
 * the add-in, so this file holds one load: its tests run in order. Outside Office:
 * test/formulasOutsideOffice.test.ts.
 */
import { afterAll, describe, expect, test } from "vitest";
import { Cosmology } from "../core/index.js";
import { settingsReady, whenSettingsReady } from "../functions/activeModel.js";
import { definitions } from "../functions/definitions.js";
import { callFromSheet } from "../functions/evaluate.js";

const g = globalThis as { Office?: unknown };
const saved = g.Office;
afterAll(() => {
  if (saved === undefined) delete g.Office;
  else g.Office = saved;
});

// An Office still loading: onReady resolves when `release` is called. The workbook stores EDS as its model.
let onReadyCalls = 0;
let release = () => {};
g.Office = {
  onReady: () => {
    onReadyCalls++;
    return new Promise((resolve) => (release = () => resolve({ host: "Excel" })));
  },
  context: { document: { settings: { get: (key: string) => (key === "zcell.activeModel" ? "EDS" : null) } } },
};
const edsAgeGyr = (2 / 3) * ((648000 / Math.PI) * 149597870700 * 1e6 / 70e3 / (365.25 * 86400 * 1e9)); // EdS age 2/(3H0) for H0 = 70: the lookback time to z → ∞ with E = (1+z)^1.5 (Hogg 1999 eq. 30, from memory); pc = 648000/π au (IAU 2015 B2), Julian year
const age = () => callFromSheet(definitions.AGE, [0, null]);

describe("formulas wait once for Office to load the workbook's settings", () => {
  test("asking whether the settings are ready starts the wait, and the answer is no until Office is ready", () => {
    expect(settingsReady()).toBe(false);
    expect(onReadyCalls).toBe(1);
    expect(settingsReady()).toBe(false);
    expect(whenSettingsReady()).toBe(whenSettingsReady()); // one wait, shared by every formula
    expect(onReadyCalls).toBe(1);
  });

  test("a formula computed meanwhile gets a Promise of its value under the workbook's stored model", async () => {
    const early = age();
    expect(early).toBeInstanceOf(Promise);
    release();
    const cells = (await early) as unknown as number[][];
    expect(Math.abs(cells[0][0] / edsAgeGyr - 1)).toBeLessThan(1e-10); // the accuracy zcell states (ZC.VERSION)
  });

  test("from then on a formula gets its value at once, and Office is asked no more", () => {
    expect(settingsReady()).toBe(true);
    const now = age();
    expect(now).not.toBeInstanceOf(Promise);
    expect(Math.abs((now[0][0] as number) / edsAgeGyr - 1)).toBeLessThan(1e-10);
    expect(Cosmology.fromSpec("EDS").ageTodayGyr).toBe(now[0][0]); // the stored model, not P18-CMB
    expect(onReadyCalls).toBe(1);
  });
});
