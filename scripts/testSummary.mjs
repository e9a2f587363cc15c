// Prints the plain closing line "N passed, N failed[, N skipped]" from vitest's JSON report.
import { readFileSync } from "node:fs";

const report = JSON.parse(readFileSync(process.argv[2], "utf8"));
const skipped = report.numPendingTests + report.numTodoTests;
console.log(
  `${report.numPassedTests} passed, ${report.numFailedTests} failed` + (skipped ? `, ${skipped} skipped` : ""),
);
