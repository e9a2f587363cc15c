import { describe, expect, test } from "vitest";
import { Cosmology } from "../core/distances/Cosmology.js";
import type { ModelParameters } from "../core/model/ModelParameters.js";
import { quotedText } from "../core/checks/quoted.js";
import { formatModelSpec, MissingParameterError, parseModelSpec, withChanges, type NamedModels } from "../core/model/modelSpec.js";
import { presets } from "../core/model/presets.js";
import { seededRandom } from "./helpers.js";

describe("model spec text", () => {
  test.each([
    // spec                                   canonical                         (our syntax, issue conventions)
    ["P18-BAO",                             "P18-BAO"],
    ["p18-bao ; h0 = 73",                      "P18-BAO; H0=73"],
    ["H0=70; Om=0.3; OL=0.7",                  "H0=70; Om=0.3; OL=0.7"],
    [" om = 0.30 ; H0=70.0 ;",                 "H0=70; Om=0.3"],
    ["H0=70; Om=0.3; Ok=0.1; Tcmb=2.7255",     "H0=70; Om=0.3; Ok=0.1; Tcmb=2.7255"],
    ["H0=70;Om=0.3;Tcmb=2.7;mnu=0,0.01,0.05",  "H0=70; Om=0.3; Tcmb=2.7; mnu=0.05,0.01"],
    ["P18-BAO; mnu=0",                      "P18-BAO; mnu=0"],
    ["W9-ALL; w0=-0.9; wa=0.1; Neff=3",         "W9-ALL; w0=-0.9; wa=0.1; Neff=3"],
    ["CONCORDANCE; H0=7e1",                    "CONCORDANCE"],
  ])("%s prints as %s", (spec, canonical) => {
    expect(formatModelSpec(parseModelSpec(spec))).toBe(canonical);
  });

  test("a spec without a preset means no radiation, Neff 3.046, no massive ν, Λ, flat", () => {
    const p = parseModelSpec("H0=70; Om=0.3");
    expect(p).toEqual({ H0: 70, Om: 0.3, w0: -1, wa: 0, Tcmb: 0, Neff: 3.046, mnu: [] });
    const m = new Cosmology(p);
    expect(m.OL).toBeCloseTo(0.7, 15);
    expect(m.Ok).toBe(0);
  });

  test("a key given to a preset replaces its value and keeps the rest (P18-BAO stays flat)", () => {
    const m = Cosmology.fromSpec("P18-BAO; Om=0.3");
    expect(m.Ok).toBe(0);
    expect(m.H0).toBe(67.66);
    expect(Cosmology.fromSpec("P18-BAO; OL=0.6").Ok).toBeCloseTo(1 - 0.3111 - 0.6 - m.Or, 14);
  });

  test.each([
    // spec                           message names
    ["",                             /empty model spec/],
    ["PLANK2018",                    /unknown preset "PLANK2018"/],
    ["H0=70; Om=0.3; Omega=1",       /unknown key "Omega"/],
    ["H0=70; Om=abc",                /Om: "abc" is not a number/],
    ["H0=70; Om=0,3",                /Om: "0,3" is not a number: use a point for decimals, 0.3/],
    ["H0=70; Om=0.3; OL=0.7; Ok=0",  /OL or Ok, not both/],
    ["Om=0.3",                       /H0 is required/],
    ["H0=70; H0=71; Om=0.3",         /H0 is given twice/],
    ["H0=70; Om=0.3; P18-BAO",    /"P18-BAO" is not key=value/],
    ["H0=70; Om=0.3; mnu=1,2,3,4",   /mnu: at most three/],
  ])("%j is rejected: %s", (spec, message) => {
    expect(() => parseModelSpec(spec)).toThrow(TypeError);
    expect(() => parseModelSpec(spec)).toThrow(message);
  });

  test("parse(print(p)) is p for 500 random parameter sets", () => {
    const rnd = seededRandom(20261201);
    const pick = <T>(xs: T[]): T => xs[Math.floor(rnd() * xs.length)];
    const num = () => Number((rnd() * 2 - 0.5).toPrecision(1 + Math.floor(rnd() * 17)));
    for (let i = 0; i < 500; i++) {
      const preset = pick([undefined, ...presets.map((x) => x.name)]);
      const base: ModelParameters = preset
        ? structuredClone(presets.find((x) => x.name === preset)!.parameters)
        : { H0: 50 + 50 * rnd(), Om: rnd(), w0: -1, wa: 0, Tcmb: 0, Neff: 3.046, mnu: [] };
      if (rnd() < 0.5) base.H0 = Number((40 + 60 * rnd()).toFixed(Math.floor(rnd() * 6)));
      if (rnd() < 0.3) base.Om = Math.abs(num());
      const curvature = rnd();
      if (curvature < 0.3) base.OL = num();
      else if (curvature < 0.5) base.Ok = num();
      if (rnd() < 0.3) base.w0 = -1 + num();
      if (rnd() < 0.3) base.wa = num();
      if (rnd() < 0.3) base.Tcmb = pick([0, 2.7255, 2.725, Math.abs(num())]);
      if (rnd() < 0.2) base.Neff = Math.abs(num()) * 4;
      if (rnd() < 0.3) base.mnu = pick([[], [0.06], [0.1, 0.05, 0.01], [0.3, 0.2]]);
      if (rnd() < 0.2) base.Ob = Math.abs(num()) / 10;
      const text = formatModelSpec(base);
      expect(parseModelSpec(text), text).toEqual(base);
    }
  });

  test("every preset's canonical spec is its name and rebuilds its parameters", () => {
    for (const p of presets) {
      expect(formatModelSpec(p.parameters)).toBe(p.name);
      expect(parseModelSpec(p.name)).toEqual(p.parameters);
    }
  });
});

