import { closeSync, openSync, readSync } from 'node:fs';

/** A file's text, or word that it is longer than the limit. */
export type BoundedText = { ok: true; text: string } | { ok: false; tooLarge: true };

/**
 * Reads a file as UTF-8, but never more than `limit` + 1 bytes: a `/dev/zero` or a runaway file
 * is stopped at the limit instead of being read into memory. Errors opening or reading the file
 * (ENOENT, EACCES, EISDIR …) are thrown as Node's errors.
 */
export function readBounded(path: string, limit: number): BoundedText {
  const fd = openSync(path, 'r');
  try {
    const bytes = readUpTo(fd, limit + 1);
    if (bytes.length > limit) return { ok: false, tooLarge: true };
    return { ok: true, text: bytes.toString('utf8') };
  } finally {
    closeSync(fd);
  }
}

/** At most `limit` bytes of an open file, read from its current position until its end. */
export function readUpTo(fd: number, limit: number): Buffer {
  const buffer = Buffer.allocUnsafe(Math.max(0, Math.min(limit, 64 * 1024)));
  const chunks: Buffer[] = [];
  let total = 0;
  while (total < limit) {
    const n = readSync(fd, buffer, 0, Math.min(buffer.length, limit - total), null);
    if (n === 0) break;
    chunks.push(Buffer.from(buffer.subarray(0, n)));
    total += n;
  }
  return Buffer.concat(chunks, total);
}

/** Input size limits, in bytes, and the environment variables that raise them. */
export const INPUT_LIMITS = {
  brief: { bytes: 1024 * 1024, variable: 'CHARTWRIGHT_MAX_BRIEF_BYTES' },
  style: { bytes: 256 * 1024, variable: 'CHARTWRIGHT_MAX_STYLE_BYTES' },
} as const;

/** A limit from its environment variable when that holds a positive integer, else the default. */
export function inputLimit(kind: keyof typeof INPUT_LIMITS, env: Record<string, string | undefined>): number {
  const raw = env[INPUT_LIMITS[kind].variable];
  const n = raw === undefined ? NaN : Number(raw);
  return Number.isSafeInteger(n) && n > 0 ? n : INPUT_LIMITS[kind].bytes;
}

/** "1 MiB", "256 KiB", "1500 bytes": a limit as people read it. */
export function describeBytes(bytes: number): string {
  if (bytes % (1024 * 1024) === 0) return `${bytes / (1024 * 1024)} MiB`;
  if (bytes % 1024 === 0) return `${bytes / 1024} KiB`;
  return `${bytes} bytes`;
}
