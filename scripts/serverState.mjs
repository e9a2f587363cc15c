// Where npm start keeps its state, and how start and stop tell a zcell server of ours from any other
// process: the pid file names it, its command line runs scripts/server.mjs, and it answers
// /.zcell-server with its own pid.
import { existsSync, readFileSync } from "node:fs";
import { get } from "node:https";
import { createServer } from "node:net";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { execFileSync } from "node:child_process";

const root = fileURLToPath(new URL("..", import.meta.url));

/** Settings of npm start / npm stop (the environment overrides are for tests and unusual set-ups). */
export const serverConfig = {
  root,
  port: Number(process.env.ZCELL_PORT ?? 3000),
  /** Certificates, the pid file and the server log. */
  stateDir: process.env.ZCELL_STATE_DIR ?? `${root}.certs/`,
  /** The folder served. */
  dist: process.env.ZCELL_DIST ?? `${root}dist/`,
};
export const pidFile = () => join(serverConfig.stateDir, "server.pid");
export const identityPath = "/.zcell-server";

/** The pid in the pid file, or undefined. */
export function recordedPid() {
  if (!existsSync(pidFile())) return undefined;
  const pid = Number(readFileSync(pidFile(), "utf8"));
  return Number.isInteger(pid) && pid > 0 ? pid : undefined;
}

/** The process's command line, or undefined when there is no such process (or it cannot be read). */
function commandLine(pid) {
  try {
    if (existsSync(`/proc/${pid}/cmdline`)) return readFileSync(`/proc/${pid}/cmdline`, "utf8").replaceAll("\0", " ");
    if (process.platform === "win32") {
      return execFileSync("powershell", ["-NoProfile", "-Command", `(Get-CimInstance Win32_Process -Filter "ProcessId=${pid}").CommandLine`], { encoding: "utf8" });
    }
    return execFileSync("ps", ["-p", String(pid), "-o", "command="], { encoding: "utf8" });
  } catch {
    return undefined;
  }
}

/** True when `pid` is a running zcell server (its command line runs scripts/server.mjs). */
export function isZcellServer(pid) {
  const line = commandLine(pid);
  return line !== undefined && /scripts[\\/]server\.mjs/.test(line);
}

/** The pid that the server on `port` reports for itself, or undefined when it is not a zcell server. */
export function servedPid(port) {
  return new Promise((resolve) => {
    const request = get({ host: "127.0.0.1", port, path: identityPath, rejectUnauthorized: false, timeout: 1000 }, (res) => {
      let body = "";
      res.on("data", (chunk) => (body += chunk));
      res.on("end", () => {
        try {
          resolve(res.statusCode === 200 ? JSON.parse(body).pid : undefined);
        } catch {
          resolve(undefined);
        }
      });
    });
    request.on("error", () => resolve(undefined));
    request.on("timeout", () => request.destroy());
  });
}

/** True when something already listens on 127.0.0.1:`port`. */
export function portTaken(port) {
  return new Promise((resolve) => {
    const probe = createServer();
    probe.once("error", () => resolve(true));
    probe.listen(port, "127.0.0.1", () => probe.close(() => resolve(false)));
  });
}
