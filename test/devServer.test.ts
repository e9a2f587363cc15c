/**
 * npm start / npm stop as a user meets them: a second start while our server runs says so and
 * keeps it; a port held by another program is an error (exit 1), not a false success; stop ends only
 * a process that is ours; the fallback certificate is a localhost leaf with a private key.
 * Runs the real scripts on a free port, serving the tests' build, with state in a temporary folder.
 */
import { spawnSync } from "node:child_process";
import { X509Certificate } from "node:crypto";
import { copyFileSync, existsSync, mkdtempSync, readFileSync, statSync, symlinkSync, writeFileSync } from "node:fs";
import { connect as netConnect, createServer, type Server } from "node:net";
import { connect as tlsConnect } from "node:tls";
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

/** One raw request over TLS: the status line's code, the headers, and whether the socket ended. */
function rawRequest(port: number, target: string): Promise<{ status: number; headers: Record<string, string> }> {
  return new Promise((resolve, reject) => {
    const socket = tlsConnect({ host: "127.0.0.1", port, rejectUnauthorized: false }, () => {
      socket.write(`GET ${target} HTTP/1.1\r\nHost: localhost\r\nConnection: close\r\n\r\n`);
    });
    let text = "";
    socket.setEncoding("utf8");
    socket.on("data", (d) => (text += d));
    socket.on("error", reject);
    socket.on("end", () => {
      const [head] = text.split("\r\n\r\n");
      const [statusLine, ...lines] = head.split("\r\n");
      const headers = Object.fromEntries(lines.map((l) => [l.slice(0, l.indexOf(":")).toLowerCase(), l.slice(l.indexOf(":") + 1).trim()]));
      resolve({ status: Number(statusLine.split(" ")[1]), headers });
    });
  });
}

/** A TLS client that sends a request and then half-closes its side: the status code and the body it still gets. */
function halfClosedRequest(port: number, target: string): Promise<{ status: number; body: string }> {
  return new Promise((resolve, reject) => {
    const socket = tlsConnect({ host: "127.0.0.1", port, rejectUnauthorized: false }, () => {
      socket.end(`GET ${target} HTTP/1.1\r\nHost: localhost\r\n\r\n`);
    });
    const chunks: Buffer[] = [];
    socket.on("data", (d: Buffer) => chunks.push(d));
    socket.on("error", reject);
    socket.on("close", () => {
      const bytes = Buffer.concat(chunks);
      const split = bytes.indexOf("\r\n\r\n");
      const head = bytes.subarray(0, split < 0 ? bytes.length : split).toString("latin1");
      let body = split < 0 ? Buffer.alloc(0) : bytes.subarray(split + 4);
      if (/\r\ntransfer-encoding: chunked/i.test(head)) {
        // RFC 9112 §7.1: chunks, each its size in hexadecimal bytes, ended by a chunk of size 0
        const parts: Buffer[] = [];
        for (let at = 0; ; ) {
          const eol = body.indexOf("\r\n", at);
          const size = eol < 0 ? 0 : parseInt(body.subarray(at, eol).toString("latin1"), 16);
          if (!size) break;
          parts.push(body.subarray(eol + 2, eol + 2 + size));
          at = eol + 2 + size + 2;
        }
        body = Buffer.concat(parts);
      }
      resolve({ status: Number(head.split(" ")[1]) || 0, body: body.toString("utf8") });
    });
  });
}

/**
 * A client that starts a request and sends one header line every 200 ms, never finishing: ms until the
 * server closes it (at most `waitMs`, then Infinity) and what it answered.
 */
function slowHeaders(port: number, waitMs: number): Promise<{ closedAfterMs: number; answer: string }> {
  return new Promise((resolve) => {
    const t0 = Date.now();
    let answer = "";
    let drip: NodeJS.Timeout | undefined;
    const done = (closedAfterMs: number) => {
      clearInterval(drip);
      clearTimeout(giveUp);
      socket.destroy();
      resolve({ closedAfterMs, answer });
    };
    const socket = tlsConnect({ host: "127.0.0.1", port, rejectUnauthorized: false }, () => {
      socket.write("GET /taskpane.html HTTP/1.1\r\nHost: localhost\r\n");
      let n = 0;
      drip = setInterval(() => socket.write(`X-Slow-${n++}: still sending\r\n`), 200);
    });
    socket.setEncoding("utf8");
    socket.on("data", (d) => (answer += d));
    socket.on("error", () => undefined);
    socket.on("close", () => done(Date.now() - t0));
    const giveUp = setTimeout(() => done(Number.POSITIVE_INFINITY), waitMs);
  });
}

