/**
 * The cell inspector's explanation of each ZC call in a formula: what it computes (the equation in
 * plain notation), its arguments with their values and units, the model used and its conventions,
 * the numerical method and its accuracy, and the result — or, for an error, the reason. The result
 * is recomputed with the same shared wrapper the worksheet functions use, so the reason given is
 * the one behind the cell's error.
 */
import type { Cosmology } from "../core/index.js";
import type { ActiveModelSetting } from "../functions/activeModel.js";
import { CellError, type ErrorKind } from "../functions/cellError.js";
import { adviseOnError } from "./errorAdvice.js";
import { definitions } from "../functions/definitions.js";
import { describeModel } from "../functions/describeModel.js";
import { evaluateLazily, type ArgSpec, type CallResult, type Cell, type FunctionDef } from "../functions/evaluate.js";
import { isBlank, keyValueBlockSpec } from "../functions/modelArgument.js";
import { modelFor } from "../functions/modelCache.js";
import { resolvedSpec } from "../functions/workbookModels.js";
import { formatValue } from "../functions/messages.js";
import { parentsOf, placeIn, placeWords, within, type CellPlace } from "./broadcastPlace.js";
import { findCalls, type FormulaCall } from "./formulaCalls.js";
import { about, plainMethod, type ResultUnit } from "./functionAbout.js";
import { cellName, cut, firstOf, inspectorReadLimit, matrixOf, readArgument, showValue, type ReadArgument, type ReferenceRead, type ReferenceReader } from "./readArgument.js";

export { inspectorReadLimit } from "./readArgument.js";
export type { ReferenceRead, ReferenceReader } from "./readArgument.js";

/** One explained call, for the selected cell: the arguments' values and the model of that cell. */
export interface CallExplanation {
  name: string;
  summary: string;
  equation: string;
  args: { name: string; text: string; value: string; unit?: string }[];
  /**
   * The model that computed the selected cell: its text as given (or the workbook's), where it came
   * from (`where`: the cell of a model range, a key/value block) and its description.
   */
  model?: { spec: string; source: "given in the formula" | "the workbook's model"; where?: string; description: string };
  /** For a range of models: the distinct models it names, in order (a blank cell as the workbook's model). */
  models?: string[];
  /** When the model of the selected cell is not known here: why. */
  modelNote?: string;
  /**
   * A function of two models (RESCALE): each model argument's model at the selected cell, labelled
   * for its argument ("From model" for from_model, "To model" for to_model); `model`, `models` and
   * `modelNote` are then not set, since no one model computed the cell.
   */
  modelArgs?: ({ label: string; argument: string } & Pick<CallExplanation, "model" | "models" | "modelNote">)[];
  /** The columns of a result that is a table (LUMINOSITY_FUNCTION), when the function names them. */
  columns?: string[];
  conventions: string[];
  method: string;
  /** The method in one plain line; `method` holds the detail. */
  methodPlain: string;
  /** The result of the selected cell as a person reads it: at most 6 significant digits, with the unit. */
  result: string;
  /** The result's full value (every digit Excel holds), when it is a number. */
  exact?: string;
  isError: boolean;
  /** For an error: the argument its message is about (its formula text and value), and how to fix it. */
  fault?: { argument?: string; text?: string; value?: string; fix: string };
}

/** Models of a range listed at most; the rest are counted. */
const modelsListed = 8;
/** Characters of a model's text shown at most (a cell may hold 32,767: a stranger's text is cut). */
const modelTextShown = 100;

/**
 * Cells of the results of calls written as another ZC call's argument, computed whole at most for
 * one formula (the caller reads such a result whole); the calls themselves are computed only at the
 * cell explained.
 */
export const inspectorNestedCellLimit = 1_000;

/**
 * A call with its arguments read and, when every one is known, its result as the worksheet function
 * returns it: its shape, and its cells computed one at a time when asked for.
 */
interface EvaluatedCall {
  call: FormulaCall;
  def: FunctionDef;
  args: ReadArgument[];
  result?: CallResult;
}

/** A model argument that is a key/value block: the spec it spells, or why it spells none. */
function blockOf(arg: ReadArgument | undefined): { spec: string } | { error: string } | undefined {
  const m = arg?.known ? matrixOf(arg.value) : undefined;
  if (!m || m.length * m[0].length === 1) return undefined;
  try {
    const spec = keyValueBlockSpec(m);
    return spec === undefined ? undefined : { spec };
  } catch (e) {
    return { error: (e as Error).message };
  }
}

