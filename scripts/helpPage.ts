/**
 * The help page (dist/help.html, Excel's help link for every function) for the people who use the
 * functions: what zcell computes and under which model, the model syntax, the presets with their
 * sources, units, conventions, errors, one entry per worksheet function, sharing workbooks.
 *
 * Built from the sources the add-in itself is built from, so it cannot drift from them: each entry
 * from its declaration (the JSDoc that makes functions.json: description, arguments, `@returns`, and
 * `@example =ZC.NAME(…)`) and its definition (defaults, default units, choices); its example's value
 * computed here through the same wrapper as a cell (the pane's inspector, `explainFormula`), under
 * the default model; the presets from core/model/presets.ts; the prose sections for users from
 * README.md (by heading). webpack.config.js calls `helpPage()` for every build.
 */
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { generateCustomFunctionsMetadata } from "custom-functions-metadata";
import { marked } from "marked";
import { Cosmology, presets } from "../core/index.js";
import { defaultModelSpec } from "../functions/activeModel.js";
import { CellError } from "../functions/cellError.js";
import { definitions } from "../functions/definitions.js";
import { describeModel, zcellVersion } from "../functions/describeModel.js";
import { evaluate, type ArgSpec, type Cell } from "../functions/evaluate.js";
import { formatValue } from "../functions/messages.js";
import { explainFormula, type CallExplanation } from "../taskpane/explainCall.js";
import { findCalls, parseArrayConstant, type Token } from "../taskpane/formulaCalls.js";

const root = fileURLToPath(new URL("..", import.meta.url));
/** The declaration files, one per family (functions/declarationFiles.json, which the build reads too). */
const declarationFiles = JSON.parse(readFileSync(`${root}functions/declarationFiles.json`, "utf8")) as string[];

/** The README sections a user reads, in the order the page shows them, around the function entries. */
export const guideSections = { before: ["Your first formula", "From a raw catalogue to luminosities", "Model spec", "Models of this workbook", "Presets", "Units", "Conventions", "Errors"], after: ["Sharing workbooks", "Security"] };

/** What the page says about one worksheet function. */
export interface FunctionEntry {
  name: string;
  family: string;
  description: string;
  returns: string;
  parameters: { name: string; description: string; optional: boolean; ifOmitted: string; unit?: string }[];
  /** The example as typed in a cell ("=ZC.DIST_LUM(1)"), undefined when the declaration has none. */
  example?: string;
  /** What the pane's inspector says of the example: summary, equation, method, model, result. */
  explanation?: CallExplanation;
  /** The example's whole result (more than one cell for a table). */
  cells?: Cell[][];
  /** The conventions of each model the example names (not the default's), by model: they belong to the example, not to the function. */
  exampleModels: { spec: string; conventions: string[] }[];
}

type Metadata = { functions: { id: string; description: string; parameters: { name: string; description: string; optional?: boolean }[] }[] };

