/**
 * The `model` argument of the worksheet functions: omitted or blank means the workbook's active
 * cosmology; text is a preset name or a model spec; a two-column block of key/value cells
 * (H0 | 70, Om | 0.3, ...) is one model; any other range of text cells broadcasts, one model a cell.
 */
import { parameterKeys } from "../core/index.js";

const blockKeys = new Set([...parameterKeys.map((k) => k.toLowerCase()), "preset"]);

/** True for a cell that Excel passes for an empty cell. */
export function isBlank(value: unknown): boolean {
  return value === null || value === undefined || value === "";
}

/**
 * If `matrix` is a key/value block, the spec text it spells (preset first), else undefined.
 * Rows with a blank key are skipped; every other key must be a parameter key or "preset".
 */
export function keyValueBlockSpec(matrix: unknown[][]): string | undefined {
  if (matrix.length === 0 || matrix[0].length !== 2) return undefined;
  let preset: string | undefined;
  const pairs: string[] = [];
  for (const [key, value] of matrix) {
    if (isBlank(key)) continue;
    if (typeof key !== "string" || !blockKeys.has(key.trim().toLowerCase())) return undefined;
    if (isBlank(value)) continue;
    if (key.trim().toLowerCase() === "preset") preset = String(value).trim();
    else pairs.push(`${key.trim()}=${String(value).trim()}`);
  }
  if (preset === undefined && pairs.length === 0) return undefined;
  return [...(preset ? [preset] : []), ...pairs].join("; ");
}
