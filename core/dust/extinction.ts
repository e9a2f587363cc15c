/**
 * Extinction A_λ in magnitudes for a colour excess E(B−V), by one of four published laws, each named
 * by first author and year as the trade cites it, each only within its own wavelength range:
 *
 * | law              | range          | R_V default | what it is |
 * |------------------|----------------|-------------|------------|
 * | Fitzpatrick 1999 | 1150 Å–3.5 µm  | 3.1 | Milky Way, R_V-dependent (fitzpatrick1999.ts) |
 * | Cardelli 1989    | 1000 Å–3.33 µm | 3.1 | Milky Way, R_V-dependent (cardelli1989.ts) |
 * | ODonnell 1994    | 1000 Å–3.33 µm | 3.1 | Cardelli 1989 with a new optical piece (odonnell1994.ts) |
 * | Calzetti 2000    | 1200 Å–2.2 µm  | 4.05 | a starburst galaxy's own attenuation (calzetti2000.ts) |
 *
 * The ranges: Cardelli 1989 and O'Donnell 1994, where CCM's equations are given (0.3 ≤ x ≤ 10
 * µm⁻¹, their eqs. 2–5; below 1250 Å it is their far-UV extension, eq. 5); Fitzpatrick 1999, its
 * claimed validity down to 1150 Å (as python3-extinction documents it) and up to 3.5 µm (as the IDL
 * astrolib FM_UNRED documents it); Calzetti 2000, its eq. 4 (0.12–2.2 µm).
 */
import { NoSolutionError } from "../checks/NoSolutionError.js";
import { quoted } from "../checks/quoted.js";
import { requireFiniteNumber, requireNonNegative } from "../checks/numberChecks.js";
import { calzettiAttenuationPerEbv } from "./calzetti2000.js";
import { cardelliExtinctionPerEbv } from "./cardelli1989.js";
import { fitzpatrickExtinctionPerEbv } from "./fitzpatrick1999.js";
import { odonnellExtinctionPerEbv } from "./odonnell1994.js";

/** The laws by the names the sheet takes (case, spaces, "_", "-" and apostrophes ignored: "O'Donnell 1994" too). */
export const extinctionLaws = ["Fitzpatrick 1999", "Cardelli 1989", "ODonnell 1994", "Calzetti 2000"] as const;
export type ExtinctionLaw = (typeof extinctionLaws)[number];

interface LawDefinition {
  /** A_λ/E(B−V) at x = 1/λ [µm⁻¹]. */
  perEbv: (x: number, rv: number) => number;
  /** Wavelength range [Å]. */
  minAngstrom: number;
  maxAngstrom: number;
  /** R_V when none is given (R′_V for Calzetti 2000). */
  rv: number;
}

const laws: Record<ExtinctionLaw, LawDefinition> = {
  "Fitzpatrick 1999": { perEbv: fitzpatrickExtinctionPerEbv, minAngstrom: 1150, maxAngstrom: 35_000, rv: 3.1 },
  "Cardelli 1989": { perEbv: cardelliExtinctionPerEbv, minAngstrom: 1000, maxAngstrom: 1e4 / 0.3, rv: 3.1 },
  "ODonnell 1994": { perEbv: odonnellExtinctionPerEbv, minAngstrom: 1000, maxAngstrom: 1e4 / 0.3, rv: 3.1 },
  "Calzetti 2000": { perEbv: calzettiAttenuationPerEbv, minAngstrom: 1200, maxAngstrom: 22_000, rv: 4.05 },
};

