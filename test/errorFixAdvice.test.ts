/**
 * The pane's "How to fix" for a cell that shows an error (taskpane/errorAdvice.ts, through the cell
 * inspector): which argument the message is about, and the advice of that argument's kind, its
 * domain and its unit. The messages are the functions' own (functions/messages.ts and the core's
 * checks); the advice texts are the pane's, pinned here as its interface, each written out whole.
 */
import { describe, expect, test, vi } from "vitest";
import { definitions } from "../functions/definitions.js";
import type { FunctionDef } from "../functions/FunctionDef.js";
import type { ReferenceReader } from "../taskpane/explainCall.js";

/**
 * The inspector, or the advice alone, loaded afresh inside the running test. The advice's patterns
 * are built when its module loads, and mutation testing (per-test coverage) credits code run while a
 * module loads only to the test that loads it: each test here loads it, so each can kill a change to
 * those patterns.
 */
async function fresh() {
  vi.resetModules();
  const { explainFormula } = await import("../taskpane/explainCall.js");
  const { adviseOnError } = await import("../taskpane/errorAdvice.js");
  return { explainFormula, adviseOnError };
}

const blanks: ReferenceReader = async () => ({ cells: 1, values: [[""]] });
const active = { spec: "P18-CMB", stored: false };

/** The pane's fault line for the first call of `formula`: the argument named and the fix. */
async function faultOf(formula: string) {
  const { explainFormula } = await fresh();
  const [call] = await explainFormula(formula, blanks, active);
  expect(call.isError, formula).toBe(true);
  return { argument: call.fault?.argument, fix: call.fault?.fix };
}

const modelAdvice =
  'Give a preset name (ZC.PRESETS() lists them) or a spec such as "P18-CMB; H0=70", or leave it blank for the workbook\'s model; a model needs a big bang (check Om, OL or Ok, w0, wa).';
const sexagesimal =
  "or as sexagesimal text: a right ascension in hours (12:30:49.4, 12h30m49.4s, 12 30 49.4), a declination in degrees (+12:23:28, -05d07m, −05°07′); minutes and seconds below 60, one sign, a declination within ±90°.";
const redshiftAdvice = (z: string) =>
  `Give ${z} a redshift ≥ 0 (> 0 where the result needs the source's distance; a blueshifted source needs a distance that does not come from its redshift).`;
const kindAdvice = {
  value: "An argument is not of its kind (a number, a unit, a model or one of its words): compare the order of the arguments with the function's help.",
  na: "No value answers these arguments in this model: change the value asked for, its unit, or the model.",
};

describe("a number outside its domain: the domain in words, in the unit it is read in", () => {
  //  formula                                            argument        the whole "How to fix" line
  const cases: [string, string, string][] = [
    ["=ZC.LUMINOSITY(-1,0.5)",                           "flux",         "Give flux a value ≥ 0 in the unit of flux_unit (default erg/s/cm2)."],
    ["=ZC.LUMINOSITY_ERR(1,-1,0.5,0.1)",                 "flux_err",     "Give flux_err a value ≥ 0 in the unit of flux_unit (default erg/s/cm2)."], // one unit for a value and its error
    ["=ZC.MAG_AB(-1)",                                   "flux_density", "Give flux_density a value > 0 in the unit of unit (default Jy)."],            // a text unit with a default
    ["=ZC.INDEX_BETWEEN(1,0,1,2)",                       "band1",        "Give band1 a value > 0 in the unit of band_unit (default GHz)."],
    ["=ZC.LUMINOSITY_NU_ERR(1,0.1,0.5,0.01,0,-1)",       "alpha_err",    "Give alpha_err a value ≥ 0."],                                               // no unit converts it
    ["=ZC.EXTINCTION(5000,-0.1)",                        "ebv",          "Give ebv a value ≥ 0."],
    ["=ZC.FLUX_AB(20,,0)",                               "wavelength",   "Give wavelength a value > 0."],                                              // a text unit that converts no number
    ["=ZC.VELOCITY(-2)",                                 "z",            "Give z a value > -1."],
    ["=ZC.REDSHIFT_CMB(0.1,10,99)",                      "dec",          "Give dec a value from -90 to the pole, 90° in the unit of angle_unit (default deg)."], // "99" is no magnitude flag here
    ["=ZC.VOLUME_SHELL(0.1,0.2,50000)",                  "area",         "Give area a value from 0 to the whole sky in the unit of area_unit (default deg2)."],
    ["=ZC.COORD_TEXT(10,\"ra\",12)",                     "decimals",     "Give decimals a value from 0 to nine decimals."],
  ];
  test.each(cases)("%s", async (formula, argument, fix) => {
    expect(await faultOf(formula)).toEqual({ argument, fix });
  });

  test("a message that does not say the value is outside the domain gets no domain", async () => {
    // mu_err has no domain of its own in the definition; its message says what it must be
    expect(await faultOf("=ZC.CHI2_MODULUS(1,40,0)")).toEqual({ argument: "mu_err", fix: "Change mu_err: the message says what it must be." });
  });
});

