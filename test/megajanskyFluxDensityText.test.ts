/**
 * MAG_AB and FLUX_AB read their flux-density unit as text (it may be per wavelength): megajansky
 * anywhere in it as a unit of its own (not part of a longer name) is refused as for every
 * flux-density unit, as a likely mistyped mJy. The texts are the message zcell shows
 * (functions/messages.ts), pinned as the interface.
 */
import { expect, test } from "vitest";
import { CellError } from "../functions/cellError.js";
import { sheetCalls } from "./sheetCalls.js";

const { one, num } = sheetCalls("P18-CMB");
const refused = (name: string, text: string) =>
  `ZC.${name}: unit: "${text}" is megajansky (10⁹ mJy), not a likely flux density for a source: did you mean mJy? (units are case-sensitive)`;

test.each([
  // function   first argument   unit text   (MJy where it stands)
  ["MAG_AB",    1,               "MJy"],     // alone
  ["MAG_AB",    1,               "(MJy)"],   // after a bracket, before a bracket
  ["MAG_AB",    1,               "MJy/sr"],  // at the start, before a slash
  ["FLUX_AB",   20,              "(MJy)"],
  ["FLUX_AB",   20,              "MJy/sr"],
])("%s(%d, %j) is #VALUE!: megajansky", (name, x, text) => {
  const cell = one(name, x, text);
  expect(cell).toBeInstanceOf(CellError);
  expect([(cell as CellError).kind, (cell as CellError).message]).toEqual(["value", refused(name, text)]);
});

test("mJy, and MJy inside a longer name, are not taken for megajansky", () => {
  // m_AB = 8.90 − 2.5 log10(f_ν / 1 Jy) (Oke & Gunn 1983, −48.60 in erg/s/cm²/Hz): 1 mJy is 16.40
  expect(num("MAG_AB", 1, "mJy")).toBeCloseTo(16.4, 12);
  expect((one("MAG_AB", 1, "xMJy") as CellError).message).toBe('ZC.MAG_AB: unit: unknown unit "xMJy": did you mean mJy?');
  expect((one("MAG_AB", 1, "MJyx") as CellError).message).toBe('ZC.MAG_AB: unit: unknown unit "MJyx": did you mean mJy?');
});
