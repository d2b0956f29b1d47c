// JavaScript a browser fetches to show one route first: the entry chunk and its static imports,
// then the route's lazily loaded module and its static imports, each counted once, gzip-compressed
// as the server sends them. Read from Vite's build manifest (build.manifest in vite.config.ts).
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';

/** Budget for the first route, from the product's requirements. */
export const FIRST_ROUTE_BUDGET_BYTES = 350 * 1024;

/** The routes a visitor can arrive on, by the module that renders each. */
export const ROUTE_MODULES = {
  '/ (home)': 'src/app/routes/home.tsx',
  '/sign-in': 'src/app/routes/sign-in.tsx',
  '/calculations': 'src/app/routes/calculations/list.tsx',
  '/calculations/:id (editor)': 'src/app/routes/calculations/editor.tsx',
};

export function readManifest(distDir) {
  return JSON.parse(readFileSync(join(distDir, '.vite', 'manifest.json'), 'utf8'));
}

function closure(manifest, key, seen) {
  const chunk = manifest[key];
  if (!chunk || seen.has(key)) return;
  seen.add(key);
  for (const imported of chunk.imports ?? []) closure(manifest, imported, seen);
}

/** Files (relative to dist) and gzip bytes of the JS a first visit to `routeModule` loads. */
export function routeJs(distDir, routeModule) {
  const manifest = readManifest(distDir);
  const seen = new Set();
  closure(manifest, 'index.html', seen);
  closure(manifest, routeModule, seen);
  const files = [...seen].map((key) => manifest[key].file).filter((file) => file.endsWith('.js'));
  const gzipBytes = files.reduce(
    (sum, file) => sum + gzipSync(readFileSync(join(distDir, file))).length,
    0,
  );
  return { files, gzipBytes };
}

const kB = (bytes) => (bytes / 1024).toFixed(1);

/** A printable table of every arrival route against the budget. */
export function routeJsReport(distDir) {
  const lines = ['JavaScript loaded on arrival, gzip (budget for the first route: 350 kB)'];
  for (const [route, module] of Object.entries(ROUTE_MODULES)) {
    const { gzipBytes, files } = routeJs(distDir, module);
    lines.push(
      `  ${route.padEnd(28)} ${kB(gzipBytes).padStart(7)} kB in ${files.length} files  ` +
        `(${(gzipBytes / FIRST_ROUTE_BUDGET_BYTES).toFixed(2)} of budget)`,
    );
  }
  return lines.join('\n');
}

if (import.meta.url === `file://${process.argv[1]}`) {
  console.log(routeJsReport(new URL('../dist', import.meta.url).pathname));
}
