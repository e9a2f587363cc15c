/**
 * The ZC.* worksheet functions, declared by family in functions/declarations/ (each function is its
 * JSDoc, read by the metadata plugin to build functions.json, plus one line handing the arguments to
 * the shared wrapper). Arguments marked "range" broadcast: a single value or a range, and a column
 * against a row makes a table. Omitted or blank `model` means the workbook's active cosmology
 * (P18-CMB until one is applied). This file is the bundle's entry: it loads every family, and the
 * metadata plugin adds each family's CustomFunctions.associate calls to that family's file.
 */
import "./declarations/distancesAndTimes.js";
import "./declarations/photometry.js";
import "./declarations/errors.js";
import "./declarations/limitsAndPopulations.js";
import "./declarations/structure.js";
import "./declarations/positions.js";
import "./declarations/velocities.js";
import "./declarations/modelsAndUtilities.js";
import "./declarations/dustAndSpectra.js";