describe("model spec text: the messages and the OL/Ok exchange", () => {
  /** A workbook's model with OL given, as the pane stores it (invented). */
  const team: NamedModels = {
    find: (name) => (name === "TEAM" ? { H0: 70, Om: 0.3, OL: 0.7, w0: -1, wa: 0, Tcmb: 0, Neff: 3.046, mnu: [] } : undefined),
    names: ["TEAM"],
  };
  const many: NamedModels = { find: () => undefined, names: Array.from({ length: 20 }, (_, i) => `M${i}`) };

  test.each([
    // spec               named   whole message (our own)
    [3 as never,          undefined, "model spec must be text"],
    ["H0=70=3",           undefined, "\"H0=70=3\" holds several keys: separate keys with ';', e.g. \"H0=70; Om=0.3; OL=0.7\""],
    ["=70",               undefined, "unknown key \"\": use H0, Om, OL, Ok, Ob, w0, wa, Tcmb, Neff, mnu"],
    ["NOPE",              many,      "unknown preset \"NOPE\": use one of P18-CMB, P18-BAO, P15-EXT, W9-ALL, W7-BAO, DESI2-CMB, DESI2-CMB-PP, DESI2-CMB-U3, DESI2-CMB-DY5, CONCORDANCE, EDS, M0 … and 19 more"],
    ["H0=70; Om=0.3; mnu=1,2,3,4", undefined, "mnu: at most three masses, got 4"],
  ])("%j", (spec, named, message) => {
    expect(() => parseModelSpec(spec, named)).toThrow(new TypeError(message));
  });

  test("a model named in the workbook with OL, given Ok, drops OL (and the other way round)", () => {
    const p = parseModelSpec("TEAM; Ok=0.1", team);
    expect([p.Ok, p.OL]).toEqual([0.1, undefined]);
    expect(() => new Cosmology(p)).not.toThrow();
    const back = withChanges(p, [[" ol ", " 0.6 "]]); // keys and values as typed, spaces and case aside
    expect([back.OL, back.Ok]).toEqual([0.6, undefined]);
    const again = withChanges(back, [["Ok", 0]]);
    expect([again.Ok, again.OL]).toEqual([0, undefined]);
  });

  test("spaces inside a key or a value are ignored, as between them", () => {
    expect(parseModelSpec("H 0 = 7 0 ; O m = 0 . 3").H0).toBe(70);
    expect(withChanges(parseModelSpec("P18-BAO"), [["H0", " 7 3 "]]).H0).toBe(73);
  });

  test("masses: none written as 0, several kept in decreasing order", () => {
    expect(formatModelSpec(parseModelSpec("P18-BAO; mnu=0"))).toBe("P18-BAO; mnu=0");
    expect(formatModelSpec(parseModelSpec("P18-BAO; mnu=0.01,0.06"))).toBe("P18-BAO; mnu=0.06,0.01");
    expect(formatModelSpec(parseModelSpec("P18-BAO; mnu=0.06"))).toBe("P18-BAO");
    expect(formatModelSpec(parseModelSpec("P18-BAO; mnu=0.05"))).toBe("P18-BAO; mnu=0.05"); // as many masses, another value
    // without a preset, H0 and Om are always written (they have no default)
    expect(formatModelSpec(parseModelSpec("H0=67.66; Om=0.3111"))).toBe("H0=67.66; Om=0.3111");
  });

  test("quoted text from a workbook is cut at 40 characters", () => {
    expect(quotedText("x".repeat(40))).toBe("x".repeat(40));
    expect(quotedText("x".repeat(41))).toBe(`${"x".repeat(39)}…`);
  });
});

