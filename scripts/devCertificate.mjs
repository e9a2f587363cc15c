// The HTTPS certificate for npm start when Office's dev-certs tooling cannot install its CA: a
// self-signed leaf certificate for localhost (CA:FALSE, serverAuth, SAN localhost and 127.0.0.1)
// whose private key only its owner may read (mode 0600). It is never a CA, so trusting it trusts
// nothing else.
import { spawnSync } from "node:child_process";
import { X509Certificate } from "node:crypto";
import { join } from "node:path";
import { chmodSync, existsSync, readFileSync, writeFileSync } from "node:fs";

/** True when the file holds a certificate we can still serve: a localhost leaf, not a CA, not expired. */
function usable(certFile) {
  if (!existsSync(certFile)) return false;
  try {
    const cert = new X509Certificate(readFileSync(certFile));
    return !cert.ca && cert.checkHost("localhost") === "localhost" && new Date(cert.validTo) > new Date(Date.now() + 86_400_000);
  } catch {
    return false;
  }
}

/**
 * Makes (or reuses) the self-signed leaf certificate in `dir`.
 * @returns the key and certificate file paths
 */
export async function selfSignedLeaf(dir) {
  const key = join(dir, "localhost.key");
  const cert = join(dir, "localhost.crt");
  if (!usable(cert) || !existsSync(key)) {
    const selfsigned = (await import("selfsigned")).default;
    const pems = selfsigned.generate([{ name: "commonName", value: "localhost" }], {
      keySize: 2048,
      days: 365,
      algorithm: "sha256",
      extensions: [
        { name: "basicConstraints", cA: false, critical: true },
        { name: "keyUsage", digitalSignature: true, keyEncipherment: true, critical: true },
        { name: "extKeyUsage", serverAuth: true },
        { name: "subjectAltName", altNames: [{ type: 2, value: "localhost" }, { type: 7, ip: "127.0.0.1" }] },
      ],
    });
    writeFileSync(key, pems.private, { mode: 0o600 });
    writeFileSync(cert, pems.cert);
  }
  chmodSync(key, 0o600);
  return { key, cert };
}

/** Whether this shell finds a command (POSIX `command -v`). */
export function has(cmd) {
  return spawnSync("sh", ["-c", `command -v ${cmd}`], { stdio: "ignore" }).status === 0;
}

/**
 * What the shell npm start runs in can do: run as root already, run sudo, find certutil.
 * @returns {{ root: boolean, sudo: boolean, certutil: boolean }}
 */
export function currentShell() {
  return { root: process.getuid?.() === 0, sudo: has("sudo"), certutil: has("certutil") };
}

/**
 * A command that needs root, written the way it works in `shell`: as it is for root, through sudo
 * where there is one, otherwise through su (which asks for root's password).
 * @param command e.g. "apt-get install libnss3-tools"
 * @param shell what the shell can do (`currentShell()`)
 */
export function asRoot(command, shell) {
  if (shell.root) return command;
  if (shell.sudo) return command.split(" && ").map((part) => `sudo ${part}`).join(" && ");
  return `su -c '${command}'`;
}

/**
 * The steps that make a browser on Linux trust a certificate. Chromium on Linux reads the NSS shared
 * database ~/.pki/nssdb, not the system store (Chromium docs/linux_cert_management.md); certutil
 * comes with Debian's libnss3-tools. A self-signed leaf is added as a trusted peer ("P,,"), a CA as
 * a trusted issuer ("C,,"). Installing the package needs root: the step is written for the shell it
 * is printed in (no sudo for root, su where there is no sudo), and left out where certutil is there.
 * @param certFile the certificate (leaf or CA) to trust
 * @param isCa whether it is a CA certificate
 * @param shell what this shell can do (default: `currentShell()`)
 */
export function nssTrustSteps(certFile, isCa, shell = currentShell()) {
  const nickname = isCa ? "office-addin-dev-ca" : "zcell-localhost";
  const install = shell.certutil ? "" : `    ${asRoot("apt-get install libnss3-tools", shell)}        # provides certutil\n`;
  return `  Chrome, Chromium or Edge on Linux (they read their own store, ~/.pki/nssdb, not the system's):
${install}    mkdir -p "$HOME/.pki/nssdb"
    [ -f "$HOME/.pki/nssdb/cert9.db" ] || certutil -d "sql:$HOME/.pki/nssdb" -N --empty-password
    certutil -d "sql:$HOME/.pki/nssdb" -A -t "${isCa ? "C,," : "P,,"}" -n ${nickname} -i "${certFile}"
  then restart the browser.`;
}

/**
 * The step that puts a certificate into Debian's or Ubuntu's system store, for the shell it is printed in.
 * @param certFile the certificate to trust
 * @param shell what this shell can do (default: `currentShell()`)
 */
export function systemTrustStep(certFile, shell = currentShell()) {
  return `    ${asRoot(`cp "${certFile}" /usr/local/share/ca-certificates/zcell-localhost.crt && update-ca-certificates`, shell)}`;
}
