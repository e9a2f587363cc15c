// Types of renderDemo.mjs for the TypeScript tests that import it.
export function renderToolsMissing(): string[][];
export function renderPdf(workbook: string, outDir: string): string;
export function pageTexts(pdf: string): string[];
export function sheetOfPage(text: string, sheetNames: readonly string[]): string | undefined;
