import { checkBriefValue, readBrief, withPositions } from '../brief/resolve.js';
import { capProblems } from '../brief/validate.js';
import type { ParsedBrief } from '../brief/parse.js';
import type { Locale, ResolvedBrief } from '../brief/types.js';
import { checkBriefRules } from '../choose/checks.js';
import { choose } from '../choose/choose.js';
import type { Choice, Decision } from '../choose/types.js';
import { diagnostic, hasErrors, inFile, type Diagnostic } from '../diagnostics/diagnostic.js';
import { inferFields } from '../fields/infer.js';
import type { TextMeasurer } from '../font/measurer.js';
import { FORMS, formNamed } from '../forms/registry.js';
import { layoutChart } from '../layout/chart.js';
import type { LayoutContext } from '../layout/kit-types.js';
import { idMaker } from '../scene/ids.js';
import type { Scene } from '../scene/types.js';
import { withStyleSize } from '../style/frame-size.js';
import type { Style, TextModeName } from '../style/types.js';
import { embeddedFonts } from '../svg/embed.js';
import { idPrefixProblem } from '../svg/id-prefix.js';
import { writeSvg, type SvgOptions, type TextMode } from '../svg/write.js';
import { readTable } from '../table/load.js';
import type { Table } from '../table/types.js';
import type { RenderEnv } from './env.js';
import { renderFacets } from './facets.js';
import { chartAlt } from './alt.js';
import { smallestFrame, withSmallestFrame, type FrameSize } from './smallest-frame.js';
import { VOCABULARY } from './vocabulary.js';

/** One render: a brief as text or value, where it lives, and how strict to be. */
export interface RenderRequest {
  /** Brief text (JSON or YAML), or a brief object. */
  brief: string | Record<string, unknown>;
  /**
   * The brief text already parsed, as `parseBriefText` gives it (the CLI parses a brief once to
   * plan its outputs). Only with a text brief. Default: the text is parsed here.
   */
  parsed?: ParsedBrief;
  /** Path of the brief file: data and style paths in it are relative to this. Default: none. */
  file?: string;
  /**
   * A style preset name or style file that replaces the brief's `style:` (the CLI's --style); a
   * relative path is taken from the working folder, as the caller resolved it. Default: the brief's.
   */
  style?: string;
  /** Rows to chart when the brief names no data (library use). Default: none. */
  rows?: Record<string, unknown>[];
  /** Draw the nearest honest form, with a warning, instead of failing on a broken hard rule. Default: false. */
  lenient?: boolean;
  /** Treat warnings as errors. Default: false. */
  strict?: boolean;
  /** Keep the form's own table of the numbers it draws on the scene (`scene.data`, for --data). Default: false. */
  data?: boolean;
  /** Write the chart's numbers and dates in this locale instead of the brief's `locale:` (the CLI's --locale). Default: the brief's. */
  locale?: Locale;
  /**
   * A clock in milliseconds, to time each stage (the CLI's --timings). Only measured, never
   * used for output. Default: none (no timings).
   */
  clock?: () => number;
  /**
   * How the SVG writes its text: `embed` (live text with the glyphs it uses embedded as WOFF2),
   * `outline` (glyph paths), `live` (live text in the style's family list). Default: the
   * style's `textMode`, else embed.
   */
  textMode?: TextModeName;
  /**
   * Starts every id in the SVG, so charts inlined in one HTML page never share one: a letter or
   * `_`, then letters, digits, `_`, `-`, `.`; at most 64 characters. Default: `cw` and a hash of
   * the chart's words.
   */
  idPrefix?: string;
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
  /** The SVG, its text as the request's text mode says (by default live text with its fonts embedded: selectable, searchable, accessible). */
  svg?: string;
  rationale: Decision[];
  diagnostics: Diagnostic[];
  /** Per-stage times, when the request gave a clock. */
  timings?: StageTiming[];
  /** The style the chart was drawn in (its fonts draw the outline SVG and the PNG). */
  style?: Style;
}

