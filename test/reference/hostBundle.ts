/**
 * Loads the production bundle functions.js (the tests' build) the way Excel's custom-functions runtime would: in a
 * bare JS context whose only globals are stub `CustomFunctions` and `Office` (no DOM).
 */
import { readFileSync } from "node:fs";
import vm from "node:vm";
import { testBuildDir } from "../testBuild.js";

/** The host's error value, as the stub CustomFunctions.Error makes it. */
export class HostError {
  constructor(
    readonly code: string,
    readonly message?: string,
  ) {}
}

/** A function as registered with CustomFunctions.associate. */
export type Registered = (...args: unknown[]) => unknown[][] | Promise<unknown[][]>;

/**
 * @param settings the workbook's add-in settings
 * @param settingsDelayMs how long Office takes to become ready (the functions must wait for it)
 * @returns the registered functions by id
 */
export function loadBundle(settings: Record<string, unknown>, settingsDelayMs = 0): Map<string, Registered> {
  const associated = new Map<string, Registered>();
  const CustomFunctions = {
    associate: (id: string, fn: Registered) => associated.set(id, fn),
    Error: HostError,
    ErrorCode: { invalidValue: "#VALUE!", notAvailable: "#N/A", invalidNumber: "#NUM!" },
  };
  const Office = {
    onReady: () => new Promise<void>((resolve) => setTimeout(resolve, settingsDelayMs)),
    context: { document: { settings: { get: (key: string) => settings[key] ?? null } } },
  };
  const context = vm.createContext({ CustomFunctions, Office });
  vm.runInContext(readFileSync(`${testBuildDir}functions.js`, "utf8"), context, { filename: "functions.js" });
  return associated;
}
