/**
 * A model spec without H0 or Om: the cell says which is required, shows the spec started from a
 * preset, and, when the changes fit one ZC.MODEL call (at most its six key/value pairs, each value
 * short enough to read), the same changes on the workbook's model as that call, a list of masses as
 * text. The messages are zcell's own (functions/messages.ts), pinned as the interface.
 */
import { describe, expect, test } from "vitest";
import { sheetCalls } from "./sheetCalls.js";

const { failure, run } = sheetCalls("P18-CMB");
const required = (missing: string, spec: string) => `ZC.DIST_LUM: model: ${missing} is required (or start from a preset, e.g. "P18-CMB; ${spec}")`;
const use = (call: string) => `; to change the workbook's model instead, use ZC.MODEL(, ${call})`;

/** A value of exactly `length` characters: 0.000…01. */
const digits = (length: number) => `0.${"0".repeat(length - 3)}1`;

describe("a spec without H0 or Om", () => {
  test.each([
    // spec                                                       message
    ["Om=0.3",                                                    required("H0", "Om=0.3") + use('"Om", 0.3')],
    ["H0=70",                                                     required("Om", "H0=70") + use('"H0", 70')],
    // a list of masses is text in a formula: quoted
    ["H0=70; mnu=0.06,0.01",                                      required("Om", "H0=70; mnu=0.06,0.01") + use('"H0", 70, "mnu", "0.06,0.01"')],
    ["Om=0.3; mnu=0.06",                                          required("H0", "Om=0.3; mnu=0.06") + use('"Om", 0.3, "mnu", 0.06')],
    // six changes: ZC.MODEL takes six pairs
    ["Om=0.3; Ob=0.05; w0=-1; wa=0; Tcmb=2.7; Neff=3",            required("H0", "Om=0.3; Ob=0.05; w0=-1; wa=0; Tcmb=2.7; Neff=3") + use('"Om", 0.3, "Ob", 0.05, "w0", -1, "wa", 0, "Tcmb", 2.7, "Neff", 3')],
    // seven: no single ZC.MODEL call takes them
    ["Om=0.3; Ob=0.05; w0=-1; wa=0; Tcmb=2.7; Neff=3; OL=0.7",    required("H0", "Om=0.3; Ob=0.05; w0=-1; wa=0; Tcmb=2.7; Neff=3; OL=0.7")],
    // a value of 40 characters is still shown in the call; one of 41 is not (and the spec quoted is cut, core/ quoted())
    [`Ob=${digits(40)}`,                                          required("H0", `Ob=${digits(40)}`) + use(`"Ob", ${digits(40)}`)],
    [`Ob=${digits(41)}`,                                          `ZC.DIST_LUM: model: H0 is required (or start from a preset, e.g. "P18-CMB; Ob=${digits(41).slice(0, 39)}…")`],
  ])("%s", (spec, message) => {
    const e = failure("DIST_LUM", 0.5, spec);
    expect({ kind: e.kind, message: e.message }).toEqual({ kind: "value", message });
  });

  test("the same advice in every cell of a range computed with that spec", () => {
    const message = required("H0", "Om=0.3") + use('"Om", 0.3');
    const cells = run("DIST_LUM", [[0.5], [0.6]], "Om=0.3").map(([c]) => (c as { message?: string }).message);
    expect(cells).toEqual([message, message]);
  });
});
