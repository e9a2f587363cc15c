// The host a benchmark loads the built functions.js into: stub CustomFunctions and Office globals in
// this process's own global scope (no separate vm context, so global look-ups cost what they cost in
// a page). The bundle registers its functions through associate; settings are the workbook's.

/** An error value as the runtime's CustomFunctions.Error holds it: a code and a message. */
export class HostError {
  constructor(code, message) {
    this.code = code;
    this.message = message;
  }
}

/**
 * Installs the stub host in globalThis.
 * @param {Record<string, unknown>} settings the workbook's settings by key (e.g. "zcell.activeModel")
 * @returns {Map<string, Function>} the functions the bundle will register, by id
 */
export function installStubHost(settings = {}) {
  const registered = new Map();
  globalThis.CustomFunctions = {
    associate: (id, fn) => registered.set(id, fn),
    Error: HostError,
    ErrorCode: { invalidValue: "#VALUE!", notAvailable: "#N/A", invalidNumber: "#NUM!" },
  };
  globalThis.Office = {
    onReady: () => Promise.resolve({ host: "Excel" }),
    context: { document: { settings: { get: (key) => settings[key] ?? null } } },
  };
  return registered;
}
