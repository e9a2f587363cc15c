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

/** The unit argument that converts `name`, if any. */
function unitOf(def: FunctionDef, name: string): Extract<ArgSpec, { kind: "unit" }> | undefined {
  for (const spec of def.args) {
    if (spec.kind !== "unit") continue;
    const applies = typeof spec.applies === "string" ? [spec.applies] : spec.applies;
    if (applies.includes(name)) return spec;
  }
  return undefined;
}

const byKind: Record<ErrorKind, string> = {
  value:
    "An argument is not of its kind (a number, a unit, a model or one of its words): compare the order of the arguments with the function's help.",
  num: "A value lies outside its physical domain, or the result does: the message says which.",
  na: "No value answers these arguments in this model: change the value asked for, its unit, or the model.",
};

/**
 * Advice for an error a ZC function gave.
 * @param def the function
 * @param kind the error kind (#VALUE!, #NUM!, #N/A)
 * @param message the error's message as the cell holds it
 * @returns the argument the message is about, when it names one, and how to fix it
 */
export function adviseOnError(def: FunctionDef, kind: ErrorKind, message: string): ErrorAdvice {
  const spec = argumentAtFault(def, message);
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
      if (range) return { argument, fix: `Give ${argument} a value ${range}${inUnit}.` };
      if (/^z(?![a-z])/.test(argument)) {
        return { argument, fix: `Give ${argument} a redshift ≥ 0 (> 0 where the result needs the source's distance; a blueshifted source needs a distance that does not come from its redshift).` };
      }
      return { argument, fix: `Change ${argument}${inUnit}: the message says what it must be.` };
    }
    default:
      return { argument, fix: byKind[kind] };
  }
}
