/**
 * ZC.EXTINCTION outside its law's range: a wavelength more than 1.5 times beyond an edge (our choice:
 * not a value just past it) is "far", and only then is the unit named in which the same number falls
 * inside the range. At exactly 1.5 times an edge the value is not far. The texts are the messages
 * zcell shows (functions/messages.ts), pinned as the interface; the ranges are the laws' (Fitzpatrick
 * 1999: 1150 Å … 3.5 µm as core/dust/fitzpatrick1999.ts states it).
 */
import { expect, test } from "vitest";
import { CellError } from "../functions/cellError.js";
import { sheetCalls } from "./sheetCalls.js";

const { one } = sheetCalls("P18-CMB");
const range = "is outside Fitzpatrick 1999's range";

test.each([
  // wavelength       unit     message after "ZC.EXTINCTION: wavelength = "
  [1150 / 1.5,        null,    `766.667 Angstrom ${range}, 1150 to 35000 Angstrom: the law is not defined there`],                                                    // exactly the lower edge / 1.5: not far
  [1150 / 1.5 - 1e-9, null,    `766.667 Angstrom ${range}, 1150 to 35000 Angstrom: the law is not defined there; if 766.667 is in nm, give "nm" as wavelength_unit (5th argument)`],
  [5250,              "nm",    `5250 nm ${range}, 115 to 3500 nm: the law is not defined there`],                                                                   // 52500 Å: exactly 1.5 × the upper edge, not far
  [5250.001,          "nm",    `5250 nm ${range}, 115 to 3500 nm: the law is not defined there; if 5250 is in Angstrom, give "Angstrom" as wavelength_unit (5th argument)`],
  [5250,              "um",    `5250 um ${range}, 0.115 to 3.5 um: the law is not defined there; if 5250 is in Angstrom, give "Angstrom" as wavelength_unit (5th argument)`],
])("EXTINCTION(%d, 0.1, , , %s) is #N/A: %s", (wavelength, unitText, message) => {
  const cell = one("EXTINCTION", wavelength, 0.1, null, null, unitText);
  expect(cell).toBeInstanceOf(CellError);
  expect([(cell as CellError).kind, (cell as CellError).message]).toEqual(["na", `ZC.EXTINCTION: wavelength = ${message}`]);
});
