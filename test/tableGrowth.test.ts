/**
 * What a model's first distance costs: its tables grow as they are read, one unit of u = ln(1+z) at a
 * time (core/distances/distanceTables.ts), so the first value at z ≈ 1 evaluates E² for one unit, not
 * for the 19 units up to z = 1e8. Counted, not timed: the model's E² is wrapped and its calls counted.
 * A model whose E² could vanish is built in full at once (each node and quadrature point checked for a
 * bounce), and that is counted too.
 */
import { afterEach, describe, expect, test, vi } from "vitest";
import { Cosmology } from "../core/distances/Cosmology.js";
import { ExpansionRate } from "../core/model/ExpansionRate.js";

/** Panels per unit of u and Gauss–Legendre points per panel of the tables (distanceTables.ts). */
const panelsPerUnit = 48;
const pointsPerPanel = 7;
/** One unit: its 49 nodes and 48 × 7 quadrature points (= 385). */
const oneUnit = panelsPerUnit + 1 + panelsPerUnit * pointsPerPanel;
/** Units up to z = 1e8: ⌈48 ln(1 + 1e8)⌉ = 885 panels (distanceTables.ts: tableMaxRedshift, panelsPerUnit). */
const allPanels = Math.ceil(Math.log1p(1e8) * panelsPerUnit);
/** The whole tables (886 nodes, 885 × 7 points) and the checks beyond them at z = 1e9 … 1e75 (67). */
const wholeTables = allPanels + 1 + allPanels * pointsPerPanel + 67;

/** Counts E² evaluations from now on (the wrapper calls the model's own E²). */
function countE2(): { calls: number } {
  const counter = { calls: 0 };
  const e2 = ExpansionRate.prototype.e2;
  vi.spyOn(ExpansionRate.prototype, "e2").mockImplementation(function (this: ExpansionRate, zp: number, lnZp: number) {
    counter.calls++;
    return e2.call(this, zp, lnZp);
  });
  return counter;
}

afterEach(() => {
  vi.restoreAllMocks();
});

describe("the first distance at z = 1 builds one unit of the tables, not 19", () => {
  test.each([
    // spec                                   what it is
    ["P18-CMB",                               "flat, radiation, a massive neutrino"],
    ["H0=70; Om=0.3",                         "flat, no radiation (Tcmb = 0)"],
    ["EDS",                                   "no dark energy, no curvature, no radiation"],
    ["H0=70; Om=0; OL=0",                     "empty (Milne): curvature alone"],
    ["H0=70; Om=0.3; OL=0.5",                 "open (Ok > 0)"],
    ["P18-CMB; w0=-0.9; wa=0.1",              "CPL dark energy"],
  ])("%s (%s): E² evaluated for one unit (385 times)", (spec) => {
    const counter = countE2();
    const m = Cosmology.fromSpec(spec);
    const d = m.comovingDistanceMpc(1);
    expect(d).toBeGreaterThan(0);
    expect(counter.calls).toBeLessThanOrEqual(oneUnit); // u = ln 2 < 1: the first unit alone (measured: 385)
  });

  test("z = 1000 (u ≈ 6.9) builds seven units, still not all 19", () => {
    const counter = countE2();
    Cosmology.fromSpec("P18-CMB").comovingDistanceMpc(1000);
    // each unit after the first adds 48 nodes (its first is the last of the unit before) and 48 × 7 points
    expect(counter.calls).toBeLessThanOrEqual(oneUnit + 6 * (oneUnit - 1)); // measured: the same
  });

  test("a value read again costs no E² evaluation", () => {
    const m = Cosmology.fromSpec("P18-CMB");
    m.comovingDistanceMpc(1);
    const counter = countE2();
    m.comovingDistanceMpc(0.9);
    m.lookbackTimeGyr(1);
    expect(counter.calls).toBe(0);
  });
});

describe("a model whose E² could vanish is checked in full when it is made", () => {
  test.each([
    // spec                                   why E² could vanish
    ["H0=70; Om=0.3; OL=1.5",                 "closed (Ok < 0)"],
    ["H0=70; Om=0.3; OL=-0.2",                "negative dark energy"],
  ])("%s (%s): every node and point of the 19 units and the checks beyond", (spec) => {
    const counter = countE2();
    Cosmology.fromSpec(spec);
    expect(counter.calls).toBeGreaterThanOrEqual(wholeTables); // measured: the same (7,148)
  });
});
