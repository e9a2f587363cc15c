/**
 * One default model everywhere: every text a person reads (messages, function help, README, the pane,
 * what the scripts print) that names a model as the default names P18-CMB; lists and suggestions put
 * it first; the README's example error is the one the default gives; and its comparison with astropy
 * names the preset that astropy's own Planck 2018 set is.
 */
import { readdirSync, readFileSync, statSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, test } from "vitest";
import { Cosmology, defaultPresetName, parseModelSpec, presets } from "../core/index.js";
import { defaultModelSpec } from "../functions/activeModel.js";
import { messages } from "../functions/messages.js";
import { relativeError } from "./helpers.js";
import { referenceAvailable, runPythonReference } from "./reference/python.js";
import { onFirstUse } from "./requirements.js";
import { sheetCalls } from "./sheetCalls.js";

const root = fileURLToPath(new URL("..", import.meta.url));

/** Every file whose text reaches a person: sources (messages, help texts), the pane, the scripts, the guides. CHANGELOG is history and may name the old default. */
function userFacingFiles(): string[] {
  const walk = (dir: string): string[] =>
    readdirSync(join(root, dir)).flatMap((name) => {
      const path = join(dir, name);
      return statSync(join(root, path)).isDirectory() ? walk(path) : /\.(ts|mjs|html|xml)$/.test(name) ? [path] : [];
    });
  return ["README.md", "DEVELOPERS.md", ...["core", "functions", "taskpane", "scripts", "manifest"].flatMap(walk)];
}

const names = presets.map((p) => p.name.replace(/[-]/g, "\\-")).sort((a, b) => b.length - a.length).join("|");
/** Ways a text says which model is the default (our wording, and the wording of the old texts). */
const sayingTheDefault = [
  // "P18-CMB (default)", "P18-CMB (the default)", "P18-CMB until you choose another", "P18-CMB unless the workbook …"
  new RegExp(`\\b(${names})\\b[\`"')]*\\s*(?:\\((?:the )?default|,? the default\\b|is the default|until (?:you|one|someone|another)|unless (?:the workbook|you|a formula))`, "gi"),
  // "the default model is P18-CMB", "default (P18-CMB)", "the default, P18-CMB"
  new RegExp(`\\bdefault(?: model| cosmology| preset)?(?:\\s*(?:is|=|:|,|\\())?\\s*[\`"'*]*(${names})\\b`, "gi"),
  // "falls back to P18-CMB", "defaults to P18-CMB"
  new RegExp(`(?:falls? back to|fallback(?: model)?(?: is)?:?|defaults? to)\\s*(?:the\\s+)?[\`"'*]*(${names})\\b`, "gi"),
];

/** The models a text names as the default, each with a few words around it. */
function defaultsNamed(text: string): { name: string; context: string }[] {
  const flat = text.replace(/\s+/g, " ");
  return sayingTheDefault.flatMap((pattern) =>
    [...flat.matchAll(pattern)].map((m) => ({ name: m[1].toUpperCase(), context: flat.slice(Math.max(0, m.index - 30), m.index + m[0].length + 10) })),
  );
}

