import { basename, dirname, extname, isAbsolute, join, relative, resolve } from 'node:path';
import { readBrief, withPositions } from '../brief/resolve.js';
import type { ResolvedBrief } from '../brief/types.js';
import { diagnostic, inFile, type Diagnostic } from '../diagnostics/diagnostic.js';
import { readBriefFile, type BriefEntry, type BriefSource } from './briefs.js';
import { canonicalPath, plannedOutputs, type OutputRules, type PlannedFile } from './outputs.js';

/** What a run will do with one brief, decided before anything is written. */
export interface BriefPlan {
  file: string;
  /** The files the brief writes when it renders cleanly (outputs and scene dump). */
  files: PlannedFile[];
  /** Problems with where it would write (names, containment, collisions): it is rendered, for its own diagnostics, but writes nothing. */
  problems: Diagnostic[];
  /** The files it reads (the brief, its data and style files): nothing in the run may overwrite them. */
  inputs: string[];
  /** Set when the entry is not a brief at all (an unreadable or empty folder): nothing to render. */
  failed?: Diagnostic;
  /**
   * The brief as read and parsed for planning, when it parsed: rendered from these, so the file
   * is read and parsed once and the outputs planned are those of the text rendered.
   */
  source?: BriefSource;
}

/** How a run writes. */
export interface PlanOptions extends OutputRules {
  /** A file (one brief) or a folder (several) for scene dumps. */
  scene?: string;
  /** The largest brief file read, in bytes. */
  maxBriefBytes?: number;
  /** A style preset or style file (absolute) for every brief, instead of each brief's `style:` (--style). */
  style?: string;
}

function inputsOf(file: string, brief: ResolvedBrief, styleOverride: string | undefined): string[] {
  const near = (p: string) => (isAbsolute(p) ? p : join(dirname(file), p));
  const inputs = [file];
  if (brief.data.kind === 'file') inputs.push(near(brief.data.path));
  const style = styleOverride ?? brief.style;
  if (style.includes('/') || style.endsWith('.json')) inputs.push(near(style));
  return inputs;
}

function sceneFile(scene: string, file: string, many: boolean, cwd: string): PlannedFile {
  const path = many ? join(resolve(cwd, scene), `${basename(file, extname(file))}.scene.json`) : resolve(cwd, scene);
  return { path, kind: 'scene' };
}

/** Plans one brief: reads and parses it to learn its outputs; a brief that cannot be read plans nothing (its render says why). */
function planBrief(entry: BriefEntry, many: boolean, opts: PlanOptions, cwd: string): BriefPlan {
  const file = entry.file;
  if (entry.problem) return { file, files: [], problems: [], inputs: [], failed: entry.problem };
  const read = readBriefFile(file, opts.maxBriefBytes);
  const parsed = 'text' in read ? readBrief(read.text) : undefined;
  if (!('text' in read) || !parsed?.ok) return { file, files: [], problems: [], inputs: [file] };
  const { brief } = parsed.value;
  const outputs = plannedOutputs(file, brief.output, opts);
  const files = opts.scene ? [...outputs.files, sceneFile(opts.scene, file, many, cwd)] : outputs.files;
  const source = { text: read.text, parsed: parsed.value.parsed };
  return { file, files, problems: inFile(withPositions(outputs.problems, parsed.value.parsed), file), inputs: inputsOf(file, brief, opts.style), source };
}

function collisionProblem(path: string, others: string[], cwd: string, file?: string): Diagnostic {
  const rel = relative(cwd, path) || path;
  const names = others.map((o) => `\`${relative(cwd, o) || o}\``).join(', ');
  return diagnostic('output.collision', `\`${rel}\` would be written twice in this run, also for ${names}`, { file, found: rel, hint: 'give each brief its own `output:` name (or its own --scene folder); nothing was written for these briefs' });
}

function overwriteProblem(path: string, owner: string, cwd: string, file?: string): Diagnostic {
  const rel = relative(cwd, path) || path;
  return diagnostic('output.overwrites-input', `\`${rel}\` is read by this run (a brief or data file of \`${relative(cwd, owner) || owner}\`) and would be overwritten`, { file, found: rel, hint: 'write outputs, --scene and --report to other names' });
}

/** Adds to each plan the collisions among the run's outputs and with its inputs. */
function findCollisions(plans: BriefPlan[], cwd: string): void {
  const claims = new Map<string, { plan: BriefPlan; path: string }[]>();
  for (const plan of plans) for (const f of plan.files) {
    const key = canonicalPath(f.path);
    claims.set(key, [...(claims.get(key) ?? []), { plan, path: f.path }]);
  }
  const inputs = new Map<string, string>();
  for (const plan of plans) for (const i of plan.inputs) inputs.set(canonicalPath(i), plan.file);
  for (const [key, claimants] of claims) {
    const owner = inputs.get(key);
    for (const [i, c] of claimants.entries()) {
      if (owner !== undefined) c.plan.problems.push(overwriteProblem(c.path, owner, cwd, c.plan.file));
      if (claimants.length < 2 || claimants.findIndex((o) => o.plan === c.plan) !== i) continue;
      const others = [...new Set(claimants.filter((o) => o.plan !== c.plan).map((o) => o.plan.file))];
      c.plan.problems.push(collisionProblem(c.path, others.length ? others : [c.plan.file], cwd, c.plan.file));
    }
  }
}

/** A problem with the run report's path: it may not be any file the run reads or writes. */
function reportProblem(report: string, plans: BriefPlan[], cwd: string): Diagnostic | undefined {
  const key = canonicalPath(report);
  const reader = plans.find((p) => p.inputs.some((i) => canonicalPath(i) === key));
  if (reader) return overwriteProblem(report, reader.file, cwd);
  const writer = plans.find((p) => p.files.some((f) => canonicalPath(f.path) === key));
  return writer ? collisionProblem(report, [writer.file], cwd) : undefined;
}

/**
 * Plans a run before anything is written: every brief's outputs, checked for names,
 * containment, and collisions with each other, the scene dumps, the run report and the run's
 * own inputs. Problems of one brief stay with it; a run report that would overwrite anything
 * is a problem of the whole run.
 */
export function planRun(entries: BriefEntry[], opts: PlanOptions, cwd: string, report?: string): { plans: BriefPlan[]; problems: Diagnostic[] } {
  const plans = entries.map((e) => planBrief(e, entries.length > 1, opts, cwd));
  findCollisions(plans, cwd);
  const problem = report === undefined ? undefined : reportProblem(resolve(cwd, report), plans, cwd);
  return { plans, problems: problem ? [problem] : [] };
}
