import { mkdir, rename, rm, writeFile } from 'node:fs/promises';
import { basename, dirname, extname, join } from 'node:path';

/** A file to write: where, and what. */
export interface PlannedFile {
  path: string;
  kind: 'svg' | 'png' | 'scene';
}

/**
 * The files one brief renders to. The brief's `output` names them (relative to the brief, or
 * to `outDir`); by default the brief's own name with .svg. The SVG is always written; a .png
 * output or `png` adds the PNG beside it under the same name.
 */
export function plannedOutputs(briefFile: string, outputs: string[], outDir: string | undefined, png: boolean): PlannedFile[] {
  const base = outDir ?? dirname(briefFile);
  const names = outputs.length ? outputs : [`${basename(briefFile, extname(briefFile))}.svg`];
  const files = new Map<string, PlannedFile>();
  for (const name of names) {
    const path = join(base, name);
    const stem = path.slice(0, path.length - extname(path).length);
    const ext = extname(path).toLowerCase();
    files.set(`${stem}.svg`, { path: `${stem}.svg`, kind: 'svg' });
    if (ext === '.png' || png) files.set(`${stem}.png`, { path: `${stem}.png`, kind: 'png' });
  }
  return [...files.values()];
}

/** Writes a file atomically: to a temporary name beside it, then renamed into place. */
export async function writeAtomic(path: string, content: string | Buffer, tag: string): Promise<void> {
  await mkdir(dirname(path), { recursive: true });
  const temp = `${path}.${tag}.tmp`;
  try {
    await writeFile(temp, content);
    await rename(temp, path);
  } catch (e) {
    await rm(temp, { force: true });
    throw e;
  }
}
