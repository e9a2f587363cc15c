/**
 * Positions: sexagesimal right ascensions and declinations read and written, the separation of two
 * directions, and the rotation between the equatorial, galactic, supergalactic and ecliptic frames.
 * Each function is its JSDoc (read by the metadata plugin into functions.json) plus one line handing
 * the arguments to the shared wrapper; see functions/functions.ts for the conventions of all families.
 */
/* eslint-disable @typescript-eslint/no-explicit-any */
import { definitions as d } from "../definitions.js";
import { callFromSheet } from "../evaluate.js";

/**
 * An angle in degrees from sexagesimal text: a right ascension "12:30:49.4", "12h30m49.4s" or "12 30 49.4" is hours (× 15°; marked d or ° it is degrees), a declination "+12:23:28", "-05d07m" or "−05°07′" is degrees; a number is already degrees (an RA is wrapped into 0–360°). Minutes and seconds ≥ 60, two signs or a declination beyond ±90° are #VALUE! naming the part. Keep positions as text in cells (format the column as Text before pasting, or type an apostrophe first): Excel may read 12:30:49.4 typed into a cell as a time of day, which is a number, and a number is read as degrees.
 * @customfunction COORD_DEG COORD_DEG
 * @helpurl https://localhost:3000/help.html#COORD_DEG
 * @example =ZC.COORD_DEG("14:05:12.3", "ra")
 * @param text Position as sexagesimal text, or a number in degrees (value or range).
 * @param part "ra" (right ascension, hours) or "dec" (declination, degrees) (value or range).
 * @returns Degrees: 0 … 360 for ra, −90 … 90 for dec.
 */
export function COORD_DEG(text: any[][], part: any[][]): any[][] {
  return callFromSheet(d.COORD_DEG, [text, part]);
}

/**
 * Sexagesimal text of an angle in degrees: a right ascension as "HH:MM:SS.ss" in hours (degrees ÷ 15, wrapped into 0–24h), a declination as "±DD:MM:SS.s" with its sign always written. Rounded once on the last digit shown and carried, so it never writes 60 seconds.
 * @customfunction COORD_TEXT COORD_TEXT
 * @helpurl https://localhost:3000/help.html#COORD_TEXT
 * @example =ZC.COORD_TEXT(-3.3625, "dec")
 * @param degrees Angle in degrees, or sexagesimal text to write again (value or range).
 * @param part "ra" or "dec" (value or range).
 * @param [decimals] Digits after the seconds' point, 0 to 9; blank = 2 for ra (0.01 s), 1 for dec (0.1″) (value or range).
 * @returns Text: "HH:MM:SS.ss" for ra, "±DD:MM:SS.s" for dec.
 */
export function COORD_TEXT(degrees: any[][], part: any[][], decimals?: any[][]): any[][] {
  return callFromSheet(d.COORD_TEXT, [degrees, part, decimals]);
}

/**
 * Angular separation of two positions on the sky, the great-circle distance by Vincenty's atan2 form (full precision from 0.001 mas to 180°), in arcsec unless a unit is given. Positions in degrees, or sexagesimal text (RA in hours, Dec in degrees), both in one frame (e.g. ICRS).
 * @customfunction SEPARATION SEPARATION
 * @helpurl https://localhost:3000/help.html#SEPARATION
 * @example =ZC.SEPARATION("14:05:12.3", "-03:21:45", "14:05:12.4", "-03:21:46")
 * @param ra1 Right ascension of the first position: degrees, or text such as "12:30:49.4" (hours) (value or range).
 * @param dec1 Declination of the first position: degrees (−90 … 90), or text such as "+12:23:28" (value or range).
 * @param ra2 Right ascension of the second position (value or range).
 * @param dec2 Declination of the second position (value or range).
 * @param [unit] Output unit, default "arcsec" (e.g. "deg", "arcmin", "mas", "rad").
 * @returns Separation, 0 … 180°, in arcsec by default.
 */
export function SEPARATION(ra1: any[][], dec1: any[][], ra2: any[][], dec2: any[][], unit?: string): any[][] {
  return callFromSheet(d.SEPARATION, [ra1, dec1, ra2, dec2, unit]);
}

/**
 * A position turned into another frame, in degrees. Frames: "equatorial" (ICRS, J2000), "galactic" (IAU 1958 pole and origin as realised in the ICRS by the Hipparcos Catalogue, ESA 1997 Vol. 1 §1.5.3: pole at RA 192.85948°, Dec 27.12825°), "supergalactic" (de Vaucouleurs' plane, pole at galactic l = 47.37°, b = +6.32°, origin at l = 137.37°, b = 0°; RC3 1991, Lahav et al. 2000), "ecliptic" (mean ecliptic and equinox of J2000, obliquity 84381.406″, IAU 2006; the ICRS frame bias of ≤ 25 mas neglected).
 * @customfunction COORD_CONVERT COORD_CONVERT
 * @helpurl https://localhost:3000/help.html#COORD_CONVERT
 * @example =ZC.COORD_CONVERT("14:05:12.3", "-03:21:45", "equatorial", "galactic", "lat")
 * @param lon Longitude in from_frame, degrees (an equatorial RA may be text in hours, "12:30:49.4") (value or range).
 * @param lat Latitude in from_frame, degrees −90 … 90 (or text, "+12:23:28") (value or range).
 * @param from_frame "equatorial", "galactic", "supergalactic" or "ecliptic".
 * @param to_frame The frame wanted, one of the same.
 * @param part "lon" (0 … 360°) or "lat" (−90 … 90°) of the result; a row {"lon","lat"} gives both (value or range).
 * @returns The longitude or latitude in to_frame, degrees.
 */
export function COORD_CONVERT(lon: any[][], lat: any[][], from_frame: string, to_frame: string, part: any[][]): any[][] {
  return callFromSheet(d.COORD_CONVERT, [lon, lat, from_frame, to_frame, part]);
}
