// npm stop: ends the server that npm start left running.
import { existsSync, readFileSync, rmSync } from "node:fs";
import { fileURLToPath } from "node:url";

const pidFile = fileURLToPath(new URL("../.certs/server.pid", import.meta.url));
if (!existsSync(pidFile)) {
  console.log("no zcell server is running (no .certs/server.pid)");
} else {
  const pid = Number(readFileSync(pidFile, "utf8"));
  try {
    process.kill(pid);
    console.log(`stopped the zcell server (pid ${pid})`);
  } catch {
    console.log(`the zcell server (pid ${pid}) had already stopped`);
  }
  rmSync(pidFile);
}