describe("a redshift, a magnitude flag, a sexagesimal angle, text where a number belongs", () => {
  //  formula                                                        argument   the whole "How to fix" line
  const cases: [string, string, string][] = [
    ["=ZC.DIST_LUM(-99)",                                            "z",       redshiftAdvice("z")],           // -99 in a redshift is no magnitude flag
    ["=ZC.OMEGA(\"matter\",-2)",                                     "z",       redshiftAdvice("z")],
    ["=ZC.MAG_ABS(-99,0.5,0)",                                       "m",       "±99 and any |m| ≥ 50 mark a missing magnitude in a catalogue: enter the measured value, or leave the cell blank for a blank result."],
    ["=ZC.MAG_ABS(\"abc\",0.5,0)",                                   "m",       "Give m a number; text that is not a number is refused."],
    ["=ZC.DIST_LUM(\"abc\")",                                        "z",       "Give z a number; text that is not a number is refused."],
    ["=ZC.OMEGA(\"matter\",\"abc\")",                                "z",       "Give z a number; text that is not a number is refused."],
    ["=ZC.ANGLE(30,\"abc\")",                                        "z",       "Give z a number; text that is not a number is refused."], // size_unit converts size, not z
    ["=ZC.ANGLE(\"abc\",1)",                                         "size",    "Give size a number in the unit of size_unit (default kpc); text that is not a number is refused."],
    ["=ZC.REDSHIFT_CMB(0.1,\"12:75\",10)",                           "ra",      `Give ra as a number in the unit of angle_unit (default deg), ${sexagesimal}`],
    ["=ZC.COORD_CONVERT(\"12:75\",10,\"equatorial\",\"galactic\",\"lon\")", "lon", `Give lon as a number in degrees, ${sexagesimal}`],
  ];
  test.each(cases)("%s", async (formula, argument, fix) => {
    expect(await faultOf(formula)).toEqual({ argument, fix });
  });
});

describe("the argument a message is about: named as a whole word, or the model by its parameters", () => {
  //  formula                                      argument    the whole "How to fix" line
  const cases: [string, string | undefined, string][] = [
    // "mu" stands inside "mu_err" and "must": neither is the argument mu
    ["=ZC.CHI2_MODULUS(1,40,0)",                   "mu_err",   "Change mu_err: the message says what it must be."],
    // a parameter first in the message ("H0 must be …") is the model's
    ["=ZC.MODEL(,\"H0\",-5)",                      "model",    modelAdvice],
    // a parameter inside the message ("… use H0, Om, …"): the model, with the message's own fix
    ["=ZC.MODEL(,\"foo\",5)",                      "model",    "Use H0, Om, OL, Ok, Ob, w0, wa, Tcmb, Neff, mnu."],
    ["=ZC.DIST_LUM(1,\"P99\")",                    "model",    "Use one of P18-CMB, P18-BAO, P15-EXT, W9-ALL, W7-BAO, DESI2-CMB, DESI2-CMB-PP, DESI2-CMB-U3, DESI2-CMB-DY5, CONCORDANCE, EDS."],
    ["=ZC.DIST_LUM(1,\"H0=70; x\")",               "model",    modelAdvice],
    ["=ZC.DIST_LUM(1,\"H0=70; Om=30\")",           "model",    modelAdvice],
    // "in this model" names no argument: the advice of the error kind
    ["=ZC.REDSHIFT(1E5,\"DIST_ANG\")",             undefined,  kindAdvice.na],
    // a value of ZC.MODEL without its key: the advice of its kind
    ["=ZC.MODEL(,\"H0\",70,,5)",                   "value2",   kindAdvice.value],
  ];
  test.each(cases)("%s", async (formula, argument, fix) => {
    expect(await faultOf(formula)).toEqual({ argument, fix });
  });
});

