import { randomBytes } from 'node:crypto';
import { constants } from 'node:fs';
import { link, lstat, mkdir, open, readdir, rename, rm } from 'node:fs/promises';
import { dirname, join } from 'node:path';

/** The file operations a commit needs; tests inject failing ones (a full disk). */
export interface OutputFs {
  mkdir(dir: string): Promise<void>;
  /** Creates `path` exclusively (never an existing file, FIFO or link), writes `data` and syncs it to disk. */
  writeNew(path: string, data: string | Buffer): Promise<void>;
  rename(from: string, to: string): Promise<void>;
  remove(path: string): Promise<void>;
  list(dir: string): Promise<string[]>;
  /** Modification time in ms of a regular file (links and other kinds: undefined). */
  fileMtime(path: string): Promise<number | undefined>;
  /** What is at a path, without following a link. */
  kind(path: string): Promise<'none' | 'folder' | 'other'>;
  /** A second name (hard link) for an existing file, to restore it if a commit is rolled back. */
  link(existing: string, path: string): Promise<void>;
}

// O_EXCL: fail on anything already there, even a dangling link or a FIFO; O_NOFOLLOW also
// where the platform has it (not on Windows, where it is 0).
const CREATE_NEW = constants.O_WRONLY | constants.O_CREAT | constants.O_EXCL | (constants.O_NOFOLLOW ?? 0);

/** The real file system. */
export const nodeOutputFs: OutputFs = {
  mkdir: async (dir) => { await mkdir(dir, { recursive: true }); },
  async writeNew(path, data) {
    const handle = await open(path, CREATE_NEW, 0o666);
    try {
      await handle.writeFile(data);
      await handle.sync();
    } finally {
      await handle.close();
    }
  },
  rename: (from, to) => rename(from, to),
  remove: (path) => rm(path, { force: true }),
  list: (dir) => readdir(dir),
  async fileMtime(path) {
    const s = await lstat(path);
    return s.isFile() ? s.mtimeMs : undefined;
  },
  async kind(path) {
    try {
      return (await lstat(path)).isDirectory() ? 'folder' : 'other';
    } catch (e) {
      if ((e as NodeJS.ErrnoException).code === 'ENOENT') return 'none';
      throw e;
    }
  },
  link: (existing, path) => link(existing, path),
};

/**
 * chartwright's temporaries: `.chartwright-<owner>-<16 random hex>.tmp` beside the final file.
 * The owner is the writing process's id; the random part makes the name unpredictable, so no
 * link or FIFO can be planted in its place.
 */
export const TEMP_PATTERN = /^\.chartwright-(\w+)-[0-9a-f]{16}\.tmp$/;

/**
 * A temporary younger than this is never removed: its writer may still be renaming it (a
 * temporary lives only while its brief's files are written: well under a second, seconds for a
 * large PNG on a slow disk). It also covers a writer on another machine sharing the folder, whose
 * process id means nothing here.
 */
export const STALE_AFTER_MS = 10_000;
/** A temporary older than this is stale whoever owns it (its pid may have been reused). */
export const ABANDONED_AFTER_MS = 60 * 60_000;

/** What the sweep needs to know about the world. */
export interface Housekeeping {
  /** Whether a process id is running on this machine. */
  alive(pid: number): boolean;
  /** Wall-clock time in ms (to age temporaries). */
  now(): number;
}

/**
 * Whether a temporary is stale: a temporary lives only while its brief is committed (seconds),
 * so one at least 10 s old whose owning process is gone (kill -9), or any at least an hour
 * old, was left behind.
 */
export function isStale(name: string, ageMs: number, world: Housekeeping): boolean {
  const match = TEMP_PATTERN.exec(name);
  if (!match || ageMs < STALE_AFTER_MS) return false;
  const pid = /^\d+$/.test(match[1]!) ? Number(match[1]) : undefined;
  return ageMs >= ABANDONED_AFTER_MS || (pid !== undefined && !world.alive(pid));
}

