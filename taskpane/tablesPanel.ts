/**
 * The "Tables" panel: a what-if table (a column of redshifts against a row of models) written as one
 * live broadcasting ZC formula, never values; asks before overwriting cells.
 */
import { parseModelSpec } from "../core/index.js";
import { columnName, qualifiedAddress, splitAddress, topLeft } from "./cellAddress.js";
import { $ } from "./dom.js";
import { chartSeriesSupported, insertChart, readReference, readSelection, writeBlock } from "./excelHost.js";
import { chartTitle, tableCounts, planTableForColumn, planTableWithRedshifts, redshiftSteps, tableQuantities, type TablePlan } from "./whatIfTable.js";

let pendingTable: TablePlan | undefined;

function blockAddress(plan: TablePlan, sheet: string | undefined): string {
  const { col, row } = topLeft(plan.anchor);
  const local = `${plan.anchor}:${columnName(col + plan.cells[0].length - 1)}${row + plan.cells.length - 1}`;
  return sheet ? qualifiedAddress(sheet, local) : local;
}

async function planTable(): Promise<{ plan: TablePlan; sheet?: string }> {
  const quantity = $<HTMLSelectElement>("table-quantity").value;
  const models = $<HTMLTextAreaElement>("table-models").value.split("\n").map((s) => s.trim()).filter(Boolean);
  for (const spec of models) parseModelSpec(spec); // a bad model is reported before anything is written
  const selection = await readSelection();
  const { sheet, address } = splitAddress(selection.address);
  const { col, row } = topLeft(address);
  if ($<HTMLInputElement>("source-selection").checked) {
    if (selection.columnCount !== 1) throw new RangeError("select one column of redshifts");
    return { plan: planTableForColumn(quantity, { row, col, rows: selection.rowCount }, models), sheet };
  }
  const num = (id: string) => Number($<HTMLInputElement>(id).value);
  const zs = redshiftSteps(num("table-start"), num("table-stop"), num("table-step"));
  return { plan: planTableWithRedshifts(quantity, zs, models, row, col), sheet };
}

/** Inserts a chart of the table to its right; says what happened. */
async function chartOf(plan: TablePlan, sheet: string | undefined): Promise<string> {
  if (!chartSeriesSupported()) return "No chart: this Excel lacks the chart series API (ExcelApi 1.7).";
  const quantity = $<HTMLSelectElement>("table-quantity").value;
  const models = plan.chart.series.map((s) => s.name);
  const { row } = topLeft(plan.area.split(":")[0]);
  const right = topLeft(plan.area.split(":")[1]).col;
  try {
    await insertChart(sheet, {
      x: plan.chart.z,
      series: plan.chart.series,
      title: chartTitle(quantity, models),
      xTitle: "redshift z",
      yTitle: tableQuantities[quantity] ?? quantity,
      at: `${columnName(right + 2)}${row}`,
    });
  } catch (e) {
    return `No chart: ${(e as Error).message}`;
  }
  return `Chart of ${models.length} model${models.length === 1 ? "" : "s"} added beside it; it reads the table's cells.`;
}

/** Fills the quantity list and wires the panel's buttons. */
export function setupTables(): void {
  const q = $<HTMLSelectElement>("table-quantity");
  for (const [name, label] of Object.entries(tableQuantities)) q.append(new Option(label, name));
  const describeQuantity = () => ($("table-quantity-description").textContent = `computed by ZC.${q.value}, one live formula over the redshifts and models`);
  q.addEventListener("change", describeQuantity);
  describeQuantity();
  const status = $("table-status");
  let sheetOfPending: string | undefined;
  const write = async (plan: TablePlan, sheet?: string) => {
    await writeBlock(blockAddress(plan, sheet), plan.cells);
    $("table-confirm").hidden = true;
    status.textContent = `Inserted ${tableCounts(plan)}, one live formula at ${plan.anchor}.`;
    if ($<HTMLInputElement>("table-chart").checked) status.textContent += ` ${await chartOf(plan, sheet)}`;
  };
  $("insert-table").addEventListener("click", async () => {
    status.textContent = "";
    try {
      const { plan, sheet } = await planTable();
      const area = sheet ? qualifiedAddress(sheet, plan.area) : plan.area;
      const existing = await readReference(area, sheet ?? "");
      const occupied = existing.formulas.flat().filter((v) => v !== "" && v !== null).length;
      if (occupied > 0) {
        pendingTable = plan;
        sheetOfPending = sheet;
        $("table-confirm-text").textContent = `${occupied} cell${occupied === 1 ? "" : "s"} in ${plan.area} are not empty. Overwrite them?`;
        $("table-confirm").hidden = false;
        $("table-overwrite").focus();
        return;
      }
      await write(plan, sheet);
    } catch (e) {
      status.textContent = `Not inserted: ${(e as Error).message}`;
    }
  });
  $("table-overwrite").addEventListener("click", async () => {
    if (pendingTable) await write(pendingTable, sheetOfPending);
    pendingTable = undefined;
  });
  $("table-cancel").addEventListener("click", () => {
    pendingTable = undefined;
    $("table-confirm").hidden = true;
    status.textContent = "Nothing written.";
  });
}

