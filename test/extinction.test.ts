/**
 * ZC.EXTINCTION: the four laws against the values their papers print, against an outside
 * implementation (Debian python3-extinction) over grids, and the rules that hold for every input
 * (linear in E(B−V), one wavelength in any unit, names read whatever their case).
 */
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { extinctionLaws, extinctionRangeAngstrom, naturalCubicSpline, speedOfLightMPerS, type ExtinctionLaw } from "../core/index.js";
import { CellError } from "../functions/cellError.js";
import type { Cell } from "../functions/evaluate.js";
import { sheetCalls } from "./sheetCalls.js";
import { expectRelative } from "./helpers.js";
import { referenceAvailable, runPythonReference } from "./reference/python.js";
import { onFirstUse } from "./requirements.js";

const { run, one: call, failure } = sheetCalls("P18-CMB");
const one = (...args: unknown[]): Cell => call("EXTINCTION", ...args);
const mag = (...args: unknown[]): number => {
  const cell = one(...args);
  if (typeof cell !== "number") throw new Error(`EXTINCTION(${args.join(", ")}) gave ${cell instanceof CellError ? cell.message : String(cell)}`);
  return cell;
};

describe("values the papers print", () => {
  test.each([
    // λ [Å]    A_λ/E(B−V) at R_V = 3.1 (source: Fitzpatrick 1999 Table 3, the spline anchors, 3 decimals)
    [26500,     0.265],
    [12200,     0.829],
    [6000,      2.688],
    [5470,      3.055],
    [4670,      3.806],
    [4110,      4.315],
    [2700,      6.265],
    [2600,      6.591],
  ])("Fitzpatrick 1999 at %d Å: A/E(B−V) = %d", (wavelength, value) => {
    expect(Math.abs(mag(wavelength, 1) - value)).toBeLessThanOrEqual(5e-4);
  });

  test.each([
    // R_V   law              (source: CCM 1989 eq. 3, O'Donnell 1994: a = 1 and b = 0 at y = x − 1.82 = 0, so A_λ = A_V = R_V E(B−V))
    [2.5,    "Cardelli 1989"],
    [3.1,    "Cardelli 1989"],
    [5.0,    "Cardelli 1989"],
    [3.1,    "ODonnell 1994"],
    [4.0,    "ODonnell 1994"],
  ] as const)("at x = 1.82 µm⁻¹ with R_V = %d, %s gives A = R_V × E(B−V)", (rv, law) => {
    expectRelative(mag(1e4 / 1.82, 0.2, law, rv), 0.2 * rv, 1e-12, law);
  });

  test.each([
    // λ [µm]   k′(λ)    (source: Calzetti et al. 2000 eq. 4 with R′_V = 4.05, the values commonly quoted for the lines, 2 decimals, from memory)
    [0.6563,    3.33],
    [0.4861,    4.60],
  ])("Calzetti 2000 at %d µm: k′ = %d", (micron, k) => {
    expect(Math.abs(mag(micron, 1, "Calzetti 2000", "", "um") - k)).toBeLessThanOrEqual(5e-3);
  });

  test("Calzetti 2000: k′(λ) = 2.659(−1.857 + 1.040/λ) + R′_V beyond 0.63 µm (eq. 4), exactly, and R′_V defaults to 4.05 (eq. 5)", () => {
    for (const micron of [0.63, 1, 1.6, 2.2]) {
      expectRelative(mag(micron, 1, "Calzetti 2000", "", "um"), 2.659 * (-1.857 + 1.04 / micron) + 4.05, 1e-14, `${micron} µm`);
      expectRelative(mag(micron, 1, "Calzetti 2000", 3, "um"), 2.659 * (-1.857 + 1.04 / micron) + 3, 1e-14, `${micron} µm, R′_V 3`);
    }
  });

  test("Fitzpatrick 1999 is continuous where its ultraviolet function meets the spline (2700 Å)", () => {
    expect(Math.abs(mag(2700 * (1 + 1e-9), 1) - mag(2700 * (1 - 1e-9), 1))).toBeLessThanOrEqual(1e-7);
  });

  test("the default law is Fitzpatrick 1999 with R_V = 3.1; Calzetti 2000's own R′_V is 4.05", () => {
    expect(one(5000, 0.3)).toBe(one(5000, 0.3, "Fitzpatrick 1999", 3.1));
    expect(one(5000, 0.3, "", "")).toBe(one(5000, 0.3, "Fitzpatrick 1999", 3.1));
    expect(one(5000, 0.3, "Calzetti 2000")).toBe(one(5000, 0.3, "Calzetti 2000", 4.05));
    expect(one(5000, 0.3, "Cardelli 1989")).toBe(one(5000, 0.3, "Cardelli 1989", 3.1));
  });
});

