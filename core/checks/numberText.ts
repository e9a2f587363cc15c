/**
 * Numbers written as text (a cell pasted from a CSV file or an archive, a model spec's value): text
 * that reads as a decimal number, and how to write text that is almost one (a decimal comma, a
 * percentage). Every pattern here matches in time linear in the text's length (a cell may hold
 * 32,767 digits): no part of a pattern can match the same characters in two ways.
 */

/** A decimal number with an optional exponent: digits, then a point and digits, or a point and digits. */
const numberText = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;
/** A number written with a decimal comma ("0,5", "1,5e-14") or a thousands separator ("1,000"). */
const commaText = /^([+-]?)(\d+),(\d+)([eE][+-]?\d+)?$/;
/** A minus sign or a dash typed for the hyphen-minus ("−0.5", U+2212; "–0.5", the en dash U+2013). */
const minusSign = /^[\u2212\u2013]/;
/** A percentage ("5%", "31.5 %"). */
const percentText = /^([+-]?(?:\d+(?:\.\d*)?|\.\d+)) ?%$/;

/**
 * True when `text` (trimmed) reads as a number.
 * @param text a cell's text, trimmed
 * @example isNumberText("1.5e3") // true
 */
export function isNumberText(text: string): boolean {
  return numberText.test(text);
}

/**
 * How to write text that is almost a number, or undefined.
 * @param text a cell's text, trimmed
 * @returns how to write it (with a point for a decimal comma, as a fraction for a percentage), or undefined
 * @example numberTextHint("0,5") // "use a point for decimals, 0.5"
 */
export function numberTextHint(text: string): string | undefined {
  const comma = commaText.exec(text);
  if (comma) {
    const [, sign, whole, after, exponent = ""] = comma;
    const decimal = `${sign}${whole}.${after}${exponent}`;
    // three digits after the comma may be thousands: 1,000 (not with an exponent: 1,500e3 is a decimal comma)
    return after.length === 3 && !exponent ? `write ${sign}${whole}${after} without the thousands comma, or ${decimal} for a decimal comma` : `use a point for decimals, ${decimal}`;
  }
  if (minusSign.test(text)) {
    const hyphened = `-${text.slice(1)}`;
    if (numberText.test(hyphened)) return `write the minus as the hyphen-minus "-", ${hyphened}`;
    const inner = numberTextHint(hyphened);
    if (inner) return `write the minus as the hyphen-minus "-" and ${inner}`;
  }
  const percent = percentText.exec(text);
  if (percent) return `it is a percentage, write ${Number((Number(percent[1]) / 100).toPrecision(12))}`;
  return undefined;
}
