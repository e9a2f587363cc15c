/**
 * Formulas waiting for zcell: when the pane opens it looks, on every sheet, for ZC formulas that
 * Excel shows as #NAME? (saved or typed while the add-in was not loaded, which stay unbound until
 * entered again) and offers to enter them again. Only formulas made of ZC calls and their arguments
 * (`restorableFormula`) are entered by the pane; one that mixes ZC with other functions was written
 * by someone else and is listed by address for the person to check. Protected sheets are reported and
 * left alone. The scan is bounded per sheet, can be stopped, and says where it did not look.
 */
import { $, el, plural } from "./dom.js";
import { findUnboundFormulas, gapSentence, reenterFormulas, type ScanControl, type UnboundFormula } from "./workbookScan.js";
import { restorableFormulas } from "./restorableFormula.js";

/** Addresses listed at most in the banner; the rest are counted. */
const listedAtMost = 20;

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

/** Formulas the banner will enter again (typed spelling), found by the last scan. */
let found: UnboundFormula[] = [];
let scanning: ScanControl | undefined;

/** Looks for unbound ZC formulas and shows the banner when there are any. */
export async function scanForUnboundFormulas(): Promise<void> {
  const banner = $("repair");
  const cancel = $("repair-cancel");
  const control: ScanControl = { cancelled: false };
  scanning = control;
  const showCancel = setTimeout(() => {
    // a scan that takes a moment shows the banner with a way to stop it
    banner.hidden = false;
    $("repair-text").textContent = "Looking for ZC formulas that show #NAME?…";
    $("repair-go").hidden = true;
    cancel.hidden = false;
  }, 300);
  let scan: Awaited<ReturnType<typeof findUnboundFormulas>>;
  try {
    scan = await findUnboundFormulas(control);
  } finally {
    clearTimeout(showCancel);
    cancel.hidden = true;
    scanning = undefined;
  }
  const restorable: UnboundFormula[] = [];
  const others: UnboundFormula[] = [];
  const verdicts = await restorableFormulas(scan.formulas.map((f) => f.formula), { singleCell: false, sheets: scan.sheets });
  scan.formulas.forEach((f, k) => {
    const verdict = verdicts[k];
    if (verdict.ok) restorable.push({ ...f, formula: verdict.formula });
    else others.push(f);
  });
  found = restorable;
  const list = $("repair-others");
  list.replaceChildren();
  if (scan.formulas.length === 0 && scan.gaps.length === 0) {
    banner.hidden = true;
    return;
  }
  const counts = countBySheet(scan.formulas);
  const locked = new Set(scan.protectedSheets);
  const open = restorable.filter((f) => !locked.has(f.sheet)).length;
  let text = scan.formulas.length
    ? `${plural(scan.formulas.length, "ZC formula")} show #NAME? on ${bySheet(counts)}: they were saved or typed while zcell was not loaded, ` +
      `and Excel binds them to zcell only when they are entered again (their text stays the same).`
    : "No ZC formula shows #NAME? in the cells looked at.";
  text += protectedSentence(scan.protectedSheets, counts);
  if (others.length) {
    text += ` ${plural(others.length, "formula", "formulas")} ${others.length === 1 ? "mixes" : "mix"} ZC with other functions or references zcell does not enter for you; check and re-enter ${others.length === 1 ? "it" : "them"} yourself:`;
    for (const f of others.slice(0, listedAtMost)) list.append(el("li", `${f.sheet}!${f.address}`));
    if (others.length > listedAtMost) list.append(el("li", `… and ${others.length - listedAtMost} more`));
  }
  text += gapSentence(scan.gaps);
  $("repair-text").textContent = text;
  const button = $("repair-go") as HTMLElement & { disabled: boolean };
  button.textContent = `Enter ${plural(open, "formula")} again`;
  button.hidden = open === 0;
  $("repair-status").textContent = "";
  banner.hidden = false;
}

/** Wires the banner's buttons; the scan itself runs from the pane's start. */
export function setupRepairBanner(): void {
  $("repair-cancel").addEventListener("click", () => {
    if (scanning) scanning.cancelled = true;
  });
  $("repair-go").addEventListener("click", async () => {
    const status = $("repair-status");
    status.textContent = "Entering the formulas again…";
    try {
      const { reentered, leftAlone } = await reenterFormulas(found);
      const total = [...reentered.values()].reduce((a, b) => a + b, 0);
      let text = `Entered ${plural(total, "formula")} again on ${bySheet(reentered) || "no sheet"}.`;
      if (leftAlone.size) text += ` Left alone on protected sheets: ${bySheet(leftAlone)}.`;
      const after = await findUnboundFormulas();
      const entered = new Set(found.filter((f) => !leftAlone.has(f.sheet)).map((f) => `${f.sheet}!${f.address}`));
      const still = after.formulas.filter((f) => entered.has(`${f.sheet}!${f.address}`)).length;
      text += still
        ? ` ${plural(still, "formula")} entered again still show #NAME?: is the add-in loaded in this workbook?`
        : ` None of the ${plural(total, "formula")} entered again shows #NAME? now.`;
      // what remains: the formulas on protected sheets, by address
      const remaining = after.formulas.filter((f) => leftAlone.has(f.sheet));
      if (remaining.length) {
        const listed = remaining.slice(0, listedAtMost).map((f) => `${f.sheet}!${f.address}`).join(", ");
        const more = remaining.length > listedAtMost ? ` and ${remaining.length - listedAtMost} more` : "";
        text += ` Still showing #NAME? on protected sheets: ${listed}${more}; remove the protection, then open the pane again to enter ${remaining.length === 1 ? "it" : "them"} again.`;
      }
      $("repair-go").hidden = true;
      status.textContent = text;
    } catch (e) {
      status.textContent = `Nothing entered: ${(e as Error).message}`;
    }
  });
}
