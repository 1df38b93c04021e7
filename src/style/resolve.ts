import { validateAgainstSchema } from '../brief/validate.js';
import { divergingRamp, sequentialRamp, type PaletteFile } from '../color/palette.js';
import { publishedPalette } from '../color/published.js';
import { diagnostic, failure, success, type Diagnostic, type Outcome } from '../diagnostics/diagnostic.js';
import { suggestionHint } from '../diagnostics/suggest.js';
import { checkStyle, contrastWarnings, distinctnessWarnings } from './check.js';
import { STYLE_SCHEMA } from './schema.js';
import type { Style } from './types.js';

/** The palette a style takes its categories and ramps from when it names none: chartwright's own. */
export const DEFAULT_PALETTE = 'tidewater';

type PaletteKind = 'categorical' | 'sequential' | 'diverging';

/** A palette reference resolved to colours: a list as given, a palette (or published palette) name, or `<palette>/<ramp>`. */
function resolveRef(kind: PaletteKind, ref: unknown, palettes: readonly PaletteFile[], file: string): { colours?: string[]; problem?: Diagnostic } {
  if (Array.isArray(ref)) return { colours: ref as string[] };
  const text = typeof ref === 'string' ? ref : kind === 'categorical' ? DEFAULT_PALETTE : `${DEFAULT_PALETTE}/${kind === 'sequential' ? 'tide' : 'ember-tide'}`;
  const [name, ramp] = text.split('/');
  const palette = palettes.find((p) => p.name === name);
  const colours = kind === 'categorical'
    ? (palette?.categorical ?? (publishedPalette(name!) ? [...publishedPalette(name!)!] : undefined))
    : palette && ramp !== undefined ? (kind === 'sequential' ? sequentialRamp(palette, ramp) : divergingRamp(palette, ramp)) : undefined;
  if (colours) return { colours };
  const known = kind === 'categorical' ? [...palettes.map((p) => p.name), 'okabe-ito'] : palettes.flatMap((p) => Object.keys(p[kind]).map((r) => `${p.name}/${r}`));
  return { problem: diagnostic('brief.bad-style', `the style's palette.${kind} \`${text}\` names no ${kind === 'categorical' ? 'palette' : 'ramp'}`, {
    file, path: `/palette/${kind}`, found: text, expected: known.join(', '), hint: suggestionHint(text, known, kind === 'categorical' ? 'palette' : 'ramp'),
  }) };
}

/**
 * A style document → a resolved `Style`: checked against the style schema (types, ranges, no
 * unknown keys), its colours checked, its palette references resolved to colours from the palette
 * files, and warnings where its colours fall short for some readers.
 */
export function resolveStyle(value: unknown, file: string, palettes: readonly PaletteFile[]): Outcome<Style> {
  // A style's problems are all `brief.bad-style`, each with the path into the style file.
  const schemaProblems = validateAgainstSchema(value, STYLE_SCHEMA).map((d): Diagnostic => ({ ...d, code: 'brief.bad-style', severity: 'error', message: `the style file: ${d.message}`, file }));
  if (schemaProblems.length) {
    const paths = new Set(schemaProblems.map((d) => d.path));
    return failure([...schemaProblems, ...checkStyle(value, file).filter((d) => !paths.has(d.path))]);
  }
  const raw = value as Omit<Style, 'palette'> & { palette: Record<string, unknown> };
  const resolved: Record<PaletteKind, string[]> = { categorical: [], sequential: [], diverging: [] };
  const problems: Diagnostic[] = [];
  for (const kind of ['categorical', 'sequential', 'diverging'] as const) {
    const r = resolveRef(kind, raw.palette[kind], palettes, file);
    if (r.problem) problems.push(r.problem);
    else resolved[kind] = r.colours!;
  }
  const style = { ...raw, palette: { ...raw.palette, ...resolved } } as Style;
  problems.push(...checkStyle(style, file));
  if (problems.length) return failure(problems);
  return success(style, [...contrastWarnings(style, file), ...distinctnessWarnings(style, file)]);
}
