/**
 * Positions: sexagesimal text read and written, the separation of two directions, and the rotation
 * between sky frames. Each entry: the arguments in the order of the ZC.* signature (built from
 * argumentKinds.ts) and what one cell computes in reference units; the declaration with its JSDoc is
 * in ../declarations/positions.ts.
 */
import { angularSeparationDeg, convertSkyFrameDeg, sexagesimalText, skyFrames, type SkyFrame } from "../../core/index.js";
import type { Args, FunctionDef } from "../FunctionDef.js";
import { degreesOf, isGiven, latitude, longitude, n, num, unit } from "./argumentKinds.js";

const parts = ["ra", "dec"] as const;

/** A right ascension or declination in degrees, for COORD_DEG and COORD_TEXT: a right ascension wrapped into [0°, 360°), a declination checked. */
function partDegrees(a: Args, name: string): number {
  const part = a.part as (typeof parts)[number];
  const x = degreesOf(a, name, part);
  if (part === "dec") {
    if (Math.abs(x) > 90) throw new RangeError(`${name} = ${x}° is beyond ±90°: a declination is −90 … 90`);
    return x;
  }
  const wrapped = x % 360;
  return wrapped < 0 ? (wrapped + 360) % 360 : wrapped;
}

/** Positions functions, in the order of their declarations. */
export const positions: FunctionDef[] = [
  {
    name: "COORD_DEG",
    args: [num("text", { sexagesimal: "either" }), { kind: "text", name: "part", choices: parts }],
    compute: (a) => partDegrees(a, "text"),
  },
  {
    name: "COORD_TEXT",
    args: [
      num("degrees", { sexagesimal: "either" }),
      { kind: "text", name: "part", choices: parts },
      num("decimals", { default: Number.NaN, blankMeansDefault: true, min: 0, max: { value: 9, what: "nine decimals" }, blank: { words: "2 for ra (0.01 s), 1 for dec (0.1″)" } }),
    ],
    compute: (a) => {
      const decimals = n(a, "decimals");
      return sexagesimalText(partDegrees(a, "degrees"), a.part as (typeof parts)[number], isGiven(decimals) ? decimals : undefined);
    },
  },
  {
    name: "SEPARATION",
    args: [longitude("ra1"), latitude("dec1"), longitude("ra2"), latitude("dec2"), unit("unit", "deg", "arcsec")],
    compute: (a) => angularSeparationDeg(n(a, "ra1"), n(a, "dec1"), n(a, "ra2"), n(a, "dec2")),
  },
  {
    name: "COORD_CONVERT",
    args: [
      num("lon", { sexagesimal: (s) => (s.from_frame === "equatorial" ? "ra" : "lon") }), latitude("lat", "lat"),
      { kind: "text", name: "from_frame", choices: skyFrames, scalar: true },
      { kind: "text", name: "to_frame", choices: skyFrames, scalar: true },
      { kind: "text", name: "part", choices: ["lon", "lat"] },
    ],
    compute: (a) => {
      const from = a.from_frame as SkyFrame;
      const to = convertSkyFrameDeg(n(a, "lon"), n(a, "lat"), from, a.to_frame as SkyFrame);
      return a.part === "lon" ? to.lon : to.lat;
    },
  },
];
