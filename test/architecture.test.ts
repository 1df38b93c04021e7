import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import ts from 'typescript';
import { describe, expect, it } from 'vitest';
import { root } from './helpers.js';

const SRC = join(root, 'src');

function sources(dir: string): string[] {
  return readdirSync(dir).flatMap((f) => (statSync(join(dir, f)).isDirectory() ? sources(join(dir, f)) : f.endsWith('.ts') ? [join(dir, f)] : []));
}

/** The src modules a file imports, as "folder/module" (type imports included). */
function importsOf(file: string): string[] {
  const text = readFileSync(file, 'utf8');
  return [...text.matchAll(/(?:from |import\()'(\.{1,2}\/[^']+)\.js'/g)].map((m) => relative(SRC, join(file, '..', m[1]!)).replaceAll('\\', '/'));
}

/** Modules anyone may import: diagnostics (with their words) and the plain types of the early stages. */
const SHARED = /^(diagnostics\/(diagnostic|catalogue|words)|(brief|table|fields|style|scene|choose)\/types)$/;

/**
 * Which stage folders each folder may import from, beyond SHARED. The pipeline runs one way, so
 * no stage reaches up to a later one or to the edges (cli, io, pipeline).
 */
const ALLOWED: Record<string, RegExp> = {
  diagnostics: /^diagnostics\//,
  color: /^color\//,
  brief: /^(brief|diagnostics)\//,
  table: /^table\//,
  fields: /^(fields|table|diagnostics\/suggest|brief\/validate)/,
  font: /^font\//,
  style: /^(style|color|brief\/(schema|validate)|diagnostics\/suggest)/,
  // The rules know forms only through the Candidate values they are given.
  choose: /^(choose\/|font\/measurer$|fields\/(notation|locales)$)/,
  derive: /^(derive|fields\/(labels|locales))/,
  scene: /^(scene|svg\/path)/,
  svg: /^(svg|scene\/(ids|walk)|font\/measurer|font\/metrics)/,
  layout: /^(layout|svg\/path|scene\/(ids|walk)|font\/(measurer|missing-report)$|fields\/(notation|labels|locales)$|color\/wcag$|raster\/png-encode$)/,
  // A form: the layout kit, the scene, derive operations, field helpers and types.
  forms: /^(forms\/|layout\/|scene\/|derive\/|svg\/path$|fields\/(labels|notation|locales)$|color\/(wcag|srgb)$)/,
  raster: /^raster\//,
  pipeline: /^(pipeline|brief|table|fields|choose|derive|forms|layout|scene|svg|font|style)\//,
  io: /^(io|pipeline|font|style|color|svg|table|diagnostics)\//,
  cli: /^(cli|io|pipeline|raster|scene|diagnostics|brief)\/|^svg\/id-prefix$/,
};

describe('architecture', () => {
  it('each stage imports only what comes before it in the pipeline (choose never imports layout or forms)', () => {
    const breaches: string[] = [];
    for (const file of sources(SRC)) {
      const folder = relative(SRC, file).split('/')[0]!;
      if (folder.endsWith('.ts')) continue; // src/index.ts, the public API, re-exports everything
      const allowed = ALLOWED[folder];
      if (!allowed) { breaches.push(`${folder}: a new folder needs its import rule`); continue; }
      for (const target of importsOf(file)) if (!SHARED.test(target) && !allowed.test(target)) breaches.push(`${relative(SRC, file)} → ${target}`);
    }
    expect(breaches).toEqual([]);
  });

  it('the scanner finds imports, type and dynamic ones included (a check that cannot fail is no check)', () => {
    expect(importsOf(join(SRC, 'pipeline', 'render.ts'))).toContain('forms/registry');
    expect(importsOf(join(SRC, 'forms', 'types.ts'))).toContain('layout/chart');
    expect(sources(SRC).flatMap(importsOf).length).toBeGreaterThan(200);
  });

  it('the rule also catches a breach', () => {
    expect(ALLOWED.choose!.test('forms/registry')).toBe(false);
    expect(ALLOWED.choose!.test('layout/compose')).toBe(false);
    expect(ALLOWED.forms!.test('pipeline/render')).toBe(false);
    expect(ALLOWED.forms!.test('cli/run')).toBe(false);
    expect(SHARED.test('forms/types')).toBe(false);
  });

  it('files stay under about 300 lines and functions under about 40', () => {
    // Data literals written as functions (a schema) are long by nature, not by tangled logic.
    const literal = new Set(['src/brief/schema.ts:briefSchema']);
    const long: string[] = [];
    for (const file of sources(SRC)) {
      const text = readFileSync(file, 'utf8');
      const name = relative(root, file).replaceAll('\\', '/');
      if (text.split('\n').length > 300) long.push(`${name}: ${text.split('\n').length} lines`);
      const sf = ts.createSourceFile(file, text, ts.ScriptTarget.Latest, true);
      const visit = (n: ts.Node): void => {
        if (ts.isFunctionDeclaration(n) || ts.isArrowFunction(n) || ts.isMethodDeclaration(n) || ts.isFunctionExpression(n)) {
          const lines = sf.getLineAndCharacterOfPosition(n.getEnd()).line - sf.getLineAndCharacterOfPosition(n.getStart()).line + 1;
          const id = `${name}:${(n as ts.FunctionDeclaration).name?.getText() ?? `line ${sf.getLineAndCharacterOfPosition(n.getStart()).line + 1}`}`;
          if (lines > 45 && !literal.has(id)) long.push(`${id}: ${lines} lines`);
        }
        ts.forEachChild(n, visit);
      };
      visit(sf);
    }
    expect(long).toEqual([]);
  });
});