describe("model spec text: more whole messages", () => {
  test("a mass that is not a number is named as mnu", () => {
    expect(() => parseModelSpec("H0=70; Om=0.3; mnu=0.06,abc")).toThrow(new TypeError(`mnu: "abc" is not a number`));
  });

  test("an unknown preset lists the presets, with no count of more when all fit", () => {
    const names = presets.map((p) => p.name);
    expect(names.length).toBeLessThanOrEqual(12);
    expect(() => parseModelSpec("NOPE")).toThrow(new TypeError(`unknown preset "NOPE": use one of ${names.join(", ")}`));
  });

  test("OL given on a named model that holds Ok replaces its Ok (and Ok its OL)", () => {
    const named: NamedModels = {
      find: (name) => (name.toLowerCase() === "curved" ? { H0: 70, Om: 0.3, Ok: 0.1, w0: -1, wa: 0, Tcmb: 0, Neff: 3.046, mnu: [] } : undefined),
      names: ["curved"],
    };
    const p = parseModelSpec("curved; OL=0.6", named);
    expect([p.OL, "Ok" in p]).toEqual([0.6, false]);
  });
});

describe("model spec text: slips that read as another number, or as nothing", () => {
  test.each([
    // spec                                whole message (our own)
    ["H0=70; Om=31.5%",                    'Om: "31.5%" is a percentage: write the fraction, Om=0.315'],
    ["P18-CMB; OL=68.5%",                  'OL: "68.5%" is a percentage: write the fraction, OL=0.685'],
    ["P18-CMB; Ok=-.5%",                   'Ok: "-.5%" is a percentage: write the fraction, Ok=-0.005'],
    ["P18-CMB; w0=90%",                    'w0: "90%" is a percentage: write w0 as a plain number'],
    ["Om=31.5%",                           'Om: "31.5%" is a percentage: write the fraction, Om=0.315'],   // the value before the missing H0
    ["H0=70; Om=31,5%",                    `Om: "31,5%" is not a number: use a point for decimals, 31.5%`],
    ["P18-CMB, H0=73",                     `"P18-CMB, H0=73": separate the parts with ';', e.g. "P18-CMB; H0=73"`],
    ["H0=70, Om=0.3; OL=0.7",              `"H0=70, Om=0.3": separate the parts with ';', e.g. "H0=70; Om=0.3"`],
    ["P18-CMB; H0=70, mnu=0.06,0.01",      `"H0=70, mnu=0.06,0.01": separate the parts with ';', e.g. "H0=70; mnu=0.06,0.01"`],
    ["H0=70; Om=0,3",                      `Om: "0,3" is not a number: use a point for decimals, 0.3`],       // a decimal comma is not a separator
    ["H0=73",                              'Om is required (or start from a preset, e.g. "P18-CMB; H0=73")'],
    ["Om=0.3; w0=-0.9",                    'H0 is required (or start from a preset, e.g. "P18-CMB; Om=0.3; w0=-0.9")'],
  ])("%j: %s", (spec, message) => {
    let thrown: unknown;
    try {
      parseModelSpec(spec);
    } catch (e) {
      thrown = e;
    }
    expect(thrown).toBeInstanceOf(TypeError);
    expect((thrown as Error).message).toBe(message);
  });

  test("a spec without H0 or Om says which is missing and keeps what it gave, as typed, for the message of a worksheet", () => {
    let e: unknown;
    try {
      parseModelSpec("h0 = 73 ; mnu=0.06,0.01");
    } catch (thrown) {
      e = thrown;
    }
    expect(e).toBeInstanceOf(MissingParameterError);
    expect((e as MissingParameterError).missing).toBe("Om");
    expect((e as MissingParameterError).given).toEqual([["H0", "73"], ["mnu", "0.06,0.01"]]);
  });

  test("an mnu list keeps its commas, alone or after other keys", () => {
    expect(parseModelSpec("P18-CMB; mnu=0.06,0.01").mnu).toEqual([0.06, 0.01]);
    expect(formatModelSpec(parseModelSpec("H0=70; Om=0.3; Tcmb=2.7255; mnu=0.05,0.01,0"))).toBe("H0=70; Om=0.3; Tcmb=2.7255; mnu=0.05,0.01");
  });
});
