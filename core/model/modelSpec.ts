/**
 * Model spec text: zcell's own one-line syntax for a cosmological model, as typed in a cell.
 *
 *   PRESET                      e.g. P18-CMB
 *   PRESET; key=value; ...      e.g. P18-CMB; H0=73
 *   key=value; ...              e.g. H0=70; Om=0.3; OL=0.7
 *
 * Keys (case-insensitive, spaces ignored, '.' is the decimal point): H0, Om, OL or Ok (not both),
 * Ob, w0, wa, Tcmb, Neff, mnu (one total mass in eV, or a list `mnu=0.05,0.01,0`). Without a preset,
 * H0 and Om are required and Tcmb = 0 (no radiation) unless given, Neff = 3.046, mnu = 0, w0 = −1,
 * wa = 0; a model with neither OL nor Ok is flat.
 */
import { isNumberText } from "../checks/numberText.js";
import { quoted, quotedText } from "../checks/quoted.js";
import { parameterKeys, specDefaults, type ModelParameters, type ParameterKey } from "./ModelParameters.js";
import { defaultPresetName, findPreset, presets } from "./presets.js";

/** A percentage (linear: no part of the pattern can match the same digits in two ways). */
const percentPattern = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)%$/;
/** A number followed by more text that starts with a letter or "/": a number with its unit ("70km/s/Mpc"). */
const numberThenWord = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?[A-Za-zµμ/°]/;
/** Keys whose value is a fraction of the critical density (a percentage of it is a slip). */
const densityKeys: ReadonlySet<string> = new Set(["Om", "OL", "Ok", "Ob"]);
/** The unit each key with one is read in (ModelParameters). */
const keyUnits: Readonly<Partial<Record<string, string>>> = { H0: "km/s/Mpc", Tcmb: "K", mnu: "eV" };

/**
 * A key's value as a number.
 * @param key the key, as the spec names it
 * @param text the value without spaces
 * @param typed the value as typed (spaces kept), for the message
 */
function parseNumber(key: string, text: string, typed = text): number {
  if (isNumberText(text)) {
    const x = Number(text);
    if (!Number.isFinite(x)) throw new TypeError(`${key}: ${quoted(typed)} is too large a number`);
    return x;
  }
  if (percentPattern.test(text)) {
    const fraction = Number((Number(text.slice(0, -1)) / 100).toPrecision(6));
    const fix = densityKeys.has(key) ? `write the fraction, ${key}=${fraction}` : `write ${key} as a plain number`;
    throw new TypeError(`${key}: ${quoted(typed)} is a percentage: ${fix}`);
  }
  if (numberThenWord.test(text)) {
    const unit = keyUnits[key];
    throw new TypeError(`${key}: ${quoted(typed)}: give the number alone${unit ? ` (${key} is in ${unit})` : ""}`);
  }
  const pointed = text.replaceAll(",", ".");
  if (pointed !== text && (isNumberText(pointed) || percentPattern.test(pointed))) {
    throw new TypeError(`${key}: ${quoted(typed)} is not a number: use a point for decimals, ${quotedText(pointed)}`);
  }
  throw new TypeError(`${key}: ${quoted(typed)} is not a number`);
}

/** Spellings of the keys in other programs and papers (lower case, without "_", "omega" as "o", a final 0 dropped), by key (common practice). */
const keySpellings: Readonly<Record<string, ParameterKey>> = {
  om: "Om", omm: "Om", omatter: "Om", m: "Om",
  ol: "OL", ode: "OL", olambda: "OL", olam: "OL", ox: "OL", de: "OL", lambda: "OL",
  ok: "Ok", ocurv: "Ok", k: "Ok",
  ob: "Ob", obaryon: "Ob",
  w: "w0",
  wa: "wa",
  h: "H0", hubble: "H0",
  tcmb: "Tcmb",
  neff: "Neff", nnu: "Neff",
  mnu: "mnu", summnu: "mnu", mnusum: "mnu",
};

/**
 * What to tell of a key that is not one: the key it is probably another spelling of, and the keys.
 * @param typed the key as typed, e.g. "Om0"
 * @param keys the keys that are valid here
 * @returns e.g. "did you mean Om? (the keys are H0, Om, …)", or "use H0, Om, …" when none is near
 * @example keySuggestion("w", ["H0", "w0"]) // "did you mean w0? (the keys are H0, w0)"
 */
export function keySuggestion(typed: string, keys: readonly string[]): string {
  const loose = typed.toLowerCase().replace(/[\s_\-]/g, "").replace(/^omega/, "o").replace(/^(.+?)0$/, "$1");
  const meant = Object.hasOwn(keySpellings, loose) ? keySpellings[loose] : undefined;
  if (meant === undefined || !keys.includes(meant)) return `use ${keys.join(", ")}`;
  const note = meant === "H0" && loose === "h" ? " (in km/s/Mpc: H0 = 100 h)" : "";
  return `did you mean ${meant}${note}? (the keys are ${keys.join(", ")})`;
}

