/**
 * The help page is built from the same declarations and definitions as the add-in, so it cannot
 * drift: an entry for every worksheet function with an example, the example's value the one a cell
 * gives (checked for distances and times against the independent slow path), the presets as
 * core/model/presets.ts lists them, and nothing for contributors (no npm, no localhost, no source
 * files). Reads the tests' build (test-artifacts/build/help.html) and the generator itself.
 */
import { readFileSync } from "node:fs";
import { describe, expect, test } from "vitest";
import { presets } from "../core/index.js";
import { definitions } from "../functions/definitions.js";
import { functionEntries, guideSections } from "../scripts/helpPage.js";
import { publishedModels } from "./fixtures.js";
import { expectRelative } from "./helpers.js";
import { SlowCosmology } from "./reference/slowCosmology.js";
import { testBuildDir } from "./testBuild.js";

const page = () => readFileSync(`${testBuildDir}help.html`, "utf8");
/** The built page's text of one function's entry (the minifier may drop quotes around attributes). */
function entryOf(html: string, name: string): string {
  const start = html.search(new RegExp(`<article class="?fn"? id="?${name}"?[ >]`));
  expect(start, name).toBeGreaterThanOrEqual(0);
  return html.slice(start, html.indexOf("</article>", start));
}

/** What contributors read and users of the add-in do not: commands, the local server, source files, API versions, issue numbers, measurements of the code. */
const contributorText =
  /localhost|127\.0\.0\.1|\bnpm\b|DEVELOPERS|CHANGELOG|\btest\/|\.test\.ts|\b\w+\.(?:ts|mjs)\b|taskpane\.html|git clone|For contributors|Stryker|vitest|ExcelApi|OfficeDev|office-js \d|\b2-core\b|two-core|\bcompiled\b/;

/** An entry's text as a reader sees it: tags dropped, entities read, spaces collapsed. */
const textOf = (html: string) =>
  html.replace(/<[^>]+>/g, " ").replaceAll("&quot;", '"').replaceAll("&lt;", "<").replaceAll("&gt;", ">").replaceAll("&amp;", "&").replace(/\s+/g, " ").replace(/ ([,.:)])/g, "$1").trim();