/** Removes stale temporaries of chartwright's own naming from a folder; nothing else is touched. */
async function sweep(dir: string, fs: OutputFs, world: Housekeeping): Promise<void> {
  let names: string[];
  try { names = await fs.list(dir); } catch { return; }
  for (const name of names.filter((n) => TEMP_PATTERN.test(n))) {
    try {
      const mtime = await fs.fileMtime(join(dir, name));
      if (mtime !== undefined && isStale(name, world.now() - mtime, world)) await fs.remove(join(dir, name));
    } catch { /* gone already, or not ours to judge: leave it */ }
  }
}

/** A file to commit: where it goes, and its bytes. */
export interface FileContent {
  path: string;
  data: string | Buffer;
}

/** Writes one temporary; a half-written one is removed (but never a file that was there before: EEXIST). */
async function writeTemp(fs: OutputFs, temp: string, data: string | Buffer): Promise<void> {
  try {
    await fs.writeNew(temp, data);
  } catch (e) {
    if ((e as NodeJS.ErrnoException).code !== 'EEXIST') await fs.remove(temp).catch(() => {});
    throw e;
  }
}

const tempName = (dir: string, owner: string) => join(dir, `.chartwright-${owner}-${randomBytes(8).toString('hex')}.tmp`);

/** A hard link to the file a commit will replace, to put it back on a rollback; none where links fail. */
async function keepOld(path: string, backup: string, fs: OutputFs): Promise<string | undefined> {
  if ((await fs.kind(path)) === 'none') return undefined;
  try {
    await fs.link(path, backup);
    return backup;
  } catch {
    return undefined;
  }
}

interface Temp { temp: string; path: string }

/**
 * Renames complete temporaries into place. A folder in the way fails before anything is renamed;
 * should a rename still fail, the files already renamed are put back as they were (from hard
 * links kept for the purpose) or removed when they are new.
 */
async function publish(temps: Temp[], fs: OutputFs, owner: string): Promise<void> {
  for (const t of temps) {
    if ((await fs.kind(t.path)) === 'folder') throw Object.assign(new Error(`EISDIR: a folder is in the way of ${t.path}`), { code: 'EISDIR' });
  }
  const done: { path: string; backup?: string }[] = [];
  const backups: string[] = [];
  try {
    for (const t of temps) {
      const backup = await keepOld(t.path, tempName(dirname(t.path), owner), fs);
      if (backup) backups.push(backup);
      await fs.rename(t.temp, t.path);
      t.temp = '';
      done.push({ path: t.path, backup });
    }
  } catch (e) {
    for (const d of done.reverse()) await (d.backup ? fs.rename(d.backup, d.path) : fs.remove(d.path)).catch(() => {});
    throw e;
  } finally {
    await Promise.all(backups.map((b) => fs.remove(b).catch(() => {})));
  }
}

/**
 * Writes one brief's files all together or not at all: every file goes to a temporary first
 * (created exclusively, synced); only when all are complete are they renamed into place, and a
 * failed rename puts back what was there. On any failure the temporaries are removed, so no new
 * SVG is left beside a PNG that failed. The first write into a folder in a run sweeps that
 * folder's stale temporaries.
 */
export function createCommitter(owner: string, world: Housekeeping, fs: OutputFs = nodeOutputFs): (files: FileContent[]) => Promise<void> {
  const swept = new Set<string>();
  return async (files) => {
    const temps: Temp[] = [];
    try {
      for (const f of files) {
        const dir = dirname(f.path);
        await fs.mkdir(dir);
        if (!swept.has(dir)) { swept.add(dir); await sweep(dir, fs, world); }
        const temp = tempName(dir, owner);
        await writeTemp(fs, temp, f.data);
        temps.push({ temp, path: f.path });
      }
      await publish(temps, fs, owner);
    } catch (e) {
      await Promise.all(temps.filter((t) => t.temp).map((t) => fs.remove(t.temp).catch(() => {})));
      throw e;
    }
  };
}