describe("ranges and errors, in the sheet's words", () => {
  test.each([
    // law                 just inside [Å]   just outside [Å]   (ranges: extinction.ts, each law's paper)
    ["Fitzpatrick 1999",   [1150, 35000],    [1149.9, 35001]],
    ["Cardelli 1989",      [1000, 33333],    [999, 33334]],
    ["ODonnell 1994",      [1000, 33333],    [999, 33334]],
    ["Calzetti 2000",      [1200, 22000],    [1199, 22001]],
  ] as const)("%s: defined inside its range, #N/A outside naming the range", (law, inside, outside) => {
    for (const w of inside) expect(typeof one(w, 0.1, law)).toBe("number");
    for (const w of outside) {
      const e = failure("EXTINCTION", w, 0.1, law);
      expect(e.kind).toBe("na");
      const { min, max } = extinctionRangeAngstrom(law);
      expect(e.message).toBe(`ZC.EXTINCTION: wavelength = ${w} Angstrom is outside ${law}'s range, ${min} to ${Number(max.toPrecision(6))} Angstrom: the law is not defined there`);
    }
  });

  test("the range is quoted in the unit the wavelength was given in, a frequency too", () => {
    expect(failure("EXTINCTION", 5, 0.1, "Calzetti 2000", "", "um").message).toBe("ZC.EXTINCTION: wavelength = 5 um is outside Calzetti 2000's range, 0.12 to 2.2 um: the law is not defined there");
    // 10 THz is 30 µm; the range 1150 Å–3.5 µm is c/λ = 85.655 to 2606.89 THz
    expect(failure("EXTINCTION", 10, 0.1, "", "", "THz").message).toBe("ZC.EXTINCTION: wavelength = 10 THz is outside Fitzpatrick 1999's range, 85.655 to 2606.89 THz: the law is not defined there");
  });

  test.each([
    // arguments                                 kind     message
    [[5000, 0.1, "Cardeli 1989"],               "value", 'ZC.EXTINCTION: law: "Cardeli 1989" is not one of Fitzpatrick 1999, Cardelli 1989, ODonnell 1994, Calzetti 2000 (case, spaces, "_", "-" and an apostrophe are ignored)'],
    [[5000, 0.1, "Calzetti"],                   "value", 'ZC.EXTINCTION: law: "Calzetti" is not one of Fitzpatrick 1999, Cardelli 1989, ODonnell 1994, Calzetti 2000 (case, spaces, "_", "-" and an apostrophe are ignored): did you mean Calzetti 2000?'],
    [[5000, 0.1, "o'donnell"],                  "value", 'ZC.EXTINCTION: law: "o\'donnell" is not one of Fitzpatrick 1999, Cardelli 1989, ODonnell 1994, Calzetti 2000 (case, spaces, "_", "-" and an apostrophe are ignored): did you mean ODonnell 1994?'],
    [[5000, -0.1],                              "num",   "ZC.EXTINCTION: ebv = -0.1 must be ≥ 0"],
    [[-5000, 0.1],                              "num",   "ZC.EXTINCTION: wavelength = -5000 Angstrom must be > 0 Angstrom"],
    [[5000, 0.1, "", 0],                        "num",   "ZC.EXTINCTION: r_v = 0 must be > 0"],
    [[5000, 0.1, "", "", "kg"],                 "value", 'ZC.EXTINCTION: wavelength_unit: "kg" is a mass; use a frequency (GHz), a wavelength (Angstrom, um) or an energy (eV)'],
    [[5000, "E(B-V)"],                          "value", 'ZC.EXTINCTION: ebv: text "E(B-V)" where a number belongs'],
  ] as const)("EXTINCTION(%j) is %s", (args, kind, message) => {
    expect(failure("EXTINCTION", ...args)).toEqual({ kind, message });
  });

  test("blank in, blank out; a column of wavelengths against one E(B−V) and one law", () => {
    expect(one("", 0.1)).toBe("");
    expect(one(5000, "")).toBe("");
    const column = run("EXTINCTION", [[4000], [""], [9000], [500]], 0.1, "Cardelli 1989");
    expect(column.map((r) => (typeof r[0] === "number" ? "n" : r[0] === "" ? "blank" : (r[0] as CellError).kind))).toEqual(["n", "blank", "n", "na"]);
    expect(column[0][0]).toBe(one(4000, 0.1, "Cardelli 1989"));
  });

  test("a row of laws against a column of wavelengths gives a table, each law its own column", () => {
    const table = run("EXTINCTION", [[5000], [10000]], 0.1, [["Fitzpatrick 1999", "Calzetti 2000"]]);
    expect(table[1][1]).toBe(one(10000, 0.1, "Calzetti 2000"));
    expect(table[0][0]).toBe(one(5000, 0.1));
  });
});

