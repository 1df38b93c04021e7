import { readdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { CliIo } from '../../src/cli/io.js';
import { tempDir } from '../helpers.js';

/** A CLI io over captured streams, a fake clock (1.5 ms per reading), and no colour. */
export function io(cwd: string) {
  const out: string[] = [];
  const err: string[] = [];
  let now = 0;
  const value: CliIo = { stdout: (s) => out.push(s), stderr: (s) => err.push(s), cwd, env: {}, isTTY: false, pid: 4242, clock: () => (now += 1.5) };
  return { io: value, out: () => out.join(''), err: () => err.join(''), chunks: { out, err } };
}

/** A folder with a data file and briefs: piers.yaml (clean), typo.yaml (an error), warn.yaml (a warning). */
export function workspace(): string {
  const dir = tempDir();
  writeFileSync(join(dir, 'piers.csv'), 'pier,crossings\nNorth,212\nSouth,64\nEast,131\n');
  writeFileSync(join(dir, 'piers.yaml'), 'data: piers.csv\nintent: compare\nkeys: pier\nvalues: crossings\ntitle: Piers\nfields: { crossings: { unit: crossings } }\n');
  writeFileSync(join(dir, 'typo.yaml'), 'data: piers.csv\nintent: compare\nkeys: pier\nvalues: crossing\n');
  writeFileSync(join(dir, 'warn.yaml'), 'data: gaps.csv\nintent: compare\nkeys: pier\nvalues: crossings\nfields: { crossings: { unit: crossings } }\n');
  writeFileSync(join(dir, 'gaps.csv'), 'pier,crossings\nNorth,212\nSouth,NA\n');
  return dir;
}

/** A brief over piers.csv with extra YAML lines. */
export const pierBrief = (extra = '') => `data: piers.csv\nintent: compare\nkeys: pier\nvalues: crossings\nfields: { crossings: { unit: crossings } }\n${extra}`;

/** A folder's entries, sorted. */
export const files = (dir: string) => readdirSync(dir).sort();
