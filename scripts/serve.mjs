// Serves the built static app (build/) on localhost and prints the URL. Used by `npm start`.
import { createServer } from 'node:http';
import { readFile, stat } from 'node:fs/promises';
import { extname, join, normalize } from 'node:path';

const root = join(process.cwd(), 'build');
const port = Number(process.env.PORT ?? 4174);
const types = { '.html': 'text/html; charset=utf-8', '.js': 'text/javascript', '.css': 'text/css',
  '.json': 'application/json', '.svg': 'image/svg+xml', '.png': 'image/png', '.txt': 'text/plain' };

async function resolveFile(urlPath) {
  let decoded;
  try {
    decoded = decodeURIComponent(urlPath.split('?')[0]);
  } catch {
    return null; // malformed percent-encoding: not a file we have
  }
  const clean = normalize(decoded).replace(/^(\.\.[/\\])+/, '');
  for (const candidate of [clean, `${clean}.html`, join(clean, 'index.html')]) {
    const path = join(root, candidate);
    if (!path.startsWith(root)) return null;
    try { if ((await stat(path)).isFile()) return path; } catch { /* try the next form */ }
  }
  return null;
}

createServer(async (req, res) => {
  try {
    const path = await resolveFile(req.url ?? '/');
    if (!path) { res.writeHead(404, { 'content-type': 'text/plain' }); res.end('Not found'); return; }
    const body = await readFile(path);
    res.writeHead(200, { 'content-type': types[extname(path)] ?? 'application/octet-stream' });
    res.end(body);
  } catch {
    // one bad request must never stop the server
    if (!res.headersSent) res.writeHead(500, { 'content-type': 'text/plain' });
    res.end('Server error');
  }
}).listen(port, '127.0.0.1', () => {
  console.log(`Outcouple is running at http://127.0.0.1:${port}/  (demo scenario loaded; Ctrl+C to stop)`);
});