/** A law's name as compared: lower case, apostrophes, spaces, "_" and "-" dropped ("calzetti_2000" is Calzetti 2000), as the sheet's other choices are. */
function comparable(text: string): string {
  return text.toLowerCase().replace(/['’‘`ʼ\s_-]/g, "");
}
const byComparableName = new Map(extinctionLaws.map((law) => [comparable(law), law] as const));

/**
 * The law a name stands for, case, spaces, "_", "-" and apostrophes ignored ("fitzpatrick 1999",
 * "O'Donnell 1994", "Calzetti2000").
 * @param text the name as typed
 * @returns the law's canonical name
 * @throws TypeError for a name that is none of them
 * @example extinctionLawNamed("o'donnell 1994") // "ODonnell 1994"
 */
export function extinctionLawNamed(text: string): ExtinctionLaw {
  const key = comparable(text);
  const law = byComparableName.get(key);
  if (law === undefined) {
    // a name without its year (or its start, four letters at least): the one law it begins
    const begun = key.length >= 4 ? extinctionLaws.filter((l) => comparable(l).startsWith(key)) : [];
    const meant = begun.length === 1 ? `: did you mean ${begun[0]}?` : "";
    throw new TypeError(`law: ${quoted(text)} is not one of ${extinctionLaws.join(", ")} (case, spaces, "_", "-" and an apostrophe are ignored)${meant}`);
  }
  return law;
}

/**
 * The wavelength range over which a law is defined.
 * @param law the law
 * @returns { min, max } [Å]
 * @example extinctionRangeAngstrom("Calzetti 2000") // { min: 1200, max: 22000 }
 */
export function extinctionRangeAngstrom(law: ExtinctionLaw): { min: number; max: number } {
  return { min: laws[law].minAngstrom, max: laws[law].maxAngstrom };
}

/**
 * Whether a law is defined at a wavelength: within its range, the ends included (a wavelength
 * converted from another unit to its end, such as 2.2 µm, may land 1 ulp outside: 1e-12 is allowed).
 * @param wavelengthAngstrom wavelength [Å]
 * @param law the law
 * @returns true inside the range
 * @example inRange(2.2 * (1e-6 / 1e-10), "Calzetti 2000") // true
 */
export function inRange(wavelengthAngstrom: number, law: ExtinctionLaw): boolean {
  const { minAngstrom, maxAngstrom } = laws[law];
  return wavelengthAngstrom >= minAngstrom * (1 - 1e-12) && wavelengthAngstrom <= maxAngstrom * (1 + 1e-12);
}

/**
 * The R_V a law uses when none is given: 3.1 for the Milky Way laws, R′_V = 4.05 for Calzetti 2000.
 * @param law the law
 * @returns R_V
 * @example defaultRv("Calzetti 2000") // 4.05
 */
export function defaultRv(law: ExtinctionLaw): number {
  return laws[law].rv;
}

/**
 * Extinction (attenuation, for Calzetti 2000) at one wavelength: A_λ = E(B−V) × (A_λ/E(B−V) of the
 * law). A broad band's A is approximated by the law's value at the band's effective wavelength.
 *
 * @param wavelengthAngstrom wavelength [Å], within the law's range
 * @param ebv colour excess E(B−V) [mag], ≥ 0 (for Calzetti 2000, E_s(B−V) of the stellar continuum)
 * @param law the law (default Fitzpatrick 1999)
 * @param rv R_V = A_V/E(B−V) (R′_V for Calzetti 2000), > 0; NaN (not given) for the law's own
 * @returns A_λ [mag]
 * @throws NoSolutionError outside the law's range (the range in the message); RangeError for a
 *   wavelength ≤ 0, a negative E(B−V), R_V ≤ 0
 * @example extinctionMag(5470, 1) // ≈ 3.055 (Fitzpatrick 1999, R_V = 3.1: F99 Table 3)
 * @example extinctionMag(1e4 / 1.82, 0.1, "Cardelli 1989") // 0.31 (A_V = R_V E(B−V) at x = 1.82 µm⁻¹)
 */
export function extinctionMag(wavelengthAngstrom: number, ebv: number, law: ExtinctionLaw = "Fitzpatrick 1999", rv = Number.NaN): number {
  requireNonNegative("wavelength", wavelengthAngstrom, "Angstrom", true);
  requireNonNegative("ebv", ebv);
  const definition = laws[law];
  const r = Number.isNaN(rv) ? definition.rv : rv;
  requireFiniteNumber("r_v", r);
  if (!(r > 0)) throw new RangeError(`r_v = ${r} must be > 0`);
  if (!inRange(wavelengthAngstrom, law)) {
    throw new NoSolutionError(
      `wavelength = ${wavelengthAngstrom} Angstrom is outside the range of ${law}, ${definition.minAngstrom} to ${Number(definition.maxAngstrom.toPrecision(6))} Angstrom`,
    );
  }
  return ebv * definition.perEbv(1e4 / wavelengthAngstrom, r);
}
