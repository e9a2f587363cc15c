/**
 * For a cell that shows an error: which argument the message is about, and how to put it right, in the
 * sheet's words (the argument's name as in the function's help, its domain, the choices it takes).
 * The message itself is the function's own; this only reads it, so an unknown message still gives
 * the advice of its error kind.
 */
import type { ErrorKind } from "../functions/cellError.js";
import type { ArgSpec, FunctionDef } from "../functions/FunctionDef.js";

/** The argument a message is about (absent when it names none) and what to do. */
export interface ErrorAdvice {
  argument?: string;
  fix: string;
}

/**
 * Words of a message about the model: its parameters, a bounce, a preset, or "model:" naming the
 * argument ("in this model" alone is about the value asked for, not the model).
 */
const modelWords = /(?<![\w.])(H0|Om|OL|Ok|Ob|w0|wa|Tcmb|Neff|mnu|no big bang|preset|model(?=:))(?![\w])/;

const escape = (text: string) => text.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");

/** Position of the first whole-word mention of `word` in `text`, or Infinity. */
function firstMention(text: string, word: string | RegExp): number {
  const pattern = typeof word === "string" ? new RegExp(`(?<![\\w.])${escape(word)}(?![\\w])`) : word;
  const at = text.search(pattern);
  return at < 0 ? Number.POSITIVE_INFINITY : at;
}

/** The argument named first in the message (the model when its parameters come first). */
function argumentAtFault(def: FunctionDef, message: string): ArgSpec | undefined {
  const text = message.replace(new RegExp(`^ZC\\.${escape(def.name)}: `), "");
  let best: ArgSpec | undefined;
  let bestAt = Number.POSITIVE_INFINITY;
  for (const spec of def.args) {
    const at = spec.kind === "model" ? firstMention(text, modelWords) : firstMention(text, spec.name);
    if (at < bestAt) [best, bestAt] = [spec, at];
  }
  return best;
}

/** The domain of a number argument in words, e.g. "≥ 0" or "from 0 to 180°". */
function domain(spec: Extract<ArgSpec, { kind: "number" }>): string | undefined {
  if (spec.min !== undefined && spec.max) return `from ${spec.min} to ${spec.max.what}`;
  if (spec.min !== undefined) return `${spec.minExclusive ? ">" : "≥"} ${spec.min}`;
  return undefined;
}

/** The unit argument that converts `name`, if any: its name and default. */
function unitOf(def: FunctionDef, name: string): { name: string; default: string } | undefined {
  for (const spec of def.args) {
    if (spec.kind === "unit") {
      const applies = typeof spec.applies === "string" ? [spec.applies] : spec.applies;
      if (applies.includes(name)) return spec;
    } else if (spec.kind === "text" && spec.unit?.applies?.includes(name)) {
      return { name: spec.name, default: textUnitDefault(spec) };
    }
  }
  return undefined;
}

/** What a blank text unit stands for, as the help shows it ("" when it is required or has no one value). */
function textUnitDefault(spec: Extract<ArgSpec, { kind: "text" }>): string {
  return spec.blank && "typed" in spec.blank ? spec.blank.typed : "";
}

/**
 * Where a message's own fix begins: after ": " or "; ", an imperative of our messages ("give …",
 * "write …", "did you mean …?", "if 0.55 is in um, give …", "for a right ascension in hours use …").
 */
const fixStart = /(?:: |; )(?=((?:if [^;:]{1,80}?, )?(?:give|write|use|put|leave|add|check|separate|did you mean|for [^;:]{1,80}? use)\b))/g;

/**
 * The fix a message names itself, as a sentence, or undefined when it names none. `typed` holds the
 * texts the formula and its cells gave (a stranger's). Messages quote such a text in double quotes,
 * perhaps rewritten (a spec's "," shown as "; "), so a fix is looked for only outside quotes, and only
 * the first place there counts: when a typed text holds a `"` (quotes no longer delimit it) or holds
 * that fix's opening words, the message's fix is not used and the argument's own advice stands.
 */
function messageFix(text: string, typed: readonly string[], argument: string | undefined): string | undefined {
  if (typed.some((t) => t.includes('"'))) return undefined;
  for (const match of text.matchAll(fixStart)) {
    if (quotesBefore(text, match.index) % 2 === 1) continue; // inside a quoted text
    const lead = text.slice(match.index, match.index + 2 + match[1].search(/\s|$/));
    if (typed.some((t) => t.includes(lead))) return undefined;
    let fix = text.slice(match.index + 2);
    if (argument) fix = fix.replace(/^give it\b/, `give ${argument}`);
    return `${fix[0].toUpperCase()}${fix.slice(1)}${/[.?]$/.test(fix) ? "" : "."}`;
  }
  return undefined;
}

