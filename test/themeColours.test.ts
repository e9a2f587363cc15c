/**
 * The colours Office reports for its theme (taskpane/theme.ts) are text from the host: a colour is
 * read only as #rrggbb (or rrggbb), anything else counts as white (luminance 1), so the pane keeps its
 * light palette rather than guessing.
 */
import { describe, expect, test } from "vitest";
import { luminance } from "../taskpane/theme.js";

describe("relative luminance of the theme's colours (WCAG 2.1 definition)", () => {
  // colour as reported     | luminance (WCAG 2.1 §1.4.3 formula, evaluated by hand in Python) | tolerance
  test.each([
    ["#000000",               0,                                                                 0],
    ["#ffffff",               1,                                                                 1e-12],
    ["#FFFFFF",               1,                                                                 1e-12],
    ["000000",                0,                                                                 0],
    [" #000000 ",             0,                                                                 0],
    ["#808080",               0.21586050011389923,                                               1e-12],
    ["#0a0a0a",               0.003035269835488375,                                              1e-15], // 10/255 ≤ 0.03928: the linear part
    ["#0b0b0b",               0.0033465357638991604,                                             1e-15], // 11/255 > 0.03928: the power law
    ["#ff0000",               0.2126,                                                            1e-12],
  ])("%j → %d", (colour, expected, tolerance) => {
    expect(Math.abs(luminance(colour) - expected)).toBeLessThanOrEqual(tolerance);
  });

  test.each(["not a colour", "", "x#000000", "#00000000", "#0000", "#00000g", "rgb(0,0,0)"])("%j is no colour: luminance 1, as white", (text) => {
    expect(luminance(text)).toBe(1);
  });
});
