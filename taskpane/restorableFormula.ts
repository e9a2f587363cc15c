/**
 * Which formulas the pane may write back into a workbook on its own (Thaw, the repair banner).
 * Everything a workbook stores — notes, comments, formulas — may come from a stranger, so a formula
 * is written only when it is made of nothing but ZC calls and what their arguments need: references
 * to cells and ranges of this workbook, numbers, strings, booleans, error literals, the arithmetic and
 * comparison operators, parentheses and the separators. This is an allow-list over our own tokenizer:
 * any other function, a DDE link (`|`), an external or structured reference, a defined name, and
 * anything the tokenizer cannot read are refused, each with a reason a person can act on.
 *
 * Text is compared as written, never after a case change that could turn a letter beyond ASCII into
 * an ASCII one (the Turkish dotless ı upper-cases to I, the long ſ to S, the ligature ﬀ to FF): a
 * function name must be ASCII and one of ours, and what is written spells each call with our exact
 * name. A reference must lie inside Excel's sheet (a cell-shaped name beyond it, such as XFE1, is a
 * defined name), its sheet part cannot hold a character Excel forbids in sheet names (a path or URL
 * names another workbook), and where the caller knows the workbook's sheets it must name one of them.
 */
import { definitions } from "../functions/definitions.js";
import { typedFormula } from "../functions/storedFormula.js";
import { columnNumber, sheetColumns, sheetRows } from "./cellAddress.js";
import { tokenize, type Token } from "./formulaCalls.js";

/** The verdict on one formula: the text to write (typed spelling), or why it is refused. */
export type Restorable = { ok: true; formula: string } | { ok: false; reason: string };

/** What the caller knows: whether one cell is written, and the workbook's sheets where the host listed them. */
export interface RestoreOptions {
  /** Also refuse a formula that could spill over other cells (Thaw writes one cell). */
  singleCell: boolean;
  /** The workbook's sheet names, exactly as the host lists them: a sheet-qualified reference must name one. */
  sheets?: readonly string[];
}

/** A piece of the stranger's text as a reason quotes it: at most 40 characters. */
function shown(text: string): string {
  return text.length > 40 ? `${text.slice(0, 40)}…` : text;
}

/** Excel's own limit on a formula's length: 8,192 characters (Microsoft's "Excel specifications and limits", from memory). */
const maxFormulaLength = 8192;
const allowedOperators = new Set(["+", "-", "*", "/", "^", "&", "=", "<", ">", "<=", ">=", "<>", "%"]);
/** Our functions by their exact typed name ("ZC.DIST_LUM"). */
const zcNames = new Set(Object.keys(definitions).map((name) => `ZC.${name}`));
/** ZC functions that return a table of several cells whatever their arguments. */
const tableFunctions = new Set(Object.values(definitions).filter((d) => d.table && d.name !== "VERSION").map((d) => `ZC.${d.name}`));
/**
 * Characters Excel forbids in a sheet name, \ / ? * [ ] : (spreadsheet-library documentation:
 * DevExpress, "How to: Rename a Worksheet"; also from memory): a sheet part holding one names a file,
 * a web address or another workbook.
 */
const notInSheetNames = /[\\/?*[\]:]/;

const cell = String.raw`\$?([A-Za-z]{1,3})\$?(\d+)`;
/** A reference: optional sheet (quoted, or bare), then a cell, a range, whole columns or whole rows. */
const referencePattern = new RegExp(
  String.raw`^(?:'((?:[^']|'')+)'!|([A-Za-z_\u00C0-\uFFFF][\w.\u00C0-\uFFFF]*)!)?` +
    String.raw`(?:${cell}(?::${cell})?|\$?([A-Za-z]{1,3}):\$?([A-Za-z]{1,3})|\$?(\d+):\$?(\d+))$`,
);

/** One item of an array constant: a number, a string, a boolean or an error literal (no name, no call). */
const arrayItem = String.raw`\s*(?:[-+]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][-+]?\d+)?|"(?:[^"]|"")*"|TRUE|FALSE|#N\/A|#NULL!|#DIV\/0!|#VALUE!|#REF!|#NAME\?|#NUM!)\s*`;
const arrayConstant = new RegExp(String.raw`^\{${arrayItem}(?:[,;\\]${arrayItem})*\}$`, "i");

/** A reference read: the sheet it names (if any), whether it covers more than one cell, or why it is refused. */
type ReadReference = { problem: string } | { problem?: undefined; sheet?: string; multiCell: boolean };

const rowInSheet = (digits: string) => !digits.startsWith("0") && Number(digits) <= sheetRows;
const columnInSheet = (letters: string) => columnNumber(letters) <= sheetColumns;

/** Reads a reference token against the sheet limits and the workbook's sheets. */
function readReference(text: string, sheets: readonly string[] | undefined): ReadReference {
  if (text.includes("[")) return { problem: `it refers to another workbook or a table (${shown(text)})` };
  const m = referencePattern.exec(text);
  if (!m) return { problem: `it has a reference zcell cannot check (${shown(text)})` };
  const [, quoted, bare, col1, row1, col2, row2, colA, colB, rowA, rowB] = m;
  const sheet = quoted !== undefined ? quoted.replaceAll("''", "'") : bare;
  if (sheet !== undefined && notInSheetNames.test(sheet)) return { problem: `it refers to another workbook or a file (${shown(text)})` };
  if (sheet !== undefined && sheets && !sheets.includes(sheet)) return { problem: `it refers to a sheet this workbook does not have (${shown(sheet)})` };
  const columns = [col1, col2, colA, colB].filter((x) => x !== undefined);
  const rows = [row1, row2, rowA, rowB].filter((x) => x !== undefined);
  if (!columns.every(columnInSheet) || !rows.every(rowInSheet)) {
    return { problem: `it uses ${shown(text)}, which lies outside Excel's sheet (XFD1048576 is the last cell), so it is a name, and a name can stand for any formula` };
  }
  const multiCell = col1 === undefined || (col2 !== undefined && (col2.toUpperCase() !== col1.toUpperCase() || Number(row2) !== Number(row1)));
  return { sheet, multiCell };
}

