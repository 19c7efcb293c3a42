// First-load JavaScript per route of the built web app, gzip-compressed (what a phone downloads).
// A route's first load = the entry script of index.html with every chunk it imports statically,
// plus the route module's lazy chunk with every chunk that one imports statically. Read from the
// build output itself (the entry's `import("./route-chunk.js")` calls and each chunk's static
// imports), so no Vite manifest is needed; when the build has one (.vite/manifest.json) it only
// gives the routes their source file names.
import { existsSync, readFileSync } from 'node:fs';
import { basename, join } from 'node:path';
import { gzipSync } from 'node:zlib';

const STATIC_IMPORT = /(?:^|[;}\s])(?:import|export)\s*(?:[\w$*{}\s,]+?\s*from\s*)?["'`]\.\/([\w.$-]+\.js)["'`]/g;
// The router's lazy routes, as Vite/Rolldown writes them: `path:`x`,lazy:async()=>…import(`./x-hash.js`)`.
const LAZY_ROUTE =
  /(?:path:\s*["'`]([^"'`]*)["'`]|index:\s*(?:!0|true))\s*,\s*lazy:[^]*?import\(\s*["'`]\.\/([\w.$-]+\.js)["'`]\s*\)/g;
const DYNAMIC_IMPORT = /import\(\s*["'`]\.\/([\w.$-]+\.js)["'`]\s*\)/g;

function gzipBytes(file) {
  return gzipSync(readFileSync(file), { level: 9 }).length;
}

/** Every chunk `file` reaches through static imports, itself included. */
function closure(assets, start, seen = new Set()) {
  const stack = [start];
  while (stack.length) {
    const file = stack.pop();
    if (seen.has(file)) continue;
    seen.add(file);
    const text = readFileSync(join(assets, file), 'utf8');
    for (const m of text.matchAll(STATIC_IMPORT)) if (!seen.has(m[1])) stack.push(m[1]);
  }
  return seen;
}

function manifestNames(dist) {
  const file = join(dist, '.vite', 'manifest.json');
  if (!existsSync(file)) return new Map();
  const manifest = JSON.parse(readFileSync(file, 'utf8'));
  return new Map(
    Object.entries(manifest)
      .filter(([, v]) => v.isDynamicEntry && v.file?.endsWith('.js'))
      .map(([src, v]) => [basename(v.file), src.replace(/^src\/app\/routes\//, '').replace(/\.tsx?$/, '')]),
  );
}

/**
 * Rows: { route, chunk, entryKB, routeKB, totalKB, files } per lazy route, largest first; plus the
 * entry alone. Throws when index.html names no module script.
 */
export function routeSizes(dist) {
  const html = readFileSync(join(dist, 'index.html'), 'utf8');
  const entryMatch = html.match(/<script[^>]+type="module"[^>]+src="\/assets\/([^"]+\.js)"/);
  if (!entryMatch) throw new Error(`no module script in ${dist}/index.html`);
  const assets = join(dist, 'assets');
  const entry = entryMatch[1];
  const sizes = new Map();
  const size = (f) => {
    if (!sizes.has(f)) sizes.set(f, gzipBytes(join(assets, f)));
    return sizes.get(f);
  };
  const sum = (files) => [...files].reduce((s, f) => s + size(f), 0);
  const entryFiles = closure(assets, entry);
  const entryText = readFileSync(join(assets, entry), 'utf8');

  // Route paths where the router's shape is readable; otherwise every dynamic import of the entry.
  const routes = new Map();
  for (const m of entryText.matchAll(LAZY_ROUTE)) if (!routes.has(m[2])) routes.set(m[2], m[1] ?? '(index)');
  for (const m of entryText.matchAll(DYNAMIC_IMPORT)) if (!routes.has(m[1])) routes.set(m[1], null);
  const names = manifestNames(dist);

  const rows = [...routes].map(([chunk, path]) => {
    const files = closure(assets, chunk, new Set(entryFiles));
    const routeFiles = [...files].filter((f) => !entryFiles.has(f));
    const name = names.get(chunk) ?? chunk.replace(/-[\w$-]{8}\.js$/, '');
    return {
      route: path === null ? name : `/${path === '(index)' ? '' : path}`,
      module: name,
      chunk,
      routeKB: sum(routeFiles) / 1024,
      totalKB: sum(files) / 1024,
    };
  });
  rows.sort((a, b) => b.totalKB - a.totalKB);
  return { entry, entryKB: sum(entryFiles) / 1024, entryChunks: entryFiles.size, routes: rows };
}