describe("help page", () => {
  test("every worksheet function has an entry with an example from its declaration, and nothing else has one", async () => {
    const entries = await functionEntries();
    expect(entries.map((e) => e.name).sort()).toEqual(Object.keys(definitions).sort());
    const missing = entries.filter((e) => !e.example).map((e) => `${e.name}: add "@example =ZC.${e.name}(…)" to its declaration`);
    expect(missing).toEqual([]);
    for (const e of entries) expect(e.example, e.name).toMatch(new RegExp(`^=ZC\\.${e.name}\\(`));
  });

  test("every example computes: a value, no error, and an entry says what it computes and how", async () => {
    for (const e of await functionEntries()) {
      expect(e.explanation?.isError, `${e.example} gave ${e.explanation?.result}`).toBe(false);
      expect(e.cells!.flat().every((c) => typeof c === "number" || (typeof c === "string" && c !== "")), e.name).toBe(true);
      expect(e.explanation!.summary, e.name).not.toBe("");
      expect(e.explanation!.methodPlain, e.name).not.toBe("");
      for (const p of e.parameters) expect(p.description, `${e.name} ${p.name}`).not.toBe("");
    }
  });

  test.each([
    // example in the page        | expected under P18-CMB from the independent slow path, parameters of Planck 2018 VI Table 2
    ["=ZC.DIST_LUM(1)",            (s: SlowCosmology) => `${s.luminosityDistanceMpc(1)} Mpc`],
    ["=ZC.DIST_ANG(1.5)",          (s: SlowCosmology) => `${s.angularDiameterDistanceMpc(1.5)} Mpc`],
    ["=ZC.LOOKBACK(2)",            (s: SlowCosmology) => `${s.lookbackTimeGyr(2)} Gyr`],
    ["=ZC.AGE()",                  (s: SlowCosmology) => `${s.ageGyr(0)} Gyr`],
  ])("the built page shows %s with the value a cell gives (6 significant digits)", (example, expected) => {
    const slow = new SlowCosmology(publishedModels["P18-CMB"]);
    const name = /ZC\.(\w+)/.exec(example)![1];
    const entry = entryOf(page(), name);
    expect(entry).toContain(`<code>${example}</code>`);
    const [, shown, unit] = /<output>([-\d.E+]+) (\w+)<\/output>/.exec(entry)!;
    const [value, expectedUnit] = expected(slow).split(" ");
    expect(unit).toBe(expectedUnit);
    expectRelative(Number(shown), Number(value), 5e-6, example); // the page shows 6 significant digits
  });

  test("the page says which model every example assumes, and the default model in words", () => {
    const html = page();
    expect(html).toMatch(/P18-CMB: flat: matter \+ Λ \+ radiation; H0 = 67\.36 km\/s\/Mpc/);
    expect(entryOf(html, "DIST_LUM")).toMatch(/under <code>P18-CMB<\/code>, the workbook's model \(the formula names none\)/);
    expect(textOf(entryOf(html, "DIST_TRANS"))).toContain('gives 5115.74 Mpc under H0=70; Om=0.3; Ok=0.1, named in the formula.');
    // a default model paragraph that does not claim every example for itself
    expect(html).toContain("An example below that names no model is computed under it");
  });

  test("a restatement between two models names both: the result under to_model, restated from from_model (the pane's From model and To model)", () => {
    expect(textOf(entryOf(page(), "RESCALE"))).toContain(
      "gives 3.33831E+44 (in the value's own unit) under P18-CMB (to_model: the workbook's model), restated from W7-BAO (from_model).",
    );
  });

  test("a model's conventions are the example's, beside it, not the function's: DIST_TRANS, DESCRIBE and RESCALE have none of their own", () => {
    const html = page();
    for (const name of ["DIST_TRANS", "DESCRIBE", "RESCALE"]) expect(entryOf(html, name), name).not.toMatch(/<strong>Convention<\/strong>/);
    expect(textOf(entryOf(html, "DIST_TRANS"))).toContain("Under H0=70; Om=0.3; Ok=0.1: Radiation off (Tcmb = 0): no photons, no neutrinos. Curvature Ωk = 0.1.");
    expect(textOf(entryOf(html, "RESCALE"))).toContain("Under W7-BAO: Radiation on: photons at Tcmb = 2.725 K and neutrinos with Neff = 3.04");
    // a convention of the function itself stays with it
    expect(textOf(entryOf(html, "KCORRECTION"))).toContain("Convention K-correction sign: M = m − μ − K");
  });

  test("a text result is not said to be under a model: MODEL and DESCRIBE give text", () => {
    const html = page();
    expect(textOf(entryOf(html, "MODEL"))).toContain('gives "P18-BAO; H0=73".');
    expect(textOf(entryOf(html, "DESCRIBE"))).not.toMatch(/ under /);
  });

  test.each([
    // function        the unit its example's value is shown with (the function's result unit, or the unit its arguments give)
    ["MODULUS",         "mag"],
    ["KCORRECTION",     "mag"],
    ["MAG_ABS",         "mag"],
    ["MAG_AB",          "mag"],
    ["FLUX_AB",         "uJy"],
    ["EXTINCTION",      "mag"],
    ["DIMMING",         "mag"],
    ["CMB_TEMP",        "K"],
    ["BRIGHTNESS_TEMP", "K"],
    ["SURFACE_LUM",     "Lsun/pc2"],
    ["SURFACE_MAG",     "mag/arcsec2"],
    ["COORD_DEG",       "deg"],
    ["COORD_CONVERT",   "deg"],
    ["OBSERVED_FRAME",  "GHz"],
    ["LUMINOSITY_REST", "W/Hz"],
    ["LUMINOSITY_REST_ERR", "W/Hz"],
    ["LUMINOSITY_NU",   "W/Hz"],
    ["PARAM",           "Gyr"],
    ["SIGMA_CRIT",      "Msun/pc2"],
  ])("%s: the example's value has its unit, %s", (name, unit) => {
    expect(entryOf(page(), name)).toMatch(new RegExp(`<output>-?[\\d.]+(?:E[+-]\\d+)? ${unit.replace("/", "\\/")}</output>`));
  });

  test("a table's result has its columns named: LUMINOSITY_FUNCTION's low, high, N, Φ, σ_Φ", () => {
    const entry = entryOf(page(), "LUMINOSITY_FUNCTION");
    // the minifier drops optional end tags: the head runs to the body
    const head = /<thead>(.*?)<tbody>/.exec(entry.slice(entry.indexOf("Result of the example")))![1];
    expect(textOf(head)).toBe("low high N Φ σ_Φ");
  });

  test("DESCRIBE says a model has massive neutrinos only where it has them", () => {
    const html = page();
    expect(textOf(entryOf(html, "DESCRIBE"))).toContain("Om = 0.2865 (matter);"); // W9-ALL: massless neutrinos (Hinshaw et al. 2013 Table 4)
    expect(html).toMatch(/P18-CMB: flat: matter \+ Λ \+ radiation; H0 = 67\.36 km\/s\/Mpc; Om = 0\.3153 \(matter incl\. massive ν\)/); // one 0.06 eV neutrino
  });

  test("the if-omitted column says what leaving an argument out means, from the definitions: never none or not given", async () => {
    const entries = await functionEntries();
    const vague = entries.flatMap((e) => e.parameters.filter((p) => p.optional && ["none", "not given", "optional", "required", ""].includes(p.ifOmitted)).map((p) => `${e.name} ${p.name}`));
    expect(vague).toEqual([]);
    const omitted = (name: string, arg: string) => entries.find((e) => e.name === name)!.parameters.find((p) => p.name === arg)!.ifOmitted;
    expect([
      omitted("INDEX_BETWEEN", "band_unit"), omitted("MAG_AB", "unit"), omitted("LUMINOSITY_REST", "out_unit"), omitted("EXTINCTION", "wavelength_unit"),
      omitted("EXTINCTION", "law"), omitted("VELOCITY", "convention"), omitted("SIGMA_CRIT", "coordinates"), omitted("GROWTH", "neutrinos"),
    ]).toEqual(['"GHz"', '"Jy"', '"W/Hz"', '"Angstrom"', '"Fitzpatrick 1999"', '"optical"', '"physical"', '"smooth"']);
    expect(omitted("EXTINCTION", "r_v")).toBe("3.1, or 4.05 (R′_V) for Calzetti 2000");
    expect(omitted("DIMMING", "alpha")).toBe("bolometric");
    expect(omitted("COORD_TEXT", "decimals")).toBe("2 for ra (0.01 s), 1 for dec (0.1″)");
    expect(omitted("CHI2_MODULUS", "offset")).toBe("the best one (fitted)");
    expect(omitted("MODEL", "base")).toBe("blank: the workbook's model (P18-CMB unless one is applied)");
    expect(omitted("MODEL", "key1")).toBe("required");
    expect(omitted("MODEL", "value2")).toBe("no change");
  });

  test("the declarations and the definitions list the arguments in the same order (the help pairs them by place)", async () => {
    for (const e of await functionEntries()) {
      const names = definitions[e.name].args.map((a) => a.name);
      expect(e.parameters.map((p) => p.name), e.name).toEqual(e.name === "MODEL" ? ["base", ...names.slice(1)] : names);
    }
  });

  test("descriptions show no Markdown: no backticks", async () => {
    for (const e of await functionEntries()) {
      expect(e.description, e.name).not.toContain("`");
      for (const p of e.parameters) expect(p.description, `${e.name} ${p.name}`).not.toContain("`");
    }
  });

  test("the page tells the truth about error messages: a #NUM! shows none in Excel, the pane shows every one, with the source", () => {
    const text = textOf(page());
    expect(text).toContain("Excel shows the message of a #VALUE! or #N/A when you hover over the cell's error flag; for a #NUM! it shows none");
    expect(page()).toMatch(/href="?https:\/\/learn\.microsoft\.com\/javascript\/api\/custom-functions-runtime\/customfunctions\.errorcode"?/);
    expect(text).not.toMatch(/Hover over an error to read its message/);
    expect(text).not.toMatch(/unverified/);
  });

  test("the presets are listed from core/model/presets.ts with their sources and former names", () => {
    const html = page().replaceAll("&amp;", "&"); // the build's minifier writes a bare & where HTML allows it
    for (const p of presets) {
      expect(html).toContain(`<code>${p.name}</code>`);
      expect(html).toContain(p.description);
    }
    expect(html).toContain("called DR2-CMB in zcell 0.2");
  });

  test("the users' sections are there, the contributors' are not, and the page holds no contributor text", () => {
    const html = page();
    for (const heading of [...guideSections.before, ...guideSections.after, "Worksheet functions", "Reporting a problem", "What zcell computes"]) {
      expect(html, heading).toMatch(new RegExp(`<h[23] id="?[a-z-]+"?>${heading}</h[23]>`));
    }
    for (const heading of ["Install and start", "Testing", "For contributors", "A quick tour", "Function reference"]) expect(html, heading).not.toContain(`>${heading}`);
    expect(contributorText.exec(html)?.[0]).toBeUndefined();
  });

  test("the contributor-text check finds what it is there for", () => {
    for (const text of ["npm start", "https://localhost:3000", "see DEVELOPERS.md", "as test/astropy.test.ts does", "scripts/start.mjs", "cited beside the policy in taskpane/taskpane.html", "(ExcelApi 1.20)", "OfficeDev/office-js 6355", "medians measured on a 2-core machine", "before the code is compiled"]) {
      expect(contributorText.test(text), text).toBe(true);
    }
    for (const text of ["=ZC.DIST_LUM(1)", "Planck 2018 VI, A&A 641, A6", "erg/s/cm2", "P18-CMB; H0=73"]) expect(contributorText.test(text), text).toBe(false);
  });
});
