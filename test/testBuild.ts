/**
 * Where the tests build the add-in: a folder of their own under test-artifacts/, so that `npm test`
 * never overwrites the `dist/` that `npm start` serves or a hosted build was made into.
 */
import { fileURLToPath } from "node:url";

/** Absolute path of the production build the tests use, with a trailing slash. */
export const testBuildDir = fileURLToPath(new URL("../test-artifacts/build/", import.meta.url));
