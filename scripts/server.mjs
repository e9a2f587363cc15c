// Static HTTPS server for the built add-in (started in the background by `npm start`, ended by
// `npm stop`). It answers /.zcell-server with its pid, so that start and stop know it is ours.
// Usage: node scripts/server.mjs <key.pem> <cert.pem> <port> <folder>
import { createReadStream, existsSync, readFileSync, statSync } from "node:fs";
import { createServer } from "node:https";
import { extname, join, normalize } from "node:path";

const [keyFile, certFile, portText, folder] = process.argv.slice(2);
const dist = folder.endsWith("/") ? folder : `${folder}/`;
const types = {
  ".html": "text/html; charset=utf-8", ".js": "text/javascript; charset=utf-8", ".json": "application/json",
  ".xml": "application/xml", ".png": "image/png", ".map": "application/json", ".css": "text/css",
};

createServer({ key: readFileSync(keyFile), cert: readFileSync(certFile) }, (req, res) => {
  const path = normalize(decodeURIComponent(new URL(req.url ?? "/", "https://localhost").pathname)).replace(/^(\.\.[/\\])+/, "");
  if (path === "/.zcell-server") {
    res.writeHead(200, { "content-type": "application/json" });
    res.end(JSON.stringify({ pid: process.pid, folder: dist }));
    return;
  }
  const file = join(dist, path === "/" ? "taskpane.html" : path);
  if (!file.startsWith(dist) || !existsSync(file) || statSync(file).isDirectory()) {
    res.writeHead(404, { "content-type": "text/plain" });
    res.end("not found");
    return;
  }
  res.writeHead(200, {
    "content-type": types[extname(file)] ?? "application/octet-stream",
    "access-control-allow-origin": "*",
    "cache-control": "no-cache",
  });
  createReadStream(file).pipe(res);
}).listen(Number(portText), "127.0.0.1", () => console.log(`serving ${dist} at https://localhost:${portText}/`));
