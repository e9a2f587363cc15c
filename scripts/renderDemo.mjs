// Renders demo/zcell-demo.xlsx as an independent spreadsheet reader shows it to a collaborator without
// zcell: LibreOffice converts the workbook to PDF (every sheet, headless), pdftoppm turns the pages into
// PNG files in test-artifacts/demo-render/ to look at (number formats, clipped labels, column widths).
// What it showed and what changed for it: every sheet one landscape page wide (about 12 columns a
// page), the model description wrapped, labels and values at full width, and the luminosity function
// as one INDEX formula a cell (an array formula over the range showed #NAME? there).
// Usage: npm run demo && node scripts/renderDemo.mjs
// Needs Debian's libreoffice-calc (soffice) and poppler-utils (pdftoppm).
import { execFileSync, spawnSync } from "node:child_process";
import { copyFileSync, existsSync, mkdirSync, mkdtempSync, readdirSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";

const root = fileURLToPath(new URL("..", import.meta.url));
const workbook = `${root}demo/zcell-demo.xlsx`;
const out = `${root}test-artifacts/demo-render/`;

for (const [tool, pkg] of [["soffice", "libreoffice-calc"], ["pdftoppm", "poppler-utils"]]) {
  if (spawnSync("sh", ["-c", `command -v ${tool}`]).status !== 0) {
    console.error(`${tool} not found: install Debian's ${pkg} (apt-get install ${pkg})`);
    process.exit(2);
  }
}
if (!existsSync(workbook)) {
  console.error("demo/zcell-demo.xlsx not found: run npm run demo first");
  process.exit(2);
}
rmSync(out, { recursive: true, force: true });
mkdirSync(out, { recursive: true });
// a profile of its own, so that a LibreOffice already open (or a first-start dialog) does not interfere
const profile = mkdtempSync(join(tmpdir(), "zcell-lo-"));
execFileSync("soffice", [`-env:UserInstallation=file://${profile}`, "--headless", "--convert-to", "pdf", "--outdir", out, workbook], { stdio: "ignore", timeout: 120_000 });
rmSync(profile, { recursive: true, force: true });
execFileSync("pdftoppm", ["-png", "-r", "80", `${out}zcell-demo.pdf`, `${out}page`]);
const pages = readdirSync(out).filter((f) => f.endsWith(".png")).sort();
console.log(`rendered ${pages.length} pages of ${workbook} into ${out}:`);
for (const page of pages) console.log(`  ${page}`);
// the catalogue sheet's page is kept in the repository (test-artifacts/demo-catalogue.png), to compare with
copyFileSync(`${out}${pages[0]}`, `${root}test-artifacts/demo-catalogue.png`);
console.log("copied the first page (the catalogue) to test-artifacts/demo-catalogue.png");
