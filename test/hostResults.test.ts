/**
 * What Excel receives from a custom function (callFromSheet, functions/evaluate.ts): before the
 * workbook's settings are read, a Promise of the result; after, the result itself; every error cell
 * as the host's own error value with its code and message (one value for each distinct error of a
 * call), and an error value rather than an exception when the host itself fails.
 *
 * The host is a stub of Excel's custom-functions runtime in Node (`CustomFunctions.Error` and
 * `ErrorCode`, as the fake host test/browser/fakeOffice.js has them); the sources are imported
 * directly, each group of tests with fresh modules (whether the settings were read is module state).
 */
import { afterEach, beforeEach, describe, expect, test, vi } from "vitest";

/** The host's error value: code and message (Office's CustomFunctions.Error). */
class HostError {
  constructor(
    readonly code: string,
    readonly message: string,
  ) {}
}

const g = globalThis as { CustomFunctions?: unknown; Office?: unknown };

/** The CONVERT of 1 pc into light years: 3.2615637771674337 (IAU 2015 B2 parsec, Julian year of 365.25 d). */
const pcInLyr = 3.2615637771674337;

async function freshSheet() {
  vi.resetModules();
  const { callFromSheet, evaluate } = await import("../functions/evaluate.js");
  const { definitions } = await import("../functions/definitions.js");
  const { whenSettingsReady } = await import("../functions/activeModel.js");
  const call = (name: string, ...args: unknown[]) => callFromSheet(definitions[name], args);
  const inspect = (name: string, ...args: unknown[]) => evaluate(definitions[name], args, { spec: "P18-CMB", stored: false });
  return { call, inspect, whenSettingsReady };
}

beforeEach(() => {
  g.CustomFunctions = {
    Error: HostError,
    ErrorCode: { invalidValue: "#VALUE!", notAvailable: "#N/A", invalidNumber: "#NUM!" },
  };
});

afterEach(() => {
  delete g.CustomFunctions;
  delete g.Office;
});

describe("a cell computed before and after the workbook's settings are read", () => {
  test("the first call waits for the settings (a Promise of the result); once they are read a call answers at once", async () => {
    const { call } = await freshSheet();
    const first = call("CONVERT", 1, "pc", "lyr");
    expect(first).toBeInstanceOf(Promise);
    const [[waited]] = await (first as unknown as Promise<unknown[][]>);
    expect(waited).toBeCloseTo(pcInLyr, 14);
    const later = call("CONVERT", [[1], [2]], "pc", "lyr");
    expect(later).not.toBeInstanceOf(Promise);
    expect(later.length).toBe(2);
    expect(later[0][0]).toBeCloseTo(pcInLyr, 14);
    expect(later[1][0]).toBeCloseTo(2 * pcInLyr, 13);
  });

  test("a host whose settings never become readable gives the cell an error value naming the problem, not a rejected Promise", async () => {
    g.Office = { onReady: () => Promise.reject(new Error("the host went away")) };
    const { call } = await freshSheet();
    const [[cell]] = await (call("CONVERT", 1, "pc", "lyr") as unknown as Promise<unknown[][]>);
    // messages.internal (functions/messages.ts), pinned as the interface
    expect(cell).toEqual(new HostError("#VALUE!", "ZC.CONVERT: unexpected problem (the host went away); please report it"));
  });

  test("a host that fails when its settings are read gives the cell an error value, not an exception", async () => {
    g.Office = {
      get context(): never {
        throw new Error("settings unavailable");
      },
    };
    const { call, whenSettingsReady } = await freshSheet();
    await whenSettingsReady();
    expect(call("DIST_LUM", 1)).toEqual([[new HostError("#VALUE!", "ZC.DIST_LUM: unexpected problem (settings unavailable); please report it")]]);
  });
});

describe("error cells reach Excel as its own error values", () => {
  test("one cell: the error's code and message (#NUM!, #VALUE!, #N/A), a good cell as its number", async () => {
    const { call, whenSettingsReady } = await freshSheet();
    await whenSettingsReady();
    const rows: [unknown[], string, RegExp][] = [
      // call                        code        message (functions/messages.ts and the core's words)
      [["DIST_LUM", -1],             "#NUM!",    /^ZC\.DIST_LUM: .*blueshifted/],
      [["DIST_LUM", "x"],            "#VALUE!",  /^ZC\.DIST_LUM: z: text "x" where a number belongs/],
      [["REDSHIFT", 1e3, "AGE"],     "#N/A",     /^ZC\.REDSHIFT: /],
    ];
    for (const [[name, ...args], code, message] of rows) {
      const result = call(name as string, ...args);
      expect(result.length, String(name)).toBe(1);
      const [[cell]] = result;
      expect(cell, String(name)).toBeInstanceOf(HostError);
      expect((cell as HostError).code, String(name)).toBe(code);
      expect((cell as HostError).message, String(name)).toMatch(message);
    }
    expect(call("CONVERT", 1, "pc", "lyr")[0][0]).toBeCloseTo(pcInLyr, 14);
  });

  test("a call whose arguments cannot be read at all (ranges that do not fit) is one error value", async () => {
    const { call, whenSettingsReady } = await freshSheet();
    await whenSettingsReady();
    const [[cell], ...rest] = call("DIST_BETWEEN", [[0.5], [1]], [[2], [3], [4]]);
    expect(rest).toEqual([]);
    expect(cell).toBeInstanceOf(HostError);
    expect((cell as HostError).code).toBe("#VALUE!");
    expect((cell as HostError).message).toMatch(/z1 is 2×1 and z2 is 3×1/);
  });

  test("a range: each error cell becomes a host error with the inspector's code and message, the cells of one error share one value, numbers and blanks stay", async () => {
    const { call, inspect, whenSettingsReady } = await freshSheet();
    await whenSettingsReady();
    const z = [[1], [-1], ["x"], [-1], [null], [2]];
    const host = call("CONVERT", z, "pc", "lyr");
    expect(host.length).toBe(6);
    expect(host[0][0]).toBeCloseTo(pcInLyr, 14);
    expect(host[5][0]).toBeCloseTo(2 * pcInLyr, 13);
    expect(host[1][0]).toBeCloseTo(-pcInLyr, 14); // a negative length converts like any other
    expect(host[4][0]).toBe("");
    const bad = call("DIST_LUM", z);
    const seen = inspect("DIST_LUM", z);
    for (const r of [1, 2, 3]) {
      const shown = seen[r][0] as { kind: string; message: string };
      expect(bad[r][0]).toEqual(new HostError({ value: "#VALUE!", num: "#NUM!", na: "#N/A" }[shown.kind]!, shown.message));
    }
    expect((bad[1][0] as HostError).code).toBe("#NUM!");
    expect((bad[2][0] as HostError).code).toBe("#VALUE!");
    expect(bad[3][0]).toBe(bad[1][0]); // the same error, one host value
    expect(bad[0][0]).toBe(seen[0][0]); // a number: the same the inspector computes
    expect(bad[4][0]).toBe("");
  });

  test("a range with errors in several columns converts every one of them", async () => {
    const { call, whenSettingsReady } = await freshSheet();
    await whenSettingsReady();
    const [row] = call("DIST_LUM", [[-1, 1, "x", -2]]);
    expect(row.map((c) => (c instanceof HostError ? c.code : typeof c))).toEqual(["#NUM!", "number", "#VALUE!", "#NUM!"]);
  });
});