/** How an argument's value reads, with what an omitted or blank one stands for. */
function describeArg(spec: ArgSpec, value: unknown): string {
  if (value === undefined || value === "") {
    if (spec.kind === "unit") return `default "${spec.default}"`;
    if (spec.kind === "model") return "the workbook's model";
    const blank = "blank" in spec ? spec.blank : undefined;
    if (blank) return "typed" in blank ? `default "${blank.typed}"` : `left out: ${blank.words}`;
    if (spec.kind === "number" && spec.default !== undefined) return Number.isNaN(spec.default) ? "not given" : `default ${spec.default}`;
  }
  return showValue(value);
}

function modelConventions(m: Cosmology): string[] {
  const out = ["Om is all matter today, massive neutrinos included."];
  if (m.Tcmb === 0) out.push("Radiation off (Tcmb = 0): no photons, no neutrinos.");
  else {
    out.push(`Radiation on: photons at Tcmb = ${m.Tcmb} K and neutrinos with Neff = ${m.Neff}, T_ν = (4/11)^(1/3) Tcmb.`);
    if (m.parameters.mnu.length) out.push(`Massive neutrinos (${m.parameters.mnu.join(", ")} eV) by the exact Fermi–Dirac integral.`);
  }
  out.push(m.Ok === 0 ? "Flat (Ωk = 0)." : `Curvature Ωk = ${Number(m.Ok.toPrecision(5))}.`);
  return out;
}

/** The kind of an error value as Excel shows it in a cell ("#NUM!" → "num", CellError's own spelling); undefined for any other value. */
function shownErrorKind(value: unknown): ErrorKind | undefined {
  return (["value", "num", "na"] as const).find((kind) => new CellError(kind, "").excelText === value);
}

type ModelOfCell = Pick<CallExplanation, "model" | "models" | "modelNote"> & { cosmology?: Cosmology };

/**
 * The model one cell of a model argument names, as the functions read it (`readArguments.ts`: blank →
 * the workbook's model; text → preset, spec or workbook model).
 * @param value the cell's value
 * @param cell where it is, e.g. "Sheet1!C1" (undefined for a single value)
 */
function modelNamed(value: unknown, cell: string | undefined, active: ActiveModelSetting): ModelOfCell {
  const given = typeof value === "string" ? value.trim() : value;
  if (isBlank(given)) {
    return built(active.spec, "the workbook's model", cell && `${cell} for this cell is blank`, active);
  }
  if (typeof given !== "string") {
    const description = "not a model: a model is text (a preset, a spec, a model of this workbook) or a key/value block";
    return { model: { spec: cut(showValue(given), modelTextShown), source: "given in the formula", where: cell && `${cell} for this cell`, description } };
  }
  return built(given, "given in the formula", cell && `${cell} for this cell`, active);
}

function built(spec: string, source: "given in the formula" | "the workbook's model", where: string | undefined, active: ActiveModelSetting): ModelOfCell {
  const shown = cut(spec, modelTextShown);
  try {
    const resolved = resolvedSpec(spec, active.models);
    const m = modelFor(resolved); // the functions' own cache: no model is built twice
    const ours = resolved !== spec ? "a model of this workbook" : undefined;
    const at = [where, ours].filter(Boolean).join("; ") || undefined;
    // the description starts with the model's name, which the row shows already
    const words = describeModel(m);
    const description = words.startsWith(`${shown}: `) ? words.slice(shown.length + 2) : words;
    return { model: { spec: shown, source, where: at, description }, cosmology: m };
  } catch (e) {
    return { model: { spec: shown, source, where, description: (e as Error).message } };
  }
}

/** The distinct models of a range of models, in order, a blank cell as the workbook's; at most `modelsListed`, then a count. */
function modelsIn(m: unknown[][], active: ActiveModelSetting): string[] {
  const seen = new Set<string>();
  for (const row of m) {
    for (const value of row) {
      const text = typeof value === "string" ? value.trim() : value;
      seen.add(isBlank(text) ? `${active.spec} (the workbook's model)` : typeof text === "string" ? cut(text, modelTextShown) : showValue(text));
    }
  }
  const listed = [...seen].slice(0, modelsListed);
  if (seen.size > modelsListed) listed.push(`… and ${(seen.size - modelsListed).toLocaleString("en-US")} more`);
  return listed;
}