describe("one default model, P18-CMB, everywhere", () => {
  test("the default of a new workbook is the core's default preset, first in the list of presets", () => {
    expect(defaultPresetName).toBe("P18-CMB"); // the default of 0.2.0 (CHANGELOG)
    expect(defaultModelSpec).toBe(defaultPresetName);
    expect(presets[0].name).toBe(defaultPresetName);
  });

  test("the detector finds a model named as the default in each wording the old texts used", () => {
    expect(defaultsNamed("Results use the workbook's cosmology (P18-BAO until you\n  choose another in the zcell pane).").map((d) => d.name)).toEqual(["P18-BAO"]);
    expect(defaultsNamed("| P18-BAO (default) | 67.66 |").map((d) => d.name)).toEqual(["P18-BAO"]);
    expect(defaultsNamed("using W9-ALL (the default) until one is applied").map((d) => d.name)).toEqual(["W9-ALL"]);
    expect(defaultsNamed("an unusable stored model falls back to the default model (P18-BAO)").map((d) => d.name)).toEqual(["P18-BAO"]);
    expect(defaultsNamed("`P18-BAO` — a preset; `P18-BAO; H0=73` — a preset with changes")).toEqual([]);
  });

  test("no text a person reads names another model as the default", () => {
    const wrong: string[] = [];
    const saying = new Set<string>();
    for (const file of userFacingFiles()) {
      for (const { name, context } of defaultsNamed(readFileSync(join(root, file), "utf8"))) {
        saying.add(file);
        if (name !== defaultPresetName) wrong.push(`${file}: …${context}…`);
      }
    }
    expect(wrong).toEqual([]);
    // the places known to name the default are read (the scan is not empty)
    for (const file of ["README.md", "DEVELOPERS.md", "scripts/start.mjs", "functions/activeModel.ts", "taskpane/taskpane.html"]) {
      expect([...saying], file).toContain(file);
    }
    expect(userFacingFiles()).toContain("functions/declarations/photometry.ts"); // the help texts of the functions
  });

  test("what npm start prints names the default", () => {
    const start = readFileSync(join(root, "scripts/start.mjs"), "utf8").replace(/\s+/g, " ");
    expect(start).toContain("Results use the workbook's cosmology (P18-CMB until you choose another in the zcell pane).");
  });

  test("PRESETS() and the unknown-preset message list the default first", () => {
    const { run, failure } = sheetCalls(defaultModelSpec);
    const table = run("PRESETS");
    expect(table[1][0]).toBe(defaultPresetName);
    expect(failure("DIST_LUM", 1, "P99").message).toBe(`ZC.DIST_LUM: model: unknown preset "P99": use one of ${presets.map((p) => p.name).join(", ")}`);
    expect(presets.map((p) => p.name).slice(0, 2)).toEqual(["P18-CMB", "P18-BAO"]);
  });

  test("a spec without Om suggests the default preset, and the fallback message names it (both whole)", () => {
    expect(() => parseModelSpec("H0=73")).toThrow(/^Om is required \(or start from a preset, e\.g\. "P18-CMB; H0=73"\)$/);
    expect(messages.activeModelFallback("x")).toBe("the workbook's stored cosmology could not be read (x); using P18-CMB (the default) until one is applied");
  });

  test("the README's example error is the one the default model gives", () => {
    const { failure } = sheetCalls(defaultModelSpec);
    const message = failure("REDSHIFT", 20, "LOOKBACK").message;
    // P18-CMB's age today, 13.7958 Gyr (Planck 2018 VI Table 2 gives 13.797 ± 0.023 Gyr for CMB + lensing)
    expect(message).toBe("ZC.REDSHIFT: LOOKBACK = 20 Gyr is not below the age of the universe in this model (13.7958 Gyr)");
    const readme = readFileSync(join(root, "README.md"), "utf8").replace(/\s+/g, " ");
    expect(readme).toContain(`\`${message}\` (under the default model, P18-CMB)`);
  });
});

type Reply = { results: Record<string, { luminosityDistanceMpc: number[]; ageGyr: number[] }> };

describe.runIf(referenceAvailable("astropy", "python3-astropy"))("the README's comparison with astropy's own Planck 2018 set", () => {
  const redshifts = [0.01, 0.1, 1];
  const reply = onFirstUse(() => runPythonReference<Reply>("astropy_reference.py", { cases: [{ id: "Planck18", realization: "Planck18", z: redshifts }] }));

  test("astropy's Planck18 is our P18-BAO (to 2e-5), and P18-CMB's distances are 0.4% longer at low z", () => {
    const astropy = reply().results.Planck18.luminosityDistanceMpc;
    const bao = Cosmology.fromSpec("P18-BAO");
    const cmb = Cosmology.fromSpec(defaultPresetName);
    redshifts.forEach((z, k) => expect(relativeError(bao.luminosityDistanceMpc(z), astropy[k]), `z = ${z}`).toBeLessThan(2e-5));
    const longer = redshifts.map((z, k) => Number(((cmb.luminosityDistanceMpc(z) / astropy[k] - 1) * 100).toFixed(2)));
    expect(longer).toEqual([0.44, 0.41, 0.2]); // % at z = 0.01, 0.1, 1, as the README states
    const readme = readFileSync(join(root, "README.md"), "utf8").replace(/\s+/g, " ");
    expect(readme).toContain("is our **P18-BAO**, not the default P18-CMB, whose distances are 0.4% longer at low z (0.44% at z = 0.01, 0.41% at z = 0.1, 0.2% at z = 1");
  });
});
