/**
 * Models defined in a workbook: names a team gives to parameter sets zcell does not ship (a newer
 * survey's result, a collaboration's fiducial model). They are stored in the workbook's add-in
 * settings beside the active model, as name → spec text, so they travel with the file; any model
 * argument may name one (`=ZC.DIST_LUM(A2, "TEAM-FIDUCIAL")`). A name never shadows a built-in preset.
 */
import { findPreset, formatModelSpec, parseModelSpec, quotedText, type ModelParameters, type NamedModels } from "../core/index.js";

/** Settings key under which the workbook's own models are stored (an object: name → spec text). */
export const workbookModelsSettingKey = "zcell.workbookModels";

const namePattern = /^[A-Za-z][A-Za-z0-9_-]{0,31}$/;

/**
 * Why a name cannot name a workbook model, or undefined when it can.
 * @param name the name typed, e.g. "TEAM-FIDUCIAL"
 */
export function modelNameProblem(name: string): string | undefined {
  if (!namePattern.test(name)) return `"${quotedText(name)}" is not a model name: use a letter, then letters, digits, - or _ (at most 32)`;
  if (findPreset(name)) return `"${name.toUpperCase()}" is a built-in preset: choose another name`;
  return undefined;
}

/** The workbook's models: upper-case name → spec text, and what could not be read. */
export interface WorkbookModels {
  specs: ReadonlyMap<string, string>;
  /** The models as a spec's possible base (for parseModelSpec). */
  named: NamedModels;
  /** One sentence for each stored entry that was left out. */
  problems: string[];
}

/** No workbook models. */
export const noWorkbookModels: WorkbookModels = { specs: new Map(), named: { find: () => undefined, names: [] }, problems: [] };

/**
 * Stored entries read from one workbook at most, usable or not (a name that is no name, a spec that
 * does not parse): a workbook is written by strangers, and the rest are left out with a warning.
 */
export const maxWorkbookModels = 100;
/** Characters of one stored spec at most (a full spec of every key is under 200). */
export const maxSpecLength = 500;
/** Problems reported one by one at most; the rest are counted. */
const problemsListedAtMost = 5;

/**
 * Reads the stored value (as the settings return it). Each entry must be a valid name whose spec
 * text (at most `maxSpecLength` characters) parses on the built-in presets alone (a workbook model
 * does not build on another); the first `maxWorkbookModels` entries are read, usable or not, and the
 * others are left out unread and counted in `problems`. Two names that differ only in case name one model: the one stored last
 * is read, and `problems` says so.
 * @param stored the settings value: an object of name → spec text, or undefined
 */
export function readWorkbookModels(stored: unknown): WorkbookModels {
  if (stored === undefined || stored === null) return noWorkbookModels;
  if (typeof stored !== "object" || Array.isArray(stored)) {
    return { ...noWorkbookModels, problems: ["the workbook's own models could not be read (not a list of names and specs)"] };
  }
  const specs = new Map<string, string>();
  const parameters = new Map<string, ModelParameters>();
  /** Each name read, as stored, by its upper-case form: names are read without regard to case. */
  const storedNames = new Map<string, string>();
  const problems: string[] = [];
  let read = 0;
  let unread = 0;
  let bad = 0;
  for (const name in stored) {
    if (!Object.prototype.hasOwnProperty.call(stored, name)) continue;
    if (read++ >= maxWorkbookModels) {
      unread++;
      continue;
    }
    const spec = (stored as Record<string, unknown>)[name];
    const problem = modelNameProblem(name);
    let why: string | undefined;
    if (problem) why = `workbook model ${problem}`;
    else if (typeof spec !== "string") why = `workbook model ${name}: its spec is not text`;
    else if (spec.length > maxSpecLength) why = `workbook model ${name}: its spec is longer than ${maxSpecLength} characters`;
    else {
      try {
        const upper = name.toUpperCase();
        parameters.set(upper, parseModelSpec(spec));
        const earlier = storedNames.get(upper);
        if (earlier !== undefined) {
          why = `workbook models ${earlier} and ${name} differ only in case, and model names are read without regard to case; zcell reads the one stored last, ${name}`;
        }
        specs.set(upper, spec);
        storedNames.set(upper, name);
      } catch (e) {
        why = `workbook model ${name}: ${(e as Error).message}`;
      }
    }
    if (why === undefined) continue;
    if (++bad <= problemsListedAtMost) problems.push(why);
  }
  if (bad > problemsListedAtMost) problems.push(`… and ${bad - problemsListedAtMost} more workbook models that could not be read`);
  if (unread) problems.push(`only the first ${maxWorkbookModels} workbook models are read; ${unread} more are left out`);
  const names = [...specs.keys()];
  return { specs, problems, named: { find: (name) => parameters.get(name.trim().toUpperCase()), names } };
}

/**
 * The stored form of a set of workbook models.
 * @param specs name → spec text
 */
export function storedWorkbookModels(specs: ReadonlyMap<string, string>): Record<string, string> {
  return Object.fromEntries([...specs].sort(([a], [b]) => a.localeCompare(b)));
}

/**
 * The spec text a model argument stands for: a name defined in the workbook (alone or with changes)
 * becomes the canonical spec of its parameters, so that the model cache never keeps a stale meaning.
 * @param text the model argument's text, e.g. "TEAM-FIDUCIAL; H0=73"
 * @param models the workbook's own models (none when omitted)
 */
export function resolvedSpec(text: string, models: WorkbookModels | undefined): string {
  if (!models || models.specs.size === 0) return text;
  const first = text.split(";", 1)[0].trim().toUpperCase();
  return models.specs.has(first) ? formatModelSpec(parseModelSpec(text, models.named)) : text;
}
