import { existsSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

/**
 * The folder of chartwright's package.json, found by walking up from this module: the same
 * answer from src/ (tests), dist/ (the bundle) and an installed package.
 */
export function packageRoot(from: string = fileURLToPath(import.meta.url)): string {
  let dir = dirname(from);
  for (;;) {
    const candidate = join(dir, 'package.json');
    if (existsSync(candidate) && (JSON.parse(readFileSync(candidate, 'utf8')) as { name?: string }).name === 'chartwright') return dir;
    const parent = dirname(dir);
    if (parent === dir) throw new Error('chartwright: cannot find its own package.json');
    dir = parent;
  }
}