/** `@tag text` lines of each JSDoc block of a declaration file, by the function's id. */
function jsdocTags(file: string): { title: string; tags: Map<string, { example: string[]; returns: string }> } {
  const text = readFileSync(`${root}${file}`, "utf8");
  const blocks = [...text.matchAll(/\/\*\*([^]*?)\*\//g)].map((m) => m[1].split("\n").map((l) => l.replace(/^\s*\* ?/, "")).join("\n"));
  const tags = new Map<string, { example: string[]; returns: string }>();
  for (const block of blocks) {
    const id = /@customfunction (\S+)/.exec(block)?.[1];
    if (!id) continue;
    tags.set(id, {
      example: [...block.matchAll(/^@example (=.+)$/gm)].map((m) => m[1].trim()),
      returns: /^@returns (.+)$/m.exec(block)?.[1].trim() ?? "",
    });
  }
  // the family's name: the first words of the file's opening comment, before its colon
  const title = /^([^:.\n]+)/.exec(blocks[0]?.trim() ?? "")?.[1] ?? file;
  return { title, tags };
}

/** What a person gets when an argument is left out, from the function's definition (`optional`: as the declaration marks it). */
function ifOmitted(spec: ArgSpec | undefined, optional: boolean): string {
  if (!spec) return optional ? "optional" : "required";
  // an argument the declaration requires (one after it is required) may still be left blank: MODEL's base
  if (!optional) return spec.kind === "model" && !spec.required ? `blank: the workbook's model (${defaultModelSpec} unless one is applied)` : "required";
  const blank = "blank" in spec ? spec.blank : undefined;
  if (blank) return "typed" in blank ? `"${blank.typed}"` : blank.words;
  switch (spec.kind) {
    case "number":
      return spec.default === undefined || Number.isNaN(spec.default) ? "required" : formatValue(spec.default);
    case "model":
      return spec.required ? "required" : `the workbook's model (${defaultModelSpec} unless one is applied)`;
    case "unit":
      return `"${spec.default}"`;
    case "numberOrText":
      return spec.default === undefined ? "required" : String(spec.default);
    case "text":
      return "required";
  }
}

/** The argument's unit as a person types it: the default of the unit argument that applies to it, and that argument's name; or its fixed unit. */
function unitOf(args: readonly ArgSpec[], name: string): string | undefined {
  const spec = args.find((a) => a.kind === "unit" && (typeof a.applies === "string" ? [a.applies] : a.applies).includes(name));
  if (spec?.kind === "unit") return `${spec.default} (set by ${spec.name})`;
  const own = args.find((a) => a.name === name);
  return own?.kind === "number" ? own.unit : undefined;
}

/** The value of an argument written as a literal (number, text, array constant, omitted); undefined when it is not one. */
function literal(tokens: Token[]): { value: unknown } | undefined {
  if (tokens.length === 0) return { value: undefined };
  if (tokens.length === 2 && tokens[0].text === "-" && tokens[1].kind === "number") return { value: -Number(tokens[1].text) };
  if (tokens.length !== 1) return undefined;
  const [t] = tokens;
  if (t.kind === "number") return { value: Number(t.text) };
  if (t.kind === "string") return { value: t.text.slice(1, -1).replaceAll('""', '"') };
  if (t.kind === "array") return { value: parseArrayConstant(t.text) };
  return undefined;
}

/** The example's whole result, when its arguments are literals (the inspector gives its first cell only). */
function exampleCells(example: string, name: string): Cell[][] | undefined {
  const call = findCalls(example)[0];
  const values = call.argTokens.map(literal);
  if (values.some((v) => v === undefined)) return undefined;
  return evaluate(definitions[name], values.map((v) => v!.value), { spec: defaultModelSpec, stored: false });
}

/** What the inspector says of a model alone (its conventions), through a call with no other argument. */
async function modelOnly(spec: string): Promise<CallExplanation> {
  const [call] = await explainFormula(`=ZC.HUBBLE(, "${spec.replaceAll('"', '""')}")`, async () => ({ cells: 0, values: [] }), { spec: defaultModelSpec, stored: false });
  return call;
}

/** Every worksheet function's entry, by family, from the declarations and the definitions. */
export async function functionEntries(): Promise<FunctionEntry[]> {
  const result = await generateCustomFunctionsMetadata(declarationFiles.map((f) => `${root}${f}`), false);
  if (result.errors.length) throw new Error(result.errors.join("\n"));
  const metadata = JSON.parse(result.metadataJson) as Metadata;
  const families = declarationFiles.map(jsdocTags);
  const active = { spec: defaultModelSpec, stored: false };
  const noReferences = async (): Promise<never> => {
    throw new Error("an example names no cells");
  };
  const entries: FunctionEntry[] = [];
  for (const f of metadata.functions) {
    const family = families.find((x) => x.tags.has(f.id))!;
    const tags = family.tags.get(f.id)!;
    const args = definitions[f.id]?.args ?? [];
    const example = tags.example[0];
    const [explanation] = example ? await explainFormula(example, noReferences, active) : [];
    const named = (explanation?.modelArgs ?? (explanation ? [explanation] : [])).flatMap((m) => (m.model?.source === "given in the formula" ? [m.model.spec] : []));
    const exampleModels = await Promise.all(named.map(async (spec) => ({ spec, conventions: (await modelOnly(spec)).conventions })));
    entries.push({
      name: f.id,
      family: family.title,
      description: f.description,
      returns: tags.returns,
      parameters: f.parameters.map((p, i) => {
        const spec = args[i]; // the declaration and the definition list the arguments in the same order (MODEL's "model" is declared as base)
        return { name: p.name, description: p.description, optional: Boolean(p.optional), ifOmitted: ifOmitted(spec, Boolean(p.optional)), unit: unitOf(args, spec?.name ?? p.name) };
      }),
      example,
      explanation,
      cells: example ? exampleCells(example, f.id) : undefined,
      exampleModels,
    });
  }
  return entries;
}

const escapeHtml = (text: string) => text.replaceAll("&", "&amp;").replaceAll("<", "&lt;").replaceAll(">", "&gt;").replaceAll('"', "&quot;");
const code = (text: string) => `<code>${escapeHtml(text)}</code>`;
/** A heading's id: lower case, letters, digits and hyphens (as README anchors are written). */
const slug = (text: string) => text.replace(/<[^>]+>/g, "").trim().toLowerCase().replace(/[^\p{L}\p{N}\s-]/gu, "").replace(/\s+/g, "-");

/** A number as the page shows it: 6 significant digits (as the pane), very large or small ones as Excel writes them (1.25929E+11). */
function shownNumber(x: number): string {
  const abs = Math.abs(x);
  if (abs !== 0 && (abs >= 1e7 || abs < 1e-4)) return x.toExponential(5).replace(/\.?0+e/, "e").replace("e", "E").replace(/E([+-])(\d)$/, "E$10$2");
  return formatValue(x);
}

/** One cell of a result as the page shows it. */
function shownCell(cell: Cell): string {
  if (cell instanceof CellError) return `${cell.excelText} (${cell.message})`;
  return typeof cell === "number" ? shownNumber(cell) : cell;
}

/** The example's one value with its unit: the inspector's result, its number written as the page writes numbers. */
function shownResult(e: CallExplanation, cell: Cell | undefined): string {
  if (typeof cell !== "number" || !e.result.startsWith(formatValue(cell))) return e.result;
  return shownNumber(cell) + e.result.slice(formatValue(cell).length);
}

/** The conventions the inspector adds for the function itself: beyond those of any model (the default's, or the example's own). */
function ownConventions(entry: FunctionEntry, defaultConventions: readonly string[]): string[] {
  const ofModels = new Set([...defaultConventions, ...entry.exampleModels.flatMap((m) => m.conventions)]);
  return (entry.explanation?.conventions ?? []).filter((c) => !ofModels.has(c));
}

/** Where the example's model comes from, in words: the workbook's (the default), one the formula names, or the two of a restatement. */
function exampleModelWords(e: CallExplanation): string {
  const words = (m: NonNullable<CallExplanation["model"]>) => (m.source === "the workbook's model" ? "the workbook's model" : "named in the formula");
  if (e.modelArgs) {
    const [to, ...from] = [...e.modelArgs].reverse();
    if (!to.model) return "";
    const froms = from.flatMap((f) => (f.model ? [`${code(f.model.spec)} (${f.argument})`] : []));
    return ` under ${code(to.model.spec)} (${to.argument}: ${words(to.model)}), restated from ${froms.join(" and ")}`;
  }
  if (!e.model) return "";
  return e.model.source === "the workbook's model" ? ` under ${code(e.model.spec)}, the workbook's model (the formula names none)` : ` under ${code(e.model.spec)}, ${words(e.model)}`;
}

/** One function's entry as HTML. */
function entryHtml(entry: FunctionEntry, defaultConventions: readonly string[]): string {
  const signature = `ZC.${entry.name}(${entry.parameters.map((p) => (p.optional ? `[${p.name}]` : p.name)).join(", ")})`;
  const e = entry.explanation;
  const rows = entry.parameters
    .map((p) => `<tr><th scope="row">${code(p.name)}</th><td>${escapeHtml(p.description)}${p.unit ? ` Unit: ${escapeHtml(p.unit)}.` : ""}</td><td>${escapeHtml(p.ifOmitted)}</td></tr>`)
    .join("");
  const args = entry.parameters.length
    ? `<table class="args"><caption>Arguments of ZC.${entry.name}</caption><thead><tr><th scope="col">argument</th><th scope="col">what it is</th><th scope="col">if omitted</th></tr></thead><tbody>${rows}</tbody></table>`
    : "<p>No arguments.</p>";
  let example = `<p class="missing">No example yet.</p>`;
  if (entry.example && e) {
    const cells = entry.cells && entry.cells.length * entry.cells[0].length > 1 ? entry.cells : undefined;
    // a text result (a spec, a description) is not computed under a model in any sense a reader needs
    const text = typeof entry.cells?.[0][0] === "string" && !cells;
    const model = text ? "" : exampleModelWords(e);
    const head = cells && e.columns ? `<thead><tr>${e.columns.map((c) => `<th scope="col">${escapeHtml(c)}</th>`).join("")}</tr></thead>` : "";
    const result = cells
      ? `<table class="result"><caption>Result of the example</caption>${head}<tbody>${cells.map((row) => `<tr>${row.map((c) => `<td>${escapeHtml(shownCell(c))}</td>`).join("")}</tr>`).join("")}</tbody></table>`
      : `<output>${escapeHtml(shownResult(e, entry.cells?.[0][0]))}</output>`;
    // the conventions of a model the example names, beyond the default model's, belong to the example
    const under = (text ? [] : entry.exampleModels)
      .map((m) => ({ spec: m.spec, extra: m.conventions.filter((c) => !defaultConventions.includes(c)) }))
      .filter((m) => m.extra.length)
      .map((m) => `<p class="hint">Under ${code(m.spec)}: ${escapeHtml(m.extra.join(" "))}</p>`)
      .join("");
    example = cells
      ? `<div class="example"><p><strong>Example</strong> ${code(entry.example)} gives${model}:</p>${result}${under}</div>`
      : `<div class="example"><p><strong>Example</strong> ${code(entry.example)} gives ${result}${model}.</p>${under}</div>`;
  }
  const equation = e && e.equation !== "—" ? `<p><strong>Computes</strong> ${escapeHtml(e.summary)}: <span class="equation">${escapeHtml(e.equation)}</span></p>` : e ? `<p><strong>Gives</strong> ${escapeHtml(e.summary)}.</p>` : "";
  const conventions = ownConventions(entry, defaultConventions).map((c) => `<p><strong>Convention</strong> ${escapeHtml(c)}</p>`).join("");
  return `<article class="fn" id="${entry.name}" aria-labelledby="${entry.name}-title">
<h4 id="${entry.name}-title">${code(signature)}</h4>
<p>${escapeHtml(entry.description)}</p>
${entry.returns ? `<p><strong>Returns</strong> ${escapeHtml(entry.returns)}</p>` : ""}
${equation}${conventions}
${args}
${example}
${e ? `<p class="hint"><strong>Method</strong> ${escapeHtml(e.methodPlain)}</p>` : ""}
</article>`;
}

/** The README split into sections by heading (levels 1–3): heading → its text, heading line included. */
function readmeSections(readme: string): Map<string, string> {
  const parts = readme.split(/^(?=#{1,3} )/m);
  return new Map(parts.map((part) => [/^#{1,3} (.*)$/m.exec(part)?.[1].trim() ?? "", part]));
}

/** A README section as HTML, with ids on its headings; the dev server's bullet of Security stays out. */
function sectionHtml(markdown: string): string {
  const text = markdown.replace(/^- \*\*The dev server\*\*[^]*?(?=^\S|^- |(?![^]))/m, "");
  const heading = /^#{1,3} (.*)$/m.exec(text)?.[1];
  const html = marked
    .parse(text, { async: false })
    .replace(/<h([1-6])>(.*?)<\/h\1>/g, (_, level: string, inner: string) => `<h${level} id="${slug(inner)}">${inner}</h${level}>`);
  return heading ? `<section aria-labelledby="${slug(heading)}">${html}</section>` : html;
}

/** The presets as a table from core/model/presets.ts: name, parameters and source, former names. */
function presetTable(): string {
  const rows = presets.map((p) => {
    const name = `${code(p.name)}${p.name === defaultModelSpec ? " (default)" : ""}`;
    return `<tr><th scope="row">${name}</th><td>${escapeHtml(p.description)}</td></tr>`;
  });
  return `<table class="presets"><caption>The built-in parameter sets (as <code>=ZC.PRESETS()</code> lists them)</caption><thead><tr><th scope="col">name</th><th scope="col">parameters and source</th></tr></thead><tbody>${rows.join("")}</tbody></table>`;
}

/**
 * The help page.
 * @returns the page's HTML and its stylesheet (help.css: the pane's colours, dark ones under prefers-color-scheme, and the page's own rules)
 */
export async function helpPage(): Promise<{ html: string; css: string }> {
  const readme = readFileSync(`${root}README.md`, "utf8");
  const sections = readmeSections(readme);
  const section = (heading: string) => {
    const text = sections.get(heading);
    if (text === undefined) throw new Error(`README.md has no section "${heading}" for the help page`);
    return text;
  };
  const guide = (headings: string[]) =>
    headings
      .map((h) => (h === "Presets" ? sectionHtml(section(h).replace(/^\|.*\n/gm, "").replace(/\n{3,}/g, "\n\n")).replace(/(<h3 id="presets">Presets<\/h3>\s*<p>[^]*?<\/p>)/, `$1${presetTable()}`) : sectionHtml(section(h))))
      .join("\n");
  // the README's opening: what zcell computes and that every number depends on the model (its title is the page's)
  const intro = sectionHtml(readme.split(/^(?=## )/m)[0].replace(/^# .*\n/, ""));
  const defaultModel = Cosmology.fromSpec(defaultModelSpec);
  const [reference] = await explainFormula("=ZC.HUBBLE()", async () => ({ cells: 0 }), { spec: defaultModelSpec, stored: false });
  const entries = await functionEntries();
  const families = [...new Set(entries.map((e) => e.family))];
  const familyId = (family: string) => `family-${slug(family)}`;
  const functionsHtml = families
    .map((family) => `<section aria-labelledby="${familyId(family)}"><h3 id="${familyId(family)}">${escapeHtml(family)}</h3>\n${entries.filter((e) => e.family === family).map((e) => entryHtml(e, reference.conventions)).join("\n")}</section>`)
    .join("\n");
  const contents = `<nav aria-labelledby="contents"><h2 id="contents">Contents</h2><ul>
<li><a href="#what-zcell-computes">What zcell computes</a></li>
<li><a href="#the-default-model">The default model</a></li>
${guideSections.before.map((h) => `<li><a href="#${slug(h)}">${escapeHtml(h)}</a></li>`).join("\n")}
<li><a href="#worksheet-functions">Worksheet functions</a><ul>${families
    .map((family) => `<li><a href="#${familyId(family)}">${escapeHtml(family)}</a>: ${entries.filter((e) => e.family === family).map((e) => `<a href="#${e.name}">${e.name}</a>`).join(", ")}</li>`)
    .join("\n")}</ul></li>
${guideSections.after.map((h) => `<li><a href="#${slug(h)}">${escapeHtml(h)}</a></li>`).join("\n")}
<li><a href="#reporting-a-problem">Reporting a problem</a></li>
</ul></nav>`;
  const html = `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<meta http-equiv="Content-Security-Policy" content="default-src 'self'; img-src 'self' data:; object-src 'none'; base-uri 'self'; form-action 'none'">
<title>zcell ${zcellVersion} help: worksheet functions and models</title>
<link rel="stylesheet" href="taskpane.css"><link rel="stylesheet" href="help.css"></head>
<body>
<header class="bar"><img src="assets/icon-32.png" alt="" width="24" height="24"><h1>zcell help</h1><p class="badge">zcell ${zcellVersion}</p></header>
<main>
<section aria-labelledby="what-zcell-computes"><h2 id="what-zcell-computes">What zcell computes</h2>
${intro}</section>
<section aria-labelledby="the-default-model" class="notice"><h2 id="the-default-model">The default model</h2>
<p>A formula that names no model uses the workbook's model, which is ${code(defaultModelSpec)} until someone applies another in the pane. In words (as <code>=ZC.DESCRIBE()</code> writes it):</p>
<p class="model">${escapeHtml(describeModel(defaultModel))}</p>
<p>An example below that names no model is computed under it, by the same code as a cell; an example that names its own model says so, with that model's conventions.</p></section>
${contents}
${guide(guideSections.before)}
<section aria-labelledby="worksheet-functions"><h2 id="worksheet-functions">Worksheet functions</h2>
<p>Arguments in brackets may be left out. An argument read as a value or range broadcasts: a single cell, a range of the same shape as the others, or a row against a column (giving a table). Units are text in the FITS syntax (see <a href="#units">Units</a>).</p>
${functionsHtml}
</section>
${guide(guideSections.after)}
<section aria-labelledby="reporting-a-problem"><h2 id="reporting-a-problem">Reporting a problem</h2>
<p>Tell the people who host zcell for you: the cell, its formula, the value you expected and the one shown, and the model (${code("=ZC.DESCRIBE()")} writes it out). ${code("=ZC.VERSION()")} gives the version.</p></section>
</main>
</body></html>
`;
  return { html, css: helpStylesheet() };
}

/**
 * help.css: the pane's dark colours (taskpane.css `:root.dark`, which the pane sets from Office's
 * theme) applied under prefers-color-scheme, then the page's own rules (taskpane/help.css).
 */
function helpStylesheet(): string {
  const pane = readFileSync(`${root}taskpane/taskpane.css`, "utf8");
  const dark = /:root\.dark\s*\{([^}]*)\}/.exec(pane);
  if (!dark) throw new Error("taskpane.css has no :root.dark block");
  return `/* generated by scripts/helpPage.ts: the pane's dark colours under the reader's preference, then taskpane/help.css */
@media (prefers-color-scheme: dark) {
  :root {${dark[1]}}
}
${readFileSync(`${root}taskpane/help.css`, "utf8")}`;
}
