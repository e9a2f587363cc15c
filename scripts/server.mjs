// Static HTTPS server for the built add-in (started in the background by `npm start`, ended by
// `npm stop`). It answers /.zcell-server with its pid, so that start and stop know it is ours.
// Any web page the developer visits can send requests to localhost, so the server answers a
// malformed request with 400 and keeps serving, serves only regular files inside the folder (no
// symbolic link out of it), sends nosniff and each page's own Content-Security-Policy as headers,
// closes idle connections and connections slow to send their request, answers a client that
// half-closes its side after its request, and allows cross-origin reads only of the custom functions'
// metadata, the one file Excel on the web fetches from another origin (learn.microsoft.com,
// "Custom functions metadata": the server hosting the JSON file must have CORS enabled).
// Usage: node scripts/server.mjs <key.pem> <cert.pem> <port> <folder>
import { readFileSync, realpathSync, statSync } from "node:fs";
import { createServer } from "node:https";
import { extname, join, normalize, sep } from "node:path";

const [keyFile, certFile, portText, folder] = process.argv.slice(2);
const root = realpathSync(folder);
const dist = root.endsWith(sep) ? root : `${root}${sep}`;
const types = {
  ".html": "text/html; charset=utf-8", ".js": "text/javascript; charset=utf-8", ".json": "application/json",
  ".xml": "application/xml", ".png": "image/png", ".map": "application/json", ".css": "text/css",
};
/** Files Excel fetches cross-origin: the custom functions' metadata. */
const crossOrigin = new Set(["/functions.json"]);
/** Seconds a connection may stay idle, or take to finish its TLS handshake or its request headers (ZCELL_IDLE_SECONDS). */
const idleSeconds = Number(process.env.ZCELL_IDLE_SECONDS) > 0 ? Number(process.env.ZCELL_IDLE_SECONDS) : 10;
/**
 * How often Node looks for requests past their headers or request timeout: it checks them only on this
 * interval, 30 s unless set (nodejs.org/api/http.html, http.createServer options:
 * connectionsCheckingInterval), which kept a slow-header client ~30 s past the timeout. A tenth of the
 * idle time closes it within 10% of it.
 */
const checkingMs = idleSeconds * 100;

/** The Content-Security-Policy a page declares in its meta tag, to send as a header too. */
function pagePolicy(file) {
  const match = /<meta\s+http-equiv="?Content-Security-Policy"?\s+content="([^"]*)"/i.exec(readFileSync(file, "utf8"));
  return match ? match[1] : "default-src 'self'";
}

/** The regular file inside the folder that a request path names, or undefined. */
function servedFile(path) {
  const file = join(dist, path === "/" ? "taskpane.html" : path);
  if (!file.startsWith(dist)) return undefined;
  try {
    const real = realpathSync(file); // a symbolic link pointing out of the folder is not served
    return real.startsWith(dist) && statSync(real).isFile() ? real : undefined;
  } catch {
    return undefined;
  }
}

function answer(res, status, text) {
  res.writeHead(status, { "content-type": "text/plain; charset=utf-8", "x-content-type-options": "nosniff" });
  res.end(text);
}

const options = {
  key: readFileSync(keyFile),
  cert: readFileSync(certFile),
  handshakeTimeout: idleSeconds * 1000,
  headersTimeout: idleSeconds * 1000,
  requestTimeout: 2 * idleSeconds * 1000,
  connectionsCheckingInterval: checkingMs,
};
const server = createServer(options, (req, res) => {
  let path;
  try {
    path = normalize(decodeURIComponent(new URL(req.url ?? "/", "https://localhost").pathname)).replace(/^(\.\.[/\\])+/, "");
  } catch {
    return answer(res, 400, "bad request");
  }
  if (req.method !== "GET" && req.method !== "HEAD") return answer(res, 405, "method not allowed");
  if (path === "/.zcell-server") {
    res.writeHead(200, { "content-type": "application/json", "x-content-type-options": "nosniff" });
    res.end(JSON.stringify({ pid: process.pid, folder: dist }));
    return;
  }
  const file = servedFile(path);
  if (!file) return answer(res, 404, "not found");
  const headers = {
    "content-type": types[extname(file)] ?? "application/octet-stream",
    "x-content-type-options": "nosniff",
    "cache-control": "no-cache",
  };
  if (extname(file) === ".html") headers["content-security-policy"] = pagePolicy(file);
  if (crossOrigin.has(path)) headers["access-control-allow-origin"] = "*";
  // read and answered at once, before the socket's end is seen: a client that half-closes its side
  // after its request ends the socket as soon as the request is handled, and a response still being
  // read from disk then was lost (Node's HTTP server does not keep a half-closed connection open)
  let body;
  try {
    body = readFileSync(file);
  } catch {
    return answer(res, 404, "not found");
  }
  res.writeHead(200, { ...headers, "content-length": body.length });
  res.end(req.method === "HEAD" ? undefined : body);
});
server.keepAliveTimeout = idleSeconds * 1000;
server.setTimeout(idleSeconds * 1000, (socket) => socket.destroy());
server.on("clientError", (error, socket) => {
  // headers or request too slow (Node's ERR_HTTP_REQUEST_TIMEOUT): 408; anything malformed: 400
  const status = error.code === "ERR_HTTP_REQUEST_TIMEOUT" ? "408 Request Timeout" : "400 Bad Request";
  if (socket.writable) socket.end(`HTTP/1.1 ${status}\r\nConnection: close\r\n\r\n`);
  else socket.destroy();
});
server.on("tlsClientError", (_error, socket) => socket.destroy());
server.listen(Number(portText), "127.0.0.1", () => console.log(`serving ${dist} at https://localhost:${portText}/`));
