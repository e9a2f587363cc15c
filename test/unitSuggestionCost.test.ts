/**
 * What the suggestion search for a unit that does not parse costs: counted in edit-distance cell
 * updates (|typed| × |unit| for each listed unit it is compared with), not timed. A cell may hold
 * 32,767 characters (Microsoft, "Excel specifications and limits": total number of characters that a
 * cell can contain), and a unit argument is a stranger's text: its search must stay as cheap as that
 * of a short typo, and the message must still come back at once.
 */
import { beforeEach, describe, expect, test, vi } from "vitest";

const work = { calls: 0, cells: 0 };
vi.mock("../core/units/editDistance.js", async (importOriginal) => {
  const original = await importOriginal<typeof import("../core/units/editDistance.js")>();
  return {
    editDistance: (a: string, b: string) => {
      work.calls++;
      work.cells += a.length * b.length;
      return original.editDistance(a, b);
    },
  };
});

const { nearestUnits } = await import("../core/units/unitSuggestions.js");
const { parseUnit } = await import("../core/units/units.js");

beforeEach(() => {
  work.calls = 0;
  work.cells = 0;
});

/** Cell updates of the search for `typed`. */
function cost(typed: string): number {
  work.cells = 0;
  nearestUnits(typed);
  return work.cells;
}

describe("the nearest-unit search does bounded work", () => {
  test("a typo is compared with every listed unit of as many slashes (the measure the bounds below use)", () => {
    expect(nearestUnits("Mpx")).toEqual(["Mpc"]);
    expect(work.calls).toBeGreaterThanOrEqual(30); // 35 of the list of common units have no "/" today
  });

  test.each([
    // what is typed                                                          typed
    ["41 characters, one more than the search takes (the longest unit has 10)", "x".repeat(41)],
    ["a thousand characters",                                                  "x".repeat(1000)],
    ["32,767 characters, as long as a cell may be",                            "q".repeat(32_767)],
    ["a long text of unit words",                                              "Mpc ".repeat(8_191)],
  ])("%s cost no more than 40 one-letter searches", (_, typed) => {
    // the work of one search grows as |typed|: 40 characters cost 40 times a one-letter search
    const oneLetter = cost("x");
    expect(oneLetter).toBeGreaterThan(0);
    expect(cost(typed)).toBeLessThanOrEqual(40 * oneLetter);
    expect(nearestUnits(typed)).toEqual([]);
  });

  test("a unit argument of 32,767 characters is refused with its message after bounded work", () => {
    const oneLetter = cost("x");
    work.cells = 0;
    expect(() => parseUnit("q".repeat(32_767))).toThrow(TypeError);
    expect(work.cells).toBeLessThanOrEqual(40 * oneLetter);
  });
});