/** Everything a render reads from outside: the brief, its style and its table. */
export interface RenderInputs {
  brief: ResolvedBrief;
  parsed: ParsedBrief;
  style: Style;
  table: Table;
  /** Path of the brief file, for messages. */
  file?: string;
}

/** Per-stage timing with an injected clock (never read by rendering itself). */
function stopwatch(clock: (() => number) | undefined) {
  const timings: StageTiming[] = [];
  let last = clock?.() ?? 0;
  return {
    timings,
    lap(stage: string) {
      if (!clock) return;
      const now = clock();
      timings.push({ stage, ms: now - last });
      last = now;
    },
  };
}

function strictly(diagnostics: Diagnostic[], strict: boolean | undefined, accepted: ReadonlySet<string> = new Set()): Diagnostic[] {
  const seen = diagnostics.map((d) => (d.severity === 'warning' && accepted.has(d.code) ? { ...d, severity: 'info' as const, message: `${d.message} (accepted by the brief's \`accept:\`)` } : d));
  if (!strict) return seen;
  return seen.map((d) => (d.severity === 'warning' ? { ...d, severity: 'error', message: `${d.message} (a warning, raised to an error by --strict)` } : d));
}

function briefStage(req: RenderRequest) {
  if (typeof req.brief === 'string') return readBrief(req.brief, req.parsed, VOCABULARY);
  const value = req.rows && req.brief.data === undefined && req.brief.rows === undefined ? { ...req.brief, rows: req.rows } : req.brief;
  return checkBriefValue(value, undefined, VOCABULARY);
}

/**
 * Reads what a render needs from outside (the only I/O of a render): the brief, its style and its
 * table. When the data cannot be read, the rules that need only the brief are still reported.
 */
export async function loadInputs(req: RenderRequest, env: RenderEnv, lap: (stage: string) => void = () => {}): Promise<{ inputs?: RenderInputs; brief?: ResolvedBrief; diagnostics: Diagnostic[] }> {
  const briefOutcome = briefStage(req);
  const diagnostics = inFile(briefOutcome.diagnostics, req.file);
  lap('brief');
  if (!briefOutcome.ok) return { diagnostics };
  const { parsed } = briefOutcome.value;
  const base = req.locale ? { ...briefOutcome.value.brief, locale: req.locale } : briefOutcome.value.brief;
  const locate = (ds: Diagnostic[]) => inFile(withPositions(ds, parsed), req.file);
  const style = env.style(req.style ?? base.style, req.file);
  const stated = req.style === undefined ? base : { ...base, style: req.style };
  const brief = style.ok ? withStyleSize(stated, style.value) : stated;
  // A style named on the command line is not in the brief: its problems point at no line of it.
  diagnostics.push(...(req.style === undefined ? locate(style.diagnostics) : style.diagnostics));
  const table = await readTable(brief.data, brief.fields, req.file, env.table);
  diagnostics.push(...locate(table.diagnostics));
  lap('table');
  if (!style.ok || !table.ok) {
    diagnostics.push(...locate(checkBriefRules(brief, FORMS, req.lenient ?? false).problems));
    return { brief, diagnostics };
  }
  return { inputs: { brief, parsed, style: style.value, table: table.value, file: req.file }, brief, diagnostics };
}

/** How the core stages run: `lenient` draws the nearest honest form; `data` also keeps the form's own table of what it draws (for --data; a million-cell heat map's table costs a second). */
export interface RenderOptions {
  lenient?: boolean;
  data?: boolean;
}

/**
 * The pure core of a render: inputs → fields → choice → derived → scene → SVG, synchronous, with
 * output that depends on its inputs alone. Never throws for bad input: every problem is a
 * diagnostic on the result.
 */
