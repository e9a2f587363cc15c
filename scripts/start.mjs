// npm start: build, serve dist/ at https://localhost:3000 with a development certificate, then
// sideload into desktop Excel where one exists, or print the steps to load it in Excel on the web.
import { execFileSync, spawn, spawnSync } from "node:child_process";
import { existsSync, mkdirSync, openSync, writeFileSync } from "node:fs";
import { get } from "node:https";
import { platform } from "node:os";
import { fileURLToPath } from "node:url";

const root = fileURLToPath(new URL("..", import.meta.url));
const certs = `${root}.certs/`;
const port = 3000;
mkdirSync(certs, { recursive: true });

console.log("building (development) …");
execFileSync(process.execPath, [`${root}node_modules/webpack/bin/webpack.js`, "--mode", "development"], { cwd: root, stdio: ["ignore", "ignore", "inherit"] });

const has = (cmd) => spawnSync("sh", ["-c", `command -v ${cmd}`], { stdio: "ignore" }).status === 0;

/** The Office dev-certs tooling where it can install its CA; otherwise a self-signed certificate of our own. */
async function certificate() {
  const canInstallCa = platform() !== "linux" || has("sudo");
  if (canInstallCa) {
    try {
      const devCerts = await import("office-addin-dev-certs");
      await devCerts.ensureCertificatesAreInstalled();
      const options = await devCerts.getHttpsServerOptions();
      writeFileSync(`${certs}dev.key`, options.key);
      writeFileSync(`${certs}dev.crt`, options.cert);
      return { key: `${certs}dev.key`, cert: `${certs}dev.crt`, trusted: true };
    } catch (e) {
      console.log(`Office dev-certs could not install its CA (${e.message ?? e}); using a self-signed certificate.`);
    }
  }
  const key = `${certs}localhost.key`;
  const cert = `${certs}localhost.crt`;
  if (!existsSync(key) || !existsSync(cert)) {
    const selfsigned = (await import("selfsigned")).default;
    const pems = selfsigned.generate([{ name: "commonName", value: "localhost" }], {
      keySize: 2048,
      days: 365,
      algorithm: "sha256",
      extensions: [
        { name: "basicConstraints", cA: true },
        { name: "subjectAltName", altNames: [{ type: 2, value: "localhost" }, { type: 7, ip: "127.0.0.1" }] },
      ],
    });
    writeFileSync(key, pems.private);
    writeFileSync(cert, pems.cert);
  }
  return { key, cert, trusted: false };
}

const { key, cert, trusted } = await certificate();
const log = openSync(`${certs}server.log`, "a");
const server = spawn(process.execPath, [`${root}scripts/server.mjs`, key, cert, String(port)], { detached: true, stdio: ["ignore", log, log] });
server.unref();
writeFileSync(`${certs}server.pid`, String(server.pid));

await new Promise((resolve, reject) => {
  let tries = 0;
  const probe = () =>
    get(`https://localhost:${port}/manifest.xml`, { rejectUnauthorized: false }, (res) => {
      res.resume();
      resolve();
    }).on("error", () => (++tries > 50 ? reject(new Error("server did not start; see .certs/server.log")) : setTimeout(probe, 100)));
  probe();
});

console.log(`\nzcell is served at https://localhost:${port}/ (npm stop ends it).`);
if (!trusted) {
  console.log(`
The certificate is self-signed (${cert}). Trust it once, as you prefer:
  - Debian/Ubuntu system store:  cp ${cert} /usr/local/share/ca-certificates/zcell-localhost.crt && update-ca-certificates
  - Chrome/Edge on Linux:        certutil -d sql:$HOME/.pki/nssdb -A -t "C,," -n zcell-localhost -i ${cert}
  - or open https://localhost:${port}/manifest.xml in the browser you use for Excel and accept the warning.`);
}
if (platform() === "win32" || platform() === "darwin") {
  console.log(`
Desktop Excel: Insert → Add-ins → My Add-ins → Upload My Add-in → ${root}dist/manifest.xml
(on Windows you can also share the dist folder as a trusted add-in catalogue).`);
}
console.log(`
Excel on the web: open a workbook at office.com → Home → Add-ins → More Add-ins → Upload My Add-in,
and upload ${root}dist/manifest.xml. Then type =ZC.DIST_LUM(1) in a cell.
Results use the workbook's cosmology (PLANCK2018 until you choose another in the zcell pane).`);
