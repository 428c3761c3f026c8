// A tiny static file server on 127.0.0.1 for the browser page check (and for trying docs/browser/
// by hand: `node tests/browser/server.mjs`, then open the printed URL). Serves the package root,
// read-only, GET and HEAD only, never a path outside the root.
import { createServer } from "node:http";
import { readFile, stat } from "node:fs/promises";
import { extname, join, normalize, sep } from "node:path";
import { fileURLToPath } from "node:url";

const TYPES = {
  ".html": "text/html; charset=utf-8",
  ".js": "text/javascript; charset=utf-8",
  ".mjs": "text/javascript; charset=utf-8",
  ".map": "application/json",
  ".json": "application/json",
  ".css": "text/css",
  ".svg": "image/svg+xml",
};

/**
 * Serve `root` on 127.0.0.1 at a free port.
 * @returns {Promise<{ url: string, close: () => Promise<void> }>}
 */
export function startServer(root = fileURLToPath(new URL("../..", import.meta.url))) {
  const base = normalize(root.endsWith(sep) ? root : root + sep);
  const server = createServer(async (req, res) => {
    try {
      if (req.method !== "GET" && req.method !== "HEAD") return send(res, 405, "method not allowed");
      const path = decodeURIComponent(new URL(req.url ?? "/", "http://127.0.0.1").pathname);
      let file = normalize(join(base, path));
      if (!file.startsWith(base)) return send(res, 403, "forbidden");
      if ((await stat(file)).isDirectory()) file = join(file, "index.html");
      const body = await readFile(file);
      res.writeHead(200, { "content-type": TYPES[extname(file)] ?? "application/octet-stream", "content-length": body.length });
      res.end(req.method === "HEAD" ? undefined : body);
    } catch {
      send(res, 404, "not found");
    }
  });
  return new Promise((resolve, reject) => {
    server.once("error", reject);
    server.listen(0, "127.0.0.1", () => {
      const { port } = /** @type {import("node:net").AddressInfo} */ (server.address());
      resolve({ url: `http://127.0.0.1:${port}`, close: () => new Promise((r) => server.close(() => r())) });
    });
  });
}

function send(res, status, text) {
  res.writeHead(status, { "content-type": "text/plain; charset=utf-8" });
  res.end(text);
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  const { url } = await startServer();
  console.log(`serving the package root at ${url} — open ${url}/docs/browser/ (Ctrl-C stops)`);
}