/**
 * A spec part written with commas where ';' belongs ("P18-CMB,H0=73", "H0=70,Om=0.3"), rewritten
 * with ';'; a comma followed by no key (the masses of an mnu list, a decimal comma) stays.
 */
function withSemicolons(part: string): string | undefined {
  if (!part.includes("=")) return undefined;
  const pieces: string[] = [];
  for (const piece of part.split(",")) {
    const last = pieces.length - 1;
    if (last >= 0 && !piece.includes("=") && pieces[last].includes("=")) pieces[last] += `,${piece}`;
    else pieces.push(piece);
  }
  return pieces.length > 1 ? pieces.join("; ") : undefined;
}

function parseMasses(text: string, typed = text): number[] {
  const items = text.split(",");
  if (items.length > 3) throw new TypeError(`mnu: at most three masses, got ${items.length}`);
  if (items.length === 2 && items[0] === "0" && /^\d+$/.test(items[1])) {
    // a list starts from its heaviest mass: "0,06" is 0.06 eV with a decimal comma, not 0 and 6 eV
    throw new TypeError(`mnu: ${quoted(typed)} reads as two masses, 0 and ${quotedText(items[1])} eV: for one mass write mnu=0.${quotedText(items[1])} (a list is written heaviest first, "0.05,0.01")`);
  }
  return items
    .map((item) => parseNumber("mnu", item, items.length === 1 ? typed : item))
    .filter((m) => m !== 0)
    .sort((a, b) => b - a);
}

const keyByLowerCase = new Map<string, ParameterKey>(parameterKeys.map((k) => [k.toLowerCase(), k]));

/** Models named outside the built-in presets (e.g. defined in a workbook), usable as a spec's base. */
export interface NamedModels {
  /** The parameters of the model with this name (case-insensitive), or undefined. */
  find(name: string): ModelParameters | undefined;
  /** Their names, for messages. */
  names: readonly string[];
}

/** Names a message lists at most (a workbook may define many models). */
const namesListedAtMost = 12;

/**
 * A spec that names no preset and lacks H0 or Om. `given` holds the keys it gave, as typed, so that
 * a message can show them on a preset or on the workbook's model.
 */
export class MissingParameterError extends TypeError {
  /**
   * @param missing the key that is missing ("H0" or "Om")
   * @param given the keys and value texts the spec gave, in its order
   */
  constructor(
    readonly missing: "H0" | "Om",
    readonly given: readonly (readonly [ParameterKey, string])[],
  ) {
    const example = [defaultPresetName, ...given.map(([key, value]) => `${key}=${quotedText(value)}`)].join("; ");
    super(`${missing} is required (or start from a preset, e.g. "${example}")`);
  }
}

/**
 * Parses model spec text into parameters (syntax only; physical checks happen when the model is built).
 *
 * @param text spec text, e.g. "P18-CMB; H0=73"
 * @param named further models a spec may start from, after the built-in presets
 * @returns the model parameters
 * @throws TypeError naming the offending key or token (MissingParameterError for a spec with neither
 *   a preset nor H0 and Om)
 * @example parseModelSpec("H0=70; Om=0.3").OL // undefined (flat)
 */
