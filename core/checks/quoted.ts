/**
 * Text from a workbook as a message quotes it. A cell holds up to 32,767 characters and a stranger
 * may fill it: a message shows at most the first 40, then "…" and how long the whole text is.
 */

/** Characters a message quotes of a text at most. */
const quotedAtMost = 40;

/** The first `count` characters of `text`, never ending on the first half of a surrogate pair. */
function head(text: string, count: number): string {
  const code = text.charCodeAt(count - 1);
  return text.slice(0, code >= 0xd800 && code <= 0xdbff ? count - 1 : count);
}

/**
 * Text from a workbook cut for a message: at most 40 characters.
 * @param text any text, e.g. a spec part or a model name
 * @returns the text, cut to 39 characters and "…" when longer than 40
 * @example quotedText("x".repeat(50)).length // 40
 */
export function quotedText(text: string): string {
  return text.length > quotedAtMost ? `${head(text, quotedAtMost - 1)}…` : text;
}

/**
 * Text from a workbook in quotes, as a message shows it: whole when it has at most 40 characters,
 * else its first 39, "…" and its length.
 * @param text any text, e.g. a unit, a choice or a cell's value as typed
 * @returns the text in double quotes, e.g. `"Mpc"` or `"mmmmm…" (32,767 characters)`
 * @example quoted("Mpc") // "\"Mpc\""
 */
export function quoted(text: string): string {
  return text.length > quotedAtMost ? `"${quotedText(text)}" (${withThousands(text.length)} characters)` : `"${text}"`;
}

/** A whole number with a comma between thousands, as the sheet's messages write counts (32,767); no locale is loaded for it. */
function withThousands(n: number): string {
  const digits = String(n);
  let out = "";
  for (let i = 0; i < digits.length; i++) out += (i > 0 && (digits.length - i) % 3 === 0 ? "," : "") + digits[i];
  return out;
}
