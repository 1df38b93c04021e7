import { DOMParser } from '@xmldom/xmldom';
import { mkdtempSync, readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { parse as parseYaml } from 'yaml';
import { createNodeEnv } from '../src/io/node-env.js';
import { packageRoot } from '../src/io/package-root.js';
import type { RenderEnv } from '../src/pipeline/env.js';
import { renderBrief, type RenderRequest, type RenderResult } from '../src/pipeline/render.js';
import { dumpScene, type SceneDump } from '../src/scene/dump.js';
import type { TableEnv } from '../src/table/load.js';

/** One environment for the whole test file: fonts and styles read once. */
export const env: RenderEnv = createNodeEnv();
export const root = packageRoot();

/**
 * A table env over in-memory files, for table-stage tests. Text is stored as UTF-8; give bytes
 * for other encodings. Like the Node env, it returns at most the bytes asked for.
 */
export function memoryFiles(files: Record<string, string | Uint8Array>, stdin: string | Uint8Array = '', maxDataBytes?: number): TableEnv {
  const bytes = (v: string | Uint8Array) => (typeof v === 'string' ? new TextEncoder().encode(v) : v);
  return {
    readBytes: async (p, limit) => {
      const key = Object.keys(files).find((k) => p === k || p.endsWith(`/${k}`));
      if (key === undefined) throw Object.assign(new Error(`ENOENT: ${p}`), { code: 'ENOENT' });
      return bytes(files[key]!).subarray(0, limit);
    },
    readStdin: async (limit) => bytes(stdin).subarray(0, limit),
    ...(maxDataBytes === undefined ? {} : { maxDataBytes }),
  };
}

/** Text as UTF-16 bytes with a byte-order mark, little- or big-endian, as some spreadsheets export it. */
export function utf16Bytes(text: string, bigEndian: boolean): Uint8Array {
  const out = new Uint8Array(2 + text.length * 2);
  out.set(bigEndian ? [0xfe, 0xff] : [0xff, 0xfe]);
  for (let i = 0; i < text.length; i++) {
    const unit = text.charCodeAt(i);
    out[2 + 2 * i + (bigEndian ? 0 : 1)] = unit >> 8;
    out[2 + 2 * i + (bigEndian ? 1 : 0)] = unit & 0xff;
  }
  return out;
}

/** Renders a brief object (YAML text or object) with inline rows through the whole pipeline. */
export async function renderRows(brief: Record<string, unknown>, rows: Record<string, unknown>[], opts: Omit<RenderRequest, 'brief' | 'rows'> = {}): Promise<RenderResult> {
  return renderBrief({ brief: { ...brief, rows }, ...opts }, env);
}

/** The codes of a result's diagnostics, in order. */
export function codes(result: { diagnostics: { code: string }[] }): string[] {
  return result.diagnostics.map((d) => d.code);
}

/** The demo briefs shipped in demo-data/. */
export function demoBriefs(): string[] {
  const dir = join(root, 'demo-data');
  return readdirSync(dir).filter((f) => f.endsWith('.yaml')).sort().map((f) => join(dir, f));
}

/** Renders a demo brief file and dumps its scene. */
export async function renderDemo(file: string, opts: { data?: boolean } = {}): Promise<{ result: RenderResult; dump: SceneDump }> {
  const { readFileSync } = await import('node:fs');
  const result = await renderBrief({ brief: readFileSync(file, 'utf8'), file, ...opts }, env);
  if (!result.ok || !result.scene) throw new Error(`demo ${file} failed: ${JSON.stringify(result.diagnostics)}`);
  return { result, dump: dumpScene(result.scene) };
}

/** A fresh temporary folder. */
export function tempDir(): string {
  return mkdtempSync(join(tmpdir(), 'chartwright-test-'));
}

/** Parses YAML (for building briefs in tests). */
export const yaml = (text: string) => parseYaml(text) as Record<string, unknown>;

/** Parses SVG as XML, failing on any parser error or warning. */
export function parseXml(svg: string): Document {
  const problems: string[] = [];
  const doc = new DOMParser({ onError: (level, msg) => { problems.push(`${level}: ${msg}`); } }).parseFromString(svg, 'image/svg+xml');
  if (problems.length) throw new Error(problems.join('\n'));
  return doc as unknown as Document;
}

/** Runs for a property test, scaled by FC_SCALE for deeper local exploration. */
export function runs(n: number): number {
  return Math.round(n * (Number(process.env.FC_SCALE) || 1));
}

/** Asserts no attribute of the SVG holds NaN, Infinity or undefined (text content may: a pier can be named "Infinity"). */
export function expectFiniteAttributes(svg: string): void {
  const bad = svg.match(/\s[a-z-]+="[^"]*\b(NaN|Infinity|undefined)\b[^"]*"/);
  if (bad) throw new Error(`non-finite attribute in SVG: ${bad[0]}`);
}
