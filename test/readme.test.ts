/**
 * The README against the files it describes: the generated function reference, and the claims a
 * newcomer relies on (Node version, commands, packages CI installs, where builds and the server go).
 */
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { describe, expect, test } from "vitest";
import { functionReference, readmePath, withReference } from "../scripts/functionReference.js";
import { definitions } from "../functions/definitions.js";
import { fixedResultUnit } from "../taskpane/explainCall.js";
import { HostError } from "./reference/hostBundle.js";
import { evaluateFormula, sheetRuntime, type SheetValue } from "./sheetFormula.js";
import { testBuildDir } from "./testBuild.js";

const root = fileURLToPath(new URL("..", import.meta.url));
const readme = () => readFileSync(readmePath, "utf8");
const file = (path: string) => readFileSync(`${root}${path}`, "utf8");

describe("README", () => {
  test("its function reference matches the declarations in functions/declarations/ (run npm run docs after changing them)", async () => {
    const readme = readFileSync(readmePath, "utf8");
    expect(withReference(readme, await functionReference())).toBe(readme);
  });

  test("states the caution that results depend on the assumed cosmology", () => {
    expect(readFileSync(readmePath, "utf8")).toMatch(/Every number zcell gives depends on the assumed cosmology/);
  });

  test("names the Node version package.json requires, and the engines of the build tools allow it", () => {
    const pkg = JSON.parse(file("package.json")) as { engines: { node: string } };
    expect(pkg.engines.node).toBe(">=20.19");
    expect(readme()).toContain("**Node.js 20.19 or newer**");
    const lock = JSON.parse(file("package-lock.json")) as { packages: Record<string, { engines?: { node?: string } }> };
    expect(lock.packages["node_modules/vite"].engines?.node).toMatch(/\^20\.19\.0/);
  });

  test("every npm command it names is a script of package.json", () => {
    const scripts = Object.keys((JSON.parse(file("package.json")) as { scripts: Record<string, string> }).scripts);
    const named = new Set([...readme().matchAll(/npm (?:run )?([a-z:]+)/g)].map((m) => m[1]).filter((n) => !["install", "warns", "ci", "help", "approve"].includes(n))); // npm's own commands: install, ci, help, approve-scripts
    expect(named.size).toBeGreaterThan(5);
    for (const name of named) expect(scripts, name).toContain(name);
  });

  test("the Debian packages it says CI installs are the ones .ci/run installs", () => {
    const installed = /apt-get install -y -qq ([^>]+)>/.exec(file(".ci/run"))![1].trim().split(/\s+/);
    const [, said] = /`apt-get install ([^`]+)`/.exec(readme().replaceAll("\n", " "))!;
    expect(said.split(/\s+/).sort()).toEqual([...installed].sort());
  });

  test("where builds, tests and the server go is what the scripts do", () => {
    expect(readme()).toContain("it builds into\n`test-artifacts/build/`");
    expect(testBuildDir.endsWith("test-artifacts/build/")).toBe(true);
    expect(file("scripts/server.mjs")).toMatch(/\.listen\(Number\(portText\), "127\.0\.0\.1"/);
    expect(readme()).toContain("The server listens on 127.0.0.1 only");
    expect(file("scripts/serverState.mjs")).toContain("process.env.ZCELL_PORT");
    expect(file("scripts/start.mjs")).toContain('"--mode", "production", "--devtool", "source-map"');
  });
});

describe("README: Security", () => {
  test("its limits are the ones the code enforces", async () => {
    const { maxWorkbookModels, maxSpecLength } = await import("../functions/workbookModels.js");
    const { scanCellLimit, scanChunkCells } = await import("../taskpane/workbookScan.js");
    const { inspectorNestedCellLimit, inspectorReadLimit } = await import("../taskpane/explainCall.js");
    const { commentsLookedAtMost } = await import("../taskpane/excelHost.js");
    const text = readme().replace(/\s+/g, " ");
    expect(text).toContain(`The first ${maxWorkbookModels} workbook models`);
    expect(text).toContain(`${commentsLookedAtMost.toLocaleString("en-US")} comments of a sheet`);
    expect(text).toContain(`requests of at most ${scanChunkCells.toLocaleString("en-US")} cells`);
    expect(text).toContain(`up to ${inspectorNestedCellLimit.toLocaleString("en-US")} cells a formula`);
    expect(text).toContain(`${maxWorkbookModels} workbook models (specs of up to ${maxSpecLength} characters)`);
    expect(text).toContain(`${scanCellLimit.toLocaleString("en-US")} cells a sheet when it looks`);
    expect(text).toContain(`${inspectorReadLimit.toLocaleString("en-US")} cells of a reference`);
    expect(file("functions/modelCache.ts")).toContain("const capacity = 64;");
    expect(file("scripts/server.mjs")).toContain('const crossOrigin = new Set(["/functions.json"]);');
    expect(file("scripts/server.mjs")).toMatch(/: 10;/);
  });

  test("its second-pass statements are what the code does: sheet limits, slices of work, the server's check interval", async () => {
    const { columnNumber, sheetColumns, sheetRows } = await import("../taskpane/cellAddress.js");
    const text = readme().replace(/\s+/g, " ");
    expect(text).toContain("the last cell is XFD1048576");
    expect([columnNumber("XFD"), sheetRows]).toEqual([sheetColumns, 1_048_576]);
    expect(text).toContain("judge many formulas 10 ms of work at a time");
    expect(file("taskpane/restorableFormula.ts")).toContain("const sliceMs = 10;");
    expect(text).toContain("quoting at most 40 characters of the formula");
    expect(file("taskpane/restorableFormula.ts")).toContain("text.length > 40 ? `${text.slice(0, 40)}…` : text");
    // a tenth of the 10 s idle time: every second
    expect(text).toContain("here every second, so within 11 s");
    expect(file("scripts/server.mjs")).toContain("const checkingMs = idleSeconds * 100;");
    expect(text).toContain("`appsforoffice.microsoft.com/lib/1/hosted/`");
    expect(file("taskpane/taskpane.html")).toContain("script-src 'self' https://appsforoffice.microsoft.com/lib/1/hosted/;");
  });
});

describe("README: comparing with astropy", () => {
  test("the agreement it states is the one test/astropy.test.ts enforces", () => {
    const text = readme().replace(/\s+/g, " ");
    expect(text).toContain("agree to 1e-9 without massive neutrinos and to 1e-5 (3e-5 for ages and volumes) with them");
    const check = file("test/astropy.test.ts");
    expect(check).toContain("Om0: p.Om - m.OnuMassive");
    expect(check).toContain("const tol = massive ? (looser ? 3e-5 : 1e-5) : 1e-9;");
  });
});

describe("README: From a raw catalogue to luminosities", () => {
  const recipe = () => {
    const text = readme();
    return text.slice(text.indexOf("## From a raw catalogue to luminosities"), text.indexOf("<!-- raw-catalogue:end"));
  };
  /** The table's rows: cell, formula as typed (without "="), value as shown. */
  const steps = () => [...recipe().matchAll(/^\|.*?\| (B\d+) \| `=([^`]+)` \| ([^|]+) \|$/gm)].map(([, cell, formula, shown]) => ({ cell, formula, shown: shown.trim() }));

  test("every step's value is what its formula gives in a sheet, to the digits shown: through the built add-in, the model the default (P18-CMB), earlier steps' cells read by later ones", async () => {
    const rows = steps();
    expect(rows.map((r) => r.cell)).toEqual(Array.from({ length: 11 }, (_, i) => `B${i + 2}`));
    const runtime = await sheetRuntime(); // a workbook with no model applied: the default model
    const cells = new Map<string, SheetValue>();
    for (const { cell, formula, shown } of rows) {
      const value = await evaluateFormula(runtime, formula, (address) => cells.get(address) ?? null);
      expect(typeof value, `${cell} =${formula} gives ${String(value)}`).toBe("number");
      // the number shown, and one unit of its last digit: 19.760 → 0.001, 5.741E+23 → 1e20
      const [, mantissa, exponent = "0"] = /^([-−]?\d+(?:\.\d+)?)(?:E([+-]\d+))?/.exec(shown)!;
      const decimals = mantissa.split(".")[1]?.length ?? 0;
      const unit = 10 ** (Number(exponent) - decimals);
      const number = Number(mantissa.replace("−", "-")) * 10 ** Number(exponent);
      expect(Math.abs((value as number) - number), `${cell} =${formula} gives ${String(value)}, shown ${shown}`).toBeLessThanOrEqual(unit / 2 + Math.abs(number) * 1e-15);
      cells.set(cell, value as number);
    }
  });

  test("it starts from sexagesimal text, uses the same invented positions as its opening names, and each step's function in turn", () => {
    const text = recipe();
    const opening = text.slice(0, text.indexOf("<!-- raw-catalogue:start"));
    const quoted = new Set([...opening.matchAll(/`"([^"`]+)"`/g)].map((m) => m[1]));
    expect([...quoted]).toEqual(["10:27:36.21", "+05:48:12.9", "10:27:36.26", "+05:48:13.6"]);
    for (const { formula } of steps()) for (const [, position] of formula.matchAll(/"([+-]?\d\d:[^"]+)"/g)) expect(quoted, formula).toContain(position);
    const called = steps().map(({ formula }) => /ZC\.(\w+)/.exec(formula)![1]);
    expect(called).toEqual(["COORD_DEG", "COORD_DEG", "SEPARATION", "COORD_CONVERT", "EXTINCTION", "Z_FROM_VELOCITY", "REDSHIFT_CMB", "INDEX_BETWEEN", "LUMINOSITY_NU", "DIST_LUM", "MAG_ABS"]);
    expect(opening.replace(/\s+/g, " ")).toContain("8–10 are under P18-CMB, the default model");
    expect(opening).toMatch(/\*\*invented\*\* source/);
  });
});

describe("README: a newcomer's path", () => {
  const headings = () => [...readme().matchAll(/^## (.+)$/gm)].map((m) => m[1]);

  test("the first formula comes right after loading the add-in, and Security after Errors (the tour is not behind it)", () => {
    const h = headings();
    expect(h.indexOf("Your first formula")).toBe(h.indexOf("Loading the add-in") + 1);
    expect(h.indexOf("Security")).toBe(h.indexOf("Errors") + 1);
    expect(h.indexOf("Security")).toBeGreaterThan(h.indexOf("A quick tour (invented demo catalogue)"));
  });

  test("the first formula gives the value it states, through the built add-in under the default model (P18-CMB)", async () => {
    const section = readme().split(/^## /m).find((p) => p.startsWith("Your first formula"))!;
    const [, formula, shown] = /`=(ZC\.DIST_LUM\(0\.5\))`[^*]*\*\*([\d.]+)\*\*/.exec(section)!;
    expect(section).toContain("under P18-CMB, the default model");
    const value = await evaluateFormula(await sheetRuntime(), formula, () => null);
    // the digits shown, to half a unit of the last one (2928.39: 0.005)
    expect(Math.abs((value as number) - Number(shown))).toBeLessThanOrEqual(0.005);
  });
});

describe("README: Errors", () => {
  const errors = () => readme().split(/^## /m).find((p) => p.startsWith("Errors"))!;

  test("each example message is the one the built add-in gives, with its error", async () => {
    const block = errors().slice(errors().indexOf("<!-- error-examples:start"), errors().indexOf("<!-- error-examples:end"));
    const examples = [...block.matchAll(/`=([^`]+)` is `(#[A-Z/!]+)` with `([^`]+)`/g)];
    expect(examples.map((m) => m[2])).toEqual(["#VALUE!", "#N/A", "#NUM!"]);
    const runtime = await sheetRuntime();
    for (const [, formula, code, message] of examples) {
      const cell = await evaluateFormula(runtime, formula, () => null);
      expect(cell, formula).toBeInstanceOf(HostError);
      expect([(cell as HostError).code, (cell as HostError).message], formula).toEqual([code, message]);
    }
  });

  test("it says where Excel shows a message and where it does not, with Microsoft's reference beside it", () => {
    const text = errors().replace(/\s+/g, " ");
    expect(text).toContain("Excel shows the message of a `#VALUE!` or `#N/A` when you hover over the cell's error flag; for a `#NUM!` it shows none");
    expect(text).toContain("(https://learn.microsoft.com/javascript/api/custom-functions-runtime/customfunctions.errorcode)");
    expect(readme()).not.toMatch(/Hover over an error to read its message/);
  });

  test("every function that can give #N/A with a reason of its own is named in the #N/A line", () => {
    const line = /^- `#N\/A` — [^]*?(?=\n\n)/m.exec(errors())![0];
    for (const name of ["REDSHIFT", "REDSHIFT_LIMIT", "REDSHIFT_LIMIT_NU", "EXTINCTION", "SOUND_HORIZON", "LUMINOSITY_FUNCTION"]) expect(line, name).toContain(`ZC.${name}`);
  });

  test("SOUND_HORIZON without Ob suggests adding Ob to the model the cell names, not a preset that has it", async () => {
    const runtime = await sheetRuntime();
    const cell = (await evaluateFormula(runtime, 'ZC.SOUND_HORIZON("CONCORDANCE")', () => null)) as HostError;
    expect([cell.code, cell.message]).toEqual(["#N/A", 'ZC.SOUND_HORIZON: the sound horizon needs the baryon density: add Ob to the model, e.g. "CONCORDANCE; Ob=0.049"']);
    expect(errors()).toContain('`"CONCORDANCE; Ob=0.049"`');
    expect(readme()).toContain("`Ob` (baryons; used by SOUND_HORIZON only)");
  });
});

describe("README: Default units", () => {
  /** Each default unit and the functions that use it, from the definitions: unit arguments, text units with a default, numbers in a fixed unit, positions, fixed result units (magnitudes aside). */
  function fromDefinitions(): Map<string, Set<string>> {
    const units = new Map<string, Set<string>>();
    const add = (unit: string, name: string) => units.set(unit, (units.get(unit) ?? new Set()).add(name));
    for (const d of Object.values(definitions)) {
      for (const a of d.args) {
        if (a.kind === "unit") add(a.default, d.name);
        else if (a.kind === "text" && a.name.endsWith("unit") && a.blank && "typed" in a.blank) add(a.blank.typed, d.name);
        else if (a.kind === "number" && a.unit) add(a.unit, d.name);
        else if (a.kind === "number" && a.sexagesimal) add("deg", d.name); // a position: degrees, or sexagesimal text
      }
      const fixed = fixedResultUnit(d.name);
      if (fixed && fixed !== "mag") add(fixed, d.name);
    }
    return units;
  }

  test("the table lists, for each default unit, exactly the functions that use it", () => {
    const text = readme();
    const table = text.slice(text.indexOf("<!-- default-units:start"), text.indexOf("<!-- default-units:end"));
    const rows = [...table.matchAll(/^\| ([^|]+) \| ([^|]+) \| ([^|]+) \|$/gm)].slice(1).filter(([, kind]) => kind !== "model"); // the header row (the separator has no spaces)
    const inReadme = new Map(rows.map(([, , unit, names]) => [unit.trim(), new Set(names.trim().split(", "))]));
    expect(inReadme.size).toBe(rows.length); // one row a unit
    const expected = fromDefinitions();
    expect([...inReadme.keys()].sort()).toEqual([...expected.keys()].sort());
    for (const [unit, names] of expected) expect([...inReadme.get(unit)!].sort(), unit).toEqual([...names].sort());
  });

  test("it says plainly that bands default to GHz and wavelengths to Angstrom", () => {
    expect(readme().replace(/\s+/g, " ")).toContain("Bands default to **GHz** (frequencies) while wavelengths default to **Å** (`Angstrom`)");
  });
});

describe("README: versions, sources and presets read right once the version is 0.3.0", () => {
  test("earlier versions are named by number, not as 'before' the next one", () => {
    expect(readme()).not.toMatch(/before (?:zcell )?0\.3\.0/);
    expect(readme()).toContain("zcell 0.1 and 0.2 called these two actions Freeze and Thaw");
  });

  test("presets not checked against their paper say so, without claiming more", () => {
    expect(readme()).not.toMatch(/unverified|from memory/);
    expect(readme()).toContain("not yet checked against the paper's table");
  });

  test("positions are kept as text: the README says why, with Microsoft's pages beside it", () => {
    const text = readme().replace(/\s+/g, " ");
    expect(text).toContain("**In cells, keep positions as text**");
    expect(text).toContain("(https://support.microsoft.com/en-us/excel/time-function)");
    expect(text).toContain("zcell reads any number as degrees");
  });
});
