/**
 * The workbook's active cosmology: spec text stored in the workbook's add-in settings (so it
 * travels with the file), P18-CMB until someone applies another. Functions wait until Office has
 * loaded the settings before they compute with it.
 */
import { defaultPresetName, parseModelSpec } from "../core/index.js";
import { messages } from "./messages.js";
import { modelFor } from "./modelCache.js";
import { maxSpecLength, noWorkbookModels, readWorkbookModels, resolvedSpec, workbookModelsSettingKey, type WorkbookModels } from "./workbookModels.js";

/** Settings key under which the active model's spec text is stored. */
export const activeModelSettingKey = "zcell.activeModel";
/** The model used until a workbook stores another. */
export const defaultModelSpec: string = defaultPresetName;

let ready: Promise<void> | undefined;
let isReady = false;

/** Resolves once the workbook's settings can be read (at once outside Office). */
export function whenSettingsReady(): Promise<void> {
  if (!ready) {
    const office = (globalThis as { Office?: typeof Office }).Office;
    ready = (office?.onReady ? office.onReady().then(() => undefined) : Promise.resolve()).then(() => {
      isReady = true;
    });
  }
  return ready;
}

/** True once the settings can be read (so a function can answer without waiting). */
export function settingsReady(): boolean {
  if (!ready) void whenSettingsReady();
  return isReady;
}

/** The stored spec and, when it is missing or unusable, the fallback with a warning. */
export interface ActiveModelSetting {
  /** Spec text to compute with. */
  spec: string;
  /** Set when the stored value was unusable and the default model is used instead. */
  warning?: string;
  /** True when the workbook stores a spec of its own. */
  stored: boolean;
  /** The models defined in this workbook (none when omitted). */
  models?: WorkbookModels;
}

/** The last reading, kept while the stored values stay the same (a formula per row reads it each time). */
let last: { value: unknown; models: unknown; result: ActiveModelSetting } | undefined;

/** Reads the active model's spec and the workbook's own models from the settings (call after whenSettingsReady). */
export function readActiveModel(): ActiveModelSetting {
  const office = (globalThis as { Office?: typeof Office }).Office;
  const settings = office?.context?.document?.settings;
  if (!settings) return { spec: defaultModelSpec, stored: false, models: noWorkbookModels };
  let value: unknown;
  let storedModels: unknown;
  try {
    storedModels = settings.get(workbookModelsSettingKey);
    value = settings.get(activeModelSettingKey);
  } catch (e) {
    return { spec: defaultModelSpec, stored: false, models: noWorkbookModels, warning: messages.activeModelFallback(String(e)) };
  }
  if (last && last.value === value && last.models === storedModels) return last.result;
  const result = interpret(value, readWorkbookModels(storedModels));
  last = { value, models: storedModels, result };
  return result;
}

function interpret(value: unknown, models: WorkbookModels): ActiveModelSetting {
  if (value === null || value === undefined) return { spec: defaultModelSpec, stored: false, models };
  if (typeof value !== "string") {
    return { spec: defaultModelSpec, stored: false, models, warning: messages.activeModelFallback("not text") };
  }
  if (value.length > maxSpecLength) {
    return { spec: defaultModelSpec, stored: false, models, warning: messages.activeModelFallback(`longer than ${maxSpecLength} characters`) };
  }
  try {
    parseModelSpec(value, models.named);
    modelFor(resolvedSpec(value, models)); // an unphysical model (no big bang) is as unusable as bad text
    return { spec: value, stored: true, models };
  } catch (e) {
    return { spec: defaultModelSpec, stored: false, models, warning: messages.activeModelFallback((e as Error).message) };
  }
}