describe("rules that hold for every input", () => {
  const law = fc.constantFrom(...extinctionLaws);
  const inRange = (l: ExtinctionLaw) => {
    const { min, max } = extinctionRangeAngstrom(l);
    return fc.double({ min, max, noNaN: true });
  };

  test("A_λ is proportional to E(B−V)", () => {
    fc.assert(
      fc.property(law.chain((l) => fc.tuple(fc.constant(l), inRange(l), fc.double({ min: 1e-4, max: 5, noNaN: true }), fc.double({ min: 2.2, max: 6, noNaN: true }))), ([l, w, ebv, rv]) => {
        expectRelative(mag(w, 2 * ebv, l, rv), 2 * mag(w, ebv, l, rv), 1e-14, `${l} ${w}`);
        expect(mag(w, 0, l, rv)).toBe(0);
      }),
    );
  });

  test("one wavelength in Angstrom, nm, um and as a frequency gives the same A_λ", () => {
    fc.assert(
      fc.property(law.chain((l) => fc.tuple(fc.constant(l), inRange(l).filter((w) => w > extinctionRangeAngstrom(l).min * (1 + 1e-9) && w < extinctionRangeAngstrom(l).max * (1 - 1e-9)))), ([l, w]) => {
        const a = mag(w, 0.25, l);
        expectRelative(mag(w / 10, 0.25, l, "", "nm"), a, 1e-12, "nm");
        expectRelative(mag(w / 1e4, 0.25, l, "", "um"), a, 1e-12, "um");
        expectRelative(mag(speedOfLightMPerS / (w * 1e-10) / 1e9, 0.25, l, "", "GHz"), a, 1e-12, "GHz");
      }),
    );
  });

  test("a law's name is read whatever its case, spacing and apostrophes", () => {
    const spelled = fc.tuple(law, fc.array(fc.boolean(), { minLength: 20, maxLength: 20 })).map(([l, upper]) => {
      const typed = l === "ODonnell 1994" ? "O'Donnell 1994" : l;
      return { l, typed: ` ${[...typed].map((ch, i) => (upper[i] ? ch.toUpperCase() : ch.toLowerCase())).join("").replace(" ", "  ")} ` };
    });
    fc.assert(
      fc.property(spelled, ({ l, typed }) => {
        expect(one(5000, 0.1, typed)).toBe(one(5000, 0.1, l));
      }),
    );
    expect(one(5000, 0.1, "O’Donnell 1994")).toBe(one(5000, 0.1, "ODonnell 1994"));
  });

  test("a law's name is read without its spaces, or with \"_\" or \"-\" for them, as the sheet's other choices are", () => {
    for (const [typed, l] of [["Calzetti2000", "Calzetti 2000"], ["calzetti_2000", "Calzetti 2000"], ["odonnell1994", "ODonnell 1994"], ["Cardelli-1989", "Cardelli 1989"], ["F itzpatrick 1999", "Fitzpatrick 1999"]] as const) {
      expect(one(5000, 0.1, typed), typed).toBe(one(5000, 0.1, l));
    }
    expect(one(5000, 0.1, "Calzetti2000")).not.toBe(one(5000, 0.1, "Cardelli 1989")); // the laws differ at 5000 Å
  });
});

type Reply = { a_per_ebv: number[][] };
const pythonName: Record<ExtinctionLaw, string> = {
  "Fitzpatrick 1999": "fitzpatrick99",
  "Cardelli 1989": "ccm89",
  "ODonnell 1994": "odonnell94",
  "Calzetti 2000": "calzetti00",
};
/** n wavelengths log-spaced over [min, max] Å. */
const grid = (min: number, max: number, n: number) => Array.from({ length: n }, (_, i) => (i === n - 1 ? max : min * (max / min) ** (i / (n - 1))));

