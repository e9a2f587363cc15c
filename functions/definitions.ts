/**
 * Every worksheet function as data, by name: the families in functions/definitions/ (one file per
 * family, like the declarations in functions/declarations/). Each entry holds its arguments in the
 * order of the ZC.* signature and what one cell computes, in reference units; `evaluate.ts` does the
 * rest. To add a function, add an entry to its family here and a declaration to the family's
 * declaration file.
 */
import { distancesAndTimes } from "./definitions/distancesAndTimes.js";
import { dustAndSpectra } from "./definitions/dustAndSpectra.js";
import { errors } from "./definitions/errors.js";
import { limitsAndPopulations } from "./definitions/limitsAndPopulations.js";
import { modelsAndUtilities } from "./definitions/modelsAndUtilities.js";
import { photometry } from "./definitions/photometry.js";
import { positions } from "./definitions/positions.js";
import { structure } from "./definitions/structure.js";
import { velocities } from "./definitions/velocities.js";
import type { FunctionDef } from "./FunctionDef.js";

const families = [distancesAndTimes, photometry, errors, limitsAndPopulations, structure, positions, velocities, modelsAndUtilities, dustAndSpectra];

/** The worksheet functions by name (without the ZC. namespace). */
export const definitions: Readonly<Record<string, FunctionDef>> = Object.fromEntries(families.flat().map((d) => [d.name, d]));
