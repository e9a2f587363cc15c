/**
 * The "Values" panel (called Freeze/Thaw before 0.3.0; the code keeps those words). "Replace with
 * values" (freeze) replaces the selection's ZC formulas by their values and attaches to each cell a
 * note with the formula, the model and the zcell version; "Restore formulas" (thaw) reads those notes
 * and writes the formulas back, on any Excel version. Excel's Undo is promised only where the host
 * can record the replacement as one undo step (ExcelApi 1.20).
 */
import { readActiveModel } from "../functions/activeModel.js";
import { zcellVersion } from "../functions/describeModel.js";
import { callsZcFunction } from "../functions/storedFormula.js";
import { columnName, splitAddress, topLeft } from "./cellAddress.js";
import { $, el, plural } from "./dom.js";
import { commentsLookedAtMost, freezeCells, readAnnotations, readReferenceBounded, readSelection, readSheetNames, thawCells, undoGroupSupported, type FreezeCell } from "./excelHost.js";
import { explainFormula, type ReferenceRead, type ReferenceReader } from "./explainCall.js";
import { parseProvenanceNote, provenanceNote } from "./provenanceNote.js";
import { restorableFormulas } from "./restorableFormula.js";

/** Every cell of a selection with its address, formula and value. */
function cellsOf(selection: { address: string; formulas: unknown[][]; values: unknown[][] }) {
  const { sheet = "", address } = splitAddress(selection.address);
  const origin = topLeft(address);
  const cells = selection.formulas.flatMap((row, r) =>
    row.map((formula, c) => ({ address: `${columnName(origin.col + c)}${origin.row + r}`, formula, value: selection.values[r][c] })),
  );
  return { sheet, cells };
}

/** What the panel says about Undo, true to the host it runs in. */
function undoSentence(): string {
  return undoGroupSupported()
    ? "Undo: Excel's Undo (Ctrl+Z / ⌘Z) reverts a replacement in one step here; Restore formulas below works at any time, in any Excel."
    : "Undo: this version of Excel cannot record an add-in's changes as one undo step (newer versions can), so do not count on Ctrl+Z; Restore formulas below brings the formulas back.";
}

/** Wires Freeze (with its confirmation) and Thaw. */
export function setupFreeze(): void {
  $("undo-hint").textContent = undoSentence();
  const status = $("freeze-status");
  let pending: { sheet: string; cells: FreezeCell[] } | undefined;

  $("freeze").addEventListener("click", async () => {
    status.textContent = "";
    try {
      const { sheet, cells } = cellsOf(await readSelection());
      const active = readActiveModel();
      // as the inspector reads them: each reference's size first, none larger than its limit read; one
      // reference named by several of the selected formulas is read once
      const reads = new Map<string, Promise<ReferenceRead>>();
      const read: ReferenceReader = (ref, maxCells) => {
        const key = `${maxCells} ${ref}`;
        let got = reads.get(key);
        if (!got) reads.set(key, (got = readReferenceBounded(ref, sheet, maxCells)));
        return got;
      };
      const today = new Date().toISOString().slice(0, 10);
      const frozen: FreezeCell[] = [];
      for (const cell of cells) {
        if (!callsZcFunction(cell.formula)) continue;
        const calls = await explainFormula(String(cell.formula), read, active);
        const models = calls.flatMap((x) => (x.model ? [x.model.spec] : []));
        frozen.push({ address: cell.address, value: cell.value, note: provenanceNote(String(cell.formula), models, zcellVersion, today) });
      }
      if (frozen.length === 0) {
        status.textContent = "The selection has no ZC formulas to replace.";
        return;
      }
      pending = { sheet, cells: frozen };
      const n = frozen.length;
      $("freeze-confirm-text").textContent =
        `Replace ${plural(n, "ZC formula")} by ${n === 1 ? "its value" : "their values"}, with a provenance note on each? ` +
        (undoGroupSupported() ? "Excel's Undo reverts it in one step; Restore formulas brings them back later." : "Restore formulas brings them back later.");
      $("freeze-confirm").hidden = false;
      $("freeze-go").focus();
    } catch (e) {
      status.textContent = `Not replaced: ${(e as Error).message}`;
    }
  });

  $("freeze-go").addEventListener("click", async () => {
    if (!pending) return;
    try {
      const { carrier, oneUndoStep } = await freezeCells(pending.sheet, pending.cells);
      const undo = oneUndoStep
        ? "Excel's Undo reverts it in one step."
        : undoGroupSupported()
          ? "Excel could not record it as one undo step; Restore formulas brings them back."
          : "Restore formulas brings them back.";
      status.textContent = `Replaced ${plural(pending.cells.length, "cell")} with values; formula, model and version are in each cell's ${carrier}. ${undo}`;
    } catch (e) {
      status.textContent = `Not replaced: ${(e as Error).message}`;
    }
    pending = undefined;
    $("freeze-confirm").hidden = true;
  });

  $("freeze-cancel").addEventListener("click", () => {
    pending = undefined;
    $("freeze-confirm").hidden = true;
    status.textContent = "Nothing replaced.";
  });

  setupThaw();
}