describe("the dev server treats every request as a stranger's", () => {
  const served = mkdtempSync(join(tmpdir(), "zcell-served-"));
  const outside = mkdtempSync(join(tmpdir(), "zcell-outside-"));
  const hostileState = mkdtempSync(join(tmpdir(), "zcell-state-"));
  let hostilePort = 0;
  const env = () => ({ ...process.env, ZCELL_PORT: String(hostilePort), ZCELL_STATE_DIR: hostileState, ZCELL_DIST: served, ZCELL_NO_BUILD: "1", ZCELL_CERT: "self", ZCELL_IDLE_SECONDS: "1" });

  afterAll(() => {
    spawnSync(process.execPath, [`${root}scripts/stop.mjs`], { env: env(), encoding: "utf8", timeout: 60_000 });
  });

  test("malformed targets get 400 and the server keeps serving; links out of the folder, headers, CORS, idle connections", async () => {
    for (const f of ["taskpane.html", "functions.json", "functions.js"]) copyFileSync(`${testBuildDir}${f}`, join(served, f));
    writeFileSync(join(outside, "secret.txt"), "not for the web");
    symlinkSync(join(outside, "secret.txt"), join(served, "secret.txt"));
    // a key left readable by others is made private again (mode 0600) at the next start
    writeFileSync(join(hostileState, "localhost.key"), "old", { mode: 0o644 });
    hostilePort = await freePort();
    const start = spawnSync(process.execPath, [`${root}scripts/start.mjs`], { env: env(), encoding: "utf8", timeout: 60_000 });
    expect(`${start.stdout}${start.stderr}`).toContain(`zcell is served at https://localhost:${hostilePort}/`);
    expect(statSync(join(hostileState, "localhost.key")).mode & 0o777).toBe(0o600);

    // targets that once killed the server (URIError / TypeError uncaught)
    for (const target of ["/%E0%A4%A", "/%", "//[", "http://[x"]) {
      expect((await rawRequest(hostilePort, target)).status, target).toBe(400);
    }
    expect((await rawRequest(hostilePort, "/.zcell-server")).status).toBe(200);

    // a symbolic link out of the served folder is not followed
    expect((await rawRequest(hostilePort, "/secret.txt")).status).toBe(404);

    // the pane: nosniff, its own CSP as a header, no CORS; the functions' metadata: CORS (Excel on the web fetches it)
    const page = await rawRequest(hostilePort, "/taskpane.html");
    expect(page.status).toBe(200);
    expect(page.headers["x-content-type-options"]).toBe("nosniff");
    const meta = /http-equiv="?Content-Security-Policy"?\s+content="([^"]*)"/.exec(readFileSync(join(served, "taskpane.html"), "utf8"))![1];
    expect(page.headers["content-security-policy"]).toBe(meta);
    expect(page.headers["access-control-allow-origin"]).toBeUndefined();
    expect((await rawRequest(hostilePort, "/functions.js")).headers["access-control-allow-origin"]).toBeUndefined();
    expect((await rawRequest(hostilePort, "/functions.json")).headers["access-control-allow-origin"]).toBe("*");

    // idle and half-open connections are closed (here after 1 s): a TCP connection that never starts TLS
    const closedAfter = await new Promise<number>((resolve) => {
      const t0 = Date.now();
      const socket = netConnect({ host: "127.0.0.1", port: hostilePort });
      socket.on("error", () => undefined);
      socket.on("close", () => resolve(Date.now() - t0));
      setTimeout(() => resolve(Number.POSITIVE_INFINITY), 8000);
    });
    expect(closedAfter).toBeLessThan(5000);
  });

  test("a client sending its headers slowly is closed after the idle time (here 1 s), not the runtime's 30 s check", async () => {
    // Node checks headersTimeout only every connectionsCheckingInterval (30 s unless set; nodejs.org,
    // http.createServer options), so a header every 200 ms kept a connection open ~30 s past it
    const { closedAfterMs, answer } = await slowHeaders(hostilePort, 8000);
    console.log(`slow-header client closed after ${closedAfterMs} ms (idle time 1 s)`);
    expect(closedAfterMs).toBeGreaterThanOrEqual(1000);
    expect(closedAfterMs).toBeLessThan(2500);
    expect(answer).toMatch(/^HTTP\/1\.1 408 /);
  });

  test("a client that half-closes its side of the TLS connection after its request still gets the file", async () => {
    for (const file of ["functions.json", "functions.js"]) {
      const content = readFileSync(join(served, file), "utf8");
      expect(await halfClosedRequest(hostilePort, `/${file}`)).toEqual({ status: 200, body: content });
    }
    expect((await halfClosedRequest(hostilePort, "/%")).status).toBe(400);
    expect((await halfClosedRequest(hostilePort, "/missing.txt")).status).toBe(404);
  });
});
