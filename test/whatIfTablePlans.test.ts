/**
 * What the pane writes when it inserts a what-if table, and what it refuses to plan: the redshift
 * column, the one live formula, the area and anchor it fills, and the messages of the form.
 * Expected texts are the messages the pane shows (taskpane/whatIfTable.ts), pinned as the interface;
 * addresses follow A1 notation (common practice).
 */
import { describe, expect, test } from "vitest";
import { planTableForColumn, planTableWithRedshifts, redshiftSteps } from "../taskpane/whatIfTable.js";

describe("the redshift steps of a what-if table", () => {
  // start | stop | step | the message the form shows (taskpane/whatIfTable.ts, pinned as the interface)
  const refused: [number, number, number, string][] = [
    [Number.NaN,  1,                        0.1,                      "start, stop and step must be numbers"],
    [0,           Number.POSITIVE_INFINITY, 1,                        "start, stop and step must be numbers"],
    [0,           1,                        Number.NaN,               "start, stop and step must be numbers"],
    [-0.5,        1,                        0.1,                      "start must be ≥ 0 (redshifts are not negative)"],
    [0,           1,                        -0.1,                     "step must be > 0"],
    [1,           0.5,                      0.1,                      "stop must be ≥ start"],
    [0,           10_000,                   1,                        "that is 10001 rows; at most 10,000"],
  ];
  test.each(refused)("start %s, stop %s, step %s is refused: %s", (start, stop, step, message) => {
    expect(() => redshiftSteps(start, stop, step)).toThrow(new RangeError(message));
  });

  test("a stop equal to start gives that one redshift", () => {
    expect(redshiftSteps(0.7, 0.7, 0.1)).toEqual([0.7]);
  });

  test("exactly 10,000 rows is still allowed, from start to stop", () => {
    const steps = redshiftSteps(0, 9999, 1);
    expect(steps.length).toBe(10_000);
    expect([steps[0], steps[9999]]).toEqual([0, 9999]);
  });
});

describe("a what-if table with its own redshift column", () => {
  test("holds z and the models across the top, the redshifts down, and one formula in the first body cell only", () => {
    // at row 3, column 2 (B3): z in B4:B6, models in C3:D3, the formula spills over C4:D6
    const plan = planTableWithRedshifts("DIST_LUM", [0.5, 1, 2], ["P18-CMB", "EDS"], 3, 2);
    expect(plan.cells).toEqual([
      ["z",  "P18-CMB",                                "EDS"],
      [0.5,  "=ZC.DIST_LUM($B$4:$B$6,$C$3:$D$3)",       ""],
      [1,    "",                                       ""],
      [2,    "",                                       ""],
    ]);
    expect(plan.anchor).toBe("B3");
    expect(plan.area).toBe("B3:D6");
    expect(plan.counts).toEqual({ redshifts: 3, models: 2 });
  });

  // models given | the message the form shows (taskpane/whatIfTable.ts, pinned as the interface)
  test.each([
    [[],                        "give at least one model"],
    [Array(9).fill("EDS"),      "at most eight models"],
  ])("%j models are refused: %s", (models, message) => {
    expect(() => planTableWithRedshifts("AGE", [1], models, 1, 1)).toThrow(new RangeError(message));
    expect(() => planTableForColumn("AGE", { row: 2, col: 1, rows: 1 }, models)).toThrow(new RangeError(message));
  });

  test("eight models fit, and the area spans the eight model columns", () => {
    const models = ["P18-CMB", "P18-BAO", "W9-ALL", "EDS", "P18-CMB", "P18-BAO", "W9-ALL", "EDS"];
    expect(planTableWithRedshifts("AGE", [1], models, 1, 1).area).toBe("A1:I2");
    expect(planTableForColumn("AGE", { row: 2, col: 1, rows: 1 }, models).area).toBe("B1:I2");
  });
});