describe("a message read on its own (any text a cell holds)", () => {
  const def = definitions.DIST_LUM;
  //  kind     message as the cell holds it                                argument    fix
  const cases: ["value" | "num" | "na", string, string | undefined, string][] = [
    ["num",    "ZC.DIST_LUM: Om = 30 is too much",                          "model",    modelAdvice],
    ["num",    "ZC.DIST_LUM: model: too long",                              "model",    modelAdvice],   // "model:" names the argument
    ["na",     "ZC.DIST_LUM: nothing at z = 3 in this model",               "z",        redshiftAdvice("z")],
    ["na",     "ZC.DIST_LUM: nothing in this model",                        undefined,  kindAdvice.na], // "model" without ":" is no argument
    ["num",    "ZC.DIST_LUM: xOm and Om2 and .Om are no parameters",        undefined,  "A value lies outside its physical domain, or the result does: the message says which."],
    ["value",  "ZC.DIST_LUM: give OL or Ok, not both",                      "model",    modelAdvice],   // the message's first words are not its fix
    ["value",  "ZC.DIST_LUM: unit: give it in Mpc",                         "unit",     "Give unit in Mpc."],
    ["value",  "ZC.DIST_LUM: z: use 1, or give it 2",                       "z",        "Use 1, or give it 2."],   // only a fix's first words name the argument
    ["value",  "ZC.DIST_LUM: the sky: give it a rest",                      undefined,  "Give it a rest."],        // no argument to name
    ["na",     "ZC.DIST_LUM: the sky: check the sky",                       undefined,  "Check the sky."],
  ];
  test.each(cases)("%s %s", async (kind, message, argument, fix) => {
    const { adviseOnError } = await fresh();
    const advice = adviseOnError(def, kind, message);
    expect(advice).toEqual(argument === undefined ? { fix } : { argument, fix });
  });
});

describe("a fix is looked for only outside the texts a message quotes", () => {
  const def = definitions.DIST_LUM;
  // A message may show a typed text rewritten (a spec's "," as "; "): the typed text alone cannot
  // tell that its words are quoted, the count of quotes before them does.
  //  message as the cell holds it                                   typed texts       advice
  const cases: [string, string[], { argument?: string; fix: string }][] = [
    ['ZC.DIST_LUM: model: "a; give me" is not a model',              ["a,give me"],    { argument: "model", fix: modelAdvice }],
    ['ZC.DIST_LUM: "a; give me" is not a model',                     ["a,give me"],    { fix: kindAdvice.value }], // a quote as the first character
    ['ZC.DIST_LUM: model: "a; give me" or "b": use P18-CMB',         ["a,give me"],    { argument: "model", fix: "Use P18-CMB." }], // after both quoted texts
    ['ZC.DIST_LUM: model: "x": give one model',                      [],               { argument: "model", fix: "Give one model." }],
  ];
  test.each(cases)("%s", async (message, typed, advice) => {
    const { adviseOnError } = await fresh();
    expect(adviseOnError(def, "value", message, typed)).toEqual(advice);
  });
});