/** The model of the selected cell: the one model given, or the cell of a model range at the cell's place in the broadcast. */
function modelOfCell(arg: ReadArgument, text: string, place: CellPlace | undefined, active: ActiveModelSetting): ModelOfCell {
  if (!arg.known) return { modelNote: `${arg.note ?? "computed by Excel"}: not known here` };
  const block = blockOf(arg);
  const where = arg.source?.kind === "reference" ? (arg.source.address ?? arg.source.text) : text;
  if (block && "error" in block) {
    return { model: { spec: cut(text, modelTextShown), source: "given in the formula", where: `the key/value block ${where}`, description: block.error } };
  }
  if (block) return built(block.spec, "given in the formula", `the key/value block ${where}`, active);
  const m = matrixOf(arg.value);
  if (!m || m.length * m[0].length === 1) return modelNamed(firstOf(arg.value), undefined, active);
  const models = modelsIn(m, active);
  const q = place && placeIn(place, m.length, m[0].length);
  if (!q) return { models, modelNote: `one per cell of ${text}; which of them computed this cell is not known here` };
  return { ...modelNamed(m[q.row][q.col], cellName(arg.source, q, m.length, m[0].length), active), models };
}

/**
 * Explains every ZC call in a formula, for the selected cell: a call whose result has several cells
 * is explained at the cell the selected one shows (the arguments' cells and the model at that place
 * in the broadcast), where that is known.
 * @param formula the cell's formula
 * @param readReference reads the values of a reference (at most `inspectorReadLimit` cells)
 * @param active the workbook's active model
 * @param cellValue the value Excel shows in the cell (used when an argument only Excel can compute)
 * @param at the selected cell's row and column in the formula's spilled result (0, 0 for the
 *   formula's own cell); undefined when not known
 * @returns the calls, outermost first, in the order they are written
 */
export async function explainFormula(
  formula: string,
  readReference: ReferenceReader,
  active: ActiveModelSetting,
  cellValue?: unknown,
  at?: CellPlace,
): Promise<CallExplanation[]> {
  const calls = findCalls(formula);
  const parents = parentsOf(calls);
  const ours = calls.flatMap((c, i) => (c.name.startsWith("ZC.") && definitions[c.name.slice(3)] ? [i] : []));
  const readOnce = new Map<string, Promise<ReferenceRead>>(); // a reference named by several calls is read once
  const read = (reference: string) => {
    let got = readOnce.get(reference);
    if (!got) readOnce.set(reference, (got = readReference(reference, inspectorReadLimit)));
    return got;
  };
  const nested = new Map<string, Cell[][] | string>();
  const budget = { cells: inspectorNestedCellLimit };
  const evaluated = new Map<number, EvaluatedCall>();
  // innermost first, so that a nested call's result is known to its caller
  for (const i of [...ours].sort((a, b) => calls[b].depth - calls[a].depth)) {
    const e = await evaluateCall(calls[i], read, active, nested);
    evaluated.set(i, e);
    const caller = parents[i] >= 0 && ours.includes(parents[i]) ? calls[parents[i]] : undefined;
    if (e.result && caller?.args.includes(calls[i].text)) nested.set(calls[i].text, wholeResult(e, budget));
  }
  // outermost first (findCalls lists a call before those inside it): the cell of each result the selected cell reads
  const whole = formula.replace(/^=/, "").trim();
  const places = new Map<number, CellPlace | undefined>();
  for (const i of ours) {
    const { result } = evaluated.get(i)!;
    let place: CellPlace | undefined;
    if (result && result.rows * result.cols === 1) place = { row: 0, col: 0 };
    else if (parents[i] < 0) place = calls[i].text !== whole ? undefined : result ? within(at, result.rows, result.cols) : at;
    else place = placeInCaller(evaluated.get(parents[i]), places.get(parents[i]), calls[i].text, result);
    places.set(i, place);
  }
  return ours.map((i) => explainAt(evaluated.get(i)!, places.get(i), active, cellValue));
}

/**
 * The cell of a nested call's result that its caller reads for the caller's cell `outer`: by the
 * broadcast for a cell argument, the first for a unit or a scalar text (read once), none known for a
 * key/value block or a function of whole columns (every cell is read).
 */
function placeInCaller(caller: EvaluatedCall | undefined, outer: CellPlace | undefined, text: string, result: CallResult | undefined): CellPlace | undefined {
  const k = caller ? caller.call.args.indexOf(text) : -1;
  if (!caller || !outer || !result || k < 0 || k >= caller.def.args.length) return undefined;
  const spec = caller.def.args[k];
  if (spec.kind === "unit" || (spec.kind === "text" && spec.scalar)) return { row: 0, col: 0 };
  if (caller.def.over || caller.def.table || (spec.kind === "model" && blockOf(caller.args[k]))) return undefined;
  if (caller.result && caller.result.rows * caller.result.cols === 1) return undefined; // the caller's one cell is an error of the whole call (shapes that do not broadcast)
  return placeIn(outer, result.rows, result.cols);
}

