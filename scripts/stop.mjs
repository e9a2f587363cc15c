// npm stop: ends the zcell server that npm start left running, and nothing else.
import { rmSync } from "node:fs";
import { isZcellServer, pidFile, recordedPid } from "./serverState.mjs";

const pid = recordedPid();
if (pid === undefined) {
  console.log("no zcell server is running (npm start records none)");
} else if (!isZcellServer(pid)) {
  console.log(`the zcell server (pid ${pid}) had already stopped; pid ${pid} is not a zcell server now, so it is left alone`);
  rmSync(pidFile(), { force: true });
} else {
  process.kill(pid);
  console.log(`stopped the zcell server (pid ${pid})`);
  rmSync(pidFile(), { force: true });
}
