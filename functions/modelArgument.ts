/**
 * The `model` argument of the worksheet functions: omitted or blank means the workbook's active
 * cosmology; text is a preset name or a model spec; a two-column block of key/value cells
 * (H0 | 70, Om | 0.3, ...) is one model, with or without a header row; any other range of text cells
 * broadcasts, one model a cell.
 */
import { parameterKeys, parseModelSpec } from "../core/index.js";
import { CellError } from "./cellError.js";
import { messages } from "./messages.js";

const blockKeyNames = [...parameterKeys, "preset"];
const blockKeys = new Set(blockKeyNames.map((k) => k.toLowerCase()));
const isKey = (key: unknown) => typeof key === "string" && blockKeys.has(key.trim().toLowerCase());

/** True for a cell that Excel passes for an empty cell. */
export function isBlank(value: unknown): boolean {
  return value === null || value === undefined || value === "";
}

/** Text that reads as a model: a preset or a spec (workbook model names are not consulted). */
export function isModelText(text: string): boolean {
  try {
    parseModelSpec(text);
    return true;
  } catch {
    return false;
  }
}

/**
 * If `matrix` is a key/value block, the spec text it spells (preset first), else undefined.
 *
 * A block has two columns; its keys (first column) are text, and most of them are parameter keys or
 * "preset", or its values hold a number. A first row whose key is no key and whose value is text is
 * a header (`param | value`) and is skipped; rows with a blank key are skipped.
 * @throws CellError (#VALUE!) for a block with a key that is not a parameter key, naming it
 */
export function keyValueBlockSpec(matrix: unknown[][]): string | undefined {
  if (matrix.length === 0 || matrix[0].length !== 2) return undefined;
  let rows = matrix.filter(([key]) => !isBlank(key));
  const [first] = rows;
  if (first && !isKey(first[0]) && typeof first[1] === "string" && Number.isNaN(Number(first[1]))) rows = rows.slice(1);
  if (rows.some(([key]) => typeof key !== "string")) return undefined;
  const known = rows.filter(([key]) => isKey(key)).length;
  const hasNumber = rows.some(([, value]) => typeof value === "number");
  if (known === 0 || (2 * known < rows.length && !hasNumber)) return undefined;
  let preset: string | undefined;
  const pairs: string[] = [];
  for (const [key, value] of rows) {
    const name = String(key).trim();
    if (!isKey(name)) throw new CellError("value", messages.blockKey(name, blockKeyNames));
    if (isBlank(value)) continue;
    if (name.toLowerCase() === "preset") preset = String(value).trim();
    else pairs.push(`${name}=${String(value).trim()}`);
  }
  if (preset === undefined && pairs.length === 0) return undefined;
  return [...(preset ? [preset] : []), ...pairs].join("; ");
}
