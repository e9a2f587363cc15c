/**
 * npm start / npm stop as a user meets them: a second start while our server runs says so and
 * keeps it; a port held by another program is an error (exit 1), not a false success; stop ends only
 * a process that is ours; the fallback certificate is a localhost leaf with a private key.
 * Runs the real scripts on a free port, serving the tests' build, with state in a temporary folder.
 */
import { spawnSync } from "node:child_process";
import { X509Certificate } from "node:crypto";
import { existsSync, mkdtempSync, readFileSync, statSync, writeFileSync } from "node:fs";
import { createServer, type Server } from "node:net";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { afterAll, describe, expect, test } from "vitest";
import { testBuildDir } from "./testBuild.js";

const root = fileURLToPath(new URL("..", import.meta.url));
const state = mkdtempSync(join(tmpdir(), "zcell-state-"));

async function freePort(): Promise<number> {
  const s = createServer();
  await new Promise<void>((r) => s.listen(0, "127.0.0.1", r));
  const port = (s.address() as { port: number }).port;
  await new Promise((r) => s.close(r));
  return port;
}

function run(script: "start" | "stop", port: number) {
  const env = { ...process.env, ZCELL_PORT: String(port), ZCELL_STATE_DIR: state, ZCELL_DIST: testBuildDir, ZCELL_NO_BUILD: "1", ZCELL_CERT: "self" };
  const r = spawnSync(process.execPath, [`${root}scripts/${script}.mjs`], { env, encoding: "utf8", timeout: 60_000 });
  return { status: r.status, out: `${r.stdout}${r.stderr}` };
}

async function listening(port: number): Promise<boolean> {
  const s = createServer();
  return new Promise((resolve) => {
    s.once("error", () => resolve(true));
    s.listen(port, "127.0.0.1", () => s.close(() => resolve(false)));
  });
}

const pidFile = join(state, "server.pid");
let port = 0;

afterAll(() => {
  run("stop", port);
});

describe("npm start and npm stop", () => {
  test("start, start again, stop: one server, told truthfully, and nothing left listening", async () => {
    port = await freePort();
    const first = run("start", port);
    expect(first.out).toContain(`zcell is served at https://localhost:${port}/`);
    expect(first.status).toBe(0);
    const pid = Number(readFileSync(pidFile, "utf8"));
    expect(readFileSync(`/proc/${pid}/cmdline`, "utf8")).toMatch(/scripts\/server\.mjs/);

    const second = run("start", port);
    expect(second.status).toBe(0);
    expect(second.out).toContain(`zcell is already running at https://localhost:${port}/ (pid ${pid})`);
    expect(second.out).not.toMatch(/is served at/);
    expect(Number(readFileSync(pidFile, "utf8"))).toBe(pid);

    const stop = run("stop", port);
    expect(stop.out).toContain(`stopped the zcell server (pid ${pid})`);
    await expect.poll(() => listening(port), { timeout: 5000 }).toBe(false);
    expect(existsSync(pidFile)).toBe(false);
    expect(run("stop", port).out).toMatch(/no zcell server is running/);
  });

  test("a port taken by another program: start fails with a clear message and records nothing", async () => {
    const other: Server = createServer();
    const taken = await freePort();
    await new Promise<void>((r) => other.listen(taken, "127.0.0.1", r));
    try {
      const r = run("start", taken);
      expect(r.status).toBe(1);
      expect(r.out).toContain(`port ${taken} is taken by another program (not a zcell server)`);
      expect(existsSync(pidFile)).toBe(false);
    } finally {
      await new Promise((r) => other.close(r));
    }
  });

  test("stop leaves alone a process that is not ours, even when the pid file names it", () => {
    writeFileSync(pidFile, String(process.pid));
    const r = run("stop", port);
    expect(r.out).toContain(`pid ${process.pid} is not a zcell server now, so it is left alone`);
    expect(existsSync(pidFile)).toBe(false);
  });

  test("the fallback certificate is a localhost leaf for serverAuth, its key readable by the owner only", () => {
    const cert = new X509Certificate(readFileSync(join(state, "localhost.crt")));
    // RFC 5280: basicConstraints CA:FALSE; extKeyUsage id-kp-serverAuth = 1.3.6.1.5.5.7.3.1
    expect(cert.ca).toBe(false);
    expect(cert.subjectAltName).toMatch(/DNS:localhost/);
    expect(cert.subjectAltName).toMatch(/IP Address:127.0.0.1/);
    expect(cert.keyUsage).toContain("1.3.6.1.5.5.7.3.1");
    expect(statSync(join(state, "localhost.key")).mode & 0o777).toBe(0o600);
  });
});
