/** Builds the production bundle once, into the tests' own folder, before the tests that load it. */
import { execFileSync } from "node:child_process";
import { fileURLToPath } from "node:url";
import { testBuildDir } from "./testBuild.js";

export default function setup(): void {
  const root = fileURLToPath(new URL("..", import.meta.url));
  execFileSync(process.execPath, [`${root}node_modules/webpack/bin/webpack.js`, "--mode", "production", "--output-path", testBuildDir], {
    cwd: root,
    stdio: ["ignore", "ignore", "inherit"],
  });
}
