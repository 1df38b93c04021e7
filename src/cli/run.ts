import { Command, CommanderError, InvalidArgumentError } from 'commander';
import { readFileSync, readdirSync, statSync } from 'node:fs';
import { join, relative, resolve } from 'node:path';
import { BRIEF_SCHEMA } from '../pipeline/vocabulary.js';
import { diagnostic, hasErrors, type Diagnostic } from '../diagnostics/diagnostic.js';
import { createNodeEnv } from '../io/node-env.js';
import { packageRoot } from '../io/package-root.js';
import type { RenderEnv } from '../pipeline/env.js';
import { renderBatch, renderFile, type BatchOptions, type BriefReport } from './batch.js';
import { EXIT } from './exit-codes.js';
import { writeAtomic } from './outputs.js';
import { runReport } from './report.js';
import { colourAllowed, formatDiagnostic } from './format.js';
import type { CliIo } from './io.js';

function parseScale(value: string): number {
  const n = Number(value);
  if (!Number.isFinite(n) || n <= 0 || n > 8) throw new InvalidArgumentError('expected a number above 0 and at most 8, e.g. 2');
  return n;
}

/** Diagnostics with their files relative to the working folder, as people typed them. */
function relativeFiles(diagnostics: Diagnostic[], cwd: string): Diagnostic[] {
  return diagnostics.map((d) => (d.file ? { ...d, file: relative(cwd, d.file) || d.file } : d));
}

/** Prints errors and warnings for people on stderr; info notes are for `explain`. */
function report(io: CliIo, diagnostics: Diagnostic[]): void {
  const colour = colourAllowed(io.isTTY, io.env);
  for (const d of diagnostics) if (d.severity !== 'info') io.stderr(`${formatDiagnostic(d, colour)}\n`);
}

function batchExit(reports: BriefReport[]): number {
  return reports.every((r) => r.ok) ? EXIT.OK : EXIT.FAILED;
}

/**
 * Brief paths from the command line: a folder stands for the briefs in it (.yaml and .yml
 * files, and .brief.json; plain .json is left out, as it may be data), sorted by name.
 */
function expandBriefs(paths: string[], cwd: string): string[] {
  return paths.flatMap((p) => {
    const full = resolve(cwd, p);
    let isDir = false;
    try { isDir = statSync(full).isDirectory(); } catch { /* a missing path is reported as brief.not-found */ }
    if (!isDir) return [full];
    return readdirSync(full).filter((f) => /\.ya?ml$|\.brief\.json$/.test(f)).sort().map((f) => join(full, f));
  });
}

function demoBriefs(root: string): string[] {
  const dir = join(root, 'demo-data');
  return readdirSync(dir).filter((f) => /\.ya?ml$/.test(f)).sort().map((f) => join(dir, f));
}

interface RenderFlags { outDir?: string; png?: boolean; outlineText?: boolean; scale: number; scene?: string; strict?: boolean; lenient?: boolean; debug?: boolean; timings?: boolean; report?: string }

function batchOptions(flags: RenderFlags, io: CliIo, outDir: string | undefined): BatchOptions {
  return { outDir, png: !!flags.png, scale: flags.scale, scene: flags.scene, strict: !!flags.strict, lenient: !!flags.lenient, debug: !!flags.debug, outlineText: !!flags.outlineText, tempTag: String(io.pid), ...(flags.timings ? { clock: io.clock } : {}) };
}

/** A progress line on stderr for batches on a terminal (never with NO_COLOR or in CI). */
function progress(io: CliIo, count: number): { step: (done: number, total: number, file: string) => void; end: () => void } {
  if (count < 2 || !colourAllowed(io.isTTY, io.env)) return { step: () => {}, end: () => {} };
  return {
    step: (done, total, file) => io.stderr(`\r\u001b[K[${done + 1}/${total}] ${relative(io.cwd, file)}`),
    end: () => io.stderr('\r\u001b[K'),
  };
}

async function runRender(files: string[], flags: RenderFlags, io: CliIo, env: RenderEnv): Promise<number> {
  const outDir = flags.outDir ? resolve(io.cwd, flags.outDir) : undefined;
  const bar = progress(io, files.length);
  const reports = await renderBatch(files, env, batchOptions(flags, io, outDir), io.cwd, bar.step);
  bar.end();
  for (const r of reports) {
    report(io, relativeFiles(r.diagnostics, io.cwd));
    for (const w of r.written) io.stdout(`${relative(io.cwd, w)}\n`);
    if (r.timings) io.stderr(`${relative(io.cwd, r.brief)}: ${r.timings.map((t) => `${t.stage} ${t.ms.toFixed(2)} ms`).join(', ')}\n`);
  }
  if (flags.report) {
    const path = resolve(io.cwd, flags.report);
    try {
      await writeAtomic(path, `${JSON.stringify(runReport(reports, chartwrightVersion(), io.cwd), null, 2)}\n`, String(io.pid));
    } catch (e) {
      report(io, [diagnostic('output.write-failed', `could not write the run report: ${(e as Error).message}`, { file: flags.report, hint: 'check that the report folder is writable' })]);
      return EXIT.FAILED;
    }
  }
  return batchExit(reports);
}

