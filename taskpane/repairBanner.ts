/**
 * Formulas waiting for zcell: when the pane opens it looks, on every sheet, for ZC formulas that
 * Excel shows as #NAME? (saved or typed while the add-in was not loaded, which stay unbound until
 * entered again) and offers to enter them again. Protected sheets are reported and left alone.
 */
import { $, plural } from "./dom.js";
import { findUnboundFormulas, reenterFormulas, type UnboundFormula } from "./excelHost.js";

/** "Catalogue (10), What-if (2)" from a count by sheet. */
function bySheet(counts: Map<string, number>): string {
  return [...counts].map(([sheet, n]) => `${sheet} (${n})`).join(", ");
}

function countBySheet(formulas: UnboundFormula[]): Map<string, number> {
  const counts = new Map<string, number>();
  for (const f of formulas) counts.set(f.sheet, (counts.get(f.sheet) ?? 0) + 1);
  return counts;
}

function protectedSentence(sheets: string[], counts: Map<string, number>): string {
  if (!sheets.length) return "";
  const n = sheets.reduce((sum, s) => sum + (counts.get(s) ?? 0), 0);
  return ` ${plural(n, "formula")} on protected ${sheets.length === 1 ? "sheet" : "sheets"} ${sheets.join(", ")} cannot be entered again until the protection is removed; nothing there is changed.`;
}

let found: UnboundFormula[] = [];

/** Looks for unbound ZC formulas and shows the banner when there are any. */
export async function scanForUnboundFormulas(): Promise<void> {
  const banner = $("repair");
  const scan = await findUnboundFormulas();
  found = scan.formulas;
  if (found.length === 0) {
    banner.hidden = true;
    return;
  }
  const counts = countBySheet(found);
  const locked = new Set(scan.protectedSheets);
  const open = found.filter((f) => !locked.has(f.sheet)).length;
  $("repair-text").textContent =
    `${plural(found.length, "ZC formula")} show #NAME? on ${bySheet(counts)}: they were saved or typed while zcell was not loaded, ` +
    `and Excel binds them to zcell only when they are entered again (their text stays the same).` +
    protectedSentence(scan.protectedSheets, counts);
  const button = $("repair-go") as HTMLElement & { disabled: boolean };
  button.textContent = `Enter ${plural(open, "formula")} again`;
  button.hidden = open === 0;
  $("repair-status").textContent = "";
  banner.hidden = false;
}

/** Wires the banner's button; the scan itself runs from the pane's start. */
export function setupRepairBanner(): void {
  $("repair-go").addEventListener("click", async () => {
    const status = $("repair-status");
    status.textContent = "Entering the formulas again…";
    try {
      const { reentered, leftAlone } = await reenterFormulas(found);
      const total = [...reentered.values()].reduce((a, b) => a + b, 0);
      let text = `Entered ${plural(total, "formula")} again on ${bySheet(reentered) || "no sheet"}.`;
      if (leftAlone.size) text += ` Left alone on protected sheets: ${bySheet(leftAlone)}.`;
      const after = await findUnboundFormulas();
      const still = after.formulas.filter((f) => !leftAlone.has(f.sheet)).length;
      text += still ? ` ${plural(still, "formula")} still show #NAME?: is the add-in loaded in this workbook?` : " None of them shows #NAME? now.";
      $("repair-go").hidden = true;
      status.textContent = text;
    } catch (e) {
      status.textContent = `Nothing entered: ${(e as Error).message}`;
    }
  });
}
