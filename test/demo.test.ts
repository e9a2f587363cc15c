/** npm run demo writes a workbook whose formulas are live ZC calls over the invented catalogue. */
import { execFileSync } from "node:child_process";
import { fileURLToPath } from "node:url";
import ExcelJS from "exceljs";
import { describe, expect, test } from "vitest";

const root = fileURLToPath(new URL("..", import.meta.url));

describe("demo workbook", () => {
  test("holds ZC formulas (not values) over sources marked as invented", async () => {
    execFileSync(process.execPath, [`${root}node_modules/tsx/dist/cli.mjs`, "scripts/demo.ts"], { cwd: root, stdio: "ignore" });
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(`${root}demo/zcell-demo.xlsx`);
    const sheet = wb.getWorksheet("Catalogue (invented)")!;
    expect(String(sheet.getCell("A1").value)).toMatch(/INVENTED/);
    const formula = (sheet.getCell("F3").value as { formula: string }).formula;
    expect(formula).toBe("ZC.DIST_LUM(B3)");
    const formulas: string[] = [];
    wb.eachSheet((s) => s.eachRow((row) => row.eachCell((c) => {
      const v = c.value as { formula?: string };
      if (v && typeof v === "object" && v.formula) formulas.push(v.formula);
    })));
    expect(formulas.length).toBeGreaterThan(60);
    expect(formulas.every((f) => f.startsWith("ZC."))).toBe(true);
  });
});
