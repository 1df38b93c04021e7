import { readFile } from 'node:fs/promises';
import { basename, extname, join, resolve } from 'node:path';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import type { RenderEnv } from '../pipeline/env.js';
import { outlineSvg, renderBrief, type RenderResult, type StageTiming } from '../pipeline/render.js';
import { rasterize } from '../raster/rasterize.js';
import { dumpScene } from '../scene/dump.js';
import type { Scene } from '../scene/types.js';
import { plannedOutputs, writeAtomic, type PlannedFile } from './outputs.js';

/** Options shared by render and demo. */
export interface BatchOptions {
  outDir?: string;
  png: boolean;
  scale: number;
  /** A file (one brief) or a folder (several) for scene dumps. */
  scene?: string;
  strict: boolean;
  lenient: boolean;
  debug: boolean;
  /** Distinguishes this process's temporary files from another's writing the same folder. */
  tempTag: string;
  /** Write the SVG file with text as glyph outlines, for viewers without the font (--outline-text). */
  outlineText: boolean;
  /** When given, each stage is timed with it (--timings). */
  clock?: () => number;
}

/** What happened to one brief. */
export interface BriefReport {
  brief: string;
  ok: boolean;
  written: string[];
  diagnostics: Diagnostic[];
  /** Per-stage times, with --timings. */
  timings?: StageTiming[];
}

/** Reads a brief file and renders it; a missing file or unexpected failure becomes a diagnostic. */
export async function renderFile(file: string, env: RenderEnv, opts: Pick<BatchOptions, 'strict' | 'lenient' | 'debug' | 'clock'>): Promise<RenderResult> {
  let text: string;
  try {
    text = await readFile(file, 'utf8');
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    return { ok: false, rationale: [], diagnostics: [diagnostic('brief.not-found', code === 'ENOENT' ? 'the brief file does not exist' : `the brief file cannot be read (${code})`, { file, hint: 'check the path; briefs are .yaml, .yml or .json files' })] };
  }
  try {
    return await renderBrief({ brief: text, file, strict: opts.strict, lenient: opts.lenient, clock: opts.clock }, env);
  } catch (e) {
    const detail = opts.debug ? `\n${(e as Error).stack}` : '';
    return { ok: false, rationale: [], diagnostics: [diagnostic('render.internal', `chartwright failed unexpectedly: ${(e as Error).message}${detail}`, { file, hint: 'rerun with --debug and report it with the brief and data' })] };
  }
}

function sceneTarget(scene: string | undefined, brief: string, many: boolean, cwd: string): string | undefined {
  if (!scene) return undefined;
  if (!many) return resolve(cwd, scene);
  return join(resolve(cwd, scene), `${basename(brief, extname(brief))}.scene.json`);
}

/** Yields to the event loop so resvg's native memory is reclaimed between renders (a tight loop grows it fast). */
const breathe = () => new Promise<void>((r) => setImmediate(r));

/** The bytes of each planned file; a PNG is drawn from the outline SVG, written once and reused. */
async function produceFiles(result: RenderResult & { svg: string; scene: Scene }, planned: PlannedFile[], env: RenderEnv, opts: BatchOptions, report: BriefReport): Promise<{ path: string; data: string | Buffer }[]> {
  let outlines: string | undefined;
  const outlined = () => (outlines ??= outlineSvg(result.scene, env));
  const files: { path: string; data: string | Buffer }[] = [];
  for (const p of planned) {
    if (p.kind === 'svg') {
      files.push({ path: p.path, data: opts.outlineText ? outlined() : result.svg });
      continue;
    }
    const started = opts.clock?.();
    files.push({ path: p.path, data: rasterize(outlined(), { scale: opts.scale, fontFiles: [] }) });
    if (started !== undefined) report.timings?.push({ stage: 'png', ms: opts.clock!() - started });
    await breathe();
  }
  return files;
}

/**
 * Renders briefs one after another. Each brief's files are all produced in memory first and
 * written only if it succeeded, atomically; one bad brief never stops the others.
 */
export async function renderBatch(files: string[], env: RenderEnv, opts: BatchOptions, cwd: string, onBrief?: (done: number, total: number, file: string) => void): Promise<BriefReport[]> {
  const reports: BriefReport[] = [];
  for (const [i, file] of files.entries()) {
    onBrief?.(i, files.length, file);
    const result = await renderFile(file, env, opts);
    const report: BriefReport = { brief: file, ok: result.ok, written: [], diagnostics: result.diagnostics, ...(result.timings ? { timings: result.timings } : {}) };
    reports.push(report);
    if (!result.ok || result.svg === undefined || !result.scene || !result.brief) continue;
    let contents: { path: string; data: string | Buffer }[];
    try {
      contents = await produceFiles({ ...result, svg: result.svg, scene: result.scene }, plannedOutputs(file, result.brief.output, opts.outDir, opts.png), env, opts, report);
    } catch (e) {
      report.ok = false;
      report.diagnostics.push(diagnostic('output.raster-failed', `could not draw the PNG: ${(e as Error).message}`, { file, hint: 'rerun with --debug and report it with the brief and data' }));
      continue;
    }
    const scenePath = sceneTarget(opts.scene, file, files.length > 1, cwd);
    if (scenePath) contents.push({ path: scenePath, data: `${JSON.stringify(dumpScene(result.scene), null, 2)}\n` });
    try {
      for (const c of contents) {
        await writeAtomic(c.path, c.data, opts.tempTag);
        report.written.push(c.path);
      }
    } catch (e) {
      report.ok = false;
      report.diagnostics.push(diagnostic('output.write-failed', `could not write the output: ${(e as Error).message}`, { file, hint: 'check that the output folder is writable' }));
    }
  }
  return reports;
}