export function parseModelSpec(text: string, named?: NamedModels): ModelParameters {
  if (typeof text !== "string") throw new TypeError("model spec must be text");
  // each part as typed (for the messages) and without spaces (spaces inside a key or value are ignored)
  const parts = text
    .split(";")
    .map((typed) => ({ typed: typed.trim(), part: typed.replace(/\s+/g, "") }))
    .filter(({ part }) => part !== "");
  if (parts.length === 0) throw new TypeError("empty model spec: give a preset name or key=value pairs");
  let base: ModelParameters | undefined;
  const given = new Map<ParameterKey, string>();
  const typedValues = new Map<ParameterKey, string>();
  parts.forEach(({ typed, part }, index) => {
    const rewritten = withSemicolons(part);
    if (rewritten !== undefined) throw new TypeError(`${quoted(typed)}: separate the parts with ';', e.g. ${quoted(rewritten)}`);
    const eq = part.indexOf("=");
    if (eq < 0) {
      const colon = part.indexOf(":");
      if (colon > 0 && keyByLowerCase.has(part.slice(0, colon).toLowerCase())) {
        const key = keyByLowerCase.get(part.slice(0, colon).toLowerCase())!;
        throw new TypeError(`${quoted(typed)}: write each key as key=value, e.g. ${quoted(`${key}=${part.slice(colon + 1)}`)}`);
      }
      const spaced = /^(\S+)\s+(\S.*)$/.exec(typed);
      if (spaced && keyByLowerCase.has(spaced[1].toLowerCase())) {
        // "H0 70": a key and its value with a space for "="
        const key = keyByLowerCase.get(spaced[1].toLowerCase())!;
        throw new TypeError(`${quoted(typed)}: write each key as key=value, e.g. ${quoted(`${key}=${spaced[2].replace(/\s+/g, "")}`)}`);
      }
      if (index > 0) throw new TypeError(`${quoted(typed)} is not key=value (a preset name may only come first)`);
      const preset = findPreset(part)?.parameters ?? named?.find(part);
      if (!preset) {
        const known = [...presets.map((p) => p.name), ...(named?.names ?? [])];
        const listed = known.slice(0, namesListedAtMost).join(", ") + (known.length > namesListedAtMost ? ` … and ${known.length - namesListedAtMost} more` : "");
        throw new TypeError(`unknown preset ${quoted(typed)}: use one of ${listed}`);
      }
      base = preset;
      return;
    }
    if (part.indexOf("=", eq + 1) >= 0) {
      throw new TypeError(`${quoted(typed)} holds several keys: separate keys with ';', e.g. "H0=70; Om=0.3; OL=0.7"`);
    }
    const rawKey = part.slice(0, eq);
    const key = keyByLowerCase.get(rawKey.toLowerCase());
    if (!key) throw new TypeError(`unknown key ${quoted(rawKey)}: ${keySuggestion(rawKey, parameterKeys)}`);
    if (given.has(key)) throw new TypeError(`${key} is given twice`);
    given.set(key, part.slice(eq + 1));
    typedValues.set(key, typed.slice(typed.indexOf("=") + 1).trim());
  });
  if (given.has("OL") && given.has("Ok")) throw new TypeError("give OL or Ok, not both");
  const p: ModelParameters = base
    ? { ...base, mnu: [...base.mnu] }
    : { ...specDefaults, mnu: [], H0: Number.NaN, Om: Number.NaN };
  for (const [key, value] of given) {
    if (key === "mnu") p.mnu = parseMasses(value, typedValues.get(key));
    else p[key] = parseNumber(key, value, typedValues.get(key));
  }
  if (!base) {
    for (const key of ["H0", "Om"] as const) {
      if (!given.has(key)) throw new MissingParameterError(key, [...given]);
    }
  }
  if (given.has("OL")) delete p.Ok;
  if (given.has("Ok")) delete p.OL;
  return p;
}

/**
 * A model with some parameters changed: each key (case-insensitive) takes the value given, as a
 * number or as spec text ("0.05,0.01" for mnu). Giving OL drops Ok and giving Ok drops OL.
 *
 * @param p the model to start from (not changed)
 * @param changes key and value pairs, e.g. [["H0", 73]]
 * @returns the changed parameters
 * @throws TypeError naming an unknown key, a key given twice or a value that is not a number
 * @example formatModelSpec(withChanges(parseModelSpec("P18-CMB"), [["H0", 73]])) // "P18-CMB; H0=73"
 */
export function withChanges(p: ModelParameters, changes: readonly (readonly [string, number | string])[]): ModelParameters {
  const out: ModelParameters = { ...p, mnu: [...p.mnu] };
  const seen = new Set<ParameterKey>();
  for (const [rawKey, value] of changes) {
    const key = keyByLowerCase.get(rawKey.trim().toLowerCase());
    if (!key) throw new TypeError(`unknown key ${quoted(rawKey.trim())}: ${keySuggestion(rawKey.trim(), parameterKeys)}`);
    if (seen.has(key)) throw new TypeError(`${key} is given twice`);
    seen.add(key);
    const typed = String(value).trim();
    const text = typed.replace(/\s+/g, "");
    if (key === "mnu") out.mnu = parseMasses(text, typed);
    else out[key] = parseNumber(key, text, typed);
    if (key === "OL") delete out.Ok;
    if (key === "Ok") delete out.OL;
  }
  return out;
}

function sameMasses(a: readonly number[], b: readonly number[]): boolean {
  return a.length === b.length && a.every((m, i) => m === b[i]);
}

/**
 * Canonical spec text: the shortest spec that rebuilds the same parameters, so that
 * parseModelSpec(formatModelSpec(p)) equals p. Keys differing from the preset (or from the defaults)
 * are written in the order H0, Om, OL, Ok, Ob, w0, wa, Tcmb, Neff, mnu; numbers in shortest
 * round-trip form.
 *
 * @param p model parameters
 * @returns spec text, e.g. "P18-CMB; H0=73"
 * @example formatModelSpec(parseModelSpec("om = 0.30 ; H0=70.0")) // "H0=70; Om=0.3"
 */
export function formatModelSpec(p: ModelParameters): string {
  const preset = p.preset ? findPreset(p.preset) : undefined;
  const base: Partial<ModelParameters> = preset ? preset.parameters : specDefaults;
  const out: string[] = preset ? [preset.name] : [];
  for (const key of parameterKeys) {
    if (key === "mnu") {
      if (!sameMasses(p.mnu, base.mnu ?? [])) out.push(`mnu=${p.mnu.length ? p.mnu.join(",") : "0"}`);
      continue;
    }
    // H0 and Om have no default, so without a preset they are always written
    const value = p[key];
    if (value !== undefined && value !== base[key]) out.push(`${key}=${value}`);
  }
  return out.join("; ");
}