describe("the message's own fix, where it names one, is what the pane says", () => {
  //  formula                                          argument       the whole "How to fix" line (the message's words, functions/messages.ts)
  const cases: [string, string, string][] = [
    ["=ZC.EXTINCTION(0.55,0.1)",                       "wavelength",  'If 0.55 is in um, give "um" as wavelength_unit (5th argument).'],
    ['=ZC.REDSHIFT_CMB(0.01,12,10,"hours")',           "angle_unit",  'For a right ascension in hours use "hourangle".'],
    ['=ZC.DIST_LUM(1,,"mpc")',                         "unit",        "Did you mean Mpc?"],
    ['=ZC.FLUX_AB(20,"erg/s/cm2/Angstrom")',           "wavelength",  "Give wavelength in Angstrom (the last argument), for f_ν = f_λ λ²/c."],
    ['=ZC.DIST_LUM(1,"  ;  ")',                        "model",       "Give a preset name or key=value pairs."],
    ['=ZC.HALO_RADIUS(1e12,0.5,"x")',                  "definition",  "Use vir, 200c, 500c, 200m or any <N>c, <N>m."],
  ];
  test.each(cases)("%s", async (formula, argument, fix) => {
    expect(await faultOf(formula)).toEqual({ argument, fix });
  });
});

describe("a unit argument or a text unit that is not understood", () => {
  //  formula                                          argument      the whole "How to fix" line
  const cases: [string, string, string][] = [
    ['=ZC.LUMINOSITY(1,0.5,,"furlong")',               "flux_unit",  'Type a unit in its FITS spelling, case as shown (default "erg/s/cm2"); the Units section of the help lists them, and the message names the nearest ones.'],
    ['=ZC.MAG_AB(1,"furlong")',                        "unit",       'Type a unit in its FITS spelling, case as shown (default "Jy"); the Units section of the help lists them.'],
    ['=ZC.REDSHIFT(1,"DIST_LUM",,"furlong")',          "unit",       "Type a unit in its FITS spelling, case as shown; the Units section of the help lists them."], // its blank has no one unit
    ['=ZC.CONVERT(1,"Mpc","furlong")',                 "to",         "Type a unit in its FITS spelling, case as shown; the Units section of the help lists them."],
    ['=ZC.OMEGA("dust",1)',                            "component",  "Use one of: matter, cold, darkenergy, curvature, radiation, photons, neutrinos."],
  ];
  test.each(cases)("%s", async (formula, argument, fix) => {
    expect(await faultOf(formula)).toEqual({ argument, fix });
  });
});

describe("advice for any function's definition, not only the listed ones", () => {
  // Invented definitions: the advice reads a definition as data, so these are what a new function meets.
  const def = (args: FunctionDef["args"]): FunctionDef => ({ name: "INVENTED", args });
  //  arguments                                                                             message                                   argument  fix
  const cases: [FunctionDef["args"], string, string, string][] = [
    // a name with a z inside is no redshift
    [[{ kind: "number", name: "dz" }],                                                      "ZC.INVENTED: dz = 1 is wrong",           "dz",     "Change dz: the message says what it must be."],
    // bounded above only: no least value is made up
    [[{ kind: "number", name: "x", max: { value: 1, what: "1" } }],                         "ZC.INVENTED: x = 2 is above 1",          "x",      "Change x: the message says what it must be."],
    // a text unit that converts nothing (no `applies`) before the unit of x: x has no unit
    [[{ kind: "number", name: "x", min: 0 }, { kind: "text", name: "to", unit: {} }],       "ZC.INVENTED: x = -1 must be ≥ 0",        "x",      "Give x a value ≥ 0."],
    // a number or text argument: the advice of the error kind
    [[{ kind: "numberOrText", name: "v" }],                                                 "ZC.INVENTED: v is wrong",                "v",      "A value lies outside its physical domain, or the result does: the message says which."],
  ];
  test.each(cases)("%j: %s", async (args, message, argument, fix) => {
    const { adviseOnError } = await fresh();
    expect(adviseOnError(def(args), "num", message)).toEqual({ argument, fix });
  });

  test("a function's name is read as text, not as a pattern: its name before the message is no place for a fix", async () => {
    const { adviseOnError } = await fresh();
    const dotted: FunctionDef = { name: "X.Y", args: [{ kind: "number", name: "x" }] };
    // "ZC.X.Y: " is the name; the message itself starts with "give", which follows no ": " of its own
    expect(adviseOnError(dotted, "num", "ZC.X.Y: give it a try")).toEqual({ fix: "A value lies outside its physical domain, or the result does: the message says which." });
    expect(adviseOnError(dotted, "num", "ZC.XzY: give it a try")).toEqual({ fix: "Give it a try." }); // another function's name is part of the message
  });
});