export function renderInputs(inputs: RenderInputs, measure: TextMeasurer, opts: RenderOptions = {}, lap: (stage: string) => void = () => {}): Omit<RenderResult, 'ok' | 'timings'> {
  const result = renderCore(inputs, measure, opts, lap);
  if (!result.diagnostics.some((d) => d.code === 'layout.frame-too-small')) return result;
  // A frame too small says which frame would do: found by rendering at larger sizes, as the user would set them.
  const renders = (size: FrameSize) => !hasErrors(renderCore({ ...inputs, brief: { ...inputs.brief, size, sizeFixed: { width: true, height: true } } }, measure, opts, () => {}).diagnostics);
  return { ...result, diagnostics: withSmallestFrame(result.diagnostics, smallestFrame(inputs.brief.size, renders)) };
}

function renderCore(inputs: RenderInputs, measure: TextMeasurer, opts: RenderOptions, lap: (stage: string) => void): Omit<RenderResult, 'ok' | 'timings'> {
  const { brief, parsed, style, table, file } = inputs;
  const all: Diagnostic[] = [];
  const locate = (ds: Diagnostic[]) => inFile(withPositions(ds, parsed), file);
  const lenient = opts.lenient ?? false;
  const fields = inferFields(table, brief);
  all.push(...locate(fields.diagnostics));
  lap('fields');
  if (!fields.ok) {
    all.push(...locate(checkBriefRules(brief, FORMS, lenient).problems));
    return { brief, rationale: [], diagnostics: all };
  }
  // One memory of measured results for the whole render: planning and drawing measure alike.
  const memo = new Map<string, unknown>();
  const choice = choose(fields.value, brief, { style, measure, lenient, forms: FORMS, memo }, table);
  all.push(...locate(choice.diagnostics));
  lap('choose');
  if (!choice.ok) return { brief, rationale: [], diagnostics: all };
  const { rationale } = choice.value;
  const form = formNamed(choice.value.form)!;
  // A form may grow a side of the frame the brief leaves open; layout draws in that frame.
  const frameSize = choice.value.size;
  const ctx: LayoutContext = { brief: frameSize ? { ...brief, size: frameSize } : brief, style, measure, id: idMaker(), memo };
  if (choice.value.facet) {
    const faceted = renderFacets(form, table, choice.value, ctx);
    all.push(...locate(faceted.diagnostics));
    lap('layout');
    return { brief, choice: choice.value, rationale: [...rationale, ...faceted.decisions], ...(faceted.scene ? { scene: faceted.scene } : {}), diagnostics: all };
  }
  const derived = form.derive(table, choice.value.plan, ctx);
  all.push(...locate(derived.diagnostics));
  lap('derive');
  if (!derived.ok) return { brief, choice: choice.value, rationale, diagnostics: all };
  const laid = layoutChart(form, derived.value, ctx);
  all.push(...locate(laid.diagnostics));
  lap('layout');
  return { brief, choice: choice.value, rationale, scene: chartAlt(laid.scene, form, derived.value, ctx, !!opts.data), diagnostics: all };
}

/** The text mode of a render: the request's, else the style's, else embed. */
async function textModeOf(name: TextModeName, scene: Scene, style: Style, env: RenderEnv): Promise<TextMode> {
  if (name === 'live') return { kind: 'live', family: style.font.family };
  const measure = env.measureFor(style);
  if (name === 'outline') return { kind: 'outlines', set: env.outlines(), measure };
  return { kind: 'embed', fonts: await embeddedFonts(scene, env.embedFonts(measure)) };
}

