/** Builds the production bundle once before the tests that load dist/ (host simulation, manifest). */
import { execFileSync } from "node:child_process";
import { fileURLToPath } from "node:url";

export default function setup(): void {
  const root = fileURLToPath(new URL("..", import.meta.url));
  execFileSync(process.execPath, [`${root}node_modules/webpack/bin/webpack.js`, "--mode", "production"], {
    cwd: root,
    stdio: ["ignore", "ignore", "inherit"],
  });
}