/** A cell Thaw may restore: its address, the formula to write and the models its note names. */
type Restoring = { address: string; formula: string; models: string[] };

/** How many of the formulas to restore the confirmation shows, and how much of each. */
const previewCount = 5;
const previewLength = 300;

/** A formula as the confirmation shows it: whole, or its start and its length when it is long. */
function preview(formula: string): string {
  return formula.length > previewLength ? `${formula.slice(0, previewLength)}… (${formula.length} characters in all)` : formula;
}

/** A list item: the cell's address and a text (a formula in code, or a reason). */
function listItem(address: string, text: string, asCode: boolean): HTMLElement {
  const item = el("li", `${address}: `);
  item.append(asCode ? el("code", text) : document.createTextNode(text));
  return item;
}

/**
 * Wires Thaw. A note is only a claim: each formula it names goes through `restorableFormula` (ZC
 * calls and their arguments only, references only to sheets the workbook has, nothing that could
 * spill; judged a slice at a time, so crafted notes never freeze the pane), the pane shows how many
 * it will restore and the start of the first few, and writes them on one confirmation, only into the
 * selected cells. Every refused cell is listed with its address and the reason.
 */
function setupThaw(): void {
  const thawStatus = $("thaw-status");
  const refusedList = $("thaw-refused");
  let pending: { sheet: string; cells: Restoring[] } | undefined;
  const hideConfirm = () => {
    pending = undefined;
    $("thaw-confirm").hidden = true;
  };

  let checking = false; // notes are being read and judged: a second click waits for the answer
  $("thaw").addEventListener("click", async () => {
    if (checking) return;
    checking = true;
    hideConfirm();
    thawStatus.textContent = "";
    refusedList.replaceChildren();
    try {
      const { sheet, cells } = cellsOf(await readSelection());
      const plain = cells.filter((c) => !(typeof c.formula === "string" && c.formula.startsWith("=")));
      const { annotations: notes, complete } = await readAnnotations(sheet, plain.map((c) => c.address));
      const unread = complete ? "" : ` Only the first ${commentsLookedAtMost.toLocaleString("en-US")} comments of this sheet were looked at.`;
      const sheets = await readSheetNames();
      const claims = [...notes].flatMap(([address, text]) => {
        const provenance = parseProvenanceNote(text);
        return provenance ? [{ address, ...provenance }] : [];
      });
      const verdicts = await restorableFormulas(claims.map((c) => c.formula), { singleCell: true, sheets });
      const restoring: Restoring[] = [];
      const refused: { address: string; reason: string }[] = [];
      claims.forEach(({ address, models }, k) => {
        const verdict = verdicts[k];
        if (verdict.ok) restoring.push({ address, formula: verdict.formula, models });
        else refused.push({ address, reason: verdict.reason });
      });
      for (const r of refused) refusedList.append(listItem(r.address, `not restored: ${r.reason}`, false));
      const refusedText = refused.length ? ` ${plural(refused.length, "cell")} not restored, listed below.` : "";
      if (restoring.length === 0) {
        thawStatus.textContent =
          (refused.length
            ? `Nothing to restore:${refusedText}`
            : "The selection has no cells that zcell replaced with values: such a cell carries a note that begins \"Replaced with its value by zcell\" (or \"Frozen by zcell\" from zcell 0.1 and 0.2).") + unread;
        return;
      }
      pending = { sheet, cells: restoring };
      $("thaw-confirm-text").textContent =
        `Restore ${plural(restoring.length, "ZC formula")} in the selection` +
        (restoring.length > previewCount ? ` (the first ${previewCount} below)?` : "?") +
        refusedText +
        unread;
      $("thaw-preview").replaceChildren(...restoring.slice(0, previewCount).map((c) => listItem(c.address, preview(c.formula), true)));
      $("thaw-confirm").hidden = false;
      $("thaw-go").focus();
    } catch (e) {
      thawStatus.textContent = `Not restored: ${(e as Error).message}`;
    } finally {
      checking = false;
    }
  });

  $("thaw-go").addEventListener("click", async () => {
    const thawing = pending;
    hideConfirm();
    if (!thawing) return;
    try {
      await thawCells(thawing.sheet, thawing.cells);
      const now = readActiveModel().spec;
      const moved = thawing.cells.filter((c) => c.models.length > 0 && !c.models.includes(now)).length;
      thawStatus.textContent =
        `Restored ${plural(thawing.cells.length, "cell")}: the ZC formulas are back and their notes removed. ` +
        `They compute under the workbook's model (${now}) unless they name their own` +
        (moved ? `; ${moved} of them had been replaced with values under another model, so their values may change.` : ".");
    } catch (e) {
      thawStatus.textContent = `Not restored: ${(e as Error).message}`;
    }
  });

  $("thaw-cancel").addEventListener("click", () => {
    hideConfirm();
    thawStatus.textContent = "Nothing restored.";
  });
}
