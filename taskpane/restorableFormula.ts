/**
 * Which formulas the pane may write back into a workbook on its own (Thaw, the repair banner).
 * Everything a workbook stores — notes, comments, formulas — may come from a stranger, so a formula
 * is written only when it is made of nothing but ZC calls and what their arguments need: references
 * to cells and ranges of this workbook, numbers, strings, booleans, error literals, the arithmetic and
 * comparison operators, parentheses and the separators. This is an allow-list over our own tokenizer:
 * any other function, a DDE link (`|`), an external or structured reference, a defined name, and
 * anything the tokenizer cannot read are refused, each with a reason a person can act on.
 */
import { definitions } from "../functions/definitions.js";
import { typedFormula } from "../functions/storedFormula.js";
import { tokenize, type Token } from "./formulaCalls.js";

/** The verdict on one formula: the text to write (typed spelling), or why it is refused. */
export type Restorable = { ok: true; formula: string } | { ok: false; reason: string };

/** Excel's own limit on a formula's length: 8,192 characters (Microsoft's "Excel specifications and limits", from memory). */
const maxFormulaLength = 8192;
const allowedOperators = new Set(["+", "-", "*", "/", "^", "&", "=", "<", ">", "<=", ">=", "<>", "%"]);
/** ZC functions that return a table of several cells whatever their arguments. */
const tableFunctions = new Set(Object.values(definitions).filter((d) => d.table && d.name !== "VERSION").map((d) => `ZC.${d.name}`));

const sheetPart = String.raw`(?:'(?:[^'\[\]]|'')+'|[A-Za-z_\u00C0-\uFFFF][\w.\u00C0-\uFFFF]*)!`;
const cell = String.raw`\$?[A-Za-z]{1,3}\$?\d+`;
/** A reference to this workbook: optional sheet, then a cell, a range, whole columns or whole rows. */
const localReference = new RegExp(String.raw`^(?:${sheetPart})?(?:(${cell})(?::(${cell}))?|\$?[A-Za-z]{1,3}:\$?[A-Za-z]{1,3}|\$?\d+:\$?\d+)$`);

/** True when a reference names more than one cell (a range, whole columns or rows). */
function isMultiCell(reference: string): boolean {
  const m = localReference.exec(reference);
  if (!m) return true;
  if (m[1] === undefined) return true; // whole columns or rows
  return m[2] !== undefined && m[2].replaceAll("$", "").toUpperCase() !== m[1].replaceAll("$", "").toUpperCase();
}

/** Why a token is not allowed, or undefined when it is. */
function tokenProblem(token: Token, next: Token | undefined): string | undefined {
  switch (token.kind) {
    case "error":
      return token.text === "#" ? "it holds a spill reference (#), whose size zcell cannot check" : undefined;
    case "number":
    case "string":
    case "bool":
    case "open":
    case "close":
    case "sep":
    case "space":
      return undefined;
    case "func": {
      const name = token.text.toUpperCase();
      if (!name.startsWith("ZC.")) return `it calls ${name}, which is not a zcell function`;
      if (!definitions[name.slice(3)]) return `${name} is not a zcell function`;
      return next?.kind === "open" ? undefined : `it cannot be read near ${name}`;
    }
    case "ref":
      if (token.text.includes("[")) return `it refers to another workbook or a table (${token.text})`;
      if (!localReference.test(token.text)) return `it has a reference zcell cannot check (${token.text})`;
      return undefined;
    case "name":
      return `it uses the name ${token.text}, and a name can stand for any formula`;
    case "array":
      return undefined;
    case "op":
      if (token.text === "|") return "it holds a DDE link (|), which can start another program";
      if (token.text === "[" || token.text === "]") return "it refers to another workbook";
      return allowedOperators.has(token.text) ? undefined : `it holds "${token.text}", which zcell does not restore`;
  }
}

/**
 * Whether the pane may write a formula back into a cell by itself.
 * @param formula the formula as stored (typed `ZC.` or saved `_xldudf_ZC_` spelling), with its "="
 * @param options.singleCell also refuse a formula that could spill over other cells (Thaw writes one cell)
 * @returns the formula to write, in the typed spelling, or the reason it is refused
 */
export function restorableFormula(formula: unknown, options: { singleCell: boolean }): Restorable {
  if (typeof formula !== "string" || !formula.startsWith("=")) return { ok: false, reason: "it is not a formula" };
  if (formula.length > maxFormulaLength) return { ok: false, reason: `it is longer than Excel allows (${maxFormulaLength} characters)` };
  const typed = typedFormula(formula);
  let tokens: Token[];
  try {
    tokens = tokenize(typed);
  } catch {
    return { ok: false, reason: "zcell cannot read it (an unterminated string, sheet name or array)" };
  }
  if (tokens.some((t) => t.kind === "op" && t.text === "|")) return { ok: false, reason: "it holds a DDE link (|), which can start another program" };
  let calls = 0;
  let depth = 0;
  for (let i = 0; i < tokens.length; i++) {
    const token = tokens[i];
    const problem = tokenProblem(token, tokens[i + 1]);
    if (problem) return { ok: false, reason: problem };
    if (token.kind === "func") calls++;
    if (token.kind === "open") depth++;
    if (token.kind === "close" && --depth < 0) return { ok: false, reason: "its parentheses do not match" };
    if (options.singleCell) {
      if (token.kind === "array" || (token.kind === "ref" && isMultiCell(token.text)) || (token.kind === "func" && tableFunctions.has(token.text.toUpperCase()))) {
        return { ok: false, reason: `it could spill over other cells (${token.text}); enter it yourself where there is room` };
      }
    }
  }
  if (depth !== 0) return { ok: false, reason: "its parentheses do not match" };
  if (calls === 0) return { ok: false, reason: "it calls no zcell function" };
  return { ok: true, formula: typed };
}
