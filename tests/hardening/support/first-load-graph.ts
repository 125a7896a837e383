/**
 * The JavaScript a first visit downloads: the module scripts (and modulepreloads) named in
 * dist/client/index.html plus every file they import statically, transitively. Dynamic `import()`
 * targets are not followed: they load later, when a page needs them.
 */
import { readFileSync } from 'node:fs';
import { dirname, join, posix } from 'node:path';
import { gzipSync } from 'node:zlib';
import { projectRoot } from '../../../scripts/lib/project-root';

export const clientDir = join(projectRoot, 'dist', 'client');

/** Static `import … from "x"`, `import "x"` and `export … from "x"`; never `import("x")`. */
const STATIC_IMPORT = /(?:\bimport|\bexport)\s*(?:[\w$*{}\s,]+?\s*from\s*)?["'`](\.{1,2}\/[^"'`]+?\.js)["'`]/g;

export function staticImportsOf(file: string): string[] {
  const code = readFileSync(file, 'utf8');
  return [...code.matchAll(STATIC_IMPORT)].map((match) => join(dirname(file), match[1]));
}

function entryScripts(html: string): string[] {
  const sources = [...html.matchAll(/<script[^>]*type="module"[^>]*src="([^"]+)"/g), ...html.matchAll(/<link[^>]*rel="modulepreload"[^>]*href="([^"]+)"/g)].map((m) => m[1]);
  return sources.map((src) => join(clientDir, posix.normalize(src).replace(/^\//, '')));
}

export function firstLoadGraph(): Set<string> {
  const html = readFileSync(join(clientDir, 'index.html'), 'utf8');
  const seen = new Set<string>();
  const queue = entryScripts(html);
  while (queue.length > 0) {
    const file = queue.pop()!;
    if (seen.has(file)) continue;
    seen.add(file);
    queue.push(...staticImportsOf(file));
  }
  return seen;
}

/** gzip size (zlib default level, as a web server would send it) of each file. */
export function gzipSizes(files: Iterable<string>): Array<{ file: string; gzip: number }> {
  return [...files].map((file) => ({ file: file.slice(clientDir.length + 1), gzip: gzipSync(readFileSync(file)).length }));
}
