import { Command, CommanderError, InvalidArgumentError, Option } from 'commander';
import { readFileSync, readdirSync } from 'node:fs';
import { join, relative, resolve } from 'node:path';
import { LOCALES, type Locale } from '../brief/types.js';
import { BRIEF_SCHEMA } from '../pipeline/vocabulary.js';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import { inputLimit } from '../io/bounded-read.js';
import { createNodeEnv } from '../io/node-env.js';
import { packageRoot } from '../io/package-root.js';
import type { RenderEnv } from '../pipeline/env.js';
import type { TextModeName } from '../style/types.js';
import { idPrefixProblem } from '../svg/id-prefix.js';
import { renderFile, renderPlan, renderPlanned, type BatchOptions, type BriefReport } from './batch.js';
import { expandBriefs, type BriefEntry } from './briefs.js';
import { createCommitter, type OutputFs } from './commit.js';
import { EXIT, exitFor } from './exit-codes.js';
import { colourAllowed, formatDiagnostic, printable } from './format.js';
import type { CliIo } from './io.js';
import { planRun } from './plan.js';
import { runReport } from './report.js';

/** What tests may swap in: the render environment, the output file system, the folder lister. */
export interface CliDeps {
  env?: RenderEnv;
  fs?: OutputFs;
  listDir?: (dir: string) => string[];
}

function parseScale(value: string): number {
  const n = Number(value);
  if (!Number.isFinite(n) || n <= 0 || n > 8) throw new InvalidArgumentError('expected a number above 0 and at most 8, e.g. 2');
  return n;
}

const TEXT_MODES: readonly TextModeName[] = ['embed', 'outline', 'live'];

function parseTextMode(value: string): TextModeName {
  if (!(TEXT_MODES as readonly string[]).includes(value)) throw new InvalidArgumentError(`expected one of ${TEXT_MODES.join(', ')}`);
  return value as TextModeName;
}

function parseIdPrefix(value: string): string {
  const problem = idPrefixProblem(value, '--id-prefix');
  if (problem) throw new InvalidArgumentError(`${problem.message}: expected ${problem.expected}; ${problem.hint}`);
  return value;
}

/** Diagnostics with their files relative to the working folder, as people typed them. */
function relativeFiles(diagnostics: Diagnostic[], cwd: string): Diagnostic[] {
  return diagnostics.map((d) => (d.file ? { ...d, file: relative(cwd, d.file) || d.file } : d));
}

/** A path as people typed it, made safe to print. */
const shown = (io: CliIo, path: string) => printable(relative(io.cwd, path) || path);

/** Prints errors (and warnings, unless quiet) for people on stderr; info notes are for `explain`. */
function report(io: CliIo, diagnostics: Diagnostic[], quiet = false): void {
  const colour = colourAllowed(io.isTTY, io.env);
  for (const d of relativeFiles(diagnostics, io.cwd)) {
    if (d.severity === 'error' || (d.severity === 'warning' && !quiet)) io.stderr(`${formatDiagnostic(d, colour)}\n`);
  }
}

function demoBriefs(root: string): BriefEntry[] {
  const dir = join(root, 'demo-data');
  return readdirSync(dir).filter((f) => /\.ya?ml$/.test(f)).sort().map((f) => ({ file: join(dir, f) }));
}

interface CommonFlags { strict?: boolean; lenient?: boolean; quiet?: boolean; allowOutside?: boolean; style?: string; locale?: Locale }

/** --style as a render takes it: a preset name as given, a style file made absolute from the working folder. */
function styleFlag(style: string | undefined, io: CliIo): { style?: string } {
  if (style === undefined) return {};
  return { style: style.includes('/') || style.endsWith('.json') ? resolve(io.cwd, style) : style };
}
interface RenderFlags extends CommonFlags { outDir?: string; png?: boolean; alt?: boolean; data?: boolean; outlineText?: boolean; text?: TextModeName; idPrefix?: string; scale: number; scene?: string; debug?: boolean; timings?: boolean; report?: string }

function batchOptions(flags: RenderFlags, io: CliIo, deps: CliDeps): BatchOptions {
  return {
    outDir: flags.outDir ? resolve(io.cwd, flags.outDir) : undefined, png: !!flags.png, alt: !!flags.alt, data: !!flags.data, scale: flags.scale, scene: flags.scene, allowOutside: !!flags.allowOutside,
    strict: !!flags.strict, lenient: !!flags.lenient, debug: !!flags.debug, outlineText: !!flags.outlineText, tempTag: String(io.pid), ...(flags.locale ? { locale: flags.locale } : {}),
    ...(flags.text ? { textMode: flags.text } : {}), ...(flags.idPrefix !== undefined ? { idPrefix: flags.idPrefix } : {}),
    maxBriefBytes: inputLimit('brief', io.env), fs: deps.fs, ...styleFlag(flags.style, io),
    housekeeping: { alive: io.alive ?? (() => true), now: io.now ?? (() => Date.now()) },
    ...(flags.timings ? { clock: io.clock } : {}),
  };
}

