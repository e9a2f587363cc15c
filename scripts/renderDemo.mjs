// Renders demo/zcell-demo.xlsx as an independent spreadsheet reader prints it for a collaborator
// without zcell: LibreOffice converts the workbook to PDF (every sheet, headless), pdftoppm turns the
// pages into PNG files in test-artifacts/demo-render/ to look at (number formats, clipped labels,
// column widths, print titles, page headers), and one page of each sheet is kept in
// test-artifacts/demo-pages/ (in the repository, for a reader to look at): the sheet's first page,
// or its second where it prints on several (the page that shows the repeated label column and
// header row). What it showed and what changed for it: every sheet landscape, about 12 columns a
// page; the header row (and the label column) on every page; a page header with the sheet's name
// and the model; labels and values at full width; the luminosity function as one INDEX formula a
// cell (an array formula over the range showed #NAME? there).
// Usage: npm run demo && node scripts/renderDemo.mjs
// Needs Debian's libreoffice-calc (soffice) and poppler-utils (pdftotext, pdftoppm).
// test/demo.test.ts uses renderPdf and pageTexts (where soffice is installed).
import { execFileSync, spawnSync } from "node:child_process";
import { copyFileSync, existsSync, mkdirSync, mkdtempSync, readdirSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { basename, join } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";

const root = fileURLToPath(new URL("..", import.meta.url));

/** Whether this shell has the tools a rendering needs (soffice, pdftotext, pdftoppm). */
export function renderToolsMissing() {
  return [["soffice", "libreoffice-calc"], ["pdftotext", "poppler-utils"], ["pdftoppm", "poppler-utils"]].filter(
    ([tool]) => spawnSync("sh", ["-c", `command -v ${tool}`]).status !== 0,
  );
}

/**
 * Converts a workbook to PDF with LibreOffice, in a profile of its own (so that a LibreOffice already
 * open, or a first-start dialog, does not interfere).
 * @returns the PDF's path in `outDir`
 */
export function renderPdf(workbook, outDir) {
  mkdirSync(outDir, { recursive: true });
  const profile = mkdtempSync(join(tmpdir(), "zcell-lo-"));
  try {
    execFileSync("soffice", [`-env:UserInstallation=file://${profile}`, "--headless", "--convert-to", "pdf", "--outdir", outDir, workbook], { stdio: "ignore", timeout: 120_000 });
  } finally {
    rmSync(profile, { recursive: true, force: true });
  }
  return join(outDir, basename(workbook).replace(/\.xlsx$/, ".pdf"));
}

/** The text of each page of a PDF, in reading order (pdftotext -raw; pages end with a form feed). */
export function pageTexts(pdf) {
  const text = execFileSync("pdftotext", ["-raw", "-enc", "UTF-8", pdf, "-"], { encoding: "utf8" });
  return text.split("\f").slice(0, -1);
}

/** The sheet a page belongs to: its page header starts with the sheet's name. */
export function sheetOfPage(text, sheetNames) {
  return [...sheetNames].sort((a, b) => b.length - a.length).find((name) => text.trimStart().startsWith(name));
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? "").href) {
  const workbook = `${root}demo/zcell-demo.xlsx`;
  const out = `${root}test-artifacts/demo-render/`;
  const kept = `${root}test-artifacts/demo-pages/`;
  const missing = renderToolsMissing();
  if (missing.length) {
    for (const [tool, pkg] of missing) console.error(`${tool} not found: install Debian's ${pkg} (apt-get install ${pkg})`);
    process.exit(2);
  }
  if (!existsSync(workbook)) {
    console.error("demo/zcell-demo.xlsx not found: run npm run demo first");
    process.exit(2);
  }
  rmSync(out, { recursive: true, force: true });
  const pdf = renderPdf(workbook, out);
  execFileSync("pdftoppm", ["-png", "-r", "100", pdf, `${out}page`]);
  const pages = readdirSync(out).filter((f) => f.endsWith(".png")).sort((a, b) => Number(/\d+/.exec(a)[0]) - Number(/\d+/.exec(b)[0]));
  console.log(`rendered ${pages.length} pages of ${workbook} into ${out}`);
  // the sheet of each page, from its page header; one page a sheet is kept
  const JSZip = (await import("jszip")).default;
  const { readFileSync } = await import("node:fs");
  const book = await (await JSZip.loadAsync(readFileSync(workbook))).file("xl/workbook.xml").async("string");
  const names = [...book.matchAll(/<sheet [^>]*name="([^"]+)"/g)].map((m) => m[1].replaceAll("&amp;", "&"));
  const texts = pageTexts(pdf);
  rmSync(kept, { recursive: true, force: true });
  mkdirSync(kept, { recursive: true });
  names.forEach((name, i) => {
    const own = texts.flatMap((t, p) => (sheetOfPage(t, names) === name ? [p] : []));
    if (own.length === 0) throw new Error(`no page of ${name}`);
    const page = own.length > 1 ? own[1] : own[0];
    const file = `${i + 1}-${name.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "")}.png`;
    copyFileSync(`${out}${pages[page]}`, `${kept}${file}`);
    console.log(`  ${name}: ${own.length} page${own.length > 1 ? "s" : ""}; kept page ${own.indexOf(page) + 1} of the sheet as test-artifacts/demo-pages/${file}`);
  });
}
