/**
 * Models defined in a workbook: names a team gives to parameter sets zcell does not ship (a newer
 * survey's result, a collaboration's fiducial model). They are stored in the workbook's add-in
 * settings beside the active model, as name → spec text, so they travel with the file; any model
 * argument may name one (`=ZC.DIST_LUM(A2, "TEAM-FIDUCIAL")`). A name never shadows a built-in preset.
 */
import { findPreset, parseModelSpec, type ModelParameters, type NamedModels } from "../core/index.js";

/** Settings key under which the workbook's own models are stored (an object: name → spec text). */
export const workbookModelsSettingKey = "zcell.workbookModels";

const namePattern = /^[A-Za-z][A-Za-z0-9_-]{0,31}$/;

/**
 * Why a name cannot name a workbook model, or undefined when it can.
 * @param name the name typed, e.g. "TEAM-FIDUCIAL"
 */
export function modelNameProblem(name: string): string | undefined {
  if (!namePattern.test(name)) return `"${name}" is not a model name: use a letter, then letters, digits, - or _ (at most 32)`;
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
 * Reads the stored value (as the settings return it). Each entry must be a valid name whose spec
 * text parses on the built-in presets alone (a workbook model does not build on another).
 * @param stored the settings value: an object of name → spec text, or undefined
 */
export function readWorkbookModels(stored: unknown): WorkbookModels {
  if (stored === undefined || stored === null) return noWorkbookModels;
  if (typeof stored !== "object" || Array.isArray(stored)) {
    return { ...noWorkbookModels, problems: ["the workbook's own models could not be read (not a list of names and specs)"] };
  }
  const specs = new Map<string, string>();
  const parameters = new Map<string, ModelParameters>();
  const problems: string[] = [];
  for (const [name, spec] of Object.entries(stored as Record<string, unknown>)) {
    const problem = modelNameProblem(name);
    if (problem) {
      problems.push(`workbook model ${problem}`);
      continue;
    }
    try {
      if (typeof spec !== "string") throw new TypeError("its spec is not text");
      parameters.set(name.toUpperCase(), parseModelSpec(spec));
      specs.set(name.toUpperCase(), spec);
    } catch (e) {
      problems.push(`workbook model ${name}: ${(e as Error).message}`);
    }
  }
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
