// npm start: build (production, with source maps beside it), serve it at https://localhost:3000
// with a development certificate, and print how to load it into Excel. A second npm start while
// our server runs says so; a port held by another program is an error, never a false success.
import { execFileSync, spawn } from "node:child_process";
import { chmodSync, existsSync, mkdirSync, openSync, readFileSync, writeFileSync } from "node:fs";
import { platform } from "node:os";
import { join } from "node:path";
import { has, nssTrustSteps, selfSignedLeaf, systemTrustStep } from "./devCertificate.mjs";
import { isZcellServer, pidFile, portTaken, recordedPid, serverConfig, servedPid } from "./serverState.mjs";

const { root, port, stateDir, dist } = serverConfig;
const url = `https://localhost:${port}/`;
mkdirSync(stateDir, { recursive: true });

const running = recordedPid();
if (running !== undefined && isZcellServer(running)) {
  console.log(`zcell is already running at ${url} (pid ${running}); npm stop ends it.`);
  process.exit(0);
}
if (await portTaken(port)) {
  const other = await servedPid(port);
  console.error(
    other !== undefined
      ? `port ${port} is held by a zcell server (pid ${other}) that this folder did not start; end it, or set ZCELL_PORT.`
      : `port ${port} is taken by another program (not a zcell server); free it, or set ZCELL_PORT to another port.`,
  );
  process.exit(1);
}

if (process.env.ZCELL_NO_BUILD !== "1") {
  console.log("building (production, with source maps) …");
  execFileSync(process.execPath, [`${root}node_modules/webpack/bin/webpack.js`, "--mode", "production", "--devtool", "source-map"], {
    cwd: root,
    stdio: ["ignore", "ignore", "inherit"],
  });
}

/** The Office dev-certs tooling where it can install its CA; otherwise a self-signed leaf of our own. */
async function certificate() {
  const tryDevCerts = process.env.ZCELL_CERT !== "self" && (platform() !== "linux" || has("sudo"));
  if (tryDevCerts) {
    try {
      const devCerts = await import("office-addin-dev-certs");
      await devCerts.ensureCertificatesAreInstalled();
      const options = await devCerts.getHttpsServerOptions();
      writeFileSync(join(stateDir, "dev.key"), options.key, { mode: 0o600 });
      chmodSync(join(stateDir, "dev.key"), 0o600); // the mode above applies only to a new file
      writeFileSync(join(stateDir, "dev.crt"), options.cert);
      const { caCertificatePath } = await import("office-addin-dev-certs/lib/defaults.js");
      return { key: join(stateDir, "dev.key"), cert: join(stateDir, "dev.crt"), ca: caCertificatePath };
    } catch (e) {
      console.log(`Office dev-certs could not install its CA (${e.message ?? e}); using a self-signed certificate.`);
    }
  }
  return selfSignedLeaf(stateDir);
}

const { key, cert, ca } = await certificate();
const log = openSync(join(stateDir, "server.log"), "a");
const server = spawn(process.execPath, [`${root}scripts/server.mjs`, key, cert, String(port), dist], { detached: true, stdio: ["ignore", log, log] });
let exited = false;
server.on("exit", () => (exited = true));

// ready when the server on the port reports the pid we started; failed when our process ends first
for (let tries = 0; ; tries++) {
  if ((await servedPid(port)) === server.pid) break;
  if (exited || tries > 100) {
    if (!exited) server.kill();
    const tail = existsSync(join(stateDir, "server.log")) ? readFileSync(join(stateDir, "server.log"), "utf8").trim().split("\n").slice(-3).join("\n") : "";
    console.error(`the zcell server did not start at ${url}${tail ? `:\n${tail}` : ""}`);
    process.exit(1);
  }
  await new Promise((r) => setTimeout(r, 100));
}
server.unref();
writeFileSync(pidFile(), String(server.pid));

console.log(`\nzcell is served at ${url} (pid ${server.pid}; npm stop ends it).`);
if (ca) {
  if (platform() === "linux") {
    console.log(`\nOffice's dev-certs tooling put its CA (${ca}) into the system store only. For the browser:\n${nssTrustSteps(ca, true)}`);
  }
} else {
  console.log(`
The certificate is self-signed (${cert}). Trust it once:
${nssTrustSteps(cert, false)}
  Other programs on Debian/Ubuntu (system store):
${systemTrustStep(cert)}
  Or open ${url}manifest.xml in the browser you use for Excel and accept the warning.`);
}
if (platform() === "win32" || platform() === "darwin") {
  console.log(`
Desktop Excel: Insert → Add-ins → My Add-ins → Upload My Add-in → ${join(dist, "manifest.xml")}
(on Windows you can also share the dist folder as a trusted add-in catalogue).`);
}
console.log(`
Excel on the web (on this machine: the server listens on 127.0.0.1 only): open a workbook at
office.com → Home → Add-ins → More Add-ins → Upload My Add-in, and upload ${join(dist, "manifest.xml")}.
Then type =ZC.DIST_LUM(1) in a cell. Results use the workbook's cosmology (P18-CMB until you
choose another in the zcell pane).`);
