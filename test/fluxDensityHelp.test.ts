/**
 * A radio flux density typed without its unit is read as Jy, while catalogues often give mJy: the
 * description Excel shows while the argument is typed (the @param text, recorded in functions.json)
 * says so for every flux-density argument, naming that function's own unit argument.
 */
import { readFileSync } from "node:fs";
import { describe, expect, test } from "vitest";
import { scaledConversion } from "../core/index.js";
import { definitions } from "../functions/definitions.js";
import type { ArgSpec } from "../functions/FunctionDef.js";

type Metadata = { functions: { id: string; parameters: { name: string; description: string }[] }[] };
// the build's functions.json, sorted by id; test/hostSimulation.test.ts checks that the build still gives it
const metadata = JSON.parse(readFileSync(new URL("./fixtures/functions.metadata.json", import.meta.url), "utf8")) as Metadata;

const isFluxDensity = (unit: string) => {
  try {
    scaledConversion(unit, "Jy");
    return true;
  } catch {
    return false;
  }
};

/** Every argument that takes a flux density: those a flux-density unit argument applies to, and any named like one. */
function fluxDensityArguments(): { fn: string; arg: string; unitArg: string | undefined }[] {
  const found: { fn: string; arg: string; unitArg: string | undefined }[] = [];
  for (const [fn, def] of Object.entries(definitions)) {
    const units = def.args.filter((a): a is Extract<ArgSpec, { kind: "unit" }> => a.kind === "unit" && a.applies !== "result" && isFluxDensity(a.unit));
    // a unit read as text in each cell (MAG_AB's unit, which may be per wavelength) is the function's `unit` argument
    const textUnit = def.args.find((a) => a.kind === "text" && /^(flux_)?unit$/.test(a.name))?.name;
    const unitOf = (name: string) => units.find((u) => (typeof u.applies === "string" ? [u.applies] : u.applies).includes(name))?.name ?? (/flux_density/.test(name) ? textUnit : undefined);
    for (const arg of def.args) {
      if (arg.kind === "unit" || arg.kind === "model") continue;
      const unitArg = unitOf(arg.name);
      if (unitArg !== undefined || /flux_density/.test(arg.name)) found.push({ fn, arg: arg.name, unitArg });
    }
  }
  return found;
}

describe("flux-density arguments say they are read in Jy", () => {
  test("the arguments found are the ones of the radio and AB functions (the search is not empty)", () => {
    expect(fluxDensityArguments().map(({ fn, arg }) => `${fn}.${arg}`).sort()).toEqual(expect.arrayContaining([
      "LUMINOSITY_NU.flux_density", "LUMINOSITY_REST.flux_density", "MAG_AB.flux_density", "REDSHIFT_LIMIT_NU.flux_density_limit",
      "LUMINOSITY_NU_ERR.flux_density", "LUMINOSITY_NU_ERR.flux_density_err", "LUMINOSITY_REST_ERR.flux_density", "LUMINOSITY_REST_ERR.flux_density_err",
    ]));
  });

  test.each(fluxDensityArguments())("$fn: $arg names its unit argument and mJy, or says that only a ratio counts", ({ fn, arg, unitArg }) => {
    const description = metadata.functions.find((f) => f.id === fn)?.parameters.find((p) => p.name === arg)?.description;
    if (unitArg === undefined) {
      // a function of a ratio of two flux densities (INDEX_BETWEEN) reads no unit: both must be in the same one
      expect(description, `${fn}.${arg} takes a flux density but no unit argument applies to it`).toMatch(/in any unit, the same for both|in the unit of flux_density\d/);
      return;
    }
    expect(description).toContain(`in Jy unless ${unitArg} says otherwise (catalogues in mJy: give "mJy")`);
  });
});
