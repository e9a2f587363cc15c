/**
 * The certificate steps npm start prints work in the shell they are printed in: no `sudo` for root
 * (a root shell in a container often has none), `sudo` for a user who has it, `su` otherwise, and no
 * install step where certutil is already there. The steps printed for this very shell name programs
 * this shell finds.
 */
import { spawnSync } from "node:child_process";
import { describe, expect, test } from "vitest";
import { asRoot, currentShell, nssTrustSteps, systemTrustStep } from "../scripts/devCertificate.mjs";

const cert = "/home/someone/zcell/.certs/localhost.crt";

describe("certificate steps for the shell they are printed in", () => {
  test.each([
    // shell                                             | the package install step printed
    [{ root: true, sudo: false, certutil: false },         "    apt-get install libnss3-tools"],
    [{ root: true, sudo: true, certutil: false },          "    apt-get install libnss3-tools"],
    [{ root: false, sudo: true, certutil: false },         "    sudo apt-get install libnss3-tools"],
    [{ root: false, sudo: false, certutil: false },        "    su -c 'apt-get install libnss3-tools'"],
  ])("%j: %s", (shell, step) => {
    const lines = nssTrustSteps(cert, false, shell).split("\n");
    expect(lines.filter((l) => l.includes("libnss3-tools")).map((l) => l.replace(/\s+# .*$/, ""))).toEqual([step]);
    if (shell.root || !shell.sudo) expect(nssTrustSteps(cert, true, shell)).not.toMatch(/\bsudo\b/);
  });

  test("where certutil is already installed, no install step is printed", () => {
    const steps = nssTrustSteps(cert, false, { root: false, sudo: true, certutil: true });
    expect(steps).not.toMatch(/apt-get|sudo/);
    expect(steps).toContain(`-t "P,," -n zcell-localhost -i "${cert}"`);
  });

  test("the system-store step takes sudo on each command only where sudo is the way to root", () => {
    expect(systemTrustStep(cert, { root: true, sudo: false, certutil: false }).trim()).toBe(
      `cp "${cert}" /usr/local/share/ca-certificates/zcell-localhost.crt && update-ca-certificates`,
    );
    expect(systemTrustStep(cert, { root: false, sudo: true, certutil: false }).trim()).toBe(
      `sudo cp "${cert}" /usr/local/share/ca-certificates/zcell-localhost.crt && sudo update-ca-certificates`,
    );
    expect(asRoot("update-ca-certificates", { root: false, sudo: false, certutil: false })).toBe("su -c 'update-ca-certificates'");
  });

  test("the steps printed here name only programs this shell finds (or certutil, which they install)", () => {
    const shell = currentShell();
    const steps = `${nssTrustSteps(cert, false, shell)}\n${systemTrustStep(cert, shell)}`;
    const programs = steps
      .split("\n")
      .filter((l) => l.startsWith("    "))
      .flatMap((l) => l.replace(/#.*$/, "").split(/&&|\|\|/))
      .map((command) => command.trim().replace(/^\[.*\]$/, "[").split(/\s+/)[0])
      .filter((p) => p && p !== "[");
    expect(programs.length).toBeGreaterThan(3);
    for (const program of new Set(programs)) {
      if (program === "certutil" && !shell.certutil) continue; // the first step installs it
      expect(spawnSync("sh", ["-c", `command -v ${program}`]).status, `${program} in this shell`).toBe(0);
    }
    if (shell.root) expect(steps).not.toMatch(/\bsudo\b/);
  });
});
