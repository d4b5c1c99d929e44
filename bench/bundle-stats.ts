/**
 * Reads a production build's route bundle stats (`<distDir>/diagnostics/route-bundle-stats.json`,
 * written by `next build`; Next 16 no longer prints first-load sizes) and gzips chunks the way the
 * server does (zlib's default level). Benchmark code only.
 */
import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';
import { round } from './stats';

interface RouteStat {
  route: string;
  firstLoadUncompressedJsBytes: number;
  firstLoadChunkPaths: string[];
}

/** Route → its first-load chunk paths (relative to the project folder, as Next writes them). */
export function routeChunks(distDir: string): Record<string, string[]> {
  const file = path.join(distDir, 'diagnostics', 'route-bundle-stats.json');
  const stats = JSON.parse(fs.readFileSync(file, 'utf8')) as RouteStat[];
  return Object.fromEntries(stats.map((s) => [s.route, s.firstLoadChunkPaths]));
}

const gzCache = new Map<string, number>();

/** Gzipped bytes of one file (cached by path: chunk names carry their content hash). */
export function gzipBytes(file: string): number {
  let n = gzCache.get(file);
  if (n === undefined) {
    n = zlib.gzipSync(fs.readFileSync(file)).length;
    gzCache.set(file, n);
  }
  return n;
}

export function gzipKb(files: string[]): number {
  return round(files.reduce((sum, f) => sum + gzipBytes(f), 0) / 1024, 1);
}