/**
 * A nested call's whole result, for its caller to read as an argument: every cell computed while
 * the formula's `budget` of cells lasts, else why it is not.
 */
function wholeResult(e: EvaluatedCall, budget: { cells: number }): Cell[][] | string {
  const { rows, cols } = e.result!;
  if (rows * cols > budget.cells) {
    return `the result of ${e.call.name}, ${rows.toLocaleString("en-US")}×${cols.toLocaleString("en-US")} cells, not computed here (the inspector computes at most ${inspectorNestedCellLimit.toLocaleString("en-US")} cells of calls inside another)`;
  }
  budget.cells -= rows * cols;
  const cells = Array.from({ length: rows }, (_, r) => Array.from({ length: cols }, (_, c) => e.result!.cell(r, c)));
  e.result = { rows, cols, cell: (r, c) => cells[r][c] }; // the cell explained is read from these, not computed again
  return cells;
}

async function evaluateCall(
  call: FormulaCall,
  read: (reference: string) => Promise<ReferenceRead>,
  active: ActiveModelSetting,
  nested: Map<string, Cell[][] | string>,
): Promise<EvaluatedCall> {
  const def = definitions[call.name.slice(3)];
  const args: ReadArgument[] = [];
  for (let i = 0; i < def.args.length; i++) args.push(await readArgument(call.argTokens[i] ?? [], call.args[i] ?? "", read, nested));
  if (!args.every((a) => a.known)) return { call, def, args };
  return { call, def, args, result: evaluateLazily(def, args.map((a) => a.value), active) };
}

/** The row label of a model argument of a function of two models: "from_model" → "From model". */
function modelLabel(name: string): string {
  const words = name.replace(/_model$/, "").replaceAll("_", " ");
  return `${words[0].toUpperCase()}${words.slice(1)} model`;
}

/**
 * The unit of the selected cell's result: a unit argument of the result (as given, or its default),
 * else the function's own (`about`), read from the cell's text arguments (a blank one as its default).
 */
function resultUnitOf(
  e: EvaluatedCall,
  own: ResultUnit | undefined,
  place: CellPlace | undefined,
  broadcasts: (spec: ArgSpec, arg: ReadArgument) => boolean,
): string | undefined {
  const { def } = e;
  const text = (name: string): string | undefined => {
    const i = def.args.findIndex((a) => a.name === name);
    const spec = def.args[i];
    const arg = e.args[i];
    if (!spec || !arg?.known) return undefined;
    const m = matrixOf(arg.value);
    const q = m && m.length * m[0].length > 1 && place && broadcasts(spec, arg) ? placeIn(place, m.length, m[0].length) : undefined;
    const value = m ? (q ? m[q.row][q.col] : m.length * m[0].length === 1 ? m[0][0] : undefined) : firstOf(arg.value);
    if (typeof value === "string" && value.trim()) return value.trim();
    if (spec.kind === "unit") return spec.default;
    return "blank" in spec && spec.blank && "typed" in spec.blank ? spec.blank.typed : undefined;
  };
  const resultUnit = def.args.find((a) => a.kind === "unit" && a.applies === "result");
  if (resultUnit) return text(resultUnit.name);
  return typeof own === "function" ? own(text) : own;
}

/** The texts a call was given, in the formula and in the cells it reads (a stranger's): the error advice keeps them out of its own words. */
function typedTexts(e: EvaluatedCall): string[] {
  // a string literal of the formula as its text (without its quotes, "" read as ")
  const texts = e.call.args.map((text) => (/^"[^]*"$/.test(text) ? text.slice(1, -1).replaceAll('""', '"') : text));
  for (const arg of e.args) {
    if (!arg.known) continue;
    for (const row of matrixOf(arg.value) ?? [[arg.value]]) for (const value of row) if (typeof value === "string") texts.push(value);
  }
  return texts;
}

