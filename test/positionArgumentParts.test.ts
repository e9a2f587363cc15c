/**
 * Which part (right ascension in hours, or degrees) a position argument's text is read as, and when:
 * fixed by the declaration, decided by a scalar text once per call (COORD_CONVERT's from_frame), or
 * left to compute ("either"); and which arguments are latitudes, which stay in degrees when the angle
 * unit is "hourangle". Declarations below are made up for the reader's contract (FunctionDef.ts:
 * `sexagesimal`); the angles are sexagesimal as the trade writes them (common practice: 15° an hour).
 */
import { describe, expect, test } from "vitest";
import type { FunctionDef } from "../functions/FunctionDef.js";
import { isLatitude, positionOrNaN, positionPart, positionParts, readPosition } from "../functions/readPositions.js";
import { CellError } from "../functions/cellError.js";
import { sheetCalls } from "./sheetCalls.js";

const decided = (s: Record<string, unknown>) => (s.frame === "equatorial" ? "ra" : "lon");
const def: FunctionDef = {
  name: "POSITIONS",
  args: [
    { kind: "number", name: "ra", sexagesimal: "ra" },
    { kind: "number", name: "dec", sexagesimal: "dec" },
    { kind: "number", name: "b", sexagesimal: "lat" },
    { kind: "number", name: "l", sexagesimal: decided },
    { kind: "number", name: "any", sexagesimal: "either" },
    { kind: "number", name: "plain" },
    { kind: "text", name: "frame", scalar: true },
  ],
  compute: () => 0,
};
const spec = (name: string) => def.args.find((a) => a.name === name) as Extract<FunctionDef["args"][number], { kind: "number" }>;

describe("latitudes", () => {
  test.each([
    // argument  a latitude?
    ["dec",      true],
    ["b",        true],
    ["ra",       false],
    ["l",        false],
    ["plain",    false],
    ["frame",    false],
    ["nothing",  false],
  ])("%s → %s", (name, latitude) => {
    expect(isLatitude(def, name)).toBe(latitude);
  });
});

describe("the part a position's text is read as", () => {
  test("fixed parts, and the part a scalar text decides, once per call", () => {
    expect(positionParts(def, { frame: "equatorial" })).toEqual([["l", "ra"]]);
    expect(positionParts(def, { frame: "galactic" })).toEqual([["l", "lon"]]);
    expect(positionParts({ ...def, args: def.args.filter((a) => a.name !== "l") }, {})).toEqual([]);
  });

  test.each([
    // argument  decided     part read before compute
    ["ra",       undefined,  "ra"],
    ["dec",      undefined,  "dec"],
    ["b",        undefined,  "lat"],
    ["any",      undefined,  undefined],
    ["plain",    undefined,  undefined],
    ["l",        undefined,  undefined], // not decided yet: not read before compute
    ["l",        "ra",       "ra"],
    ["l",        "lon",      "lon"],
  ] as const)("%s (decided %s) → %s", (name, part, expected) => {
    expect(positionPart(spec(name), part)).toBe(expected);
  });

  test("text read into degrees for its part; the text itself where compute decides; the argument named when it does not read", () => {
    // 12:30:00 hours = 187.5°; -05:30 degrees = -5.5°
    expect(readPosition(spec("ra"), "12:30:00", undefined)).toBe(187.5);
    expect(readPosition(spec("dec"), "-05:30", undefined)).toBe(-5.5);
    expect(readPosition(spec("any"), "12:30:00", undefined)).toBe("12:30:00");
    const bad = readPosition(spec("dec"), "north", undefined);
    expect(bad).toBeInstanceOf(CellError);
    expect((bad as CellError).message).toMatch(/^dec: /);
  });

  test("the quick reading of a column: degrees, or NaN for number text and for what does not read", () => {
    expect(positionOrNaN("12:30:00", "ra")).toBe(187.5);
    expect(positionOrNaN(" 12.5 ", "ra")).toBeNaN();
    expect(positionOrNaN("north", "dec")).toBeNaN();
  });
});

describe("COORD_CONVERT reads its longitude as its from_frame says", () => {
  const { num } = sheetCalls("P18-CMB");
  test("equatorial: hours; galactic: degrees", () => {
    // the same direction converted to itself: lon unchanged (a rotation by the identity)
    expect(num("COORD_CONVERT", "12:00:00", 10, "equatorial", "equatorial", "lon")).toBeCloseTo(180, 9);
    expect(num("COORD_CONVERT", "12:00:00", 10, "galactic", "galactic", "lon")).toBeCloseTo(12, 9);
  });
});