/** The SVG of a finished scene, or the coded defect that stopped it (a bad coordinate is never written). */
async function svgOf(scene: Scene, style: Style, req: RenderRequest, env: RenderEnv): Promise<{ svg?: string; diagnostics: Diagnostic[] }> {
  const options: SvgOptions = req.idPrefix !== undefined ? { idPrefix: req.idPrefix } : {};
  let mode: TextMode;
  try {
    mode = await textModeOf(req.textMode ?? style.textMode ?? 'embed', scene, style, env);
  } catch (e) {
    // Only a run-time subset can fail here (the subsetter missing or refusing a font file).
    return { diagnostics: [diagnostic('render.embed-failed', `could not embed the fonts the chart's text needs: ${(e as Error).message}`, { file: req.file, hint: 'write the text another way (--text outline or --text live), or reinstall chartwright so that subset-font is present' })] };
  }
  try {
    return { svg: writeSvg(scene, mode, options), diagnostics: [] };
  } catch (e) {
    // fmt refuses non-finite and absurd coordinates: a layout defect, reported, never written.
    if (!(e instanceof RangeError)) throw e;
    return { diagnostics: [diagnostic('render.internal', `the layout produced a bad coordinate (${e.message}); this is a defect in chartwright`, { file: req.file, hint: 'please report it with the brief and data' })] };
  }
}

/**
 * Runs the stages from brief to SVG: brief → table → fields → choice → derived → scene → svg.
 * Never throws for bad input: every problem is a diagnostic on the result.
 */
export async function renderBrief(req: RenderRequest, env: RenderEnv): Promise<RenderResult> {
  const watch = stopwatch(req.clock);
  const badPrefix = req.idPrefix !== undefined ? idPrefixProblem(req.idPrefix) : undefined;
  if (badPrefix) return { ok: false, rationale: [], diagnostics: [badPrefix] };
  const loaded = await loadInputs(req, env, watch.lap);
  const finish = (result: Omit<RenderResult, 'ok' | 'timings'>): RenderResult => {
    // A failing brief reports at most MAX_BRIEF_PROBLEMS problems, however many it has (100,000
    // unknown columns); a brief that renders keeps all its warnings.
    const all = strictly(result.diagnostics, req.strict, new Set(result.brief?.accept ?? []));
    const diagnostics = hasErrors(all) ? capProblems(all) : all;
    return { ...result, ok: !hasErrors(diagnostics) && result.svg !== undefined, diagnostics, ...(req.clock ? { timings: watch.timings } : {}) };
  };
  if (!loaded.inputs) return finish({ ...(loaded.brief ? { brief: loaded.brief } : {}), rationale: [], diagnostics: loaded.diagnostics });
  let result: Omit<RenderResult, 'ok' | 'timings'>;
  try {
    result = { ...renderInputs(loaded.inputs, env.measureFor(loaded.inputs.style), { lenient: req.lenient, data: req.data }, watch.lap), style: loaded.inputs.style };
  } catch (e) {
    // Bad input never throws (it is a diagnostic); what does is a defect, reported as one, never a crash.
    return finish({ brief: loaded.inputs.brief, rationale: [], diagnostics: [...loaded.diagnostics, diagnostic('render.internal', `chartwright failed unexpectedly while drawing: ${(e as Error).message}; this is a defect in chartwright`, { file: req.file, hint: 'please report it with the brief and data' })] });
  }
  const diagnostics = [...loaded.diagnostics, ...result.diagnostics];
  if (!result.scene || hasErrors(strictly(diagnostics, req.strict, new Set(result.brief?.accept ?? [])))) return finish({ ...result, diagnostics });
  const svg = await svgOf(result.scene, loaded.inputs.style, req, env);
  watch.lap('svg');
  return finish({ ...result, ...(svg.svg !== undefined ? { svg: svg.svg } : {}), diagnostics: [...diagnostics, ...svg.diagnostics] });
}

/** The SVG of a scene with text as glyph outlines, as the raster stage draws it, in the faces of the style it was laid out in. */
export function outlineSvg(scene: Scene, env: RenderEnv, style?: Style, options: SvgOptions = {}): string {
  return writeSvg(scene, { kind: 'outlines', set: env.outlines(), measure: style ? env.measureFor(style) : env.measure }, options);
}