describe.runIf(referenceAvailable("extinction", "python3-extinction"))("against python3-extinction (a general-purpose library of the published laws)", () => {
  const rvs = [2.5, 3.1, 4.05, 5.5];
  const same: ExtinctionLaw[] = ["Cardelli 1989", "ODonnell 1994", "Calzetti 2000"];
  const cases = [
    ...same.flatMap((law) => rvs.map((rv) => ({ law, rv, wavelengths: grid(extinctionRangeAngstrom(law).min, extinctionRangeAngstrom(law).max, 400) }))),
    ...rvs.map((rv) => ({ law: "Fitzpatrick 1999" as const, rv, wavelengths: grid(1150, 2700, 200) })),
    ...rvs.map((rv) => ({ law: "Fitzpatrick 1999" as const, rv, wavelengths: [26500, 12200, 6000, 5470, 4670, 4110, 2700, 2600] })),
    ...rvs.map((rv) => ({ law: "Fitzpatrick 1999" as const, rv, wavelengths: grid(2700.001, 35000, 400) })),
  ];
  const reply = onFirstUse(() => runPythonReference<Reply>("extinction_reference.py", { cases: cases.map((c) => ({ law: pythonName[c.law], r_v: c.rv, wavelengths: c.wavelengths })) }));
  const worst = (indices: number[]) => {
    let most = 0;
    for (const k of indices) cases[k].wavelengths.forEach((w, i) => (most = Math.max(most, Math.abs(mag(w, 1, cases[k].law, cases[k].rv) - reply().a_per_ebv[k][i]))));
    return most;
  };

  test("Cardelli 1989, O'Donnell 1994 and Calzetti 2000: the same formulas, within 1e-6 mag per mag of E(B−V) over each whole range", () => {
    const difference = worst(cases.map((_, k) => k).filter((k) => same.includes(cases[k].law)));
    console.info(`extinction: worst |ΔA| against python3-extinction, CCM/O'Donnell/Calzetti (E(B−V) = 1): ${difference.toExponential(2)} mag`);
    expect(difference).toBeLessThanOrEqual(1e-6);
  });

  test("Fitzpatrick 1999 in the ultraviolet (λ ≤ 2700 Å, the FM90 function with F99's parameters): within 1e-6 mag", () => {
    const difference = worst(cases.map((_, k) => k).filter((k) => cases[k].law === "Fitzpatrick 1999" && cases[k].wavelengths[0] === 1150));
    console.info(`extinction: worst |ΔA| against python3-extinction, Fitzpatrick 1999 UV: ${difference.toExponential(2)} mag`);
    expect(difference).toBeLessThanOrEqual(1e-6);
  });

  test("Fitzpatrick 1999 in the optical/IR: the same natural spline through the library's own anchors agrees within 1e-6", () => {
    // python3-extinction (like the IDL FM_UNRED) takes later optical anchor values from E. Fitzpatrick,
    // not F99 Table 4 (its documentation says so): through its anchors, our spline must give its values
    const anchorsX = [0, ...[26500, 12200, 6000, 5470, 4670, 4110, 2700, 2600].map((w) => 1e4 / w)];
    let most = 0;
    rvs.forEach((rv, j) => {
      const anchors = reply().a_per_ebv[cases.findIndex((c) => c.law === "Fitzpatrick 1999" && c.rv === rv && c.wavelengths.length === 8)];
      const spline = naturalCubicSpline(anchorsX, [0, ...anchors]);
      const k = cases.length - rvs.length + j;
      cases[k].wavelengths.forEach((w, i) => (most = Math.max(most, Math.abs(spline(1e4 / w) - reply().a_per_ebv[k][i]))));
    });
    console.info(`extinction: worst |ΔA| of our spline through python3-extinction's anchors, Fitzpatrick 1999 optical/IR: ${most.toExponential(2)} mag`);
    expect(most).toBeLessThanOrEqual(1e-6);
  });

  test("Fitzpatrick 1999 in the optical/IR with the paper's Table 4 anchors: within 6e-4 mag per mag of E(B−V) of the library's later ones at R_V = 3.1, 1.5e-3 over R_V 2.5–5.5", () => {
    const optical = cases.map((_, k) => k).filter((k) => cases[k].law === "Fitzpatrick 1999" && cases[k].wavelengths[0] !== 1150);
    const difference = worst(optical);
    const atR31 = worst(optical.filter((k) => cases[k].rv === 3.1));
    console.info(`extinction: Fitzpatrick 1999 optical/IR, Table 4 anchors against python3-extinction's: worst |ΔA| ${difference.toExponential(2)} mag (R_V 2.5–5.5), ${atR31.toExponential(2)} at R_V = 3.1`);
    expect(atR31).toBeLessThanOrEqual(6e-4);
    expect(difference).toBeLessThanOrEqual(1.5e-3);
  });
});
