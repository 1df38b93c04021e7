/**
 * chartwright's library API: the same stages the CLI runs, as pure functions, plus `render`,
 * which runs them all with the bundled fonts and styles.
 */
import { createNodeEnv } from './io/node-env.js';
import type { RenderEnv } from './pipeline/env.js';
import { outlineSvg, renderBrief, type RenderRequest, type RenderResult } from './pipeline/render.js';
import { rasterize } from './raster/rasterize.js';
import { dumpScene } from './scene/dump.js';

export { readBrief, checkBriefValue, resolveBrief } from './brief/resolve.js';
export { BRIEF_SCHEMA } from './pipeline/vocabulary.js';
export { readTable } from './table/load.js';
export { inferFields } from './fields/infer.js';
export { choose } from './choose/choose.js';
export { deriveBars } from './derive/bars.js';
export { FORMS } from './forms/registry.js';
export { layoutCartesian } from './layout/compose.js';
export { layoutChart } from './layout/chart.js';
export { writeSvg } from './svg/write.js';
export { rasterize } from './raster/rasterize.js';
export { dumpScene } from './scene/dump.js';
export { renderBrief, outlineSvg, loadInputs, renderInputs } from './pipeline/render.js';
export { createNodeEnv } from './io/node-env.js';
export { runCli } from './cli/run.js';
export { formatDiagnostic } from './cli/format.js';
export { CATALOGUE } from './diagnostics/catalogue.js';
export type { Diagnostic } from './diagnostics/diagnostic.js';
export type { ResolvedBrief } from './brief/types.js';
export type { Scene, SceneNode } from './scene/types.js';
export type { SceneDump } from './scene/dump.js';
export type { RenderEnv } from './pipeline/env.js';
export type { RenderRequest, RenderResult, RenderInputs } from './pipeline/render.js';
export type { FormDef } from './forms/types.js';
export type { EmbedFace, EmbedFonts, FaceProvider } from './svg/embed.js';
export type { TextModeName } from './style/types.js';

/** Options of `render`. */
export interface RenderOptions {
  /** Path the brief's relative data and style paths are resolved against. Default: none. */
  file?: string;
  /** Also draw a PNG at this scale. Default: no PNG. */
  pngScale?: number;
  lenient?: boolean;
  strict?: boolean;
  /** How the SVG writes its text: embed, outline or live (see RenderRequest). Default: the style's, else embed. */
  textMode?: RenderRequest['textMode'];
  /** Starts every id in the SVG (see RenderRequest). Default: a hash of the chart's words. */
  idPrefix?: string;
  /** An environment to reuse across calls (fonts are read once per environment, about 7 ms). Default: a new one per call. */
  env?: RenderEnv;
}

/** Thrown by `render` when a brief cannot be rendered; carries the diagnostics. */
export class RenderError extends Error {
  constructor(readonly diagnostics: RenderResult['diagnostics']) {
    super(diagnostics.filter((d) => d.severity === 'error').map((d) => `error[${d.code}] ${d.message}`).join('\n'));
    this.name = 'RenderError';
  }
}

/**
 * Renders a brief (text or object), optionally with rows, to SVG, scene and reasons. The
 * outermost convenience call: it throws a `RenderError` with the diagnostics when the brief fails.
 */
export async function render(brief: string | Record<string, unknown>, rows?: Record<string, unknown>[], options: RenderOptions = {}) {
  const env = options.env ?? createNodeEnv();
  const result = await renderBrief({ brief, rows, file: options.file, lenient: options.lenient, strict: options.strict, textMode: options.textMode, idPrefix: options.idPrefix }, env);
  if (!result.ok || !result.svg || !result.scene) throw new RenderError(result.diagnostics);
  const png = options.pngScale ? rasterize(outlineSvg(result.scene, env, result.style), { scale: options.pngScale, fontFiles: [] }) : undefined;
  // Yield once after a raster: resvg's native memory is reclaimed only when the event loop turns,
  // and a caller's tight loop of renders would otherwise grow it fast.
  if (png) await new Promise<void>((resolve) => setImmediate(resolve));
  return { svg: result.svg, png, scene: dumpScene(result.scene), rationale: result.rationale, warnings: result.diagnostics.filter((d) => d.severity !== 'error'), form: result.choice!.form };
}
