/**
 * A tokenizer for Excel formulas and a finder of the function calls in them (for the cell
 * inspector). Handles strings with doubled quotes, sheet-qualified ('My sheet'!A1) and absolute
 * ($A$1) references, whole rows/columns (A:A, 1:3), structured names, nested calls, array
 * constants ({1,2;3,4}), error literals, and both argument separators (',' and ';').
 */

/** Kinds of token. */
export type TokenKind = "number" | "string" | "bool" | "error" | "ref" | "name" | "func" | "open" | "close" | "sep" | "array" | "op" | "space";

/** One token, with its place in the formula. */
export interface Token {
  kind: TokenKind;
  text: string;
  start: number;
}

/** One function call found in a formula. */
export interface FormulaCall {
  /** Function name as written, upper-cased (e.g. "ZC.DIST_LUM"). */
  name: string;
  /** Source text of each argument ("" for an omitted one). */
  args: string[];
  /** Tokens of each argument, spaces dropped. */
  argTokens: Token[][];
  /** Nesting depth (0 for a call at the top of the formula). */
  depth: number;
  /** The call's own source text, e.g. "ZC.KCORRECTION(B2, -0.5)". */
  text: string;
}

const errorLiterals = ["#NULL!", "#DIV/0!", "#VALUE!", "#REF!", "#NAME?", "#NUM!", "#N/A", "#GETTING_DATA", "#SPILL!", "#CALC!", "#FIELD!", "#BUSY!", "#CONNECT!", "#BLOCKED!", "#UNKNOWN!"];
const cellPart = String.raw`\$?[A-Za-z]{1,3}\$?\d+`;
const columnPart = String.raw`\$?[A-Za-z]{1,3}`;
const rowPart = String.raw`\$?\d+`;
const rangePattern = new RegExp(
  String.raw`^(?:${cellPart}(?::${cellPart})?|${columnPart}:${columnPart}|${rowPart}:${rowPart})(?![A-Za-z0-9_.(])`,
);
const sheetPattern = /^(?:'(?:[^']|'')+'|[A-Za-z_\u00C0-\uFFFF][\w.\u00C0-\uFFFF]*)!/;
const numberPattern = /^(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?%?/;
const namePattern = /^[A-Za-z_\\\u00C0-\uFFFF][\w.\u00C0-\uFFFF]*/;

/**
 * Splits a formula into tokens.
 * @param formula the formula, with or without its leading "="
 * @returns the tokens in order
 * @throws SyntaxError for an unterminated string, sheet name or array constant
 */
export function tokenize(formula: string): Token[] {
  const s = formula.startsWith("=") ? formula.slice(1) : formula;
  const offset = formula.length - s.length;
  const tokens: Token[] = [];
  let i = 0;
  const push = (kind: TokenKind, text: string) => {
    tokens.push({ kind, text, start: i + offset });
    i += text.length;
  };
  while (i < s.length) {
    const rest = s.slice(i);
    const c = s[i];
    if (c === '"') {
      let j = i + 1;
      for (;;) {
        if (j >= s.length) throw new SyntaxError(`unterminated string at ${i + offset}`);
        if (s[j] === '"') {
          if (s[j + 1] === '"') j += 2;
          else break;
        } else j++;
      }
      push("string", s.slice(i, j + 1));
    } else if (c === "{") {
      let j = i + 1;
      let inString = false;
      while (j < s.length && (inString || s[j] !== "}")) {
        if (s[j] === '"') inString = !inString;
        j++;
      }
      if (j >= s.length) throw new SyntaxError(`unterminated array constant at ${i + offset}`);
      push("array", s.slice(i, j + 1));
    } else if (c === " " || c === "\n" || c === "\r" || c === "\t") {
      push("space", /^\s+/.exec(rest)![0]);
    } else if (c === "(") push("open", c);
    else if (c === ")") push("close", c);
    else if (c === "," || c === ";") push("sep", c);
    else if (c === "#") {
      const e = errorLiterals.find((x) => rest.toUpperCase().startsWith(x));
      push("error", e ? rest.slice(0, e.length) : c);
    } else if (/^[<>]=|^<>/.test(rest)) push("op", rest.slice(0, 2));
    else if ("+-*/^&=<>%:".includes(c)) push("op", c);
    else {
      const sheet = sheetPattern.exec(rest);
      const afterSheet = sheet ? rest.slice(sheet[0].length) : rest;
      const range = rangePattern.exec(afterSheet);
      if (c === "'" && !sheet) throw new SyntaxError(`unterminated sheet name at ${i + offset}`);
      if (range) push("ref", (sheet?.[0] ?? "") + range[0]);
      else if (sheet) {
        const name = namePattern.exec(afterSheet);
        push("ref", sheet[0] + (name?.[0] ?? ""));
      } else if (/^\d|^\.\d/.test(rest)) push("number", numberPattern.exec(rest)![0]);
      else {
        const name = namePattern.exec(rest);
        if (!name) {
          push("op", c);
          continue;
        }
        const upper = name[0].toUpperCase();
        const next = s[i + name[0].length];
        if (next === "(") push("func", name[0]);
        else if (upper === "TRUE" || upper === "FALSE") push("bool", name[0]);
        else if (next === "[") {
          // structured reference Table1[Column]
          const close = s.indexOf("]", i);
          push("ref", s.slice(i, close < 0 ? s.length : close + 1));
        } else push("name", name[0]);
      }
    }
  }
  return tokens;
}

/**
 * Every function call in a formula, outermost first, with its arguments split at top-level
 * separators.
 * @param formula the formula text, e.g. '=ZC.DIST_LUM(A2, "P18-BAO; H0=73")'
 * @returns the calls found (nested ones too)
 */
export function findCalls(formula: string): FormulaCall[] {
  const tokens = tokenize(formula);
  const calls: FormulaCall[] = [];
  const source = formula;
  const parse = (start: number, depth: number): number => {
    // tokens[start] is a func token, tokens[start + 1] its "("
    const call: FormulaCall = { name: tokens[start].text.toUpperCase(), args: [], argTokens: [], depth, text: "" };
    calls.push(call);
    let i = start + 2;
    let argStart = i;
    let current: Token[] = [];
    const finishArg = (endIndex: number) => {
      const from = tokens[argStart]?.start ?? source.length;
      const to = endIndex < tokens.length ? tokens[endIndex].start : source.length;
      call.args.push(source.slice(from, to).trim());
      call.argTokens.push(current);
      current = [];
    };
    while (i < tokens.length) {
      const t = tokens[i];
      if (t.kind === "func" && tokens[i + 1]?.kind === "open") {
        const end = parse(i, depth + 1);
        current.push(...tokens.slice(i, end + 1).filter((x) => x.kind !== "space"));
        i = end + 1;
        continue;
      }
      if (t.kind === "open") {
        // a parenthesised sub-expression: keep it whole inside this argument
        let level = 0;
        let j = i;
        for (; j < tokens.length; j++) {
          if (tokens[j].kind === "open") level++;
          else if (tokens[j].kind === "close" && --level === 0) break;
          else if (tokens[j].kind === "func" && tokens[j + 1]?.kind === "open") {
            j = parse(j, depth + 1);
          }
        }
        current.push(...tokens.slice(i, j + 1).filter((x) => x.kind !== "space"));
        i = j + 1;
        continue;
      }
      if (t.kind === "close") {
        if (call.args.length > 0 || current.length > 0 || tokens[start + 2] !== t) finishArg(i);
        call.text = source.slice(tokens[start].start, t.start + 1);
        return i;
      }
      if (t.kind === "sep") {
        finishArg(i);
        argStart = i + 1;
        i++;
        continue;
      }
      if (t.kind !== "space") current.push(t);
      i++;
    }
    finishArg(tokens.length);
    call.text = source.slice(tokens[start].start);
    return tokens.length;
  };
  for (let i = 0; i < tokens.length; i++) {
    if (tokens[i].kind === "func" && tokens[i + 1]?.kind === "open") i = parse(i, 0);
  }
  return calls;
}

/** Parses an array constant such as {1,2;3,"a"} into rows of numbers, text and booleans. */
export function parseArrayConstant(text: string): (number | string | boolean)[][] {
  const inner = text.slice(1, -1);
  const rows: (number | string | boolean)[][] = [[]];
  let i = 0;
  let item = "";
  const flush = () => {
    const t = item.trim();
    item = "";
    let value: number | string | boolean;
    if (t.startsWith('"')) value = t.slice(1, -1).replaceAll('""', '"');
    else if (/^(TRUE|FALSE)$/i.test(t)) value = t.toUpperCase() === "TRUE";
    else value = Number(t);
    rows[rows.length - 1].push(value);
  };
  while (i < inner.length) {
    const c = inner[i];
    if (c === '"') {
      let j = i + 1;
      while (j < inner.length && !(inner[j] === '"' && inner[j + 1] !== '"')) j += inner[j] === '"' ? 2 : 1;
      item += inner.slice(i, j + 1);
      i = j + 1;
    } else if (c === "," || c === "\\") {
      flush();
      i++;
    } else if (c === ";") {
      flush();
      rows.push([]);
      i++;
    } else {
      item += c;
      i++;
    }
  }
  flush();
  return rows;
}