/** A progress line on stderr for batches on a terminal (never with NO_COLOR, in CI or when quiet). */
function progress(io: CliIo, count: number, quiet: boolean): { step: (done: number, total: number, file: string) => void; clear: () => void } {
  if (quiet || count < 2 || !colourAllowed(io.isTTY, io.env)) return { step: () => {}, clear: () => {} };
  return {
    step: (done, total, file) => io.stderr(`\r\u001b[K[${done + 1}/${total}] ${shown(io, file)}`),
    clear: () => io.stderr('\r\u001b[K'),
  };
}

/** Prints one brief's result as soon as it is done: diagnostics on stderr, written paths on stdout. */
function printBrief(io: CliIo, r: BriefReport, quiet: boolean): void {
  report(io, r.diagnostics, quiet);
  for (const w of r.written) io.stdout(`${shown(io, w)}\n`);
  if (r.timings && !quiet) io.stderr(`${shown(io, r.brief)}: ${r.timings.map((t) => `${t.stage} ${t.ms.toFixed(2)} ms`).join(', ')}\n`);
}

async function writeReport(io: CliIo, reports: BriefReport[], opts: BatchOptions, path: string): Promise<boolean> {
  try {
    await createCommitter(opts.tempTag, opts.housekeeping!, opts.fs)([{ path, data: `${JSON.stringify(runReport(reports, chartwrightVersion(), io.cwd), null, 2)}\n` }]);
    return true;
  } catch (e) {
    report(io, [diagnostic('output.write-failed', `could not write the run report: ${(e as Error).message}`, { file: path, hint: 'check that the report folder is writable' })]);
    return false;
  }
}

async function runRender(entries: BriefEntry[], flags: RenderFlags, io: CliIo, env: () => RenderEnv, deps: CliDeps): Promise<number> {
  const opts = batchOptions(flags, io, deps);
  const quiet = !!flags.quiet;
  const planned = planRun(entries, opts, io.cwd, flags.report);
  if (planned.problems.length) { report(io, planned.problems); return EXIT.USAGE; }
  const bar = progress(io, entries.length, quiet);
  const reports = await renderPlanned(planned.plans, env(), opts, {
    start: bar.step,
    finish: (r) => { bar.clear(); printBrief(io, r, quiet); },
  });
  if (flags.report && !(await writeReport(io, reports, opts, resolve(io.cwd, flags.report)))) return Math.max(EXIT.FAILED, exitFor(reports));
  return exitFor(reports);
}

async function runExplain(file: string, flags: { json?: boolean; lenient?: boolean; style?: string; locale?: Locale }, io: CliIo, env: RenderEnv): Promise<number> {
  const result = await renderFile(resolve(io.cwd, file), env, { strict: false, lenient: !!flags.lenient, debug: false, maxBriefBytes: inputLimit('brief', io.env), ...styleFlag(flags.style, io), ...(flags.locale ? { locale: flags.locale } : {}) });
  const diagnostics = relativeFiles(result.diagnostics, io.cwd);
  if (flags.json) {
    io.stdout(`${printable(JSON.stringify({ form: result.choice?.form ?? null, ok: result.ok, rationale: result.rationale, diagnostics, alt: result.scene ? result.scene.alt ?? result.scene.description : null }, null, 2), true)}\n`);
  } else {
    io.stdout(`form: ${result.choice?.form ?? '(none)'}\n`);
    for (const r of result.rationale) io.stdout(`- ${printable(r.decision)}\n    because ${printable(r.rule)}\n`);
    for (const d of diagnostics) io.stdout(`${formatDiagnostic(d, false)}\n`);
  }
  return exitFor([{ ok: !result.diagnostics.some((d) => d.severity === 'error'), diagnostics: result.diagnostics }]);
}

async function runCheck(paths: string[], flags: CommonFlags, io: CliIo, env: () => RenderEnv, deps: CliDeps): Promise<number> {
  const opts = { png: false, allowOutside: !!flags.allowOutside, strict: !!flags.strict, lenient: !!flags.lenient, debug: false, maxBriefBytes: inputLimit('brief', io.env), ...styleFlag(flags.style, io), ...(flags.locale ? { locale: flags.locale } : {}) };
  const results: { ok: boolean; diagnostics: Diagnostic[] }[] = [];
  for (const plan of planRun(expandBriefs(paths, io.cwd, deps.listDir), opts, io.cwd).plans) {
    const result = await renderPlan(plan, env(), opts);
    results.push(result);
    report(io, result.diagnostics, !!flags.quiet);
    io.stdout(`${result.ok ? 'ok' : 'FAILED'} ${shown(io, plan.file)}\n`);
  }
  return exitFor(results);
}

/** chartwright's version, from its package.json. */
function chartwrightVersion(): string {
  return (JSON.parse(readFileSync(join(packageRoot(), 'package.json'), 'utf8')) as { version: string }).version;
}

