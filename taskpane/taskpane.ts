/**
 * Task pane entry point (shared runtime: this page also runs functions.js). Wires the panels —
 * workbook cosmology, this cell, what-if tables, freeze and thaw — and the banner for formulas
 * waiting for zcell; each lives in its own module and reaches Excel only through excelHost.ts.
 * Outside Office the page says so and lists the worksheet functions.
 */
import "@fluentui/web-components/button.js";
import { setTheme } from "@fluentui/web-components";
import { webDarkTheme, webLightTheme } from "@fluentui/tokens";
import { explainActiveCell } from "./cellPanel.js";
import { setupCosmology } from "./cosmologyPanel.js";
import { $, el } from "./dom.js";
import { onSelectionChanged } from "./excelHost.js";
import { setupFreeze } from "./freezePanel.js";
import { scanForUnboundFormulas, setupRepairBanner } from "./repairBanner.js";
import { setupTables } from "./tablesPanel.js";
import { applyOfficeTheme } from "./theme.js";

declare const __ZC_FUNCTIONS__: { name: string; description: string }[];

function setupTabs(): void {
  const tabs = [...document.querySelectorAll<HTMLButtonElement>('[role="tab"]')];
  const select = (tab: HTMLButtonElement) => {
    for (const t of tabs) {
      const on = t === tab;
      t.setAttribute("aria-selected", String(on));
      t.tabIndex = on ? 0 : -1;
      $(t.getAttribute("aria-controls")!).hidden = !on;
    }
    tab.focus();
    if (tab.id === "tab-cell") void explainActiveCell();
  };
  tabs.forEach((tab, i) => {
    tab.addEventListener("click", () => select(tab));
    tab.addEventListener("keydown", (e) => {
      const step = e.key === "ArrowRight" ? 1 : e.key === "ArrowLeft" ? -1 : 0;
      if (step) select(tabs[(i + step + tabs.length) % tabs.length]);
    });
  });
}


function showOutsideOffice(): void {
  $("outside-office").hidden = false;
  $("model-badge").textContent = "";
  const dl = $("reference");
  for (const f of __ZC_FUNCTIONS__) dl.append(el("dt", `ZC.${f.name}`), el("dd", f.description));
}

async function start(): Promise<void> {
  const office = (globalThis as { Office?: typeof Office }).Office;
  if (!office) return showOutsideOffice();
  const info = await office.onReady();
  if (info.host !== office.HostType.Excel) return showOutsideOffice();
  const dark = applyOfficeTheme(office.context.officeTheme);
  setTheme(dark ? webDarkTheme : webLightTheme);
  $("in-excel").hidden = false;
  // one panel that fails to start (whatever the workbook holds) leaves the others working
  for (const setup of [setupTabs, setupCosmology, setupTables, setupFreeze, setupRepairBanner]) {
    try {
      setup();
    } catch (e) {
      const w = $("settings-warning");
      w.textContent = `${w.textContent ?? ""} Part of the pane could not start: ${(e as Error).message}`.trim();
      w.hidden = false;
    }
  }
  onSelectionChanged(() => void explainActiveCell());
  await scanForUnboundFormulas().catch(() => undefined); // a failed scan leaves the banner hidden
}

void start();
