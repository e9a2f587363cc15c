/**
 * The two accessors of functions/definitions/argumentKinds.ts that a definition calls with its own
 * argument specs: textOr reads a text argument or its typed default, givenIn names the number
 * arguments a text unit applies to. A spec they cannot serve is a definition's mistake, refused at
 * once with the argument's name (not a blank read as undefined).
 */
import { describe, expect, test } from "vitest";
import type { ArgSpec } from "../functions/FunctionDef.js";
import { bandUnit, givenIn, num, optionalAlpha, textOr, textUnit, textWithDefault } from "../functions/definitions/argumentKinds.js";

describe("textOr: the text given, or the default one could have typed", () => {
  const convention = textWithDefault("convention", "optical", { choices: ["optical", "radio"] });
  test.each([
    // given           text read
    ["radio",          "radio"],
    ["",               "optical"],
    [undefined,        "optical"],
  ])("a text argument with typed default \"optical\" given %j reads %j", (given, read) => {
    expect(textOr({ convention: given }, convention)).toBe(read);
  });

  test.each([
    // spec without a typed default                                                         why
    [textUnit("unit", { words: "the quantity's default unit" }),                            "a text blank described in words"],
    [optionalAlpha,                                                                          "a number blank described in words"],
    [{ kind: "number", name: "offset", blank: { typed: "0" } } as unknown as ArgSpec,        "a number argument, even with a typed blank"],
    [{ kind: "text", name: "frame" } as ArgSpec,                                             "a text argument with no blank meaning"],
  ])("a blank read through %o is refused naming the argument (%s)", (spec, _why) => {
    expect(() => textOr({}, spec)).toThrow(new Error(`${spec.name} has no default`));
  });
});

describe("givenIn: a text unit with the number arguments given in it", () => {
  test("the band unit given in band1 and band2 keeps its name and typed default and names those two", () => {
    const spec = givenIn(bandUnit, "band1", "band2");
    expect(spec).toMatchObject({ kind: "text", name: "band_unit", blank: { typed: "GHz" }, unit: { applies: ["band1", "band2"] } });
  });

  test.each([
    [num("z"),                                                     "z"],
    [num("wavelength", { unit: "Angstrom" }),                      "wavelength"], // a number argument with a unit of its own
    [textWithDefault("law", "Fitzpatrick 1999", {}),               "law"],
  ])("%o is not a text unit: refused naming it", (spec, name) => {
    expect(() => givenIn(spec, "x")).toThrow(new Error(`${name} is not a text unit`));
  });
});