/** Our exact name of a function token (the tokenizer makes one only of a name followed by "("), or why it is refused. */
function functionName(token: Token): { name: string } | { problem: string } {
  if (!/^[A-Za-z0-9_.]+$/.test(token.text)) return { problem: `it calls ${shown(token.text)}, whose name is not plain ASCII, so it is not a zcell function` };
  const name = token.text.toUpperCase();
  if (!name.startsWith("ZC.")) return { problem: `it calls ${shown(name)}, which is not a zcell function` };
  if (!zcNames.has(name)) return { problem: `${shown(name)} is not a zcell function` };
  return { name };
}

/** Why a token other than a function or a reference is not allowed, or undefined when it is. */
function tokenProblem(token: Token): string | undefined {
  switch (token.kind) {
    case "error":
      return token.text === "#" ? "it holds a spill reference (#), whose size zcell cannot check" : undefined;
    case "array":
      return arrayConstant.test(token.text) ? undefined : `it holds an array constant zcell cannot check (${shown(token.text)})`;
    case "name":
      return `it uses the name ${shown(token.text)}, and a name can stand for any formula`;
    case "op":
      if (token.text === "[" || token.text === "]") return "it refers to another workbook";
      return allowedOperators.has(token.text) ? undefined : `it holds "${shown(token.text)}", which zcell does not restore`;
    default:
      return undefined;
  }
}

/**
 * Whether the pane may write a formula back into a cell by itself.
 * @param formula the formula as stored (typed `ZC.` or saved `_xldudf_ZC_` spelling), with its "="
 * @param options whether one cell is written (then nothing that could spill), and the workbook's sheets where known
 * @returns the formula to write, in the typed spelling with our exact function names, or the reason it is refused
 */
export function restorableFormula(formula: unknown, options: RestoreOptions): Restorable {
  if (typeof formula !== "string" || !formula.startsWith("=")) return { ok: false, reason: "it is not a formula" };
  if (formula.length > maxFormulaLength) return { ok: false, reason: `it is longer than Excel allows (${maxFormulaLength} characters)` };
  let tokens: Token[];
  try {
    tokens = tokenize(typedFormula(formula));
  } catch {
    return { ok: false, reason: "zcell cannot read it (an unterminated string, sheet name or array)" };
  }
  // every "|" read as an operator (not inside a string, sheet name or array) is refused here, before any other token is judged
  if (tokens.some((t) => t.kind === "op" && t.text === "|")) return { ok: false, reason: "it holds a DDE link (|), which can start another program" };
  const written: string[] = ["="];
  let calls = 0;
  let depth = 0;
  for (let i = 0; i < tokens.length; i++) {
    const token = tokens[i];
    let text = token.text;
    let spills = token.kind === "array";
    if (token.kind === "func") {
      const read = functionName(token);
      if ("problem" in read) return { ok: false, reason: read.problem };
      text = read.name;
      spills = tableFunctions.has(read.name);
      calls++;
    } else if (token.kind === "ref") {
      const read = readReference(token.text, options.sheets);
      if (read.problem !== undefined) return { ok: false, reason: read.problem };
      spills = read.multiCell;
    } else {
      const problem = tokenProblem(token);
      if (problem) return { ok: false, reason: problem };
    }
    if (token.kind === "open") depth++;
    if (token.kind === "close" && --depth < 0) return { ok: false, reason: "its parentheses do not match" };
    if (options.singleCell && spills) {
      return { ok: false, reason: `it could spill over other cells (${shown(token.text)}); enter it yourself where there is room` };
    }
    written.push(text);
  }
  if (depth !== 0) return { ok: false, reason: "its parentheses do not match" };
  if (calls === 0) return { ok: false, reason: "it calls no zcell function" };
  return { ok: true, formula: written.join("") };
}

/** Work done between two turns given to the page while judging many formulas, ms. */
const sliceMs = 10;

/**
 * Judges many formulas (every note of a selection, every #NAME? cell of a workbook), giving the page a
 * turn whenever `sliceMs` of work has passed, so that a workbook full of long crafted formulas never
 * holds the pane (and the functions sharing its runtime) for longer than that at a time.
 * @param formulas the formulas as stored
 * @param options as for `restorableFormula`
 * @returns the verdicts, in the same order
 */
export async function restorableFormulas(formulas: readonly unknown[], options: RestoreOptions): Promise<Restorable[]> {
  const verdicts: Restorable[] = [];
  let since = performance.now();
  for (const formula of formulas) {
    if (performance.now() - since > sliceMs) {
      await new Promise((resolve) => setTimeout(resolve, 0));
      since = performance.now();
    }
    verdicts.push(restorableFormula(formula, options));
  }
  return verdicts;
}
