/**
 * Reading a provenance note back (taskpane/provenanceNote.ts): a note or comment on a cell is a
 * stranger's text, so only a note in zcell's own shape is taken for one, and whatever else a cell
 * carries (a look-alike, a note cut short, lines out of order, an oversized note) is not.
 * The note's text is an interface: workbooks saved by earlier versions hold it.
 */
import { describe, expect, test } from "vitest";
import { parseProvenanceNote, provenanceNote } from "../taskpane/provenanceNote.js";

const tail = "Value computed under that cosmology; recompute with the add-in if the model changes.";

describe("the note zcell writes", () => {
  // models the formula used              | the Model line written (taskpane/provenanceNote.ts, pinned as the interface) | read back
  test.each([
    [["P18-CMB", "W9-ALL", "P18-CMB"],      "Model: P18-CMB | W9-ALL",              ["P18-CMB", "W9-ALL"]],
    [[],                                    "Model: none (no cosmology needed)",    []],
  ])("models %j are written as %j and read back as %j", (models, line, readBack) => {
    const note = provenanceNote("=ZC.VERSION()", models, "0.3.0", "2026-12-03");
    expect(note).toBe(`Replaced with its value by zcell 0.3.0 on 2026-12-03.\nFormula: "=ZC.VERSION()"\n${line}\n${tail}`);
    expect(parseProvenanceNote(note)).toEqual({ formula: "=ZC.VERSION()", models: readBack });
  });
});

describe("a note is ours only in our shape", () => {
  // note text (a stranger's, or one cut short)                                                  | read as
  test.each([
    ['Frozen by zcell 0.1.0 on 2025-11-20.\nFormula: =ZC.DIST_LUM(A2,"W9-ALL")\nModel: W9-ALL',   { formula: '=ZC.DIST_LUM(A2,"W9-ALL")', models: ["W9-ALL"] }], // 0.1: as written, ending in a quote
    ['Frozen by zcell 0.1.0 on 2025-11-20.\nFormula: =ZC.AGE()&" Gyr"\nModel: W9-ALL',             { formula: '=ZC.AGE()&" Gyr"', models: ["W9-ALL"] }], // 0.1: a formula that ends in a quote is no JSON string
    ['Frozen by zcell 0.2.0 on 2026-03-02.\r\nFormula: "=ZC.AGE()"\r\nModel: W9-ALL\r\n' + tail,   { formula: "=ZC.AGE()", models: ["W9-ALL"] }], // saved with Windows line ends
    ['Note: Frozen by zcell 0.2.0 on 2026-03-02.\nFormula: "=ZC.AGE()"\nModel: W9-ALL',              undefined], // our words, not at the start
    ["Frozen by zcell 0.2.0 on 2026-03-02.",                                                       undefined], // our first line alone
    ["Frozen by zcell 0.2.0 on 2026-03-02.\nModel: W9-ALL",                                        undefined], // no formula
    ['Frozen by zcell 0.2.0 on 2026-03-02.\nFormula: "=ZC.AGE()"',                                 undefined], // no model
    ['Frozen by zcell 0.2.0 on 2026-03-02.\nModel: W9-ALL\nFormula: "=ZC.AGE()"',                  undefined], // model before formula
    ['Frozen by zcell 0.2.0 on 2026-03-02.\nFormula: "ZC.AGE()"\nModel: W9-ALL',                   undefined], // a formula without "="
    ["Frozen by zcell 0.1.0 on 2025-11-20.\nFormula: ZC.AGE()\nModel: W9-ALL",                     undefined], // the same, as 0.1 wrote it
    ['Frozen by zcell 0.2.0 on 2026-03-02.\nFormula: "=ZC.AGE()" and more\nModel: W9-ALL',         undefined], // not one JSON string
  ])("%j → %j", (text, read) => {
    expect(parseProvenanceNote(text)).toEqual(read);
  });

  test("a note of 65,536 characters is read; one character more and it is not ours (longer than any note zcell writes)", () => {
    const note = provenanceNote("=ZC.AGE()", ["W9-ALL"], "0.3.0", "2026-12-03");
    const padded = (length: number) => `${note}\n${"x".repeat(length - note.length - 1)}`;
    expect(padded(65_536).length).toBe(65_536);
    expect(parseProvenanceNote(padded(65_536))).toEqual({ formula: "=ZC.AGE()", models: ["W9-ALL"] });
    expect(parseProvenanceNote(padded(65_537))).toBeUndefined();
  });
});