async function runExplain(file: string, flags: { json?: boolean; lenient?: boolean }, io: CliIo, env: RenderEnv): Promise<number> {
  const result = await renderFile(resolve(io.cwd, file), env, { strict: false, lenient: !!flags.lenient, debug: false });
  const diagnostics = relativeFiles(result.diagnostics, io.cwd);
  if (flags.json) {
    io.stdout(`${JSON.stringify({ form: result.choice?.form ?? null, ok: result.ok, rationale: result.rationale, diagnostics }, null, 2)}\n`);
  } else {
    io.stdout(`form: ${result.choice?.form ?? '(none)'}\n`);
    for (const r of result.rationale) io.stdout(`- ${r.decision}\n    because ${r.rule}\n`);
    for (const d of diagnostics) io.stdout(`${formatDiagnostic(d, false)}\n`);
  }
  return hasErrors(result.diagnostics) ? EXIT.FAILED : EXIT.OK;
}

async function runCheck(files: string[], flags: { strict?: boolean; lenient?: boolean }, io: CliIo, env: RenderEnv): Promise<number> {
  let failed = false;
  for (const file of files) {
    const result = await renderFile(file, env, { strict: !!flags.strict, lenient: !!flags.lenient, debug: false });
    report(io, relativeFiles(result.diagnostics, io.cwd));
    if (!result.ok) failed = true;
    io.stdout(`${result.ok ? 'ok' : 'FAILED'} ${relative(io.cwd, file) || file}\n`);
  }
  return failed ? EXIT.FAILED : EXIT.OK;
}

/** chartwright's version, from its package.json. */
function chartwrightVersion(): string {
  return (JSON.parse(readFileSync(join(packageRoot(), 'package.json'), 'utf8')) as { version: string }).version;
}

function program(io: CliIo, env: () => RenderEnv, exit: { code: number }): Command {
  const version = chartwrightVersion();
  const cli = new Command('chartwright')
    .description('Turns a table plus a stated intent into a finished static chart (SVG, PNG).')
    .version(version, '-V, --version')
    .configureOutput({ writeOut: io.stdout, writeErr: io.stderr })
    .exitOverride();
  const withRenderFlags = (c: Command) => c
    .option('-o, --out-dir <dir>', 'write outputs under this folder instead of beside each brief')
    .option('--png', 'also write a PNG beside each SVG')
    .option('--outline-text', 'write SVG text as glyph outlines, exact without the font (not selectable)')
    .option('--scale <n>', 'PNG pixels per CSS pixel', parseScale, 2)
    .option('--scene <path>', 'dump the scene as JSON: a file for one brief, a folder for several')
    .option('--strict', 'treat warnings as errors')
    .option('--lenient', 'draw the nearest honest form, with a warning, instead of failing on a hard rule')
    .option('--debug', 'show stack traces of unexpected failures')
    .option('--timings', 'print how long each stage took, per brief, on stderr')
    .option('--report <file>', 'write a JSON run report: every brief, its outputs and diagnostics');
  withRenderFlags(cli.command('render').description('render briefs to SVG (and PNG)').argument('<brief...>', 'brief files (.yaml, .yml, .json), or folders of them'))
    .action(async (files: string[], flags: RenderFlags) => { exit.code = await runRender(expandBriefs(files, io.cwd), flags, io, env()); });
  cli.command('explain').description('say which chart a brief gets and why').argument('<brief>', 'a brief file')
    .option('--json', 'print JSON: { form, rationale, diagnostics }')
    .option('--lenient', 'explain the lenient render')
    .action(async (file: string, flags: { json?: boolean; lenient?: boolean }) => { exit.code = await runExplain(file, flags, io, env()); });
  cli.command('check').description('validate and lint briefs; non-zero exit on errors').argument('<brief...>', 'brief files, or folders of them')
    .option('--strict', 'fail on warnings too')
    .option('--lenient', 'check the lenient render')
    .action(async (files: string[], flags: { strict?: boolean; lenient?: boolean }) => { exit.code = await runCheck(expandBriefs(files, io.cwd), flags, io, env()); });
  withRenderFlags(cli.command('demo').description('render the demo gallery from demo-data/ as SVG and PNG').argument('[dir]', 'output folder', 'gallery'))
    .action(async (dir: string, flags: RenderFlags) => {
      exit.code = await runRender(demoBriefs(packageRoot()), { ...flags, png: true, outDir: flags.outDir ?? dir }, io, env());
    });
  cli.command('schema').description('print the JSON Schema of a brief').action(() => { io.stdout(`${JSON.stringify(BRIEF_SCHEMA, null, 2)}\n`); });
  return cli;
}

/** The CLI as a function: arguments in, exit code out. Only bin/ touches `process`. */
export async function runCli(argv: string[], io: CliIo): Promise<number> {
  const exit = { code: EXIT.OK as number };
  let shared: RenderEnv | undefined;
  const env = () => (shared ??= createNodeEnv());
  try {
    await program(io, env, exit).parseAsync(argv, { from: 'user' });
    return exit.code;
  } catch (e) {
    if (e instanceof CommanderError) return e.exitCode === 0 ? EXIT.OK : EXIT.USAGE;
    io.stderr(`chartwright: internal error: ${(e as Error).message}\n${argv.includes('--debug') ? `${(e as Error).stack}\n` : ''}`);
    return EXIT.INTERNAL;
  }
}
