// Fails when the built UI would fetch a font, icon, stylesheet or script from outside the app.
// Run after `vite build` (the ui build script does): `node scripts/check-offline.mjs [distDir]`.
// URLs that are never fetched (XML namespaces, links inside library error messages) are listed
// for the record but do not fail the check.
import { readFileSync, readdirSync, statSync } from 'node:fs';
import { extname, join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';

const dist = process.argv[2] ?? fileURLToPath(new URL('../dist', import.meta.url));
const TEXT = new Set(['.html', '.css', '.js', '.mjs', '.svg', '.json', '.webmanifest']);
const EXTERNAL = String.raw`(?:https?:)?//[^\s"'()<>\x60]+`;

/** Places where a URL is fetched by the browser, per file kind. */
const FETCHING = {
  '.html': [new RegExp(String.raw`<(?:script|link|img|iframe|source|audio|video)\b[^>]*\b(?:src|href)\s*=\s*["']?(${EXTERNAL})`, 'gi')],
  '.css': [new RegExp(String.raw`url\(\s*["']?(${EXTERNAL})`, 'gi'), new RegExp(String.raw`@import\s+["'](${EXTERNAL})`, 'gi')],
  '.js': [
    new RegExp(String.raw`\bimport\s*\(\s*["'\x60](${EXTERNAL})`, 'gi'),
    new RegExp(String.raw`\bfrom\s*["'](${EXTERNAL})`, 'gi'),
    new RegExp(String.raw`\bimportScripts\s*\(\s*["'\x60](${EXTERNAL})`, 'gi'),
    new RegExp(String.raw`\bfetch\s*\(\s*["'\x60](${EXTERNAL})`, 'gi'),
  ],
};
FETCHING['.mjs'] = FETCHING['.js'];
/** Anywhere: an absolute URL of a font, stylesheet or script file, or a known CDN host. */
const ANYWHERE = [
  /https?:\/\/[^\s"'()<>`]+\.(?:woff2?|ttf|otf|eot|css|js|mjs)(?=[?#"'\s)`]|$)/gi,
  /https?:\/\/(?:[\w-]+\.)*(?:unpkg\.com|jsdelivr\.net|cdnjs\.cloudflare\.com|googleapis\.com|gstatic\.com|fontawesome\.com|typekit\.net)\b[^\s"'()<>`]*/gi,
];

function* files(dir) {
  for (const name of readdirSync(dir)) {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) yield* files(path);
    else yield path;
  }
}

const problems = [];
const harmless = new Map();
let count = 0;
for (const path of files(dist)) {
  const ext = extname(path);
  if (!TEXT.has(ext)) continue;
  count += 1;
  const text = readFileSync(path, 'utf8');
  const where = relative(dist, path);
  const flagged = new Set();
  for (const pattern of [...(FETCHING[ext] ?? []), ...ANYWHERE]) {
    for (const match of text.matchAll(pattern)) {
      const url = match[1] ?? match[0];
      if (!flagged.has(url)) problems.push(`${where}: ${url}`);
      flagged.add(url);
    }
  }
  for (const match of text.matchAll(/https?:\/\/[^\s"'()<>`\\]+/g)) {
    if (!flagged.has(match[0])) harmless.set(match[0], (harmless.get(match[0]) ?? 0) + 1);
  }
}

if (count === 0) {
  console.error(`check-offline: no built files under ${dist}; run vite build first`);
  process.exit(2);
}
if (problems.length > 0) {
  console.error('check-offline: the built UI would fetch from outside the app:');
  for (const problem of problems) console.error(`  ${problem}`);
  process.exit(1);
}
console.log(`check-offline: ${count} built text files, nothing fetched from outside the app.`);
if (process.env.CHECK_OFFLINE_VERBOSE) {
  console.log('URLs present but never fetched (namespaces, links in error messages):');
  for (const [url, n] of harmless) console.log(`  ${n}x ${url}`);
}
