import { checkBriefValue, readBrief, withPositions } from '../brief/resolve.js';
import type { ResolvedBrief } from '../brief/types.js';
import { checkBriefRules } from '../choose/checks.js';
import { choose } from '../choose/choose.js';
import type { Choice, Decision } from '../choose/types.js';
import { deriveBars } from '../derive/bars.js';
import { diagnostic, hasErrors, inFile, type Diagnostic } from '../diagnostics/diagnostic.js';
import { inferFields } from '../fields/infer.js';
import { FORMS } from '../forms/registry.js';
import type { Scene } from '../scene/types.js';
import { writeSvg } from '../svg/write.js';
import { readTable } from '../table/load.js';
import type { RenderEnv } from './env.js';

/** One render: a brief as text or value, where it lives, and how strict to be. */
export interface RenderRequest {
  /** Brief text (JSON or YAML), or a brief object. */
  brief: string | Record<string, unknown>;
  /** Path of the brief file: data and style paths in it are relative to this. Default: none. */
  file?: string;
  /** Rows to chart when the brief names no data (library use). Default: none. */
  rows?: Record<string, unknown>[];
  /** Draw the nearest honest form, with a warning, instead of failing on a broken hard rule. Default: false. */
  lenient?: boolean;
  /** Treat warnings as errors. Default: false. */
  strict?: boolean;
  /**
   * A clock in milliseconds, to time each stage (the CLI's --timings). Only measured, never
   * used for output. Default: none (no timings).
   */
  clock?: () => number;
}

/** How long one stage took. */
export interface StageTiming {
  stage: string;
  ms: number;
}

/** What a render produced: the SVG and scene when it succeeded, and always the reasons and diagnostics. */
export interface RenderResult {
  ok: boolean;
  brief?: ResolvedBrief;
  choice?: Choice;
  scene?: Scene;
  /** SVG with live text: selectable, searchable, accessible. */
  svg?: string;
  rationale: Decision[];
  diagnostics: Diagnostic[];
  /** Per-stage times, when the request gave a clock. */
  timings?: StageTiming[];
}

function strictly(diagnostics: Diagnostic[], strict: boolean | undefined): Diagnostic[] {
  if (!strict) return diagnostics;
  return diagnostics.map((d) => (d.severity === 'warning' ? { ...d, severity: 'error', message: `${d.message} (a warning, raised to an error by --strict)` } : d));
}

function briefStage(req: RenderRequest) {
  if (typeof req.brief === 'string') return readBrief(req.brief);
  const value = req.rows && req.brief.data === undefined && req.brief.rows === undefined ? { ...req.brief, rows: req.rows } : req.brief;
  return checkBriefValue(value);
}

/**
 * Runs the stages from brief to SVG: brief → table → fields → choice → derived → scene → svg.
 * Never throws for bad input: every problem is a diagnostic on the result.
 */
export async function renderBrief(req: RenderRequest, env: RenderEnv): Promise<RenderResult> {
  const all: Diagnostic[] = [];
  const timings: StageTiming[] = [];
  let last = req.clock?.() ?? 0;
  const lap = (stage: string) => {
    if (!req.clock) return;
    const now = req.clock();
    timings.push({ stage, ms: now - last });
    last = now;
  };
  const done = (extra: Partial<RenderResult> = {}): RenderResult => {
    const diagnostics = strictly(all, req.strict);
    return { ok: !hasErrors(diagnostics) && extra.svg !== undefined, rationale: [], ...extra, diagnostics, ...(req.clock ? { timings } : {}) };
  };
  const briefOutcome = briefStage(req);
  all.push(...inFile(briefOutcome.diagnostics, req.file));
  lap('brief');
  if (!briefOutcome.ok) return done();
  const { brief, parsed } = briefOutcome.value;
  const locate = (ds: Diagnostic[]) => inFile(withPositions(ds, parsed), req.file);
  // When the data cannot be charted, the rules that need only the brief are still reported.
  const earlyRules = () => locate(checkBriefRules(brief, req.lenient ?? false).problems);
  const style = env.style(brief.style, req.file);
  all.push(...locate(style.diagnostics));
  const table = await readTable(brief.data, brief.fields, req.file, env.table);
  all.push(...locate(table.diagnostics));
  lap('table');
  if (!style.ok || !table.ok) { all.push(...earlyRules()); return done({ brief }); }
  const fields = inferFields(table.value, brief);
  all.push(...locate(fields.diagnostics));
  lap('fields');
  if (!fields.ok) { all.push(...earlyRules()); return done({ brief }); }
  const choice = choose(fields.value, brief, { style: style.value, measure: env.measure, lenient: req.lenient ?? false });
  all.push(...locate(choice.diagnostics));
  lap('choose');
  if (!choice.ok) return done({ brief });
  const rationale = choice.value.rationale;
  const derived = deriveBars(table.value, choice.value.bar);
  all.push(...locate(derived.diagnostics));
  lap('derive');
  if (!derived.ok) return done({ brief, choice: choice.value, rationale });
  const laid = FORMS.bar.layout(derived.value, { brief, style: style.value, measure: env.measure });
  all.push(...locate(laid.diagnostics));
  lap('layout');
  if (hasErrors(strictly(all, req.strict))) return done({ brief, choice: choice.value, rationale, scene: laid.scene });
  try {
    const svg = writeSvg(laid.scene, { kind: 'live', family: style.value.font.family });
    lap('svg');
    return done({ brief, choice: choice.value, rationale, scene: laid.scene, svg });
  } catch (e) {
    // fmt refuses non-finite and absurd coordinates: a layout defect, reported, never written.
    if (!(e instanceof RangeError)) throw e;
    all.push(diagnostic('render.internal', `the layout produced a bad coordinate (${e.message}); this is a defect in chartwright`, { file: req.file, hint: 'please report it with the brief and data' }));
    return done({ brief, choice: choice.value, rationale, scene: laid.scene });
  }
}

/** The SVG of a scene with text as glyph outlines, as the raster stage draws it. */
export function outlineSvg(scene: Scene, env: RenderEnv): string {
  return writeSvg(scene, { kind: 'outlines', set: env.outlines(), measure: env.measure });
}
