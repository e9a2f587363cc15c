// Summarises StrykerJS JSON reports (npm run mutation writes test-artifacts/mutation/report.json):
// the mutation score by folder and file, and the mutants still alive, written to
// test/mutation/SURVIVORS.md for the next person. A survivor listed in test/mutation/EQUIVALENT.md
// (a line "- `file:line` Mutator: reason") is shown as equivalent there, with its reason.
// Usage: node scripts/mutationReport.mjs [report.json [later.json …]]
// A later report (a run over a few files or lines, e.g. --mutate "core/units/units.ts:190-200") gives
// the status of the mutants it tested; the first report gives the rest.
import { existsSync, readFileSync, writeFileSync } from "node:fs";
import { fileURLToPath } from "node:url";

const root = fileURLToPath(new URL("..", import.meta.url));
const [first = `${root}test-artifacts/mutation/report.json`, ...later] = process.argv.slice(2);
const report = JSON.parse(readFileSync(first, "utf8"));
const mutantKey = (file, m) => `${file}:${m.location.start.line}:${m.location.start.column}:${m.mutatorName}:${m.replacement}`;
for (const path of later) {
  const status = new Map();
  for (const [file, { mutants }] of Object.entries(JSON.parse(readFileSync(path, "utf8")).files)) {
    for (const m of mutants) status.set(mutantKey(file, m), m.status);
  }
  for (const [file, { mutants }] of Object.entries(report.files)) {
    for (const m of mutants) m.status = status.get(mutantKey(file, m)) ?? m.status;
  }
}
const equivalentFile = `${root}test/mutation/EQUIVALENT.md`;
const equivalent = new Map();
if (existsSync(equivalentFile)) {
  for (const m of readFileSync(equivalentFile, "utf8").matchAll(/^- `([^`]+:\d+)` (\w+): (.+)$/gm)) equivalent.set(`${m[1]} ${m[2]}`, m[3]);
}

const killedStates = new Set(["Killed", "Timeout"]);
const counted = new Set(["Killed", "Timeout", "Survived", "NoCoverage"]);
const tally = new Map();
const add = (key, status) => {
  const t = tally.get(key) ?? { killed: 0, total: 0, equivalent: 0 };
  if (counted.has(status)) t.total++;
  if (killedStates.has(status)) t.killed++;
  tally.set(key, t);
  return t;
};
const alive = [];
for (const [file, { source, mutants }] of Object.entries(report.files)) {
  const lines = source.split("\n");
  const folder = file.split("/")[0];
  for (const m of mutants) {
    add("all", m.status);
    add(`${folder}/`, m.status);
    add(file, m.status);
    if (m.status !== "Survived" && m.status !== "NoCoverage") continue;
    const where = `${file}:${m.location.start.line}`;
    const reason = equivalent.get(`${where} ${m.mutatorName}`);
    if (reason) for (const key of ["all", `${folder}/`, file]) tally.get(key).equivalent++;
    const line = lines[m.location.start.line - 1];
    // the line as mutated, where the mutant lies on one line (columns count from 1)
    const mutated =
      m.location.end.line === m.location.start.line
        ? line.slice(0, m.location.start.column - 1) + (m.replacement ?? "") + line.slice(m.location.end.column - 1)
        : m.replacement ?? "";
    alive.push({ where, mutator: m.mutatorName, status: m.status, original: line.trim(), replacement: mutated.trim(), reason });
  }
}
const score = (t) => (100 * t.killed) / t.total;
const scoreWithoutEquivalent = (t) => (100 * t.killed) / (t.total - t.equivalent);
const rows = [...tally].map(([key, t]) => `| ${key} | ${t.total} | ${t.killed} | ${t.total - t.killed} | ${t.equivalent} | ${score(t).toFixed(1)} | ${scoreWithoutEquivalent(t).toFixed(1)} |`);
const text = [
  "# Mutants still alive",
  "",
  "Written by `node scripts/mutationReport.mjs` from the last `npm run mutation` (StrykerJS; killed = killed or timed out; alive = survived or not covered).",
  "A survivor judged equivalent (no test can tell it from the original) is listed with its reason in `EQUIVALENT.md`.",
  "",
  "| scope | mutants | killed | alive | of them equivalent | score % | score without the equivalent % |",
  "|---|---|---|---|---|---|---|",
  ...rows,
  "",
  "## Alive",
  "",
  ...alive.map((a) => `- \`${a.where}\` ${a.mutator} (${a.status})${a.reason ? ` — equivalent: ${a.reason}` : ""}: \`${a.original.slice(0, 160)}\` → \`${a.replacement.replace(/\s+/g, " ").slice(0, 160)}\``),
  "",
].join("\n");
writeFileSync(`${root}test/mutation/SURVIVORS.md`, text);
for (const r of rows.slice(0, 3)) console.log(r);
console.log(`${alive.length} alive, ${alive.filter((a) => a.reason).length} of them listed as equivalent; list in test/mutation/SURVIVORS.md`);