/** How many double quotes stand in `text` before `end`. */
function quotesBefore(text: string, end: number): number {
  let count = 0;
  for (let i = text.indexOf('"'); i >= 0 && i < end; i = text.indexOf('"', i + 1)) count++;
  return count;
}

/** A number argument's message that says the value is outside the argument's own domain (below its least, above its most, past the pole). */
const outsideDomain = /must be [<>≤≥]|is above|is beyond/;

const byKind: Record<ErrorKind, string> = {
  value:
    "An argument is not of its kind (a number, a unit, a model or one of its words): compare the order of the arguments with the function's help.",
  num: "A value lies outside its physical domain, or the result does: the message says which.",
  na: "No value answers these arguments in this model: change the value asked for, its unit, or the model.",
};

/**
 * Advice for an error a ZC function gave: the message's own fix when it names one (the pane then
 * says what the cell says), else the advice of the argument's kind, never a domain the value meets.
 * @param def the function
 * @param kind the error kind (#VALUE!, #NUM!, #N/A)
 * @param message the error's message as the cell holds it
 * @param typed the texts the formula and the cells it reads gave (a stranger's), kept out of the advice
 * @returns the argument the message is about, when it names one, and how to fix it
 */
export function adviseOnError(def: FunctionDef, kind: ErrorKind, message: string, typed: readonly string[] = []): ErrorAdvice {
  const spec = argumentAtFault(def, message);
  const own = messageFix(message.replace(new RegExp(`^ZC\\.${escape(def.name)}: `), ""), typed, spec?.name);
  if (own) return spec ? { argument: spec.name, fix: own } : { fix: own };
  if (!spec) return { fix: byKind[kind] };
  const argument = spec.name;
  switch (spec.kind) {
    case "model":
      return {
        argument,
        fix: 'Give a preset name (ZC.PRESETS() lists them) or a spec such as "P18-CMB; H0=70", or leave it blank for the workbook\'s model; a model needs a big bang (check Om, OL or Ok, w0, wa).',
      };
    case "unit":
      return {
        argument,
        fix: `Type a unit in its FITS spelling, case as shown (default "${spec.default}"); the Units section of the help lists them, and the message names the nearest ones.`,
      };
    case "text":
      if (spec.unit) {
        const blank = textUnitDefault(spec);
        return { argument, fix: `Type a unit in its FITS spelling, case as shown${blank ? ` (default "${blank}")` : ""}; the Units section of the help lists them.` };
      }
      return { argument, fix: spec.choices ? `Use one of: ${spec.choices.join(", ")}.` : byKind[kind] };
    case "number": {
      if (spec.magnitude && /flag|99/.test(message)) {
        return { argument, fix: `±99 and any |${argument}| ≥ 50 mark a missing magnitude in a catalogue: enter the measured value, or leave the cell blank for a blank result.` };
      }
      const range = domain(spec);
      const unit = unitOf(def, argument);
      const inUnit = unit ? ` in the unit of ${unit.name} (default ${unit.default})` : "";
      if (kind === "value" && spec.sexagesimal) {
        return {
          argument,
          fix: `Give ${argument} as a number${inUnit || " in degrees"}, or as sexagesimal text: a right ascension in hours (12:30:49.4, 12h30m49.4s, 12 30 49.4), a declination in degrees (+12:23:28, -05d07m, −05°07′); minutes and seconds below 60, one sign, a declination within ±90°.`,
        };
      }
      if (kind === "value") return { argument, fix: `Give ${argument} a number${inUnit}; text that is not a number is refused.` };
      if (range && outsideDomain.test(message)) return { argument, fix: `Give ${argument} a value ${range}${inUnit}.` };
      if (/^z(?![a-z])/.test(argument)) {
        return { argument, fix: `Give ${argument} a redshift ≥ 0 (> 0 where the result needs the source's distance; a blueshifted source needs a distance that does not come from its redshift).` };
      }
      return { argument, fix: `Change ${argument}${inUnit}: the message says what it must be.` };
    }
    default:
      return { argument, fix: byKind[kind] };
  }
}
