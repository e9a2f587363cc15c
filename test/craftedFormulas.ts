/**
 * Formulas crafted to make a formula reader slow: each family repeats one piece up to a given length
 * (Excel's limit is 8,192 characters with the "="), so that a reader that looks back over the rest of
 * the formula at each piece (quadratic) shows it. Shared by the tokenizer's tests, the browser
 * scenarios (notes and #NAME? cells holding them) and the tokenizer's benchmark.
 */

/** A family: its name and the formula of about `length` characters it builds (with the "="). */
export interface CraftedFamily {
  name: string;
  formula(length: number): string;
}

/** `piece` repeated to fill `length` characters between `head` and `tail`. */
function filled(head: string, piece: string, tail: string, length: number): string {
  const room = Math.max(0, length - head.length - tail.length);
  return head + piece.repeat(Math.floor(room / piece.length)) + tail;
}

/** Nesting `open` … `close` as deep as the length allows. */
function nested(head: string, open: string, middle: string, close: string, tail: string, length: number): string {
  const depth = Math.max(0, Math.floor((length - head.length - tail.length - middle.length) / (open.length + close.length)));
  return head + open.repeat(depth) + middle + close.repeat(depth) + tail;
}

export const craftedFamilies: CraftedFamily[] = [
  { name: "a ZC call of # (spill operators)", formula: (n) => filled("=ZC.AGE(", "#", ")", n) },
  { name: "all #", formula: (n) => filled("=", "#", "", n) },
  { name: "#NAME? error literals", formula: (n) => filled("=ZC.AGE(", "#NAME?", ")", n) },
  { name: "#N/ almost-literals", formula: (n) => filled("=ZC.AGE(", "#N/", ")", n) },
  { name: "all double quotes (unterminated)", formula: (n) => filled("=", '"', "", n - (n % 2)) },
  { name: "a string of doubled quotes", formula: (n) => filled('=ZC.AGE("', '""', '")', n) },
  { name: "a long string", formula: (n) => filled('=ZC.AGE("', "x", '")', n) },
  { name: "all single quotes", formula: (n) => filled("=", "'", "", n) },
  { name: "a quoted sheet of doubled quotes, unterminated", formula: (n) => filled("=ZC.AGE('", "''", "", n) },
  { name: "quoted sheets without a cell", formula: (n) => filled("=ZC.AGE(", "'a'!", ")", n) },
  { name: "nested parentheses", formula: (n) => nested("=ZC.AGE", "(", "1", ")", "", n) },
  { name: "nested ZC calls", formula: (n) => nested("=", "ZC.AGE(", "", ")", "", n) },
  { name: "nested calls of another function", formula: (n) => nested("=ZC.AGE(", "F(", "1", ")", ")", n) },
  { name: "nested brackets", formula: (n) => nested("=ZC.AGE(", "[", "", "]", ")", n) },
  { name: "a structured reference opened again and again", formula: (n) => filled("=ZC.AGE(", "T[", ")", n) },
  { name: "an array constant of quotes", formula: (n) => filled('=ZC.AGE({"', '","', '"})', n) },
  { name: "an unterminated array constant", formula: (n) => filled("=ZC.AGE({", "1,", "", n) },
  { name: "cells glued together", formula: (n) => filled("=ZC.AGE(", "A1", ")", n) },
  { name: "cells glued by a letter beyond ASCII", formula: (n) => filled("=ZC.AGE(", "A1\u00c0", ")", n) },
  { name: "sheet-qualified names", formula: (n) => filled("=ZC.AGE(", "a!", ")", n) },
  { name: "dollars", formula: (n) => filled("=ZC.AGE(", "$", ")", n) },
  { name: "row ranges chained", formula: (n) => filled("=ZC.AGE(", "1:", "1)", n) },
  { name: "digits", formula: (n) => filled("=ZC.AGE(", "1", ")", n) },
  { name: "exponents", formula: (n) => filled("=ZC.AGE(", "1e", ")", n) },
  { name: "ZC. prefixes", formula: (n) => filled("=", "ZC.", "", n) },
  { name: "stored prefixes", formula: (n) => filled("=", "_xldudf_ZC_", "", n) },
  { name: "comparison operators", formula: (n) => filled("=ZC.AGE(", "<>", ")", n) },
  { name: "spaces", formula: (n) => filled("=ZC.AGE(", " ", ")", n) },
  { name: "backslashes", formula: (n) => filled("=ZC.AGE(", "\\", ")", n) },
  { name: "dotless i (upper-cases to I)", formula: (n) => filled("=ZC.AGE(", "\u0131", ")", n) },
  { name: "separators", formula: (n) => filled("=ZC.AGE(", ",", ")", n) },
];
