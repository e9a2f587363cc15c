/**
 * Outside Office (no Office object: a test, the bundle run in Node) there are no settings to wait
 * for: the wait ends at once and formulas compute under the default model, P18-CMB
 * (functions/activeModel.ts). The module's state is per load, so this file holds one load with no
 * Office. Inside Office: test/formulasWaitForSettings.test.ts.
 */
import { describe, expect, test } from "vitest";
import { Cosmology } from "../core/index.js";
import { settingsReady, whenSettingsReady } from "../functions/activeModel.js";
import { definitions } from "../functions/definitions.js";
import { callFromSheet } from "../functions/evaluate.js";

describe("outside Office", () => {
  test("the settings are ready at once, and a formula gets its value under P18-CMB", async () => {
    expect((globalThis as { Office?: unknown }).Office).toBeUndefined();
    await whenSettingsReady();
    expect(settingsReady()).toBe(true);
    const cells = callFromSheet(definitions.AGE, [0, null]);
    expect(cells).not.toBeInstanceOf(Promise);
    expect(cells).toEqual([[Cosmology.fromSpec("P18-CMB").ageTodayGyr]]);
  });
});