/** A call explained at one cell of its result (`place`), or as a whole when the place is not known. */
function explainAt(e: EvaluatedCall, at: CellPlace | undefined, active: ActiveModelSetting, cellValue: unknown): CallExplanation {
  const { call, def } = e;
  // a single cell from ranges of several is an error of the whole call (shapes that do not broadcast): no cell of theirs computed it
  const place = !e.result || e.result.rows * e.result.cols > 1 ? at : undefined;
  const info = about[def.name];
  const modelIndexes = def.args.flatMap((a, i) => (a.kind === "model" ? [i] : []));
  // arguments broadcast cell by cell, except units and scalar texts (read once), key/value blocks and whole columns
  const broadcasts = (spec: ArgSpec, arg: ReadArgument) =>
    !def.over && !def.table && spec.kind !== "unit" && !(spec.kind === "text" && spec.scalar) && !(spec.kind === "model" && blockOf(arg));
  const args: CallExplanation["args"] = def.args.map((spec, i) => {
    const arg = e.args[i];
    const text = call.args[i] ?? "";
    const unitSpec = def.args.find((a) => a.kind === "unit" && (typeof a.applies === "string" ? [a.applies] : a.applies).includes(spec.name));
    const unit = unitSpec?.kind === "unit" ? unitSpec.default : undefined;
    const m = arg.known ? matrixOf(arg.value) : undefined;
    const q = m && m.length * m[0].length > 1 && place && broadcasts(spec, arg) ? placeIn(place, m.length, m[0].length) : undefined;
    let value: string;
    if (!arg.known) value = arg.note ?? "computed by Excel";
    else if (q) value = `${describeArg(spec, m![q.row][q.col])} (${cellName(arg.source, q, m!.length, m![0].length)} for this cell)`;
    else {
      const block = spec.kind === "model" ? blockOf(arg) : undefined;
      value = block && "spec" in block ? `a key/value block: "${cut(block.spec, modelTextShown)}"` : describeArg(spec, arg.value);
    }
    return { name: spec.name, text: text || "(omitted)", value, unit };
  });
  const ofModelArg = (i: number) => modelOfCell(e.args[i], call.args[i] ?? "", place, active);
  // one model computes the cell; a function of two (RESCALE) shows each, and the conventions of the one its result is stated under (the last)
  const chosen: ModelOfCell = modelIndexes.length === 1 ? ofModelArg(modelIndexes[0]) : {};
  const modelArgs = modelIndexes.length > 1 ? modelIndexes.map((i) => ({ label: modelLabel(def.args[i].name), argument: def.args[i].name, ...ofModelArg(i) })) : undefined;
  const under = modelArgs ? modelArgs[modelArgs.length - 1].cosmology : chosen.cosmology;
  const conventions = under ? modelConventions(under) : [];
  if (info.kcorr) conventions.push("K-correction sign: M = m − μ − K, with K = −2.5(1+α)log10(1+z) for S_ν ∝ ν^α.");

  let result: string;
  let exact: string | undefined;
  let isError = false;
  let fault: CallExplanation["fault"];
  if (e.result) {
    const { rows, cols } = e.result;
    const several = rows * cols > 1;
    const q = several ? within(at, rows, cols) : { row: 0, col: 0 };
    const cell = q ? e.result.cell(q.row, q.col) : e.result.cell(0, 0);
    const which = !several ? "" : q ? ` (${placeWords(q, rows, cols)} of ${rows}×${cols} values: this cell)` : ` (the first of ${rows}×${cols} values; which one this cell shows is not known here)`;
    if (cell instanceof CellError) {
      isError = true;
      result = `${cell.excelText} — ${cell.message}${which}`;
      const advice = adviseOnError(def, cell.kind, cell.message, typedTexts(e));
      const named = args.find((a) => a.name === advice.argument);
      fault = { ...advice, text: named?.text, value: named?.value };
    } else {
      const unitText = resultUnitOf(e, info.unit, place, broadcasts) ?? "";
      const shown = typeof cell === "number" ? formatValue(cell) : showValue(cell);
      result = `${shown}${unitText ? ` ${unitText}` : ""}${which}`;
      if (typeof cell === "number" && shown !== String(cell)) exact = `${String(cell)}${unitText ? ` ${unitText}` : ""}`;
    }
  } else {
    const why = e.args.some((a) => a.note) ? "an argument is not read" : "an argument is computed by Excel";
    result = `${showValue(cellValue)} (as Excel shows it; ${why})`;
    isError = typeof cellValue === "string" && cellValue.startsWith("#");
    const kind = shownErrorKind(cellValue);
    if (kind) fault = adviseOnError(def, kind, "");
  }
  const { model, models, modelNote } = chosen;
  return {
    name: call.name, summary: info.summary, equation: info.equation, args, model, models, modelNote,
    modelArgs: modelArgs?.map(({ label, argument, model, models, modelNote }) => ({ label, argument, model, models, modelNote })),
    columns: info.columns, conventions, method: info.method, methodPlain: plainMethod(info.method), result, exact, isError, fault,
  };
}
