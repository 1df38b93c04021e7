import type { Locale } from '../brief/types.js';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import type { RenderEnv } from '../pipeline/env.js';
import { outlineSvg, renderBrief, type RenderResult, type StageTiming } from '../pipeline/render.js';
import { rasterize } from '../raster/rasterize.js';
import { drawnData } from '../scene/data-table.js';
import { dumpScene } from '../scene/dump.js';
import { tableCsv } from './data-csv.js';
import type { Scene } from '../scene/types.js';
import type { TextModeName } from '../style/types.js';
import { readBriefFile, type BriefSource } from './briefs.js';
import { createCommitter, type FileContent, type Housekeeping, type OutputFs } from './commit.js';
import { pngSizeProblem } from './png-size.js';
import { planRun, type BriefPlan, type PlanOptions } from './plan.js';

/** Options shared by render and demo. */
export interface BatchOptions extends PlanOptions {
  scale: number;
  strict: boolean;
  lenient: boolean;
  debug: boolean;
  /** Writes every brief's numbers and dates in this locale, whatever the brief says (--locale). Default: the brief's. */
  locale?: Locale;
  /** Names this process's temporary files (its pid), apart from another's writing the same folder. */
  tempTag: string;
  /** Write the SVG file with text as glyph outlines, for viewers without the font (--outline-text; the same as textMode outline). */
  outlineText: boolean;
  /** How the SVG writes its text (--text). Default: the style's, else embed. */
  textMode?: TextModeName;
  /** Starts every id in each SVG (--id-prefix). Default: a hash of each chart's words. */
  idPrefix?: string;
  /** When given, each stage is timed with it (--timings). */
  clock?: () => number;
  /** The file system outputs are written through. Default: the real one. */
  fs?: OutputFs;
  /** To judge stale temporaries. Default: no process is known gone; ages by the wall clock. */
  housekeeping?: Housekeeping;
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

/** What rendering one brief file needs of the batch options. */
type RenderFileOptions = Pick<BatchOptions, 'strict' | 'lenient' | 'debug' | 'clock' | 'maxBriefBytes' | 'style' | 'locale'> & Partial<Pick<BatchOptions, 'outlineText' | 'textMode' | 'idPrefix' | 'data'>>;

/**
 * Reads a brief file and renders it; a missing file or unexpected failure becomes a diagnostic.
 * A brief already read and parsed (when its outputs were planned) is rendered as it was read.
 */
export async function renderFile(file: string, env: RenderEnv, opts: RenderFileOptions, source?: BriefSource): Promise<RenderResult> {
  const read = source ?? readBriefFile(file, opts.maxBriefBytes);
  if ('problem' in read) return { ok: false, rationale: [], diagnostics: [read.problem] };
  const textMode = opts.textMode ?? (opts.outlineText ? 'outline' : undefined);
  try {
    return await renderBrief({ brief: read.text, ...(source ? { parsed: source.parsed } : {}), file, strict: opts.strict, lenient: opts.lenient, clock: opts.clock, ...(textMode ? { textMode } : {}), ...(opts.idPrefix !== undefined ? { idPrefix: opts.idPrefix } : {}), ...(opts.style !== undefined ? { style: opts.style } : {}), ...(opts.locale ? { locale: opts.locale } : {}), ...(opts.data ? { data: true } : {}) }, env);
  } catch (e) {
    const detail = opts.debug ? `\n${(e as Error).stack}` : '';
    return { ok: false, rationale: [], diagnostics: [diagnostic('render.internal', `chartwright failed unexpectedly: ${(e as Error).message}${detail}`, { file, hint: 'rerun with --debug and report it with the brief and data' })] };
  }
}

/** Renders a planned brief without writing: its own diagnostics, then the problems with where it would write. */
export async function renderPlan(plan: BriefPlan, env: RenderEnv, opts: RenderFileOptions): Promise<RenderResult> {
  if (plan.failed) return { ok: false, rationale: [], diagnostics: [plan.failed] };
  const result = await renderFile(plan.file, env, opts, plan.source);
  if (!plan.problems.length) return result;
  return { ...result, ok: false, diagnostics: [...result.diagnostics, ...plan.problems] };
}

/** Yields to the event loop so resvg's native memory is reclaimed between renders (a tight loop grows it fast). */
const breathe = () => new Promise<void>((r) => setImmediate(r));

/** The bytes of each planned file; a PNG is drawn from an outline SVG (whatever the SVG file's text mode), made once and reused. */
async function produceFiles(result: RenderResult & { svg: string; scene: Scene }, plan: BriefPlan, env: RenderEnv, opts: BatchOptions, report: BriefReport): Promise<FileContent[]> {
  let outlines: string | undefined;
  const outlined = () => (outlines ??= outlineSvg(result.scene, env, result.style));
  const files: FileContent[] = [];
  for (const p of plan.files) {
    // The SVG's text mode (--text, --outline-text) was applied by the render.
    if (p.kind === 'svg') files.push({ path: p.path, data: result.svg });
    if (p.kind === 'scene') files.push({ path: p.path, data: `${JSON.stringify(dumpScene(result.scene), null, 2)}\n` });
    if (p.kind === 'alt') files.push({ path: p.path, data: `${result.scene.alt ?? result.scene.description}\n` });
    if (p.kind === 'data') files.push({ path: p.path, data: tableCsv(drawnData(result.scene)) });
    if (p.kind !== 'png') continue;
    const started = opts.clock?.();
    files.push({ path: p.path, data: rasterize(outlined(), { scale: opts.scale, fontFiles: [] }) });
    if (started !== undefined) report.timings?.push({ stage: 'png', ms: opts.clock!() - started });
    await breathe();
  }
  return files;
}

type Commit = (files: FileContent[]) => Promise<void>;

/** Renders one planned brief and, when it succeeded, commits all its files together. */
async function renderAndWrite(plan: BriefPlan, env: RenderEnv, opts: BatchOptions, commit: Commit): Promise<BriefReport> {
  const result = await renderPlan(plan, env, opts);
  const report: BriefReport = { brief: plan.file, ok: result.ok, written: [], diagnostics: result.diagnostics, ...(result.timings ? { timings: result.timings } : {}) };
  if (!result.ok || result.svg === undefined || !result.scene) return report;
  const tooBig = plan.files.some((f) => f.kind === 'png') ? pngSizeProblem(result.scene.width, result.scene.height, opts.scale, plan.file) : undefined;
  if (tooBig) return { ...report, ok: false, diagnostics: [...report.diagnostics, tooBig] };
  let contents: FileContent[];
  try {
    contents = await produceFiles({ ...result, svg: result.svg, scene: result.scene }, plan, env, opts, report);
  } catch (e) {
    report.diagnostics.push(diagnostic('output.raster-failed', `could not draw the PNG: ${(e as Error).message}`, { file: plan.file, hint: 'rerun with --debug and report it with the brief and data' }));
    return { ...report, ok: false };
  }
  try {
    await commit(contents);
    report.written = contents.map((c) => c.path);
  } catch (e) {
    report.diagnostics.push(diagnostic('output.write-failed', `could not write the output, so none of this brief's files were written: ${(e as Error).message}`, { file: plan.file, hint: 'check that the output folder is writable and has space' }));
    report.ok = false;
  }
  return report;
}

/** Called as a batch goes: before each brief, and with each brief's report as it finishes. */
export interface BatchHooks {
  start?(done: number, total: number, file: string): void;
  finish?(report: BriefReport): void;
}

/**
 * Renders planned briefs one after another. Each brief's files are all produced in memory
 * first and committed together only if it succeeded; one bad brief never stops the others.
 */
export async function renderPlanned(plans: BriefPlan[], env: RenderEnv, opts: BatchOptions, hooks: BatchHooks = {}): Promise<BriefReport[]> {
  const world = opts.housekeeping ?? { alive: () => true, now: () => Date.now() };
  const commit = createCommitter(opts.tempTag, world, opts.fs);
  const reports: BriefReport[] = [];
  for (const [i, plan] of plans.entries()) {
    hooks.start?.(i, plans.length, plan.file);
    const report = await renderAndWrite(plan, env, opts, commit);
    reports.push(report);
    hooks.finish?.(report);
  }
  return reports;
}

/** Plans and renders brief files (the library-level batch; the CLI also checks its run report's path). */
export async function renderBatch(files: string[], env: RenderEnv, opts: BatchOptions, cwd: string, hooks: BatchHooks = {}): Promise<BriefReport[]> {
  return renderPlanned(planRun(files.map((file) => ({ file })), opts, cwd).plans, env, opts, hooks);
}
