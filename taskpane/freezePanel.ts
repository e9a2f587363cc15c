/**
 * The "Freeze" panel. Freeze replaces the selection's ZC formulas by their values and attaches to
 * each cell a note with the formula, the model and the zcell version; Thaw reads those notes and
 * writes the formulas back, on any Excel version. Excel's Undo is promised only where the host can
 * record the freeze as one undo step (ExcelApi 1.20).
 */
import { readActiveModel } from "../functions/activeModel.js";
import { zcellVersion } from "../functions/describeModel.js";
import { callsZcFunction } from "../functions/storedFormula.js";
import { columnName, splitAddress, topLeft } from "./cellAddress.js";
import { $, plural } from "./dom.js";
import { freezeCells, readAnnotations, readReference, readSelection, thawCells, undoGroupSupported, type FreezeCell } from "./excelHost.js";
import { explainFormula } from "./explainCall.js";
import { parseProvenanceNote, provenanceNote } from "./provenanceNote.js";

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
    ? "Undo: Excel's Undo (Ctrl+Z / ⌘Z) reverts a freeze in one step here; Thaw below works at any time, in any Excel."
    : "Undo: this Excel cannot record an add-in's changes as one undo step (that needs ExcelApi 1.20), so do not count on Ctrl+Z; Thaw below brings frozen formulas back.";
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
      const read = async (ref: string) => (await readReference(ref, sheet)).values;
      const today = new Date().toISOString().slice(0, 10);
      const frozen: FreezeCell[] = [];
      for (const cell of cells) {
        if (!callsZcFunction(cell.formula)) continue;
        const calls = await explainFormula(String(cell.formula), read, active);
        const models = calls.flatMap((x) => (x.model ? [x.model.spec] : []));
        frozen.push({ address: cell.address, value: cell.value, note: provenanceNote(String(cell.formula), models, zcellVersion, today) });
      }
      if (frozen.length === 0) {
        status.textContent = "The selection has no ZC formulas to freeze.";
        return;
      }
      pending = { sheet, cells: frozen };
      const n = frozen.length;
      $("freeze-confirm-text").textContent =
        `Replace ${plural(n, "ZC formula")} by ${n === 1 ? "its value" : "their values"}, with a provenance note on each? ` +
        (undoGroupSupported() ? "Excel's Undo reverts it in one step; Thaw brings them back later." : "Thaw brings them back later.");
      $("freeze-confirm").hidden = false;
      $("freeze-go").focus();
    } catch (e) {
      status.textContent = `Not frozen: ${(e as Error).message}`;
    }
  });

  $("freeze-go").addEventListener("click", async () => {
    if (!pending) return;
    try {
      const { carrier, oneUndoStep } = await freezeCells(pending.sheet, pending.cells);
      const undo = oneUndoStep
        ? "Excel's Undo reverts it in one step."
        : undoGroupSupported()
          ? "Excel could not record it as one undo step; Thaw brings the formulas back."
          : "Thaw brings the formulas back.";
      status.textContent = `Froze ${plural(pending.cells.length, "cell")}; formula, model and version are in each cell's ${carrier}. ${undo}`;
    } catch (e) {
      status.textContent = `Not frozen: ${(e as Error).message}`;
    }
    pending = undefined;
    $("freeze-confirm").hidden = true;
  });

  $("freeze-cancel").addEventListener("click", () => {
    pending = undefined;
    $("freeze-confirm").hidden = true;
    status.textContent = "Nothing frozen.";
  });

  $("thaw").addEventListener("click", async () => {
    const thawStatus = $("thaw-status");
    thawStatus.textContent = "";
    try {
      const { sheet, cells } = cellsOf(await readSelection());
      const plain = cells.filter((c) => !(typeof c.formula === "string" && c.formula.startsWith("=")));
      const notes = await readAnnotations(sheet, plain.map((c) => c.address));
      const thawing = [...notes].flatMap(([address, text]) => {
        const provenance = parseProvenanceNote(text);
        return provenance ? [{ address, ...provenance }] : [];
      });
      if (thawing.length === 0) {
        thawStatus.textContent = "The selection has no frozen cells (cells whose note zcell wrote when freezing).";
        return;
      }
      await thawCells(sheet, thawing);
      const now = readActiveModel().spec;
      const moved = thawing.filter((c) => c.models.length > 0 && !c.models.includes(now)).length;
      thawStatus.textContent =
        `Thawed ${plural(thawing.length, "cell")}: the ZC formulas are back and their notes removed. ` +
        `They compute under the workbook's model (${now}) unless they name their own` +
        (moved ? `; ${moved} of them had been frozen under another model, so their values may change.` : ".");
    } catch (e) {
      thawStatus.textContent = `Not thawed: ${(e as Error).message}`;
    }
  });
}
