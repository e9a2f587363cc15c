/**
 * The error values a cell shows and takes in: which Excel error each kind is, what Excel's runtime
 * is handed (its own error value with our message, when it has one), which incoming cell values count
 * as errors, how a thrown value becomes one, and how a call's errors are shared between its cells.
 * The codes are Excel's (the custom-functions runtime's ErrorCode: invalidValue "#VALUE!",
 * invalidNumber "#NUM!", notAvailable "#N/A", @types/custom-functions-runtime); the messages are
 * zcell's own (functions/messages.ts), pinned as the interface.
 */
import { afterEach, describe, expect, test } from "vitest";
import { NoSolutionError } from "../core/index.js";
import { CellError, classify, inFunction, isIncomingError, toHostError } from "../functions/cellError.js";
import { sheetCalls } from "./sheetCalls.js";

const { failure } = sheetCalls("P18-CMB");

describe("the error a cell shows, as Excel writes it", () => {
  test.each([
    // kind     Excel's text   source: Excel's error values (common practice)
    ["value", "#VALUE!"],
    ["num",   "#NUM!"],
    ["na",    "#N/A"],
  ] as const)("a %s error is %s", (kind, text) => {
    expect(new CellError(kind, "").excelText).toBe(text);
  });

  test("a catalogue's missing magnitude (99) is #N/A, a negative flux #NUM!, text for a redshift #VALUE!", () => {
    expect(failure("MAG_ABS", 99, 0.5).excelText).toBe("#N/A");
    expect(failure("LUMINOSITY", -1, 0.5).excelText).toBe("#NUM!");
    expect(failure("DIST_LUM", "half").excelText).toBe("#VALUE!");
  });
});

describe("what Excel's runtime is handed", () => {
  const g = globalThis as { CustomFunctions?: unknown };
  afterEach(() => {
    delete g.CustomFunctions;
  });
  /** A runtime as Excel's: an Error class taking (code, message) and the codes by name (@types/custom-functions-runtime). */
  class RuntimeError {
    constructor(
      readonly code: string,
      readonly message?: string,
    ) {}
  }
  const runtime = { Error: RuntimeError, ErrorCode: { invalidValue: "#VALUE!", invalidNumber: "#NUM!", notAvailable: "#N/A" } };

  test.each([
    // kind     code handed to Excel
    ["value", "#VALUE!"],
    ["num",   "#NUM!"],
    ["na",    "#N/A"],
  ] as const)("inside Excel a %s error becomes the runtime's error %s with our message", (kind, code) => {
    g.CustomFunctions = runtime;
    const shown = toHostError(new CellError(kind, "ZC.DIST_LUM: z: text \"x\" where a number belongs"));
    expect(shown).toBeInstanceOf(RuntimeError);
    expect(shown).toEqual(new RuntimeError(code, 'ZC.DIST_LUM: z: text "x" where a number belongs'));
  });

  test("outside Excel (tests, the pane's inspector) the error stays the CellError itself", () => {
    const e = new CellError("num", "m");
    expect(toHostError(e)).toBe(e);
    g.CustomFunctions = {}; // a runtime without error values (an old host): the same
    expect(toHostError(e)).toBe(e);
  });

  test("a cell holding Excel's own error value (the runtime's Error) is an input error, even without an errorCode field", () => {
    g.CustomFunctions = runtime;
    const incoming = new RuntimeError("#N/A");
    expect(isIncomingError(incoming)).toBe(true);
    expect(failure("DIST_LUM", incoming).message).toBe("ZC.DIST_LUM: z: the input cell holds an error");
  });
});

describe("which incoming cell values are errors", () => {
  test.each([
    // value                               an error?   why
    [new CellError("num", "x"),            true,       "one of our own error values (a formula's result fed to another)"],
    [{ errorCode: "#DIV/0!" },             true,       "an error value as Excel passes it in (errorCode)"],
    [{},                                   false,      "some other object"],
    [{ code: "#N/A" },                     false,      "an object with a code but not the runtime's error (none here)"],
    [null,                                 false,      "a blank"],
    ["#N/A",                               false,      "text that spells an error"],
    [0,                                    false,      "a number"],
  ] as [unknown, boolean, string][])("%j → %s (%s)", (value, error) => {
    expect(isIncomingError(value)).toBe(error);
  });

  test("a cell fed one of our own error values says its input holds an error; another object is a value where a number belongs", () => {
    expect(failure("DIST_LUM", new CellError("num", "ZC.LUMINOSITY: flux = -1 must be ≥ 0")).message).toBe("ZC.DIST_LUM: z: the input cell holds an error");
    expect(failure("DIST_LUM", {}).message).toBe("ZC.DIST_LUM: z: a value where a number belongs");
  });
});

describe("a thrown value as the error it stands for", () => {
  test.each([
    // thrown                                  kind     message shown
    [new NoSolutionError("no z gives this"),  "na",    "no z gives this"],
    [new RangeError("z must be > -1"),         "num",   "z must be > -1"],
    [new TypeError("z: not a number"),         "value", "z: not a number"],
    [new Error("boom"),                        "value", "ZC.DIST_LUM: unexpected problem (boom); please report it"],
    ["a string thrown",                        "value", "ZC.DIST_LUM: unexpected problem (a string thrown); please report it"],
  ])("%s → #%s", (thrown, kind, message) => {
    const e = classify(thrown, "DIST_LUM");
    expect({ kind: e.kind, message: e.message }).toEqual({ kind, message });
  });

  test("a CellError thrown is itself", () => {
    const e = new CellError("na", "m");
    expect(classify(e, "DIST_LUM")).toBe(e);
  });
});

describe("errors of one call named after its function, one object for each message", () => {
  test("a message that already names a ZC function is shown as it is (the same error value)", () => {
    const e = new CellError("value", "ZC.MODEL: key1 is required");
    expect(inFunction(e, "DIST_LUM", new Map())).toBe(e);
  });

  test("a message gains the function's name once; the next cell with the same message shows the same error value", () => {
    const seen = new Map<string, CellError>();
    const first = inFunction(new CellError("num", "z: not a finite number"), "AGE", seen);
    expect(first.message).toBe("ZC.AGE: z: not a finite number");
    expect(inFunction(new CellError("num", "z: not a finite number"), "AGE", seen)).toBe(first);
  });

  test("the same words as an error of another kind get their own value, and do not displace the first", () => {
    const seen = new Map<string, CellError>();
    const num = inFunction(new CellError("num", "same words"), "AGE", seen);
    const value = inFunction(new CellError("value", "same words"), "AGE", seen);
    expect(value).not.toBe(num);
    expect({ kind: value.kind, message: value.message }).toEqual({ kind: "value", message: "ZC.AGE: same words" });
    // the first kind seen keeps its shared value
    expect(inFunction(new CellError("num", "same words"), "AGE", seen)).toBe(num);
  });
});