/** --style, on every command that renders: it replaces each brief's `style:`. */
const STYLE_OPTION = ['--style <name|path>', 'style preset (report, slide, print, dark) or style file, instead of each brief\'s `style:`'] as const;
/** --locale: the numbers and dates of every brief in this locale, whatever the brief says. */
const localeOption = () => new Option('--locale <name>', 'write numbers and dates in this locale instead of the brief\'s `locale:`').choices([...LOCALES]);

const withCommonFlags = (c: Command) => c
  .option('--strict', 'treat warnings as errors')
  .option('--lenient', 'draw the nearest honest form, with a warning, instead of failing on a hard rule')
  .option('-q, --quiet', 'print only errors on stderr (no warnings, progress or timings)')
  .option('--allow-outside', 'let `output:` write outside the brief\'s folder (or -o DIR), absolute paths included')
  .option(...STYLE_OPTION)
  .addOption(localeOption());

const withRenderFlags = (c: Command) => withCommonFlags(c)
  .option('-o, --out-dir <dir>', 'write outputs under this folder instead of beside each brief')
  .option('--png', 'also write a PNG beside each SVG')
  .option('--alt', 'also write the alt text beside each SVG, as <output>.txt')
  .option('--data', 'also write the numbers drawn beside each SVG, as <output>.data.csv')
  .option('--outline-text', 'the same as --text outline')
  .option('--text <mode>', 'how the SVG writes text: embed (default: live text, the glyphs used embedded), outline (glyph paths), live (the style\'s font family list)', parseTextMode)
  .option('--id-prefix <p>', 'start every id in each SVG with this, so charts inlined in one page never share an id', parseIdPrefix)
  .option('--scale <n>', 'PNG pixels per CSS pixel (at most 100 megapixels per PNG)', parseScale, 2)
  .option('--scene <path>', 'dump the scene as JSON: a file for one brief, a folder for several')
  .option('--debug', 'show stack traces of unexpected failures')
  .option('--timings', 'print how long each stage took, per brief, on stderr')
  .option('--report <file>', 'write a JSON run report: every brief, its outputs and diagnostics');

function program(io: CliIo, env: () => RenderEnv, deps: CliDeps, exit: { code: number }): Command {
  const cli = new Command('chartwright')
    .description('Turns a table plus a stated intent into a finished static chart (SVG, PNG).')
    .version(chartwrightVersion(), '-V, --version')
    .configureOutput({ writeOut: (s) => io.stdout(printable(s, true)), writeErr: (s) => io.stderr(printable(s, true)) })
    .exitOverride();
  withRenderFlags(cli.command('render').description('render briefs to SVG (and PNG)').argument('<brief...>', 'brief files (.yaml, .yml, .json), or folders of them'))
    .action(async (files: string[], flags: RenderFlags) => { exit.code = await runRender(expandBriefs(files, io.cwd, deps.listDir), flags, io, env, deps); });
  cli.command('explain').description('say which chart a brief gets and why').argument('<brief>', 'a brief file')
    .option('--json', 'print JSON: { form, rationale, diagnostics, alt }')
    .option('--lenient', 'explain the lenient render')
    .option(...STYLE_OPTION)
    .addOption(localeOption())
    .action(async (file: string, flags: { json?: boolean; lenient?: boolean; style?: string; locale?: Locale }) => { exit.code = await runExplain(file, flags, io, env()); });
  withCommonFlags(cli.command('check').description('validate and lint briefs; non-zero exit on errors').argument('<brief...>', 'brief files, or folders of them'))
    .action(async (files: string[], flags: CommonFlags) => { exit.code = await runCheck(files, flags, io, env, deps); });
  withRenderFlags(cli.command('demo').description('render the demo gallery from demo-data/ as SVG and PNG').argument('[dir]', 'output folder', 'gallery'))
    .action(async (dir: string, flags: RenderFlags) => {
      exit.code = await runRender(demoBriefs(packageRoot()), { ...flags, png: true, outDir: flags.outDir ?? dir }, io, env, deps);
    });
  cli.command('schema').description('print the JSON Schema of a brief').action(() => { io.stdout(`${JSON.stringify(BRIEF_SCHEMA, null, 2)}\n`); });
  return cli;
}

/** The CLI as a function: arguments in, exit code out. Only bin/ touches `process`. */
export async function runCli(argv: string[], io: CliIo, deps: CliDeps = {}): Promise<number> {
  const exit = { code: EXIT.OK as number };
  let shared: RenderEnv | undefined = deps.env;
  const env = () => (shared ??= createNodeEnv(packageRoot(), { maxStyleBytes: inputLimit('style', io.env) }));
  try {
    await program(io, env, deps, exit).parseAsync(argv, { from: 'user' });
    return exit.code;
  } catch (e) {
    if (e instanceof CommanderError) return e.exitCode === 0 ? EXIT.OK : EXIT.USAGE;
    io.stderr(`chartwright: internal error: ${printable((e as Error).message)}\n${argv.includes('--debug') ? `${printable(String((e as Error).stack), true)}\n` : ''}`);
    return EXIT.INTERNAL;
  }
}
