import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { EXIT } from '../../src/cli/exit-codes.js';
import { colourAllowed, formatDiagnostic } from '../../src/cli/format.js';
import { runCli } from '../../src/cli/run.js';
import { tempDir } from '../helpers.js';
import { files, io, workspace } from './cli-helpers.js';

describe('chartwright render', () => {
  it('writes the SVG beside the brief, named after it, and lists it on stdout', async () => {
    const dir = workspace();
    const t = io(dir);
    expect(await runCli(['render', 'piers.yaml'], t.io)).toBe(EXIT.OK);
    expect(readFileSync(join(dir, 'piers.svg'), 'utf8')).toMatch(/^<svg /);
    expect(t.out()).toBe('piers.svg\n');
    expect(files(dir).some((f) => f.endsWith('.tmp'))).toBe(false);
  });

  it('names the SVG after the brief with its extension replaced, as documented', async () => {
    const dir = workspace();
    writeFileSync(join(dir, 'ferry.brief.yaml'), readFileSync(join(dir, 'piers.yaml')));
    expect(await runCli(['render', 'ferry.brief.yaml'], io(dir).io)).toBe(EXIT.OK);
    expect(existsSync(join(dir, 'ferry.brief.svg'))).toBe(true);
  });

  it('writes SVG and PNG under -o DIR with --png', async () => {
    const dir = workspace();
    expect(await runCli(['render', 'piers.yaml', '-o', 'out', '--png', '--scale', '1'], io(dir).io)).toBe(EXIT.OK);
    expect(files(join(dir, 'out'))).toEqual(['piers.png', 'piers.svg']);
    expect(readFileSync(join(dir, 'out', 'piers.png')).subarray(1, 4).toString()).toBe('PNG');
  });

  it('writes SVG text as glyph outlines with --outline-text, keeping title and description', async () => {
    const dir = workspace();
    expect(await runCli(['render', 'piers.yaml', '--outline-text'], io(dir).io)).toBe(EXIT.OK);
    const svg = readFileSync(join(dir, 'piers.svg'), 'utf8');
    expect(svg).not.toContain('<text');
    expect(svg).toContain('<use href="#cw');
    expect(svg).toMatch(/<title id="cw[0-9a-f]{8}-title">Piers<\/title>/);
  });

  it('always writes the SVG beside a .png output', async () => {
    const dir = workspace();
    writeFileSync(join(dir, 'p.yaml'), 'data: piers.csv\nintent: compare\nkeys: pier\nvalues: crossings\noutput: figures/ferry.png\n');
    expect(await runCli(['render', 'p.yaml'], io(dir).io)).toBe(EXIT.OK);
    expect(files(join(dir, 'figures'))).toEqual(['ferry.png', 'ferry.svg']);
  });

  it('reports a bad brief as file:line: error[code] with a hint, writes nothing, and shows no stack', async () => {
    const dir = workspace();
    const t = io(dir);
    expect(await runCli(['render', 'typo.yaml'], t.io)).toBe(EXIT.FAILED);
    expect(t.err()).toContain('typo.yaml: error[brief.unknown-column] the data has no column `crossing` (at /values, line 4:9)');
    expect(t.err()).toContain('hint: did you mean `crossings`?');
    expect(t.err()).not.toMatch(/\n\s+at /);
    expect(existsSync(join(dir, 'typo.svg'))).toBe(false);
  });

  it('renders the good briefs of a batch even when one is bad', async () => {
    const dir = workspace();
    const t = io(dir);
    expect(await runCli(['render', 'typo.yaml', 'piers.yaml', 'missing.yaml'], t.io)).toBe(EXIT.FAILED);
    expect(existsSync(join(dir, 'piers.svg'))).toBe(true);
    expect(t.err()).toContain('missing.yaml: error[brief.not-found]');
  });

  it('renders every brief in a folder, leaving plain JSON (which may be data) alone', async () => {
    const dir = workspace();
    mkdirSync(join(dir, 'briefs'));
    writeFileSync(join(dir, 'briefs', 'a.yaml'), 'data: ../piers.csv\nintent: compare\nkeys: pier\nvalues: crossings\nfields: { crossings: { unit: crossings } }\n');
    writeFileSync(join(dir, 'briefs', 'b.brief.json'), JSON.stringify({ data: '../piers.csv', intent: 'compare', keys: 'pier', values: 'crossings', fields: { crossings: { unit: 'crossings' } } }));
    writeFileSync(join(dir, 'briefs', 'rows.json'), '[{"pier": "North", "crossings": 1}]');
    const t = io(dir);
    expect(await runCli(['render', 'briefs'], t.io)).toBe(EXIT.OK);
    expect(t.out()).toBe('briefs/a.svg\nbriefs/b.brief.svg\n');
    const c = io(dir);
    expect(await runCli(['check', 'briefs'], c.io)).toBe(EXIT.OK);
    expect(c.out()).toBe('ok briefs/a.yaml\nok briefs/b.brief.json\n');
  });

  it('dumps the scene contract to a file for one brief', async () => {
    const dir = workspace();
    expect(await runCli(['render', 'piers.yaml', '--scene', 'scene.json'], io(dir).io)).toBe(EXIT.OK);
    const scene = JSON.parse(readFileSync(join(dir, 'scene.json'), 'utf8'));
    expect(Object.keys(scene)).toEqual(expect.arrayContaining(['form', 'width', 'height', 'background', 'marks', 'axes', 'texts']));
    expect(scene).toMatchObject({ form: 'bar', width: 720, height: 440, background: '#ffffff' });
    const bar = scene.marks.find((m: { role: string }) => m.role === 'bar');
    expect(bar).toMatchObject({ role: 'bar', datum: { pier: 'North', crossings: 212 } });
    expect(Object.keys(bar)).toEqual(expect.arrayContaining(['x', 'y', 'width', 'height', 'fill']));
    expect(scene.axes.map((a: { orient: string }) => a.orient)).toEqual(['left', 'bottom']);
    expect(scene.axes[0]).toMatchObject({ field: 'crossings', title: 'Crossings', domain: [0, expect.any(Number)] });
    expect(scene.axes[1].domain).toEqual(['North', 'East', 'South']);
    expect(scene.texts.find((t: { role: string }) => t.role === 'title')).toMatchObject({ text: 'Piers', fill: expect.stringMatching(/^#[0-9a-f]{6}$/) });
    for (const t of scene.texts) expect(Object.keys(t)).toEqual(expect.arrayContaining(['role', 'text', 'x', 'y', 'width', 'height', 'fill']));
  });

  it('dumps one scene per brief into a folder for several briefs', async () => {
    const dir = workspace();
    writeFileSync(join(dir, 'second.yaml'), 'data: piers.csv\nintent: compare\nkeys: pier\nvalues: crossings\n');
    expect(await runCli(['render', 'piers.yaml', 'second.yaml', '--scene', 'scenes'], io(dir).io)).toBe(EXIT.OK);
    expect(files(join(dir, 'scenes'))).toEqual(['piers.scene.json', 'second.scene.json']);
  });

  it('with --strict, fails a brief that only has warnings, and writes nothing', async () => {
    const dir = workspace();
    const t = io(dir);
    expect(await runCli(['render', 'warn.yaml'], io(dir).io)).toBe(EXIT.OK);
    expect(await runCli(['render', 'warn.yaml', '-o', 'strict', '--strict'], t.io)).toBe(EXIT.FAILED);
    expect(t.err()).toContain('error[derive.missing-values]');
    expect(existsSync(join(dir, 'strict'))).toBe(false);
  });

  it('times each stage with --timings, and writes the same SVG as without', async () => {
    const dir = workspace();
    const t = io(dir);
    expect(await runCli(['render', 'piers.yaml', '--png', '--timings'], t.io)).toBe(EXIT.OK);
    // The fake clock advances 1.5 ms per reading, so every stage reads 1.50 ms.
    expect(t.err()).toBe('piers.yaml: brief 1.50 ms, table 1.50 ms, fields 1.50 ms, choose 1.50 ms, derive 1.50 ms, layout 1.50 ms, svg 1.50 ms, png 1.50 ms\n');
    const timed = readFileSync(join(dir, 'piers.svg'), 'utf8');
    await runCli(['render', 'piers.yaml'], io(dir).io);
    expect(readFileSync(join(dir, 'piers.svg'), 'utf8')).toBe(timed);
  });

  it('writes a JSON run report with every brief, its outputs and diagnostics', async () => {
    const dir = workspace();
    expect(await runCli(['render', 'piers.yaml', 'typo.yaml', 'warn.yaml', '--report', 'run.json'], io(dir).io)).toBe(EXIT.FAILED);
    const run = JSON.parse(readFileSync(join(dir, 'run.json'), 'utf8'));
    expect(run.summary).toEqual({ briefs: 3, ok: 2, failed: 1, errors: 1, warnings: 1 });
    expect(run.briefs.map((b: { brief: string; ok: boolean; outputs: string[] }) => [b.brief, b.ok, b.outputs])).toEqual([
      ['piers.yaml', true, ['piers.svg']], ['typo.yaml', false, []], ['warn.yaml', true, ['warn.svg']],
    ]);
    expect(run.briefs[1].diagnostics[0]).toMatchObject({ code: 'brief.unknown-column', file: 'typo.yaml', line: 4 });
    expect(run.chartwright).toMatch(/^\d+\.\d+\.\d+$/);
  });

  it('fails cleanly when the run report cannot be written', async () => {
    const dir = workspace();
    writeFileSync(join(dir, 'blocked'), 'a file where a folder should be');
    const t = io(dir);
    expect(await runCli(['render', 'piers.yaml', '--report', 'blocked/run.json'], t.io)).toBe(EXIT.FAILED);
    expect(t.err()).toContain('error[output.write-failed] could not write the run report');
  });

  it('shows progress for a batch on a terminal only, and never in CI', async () => {
    const dir = workspace();
    const tty = io(dir);
    tty.io.isTTY = true;
    await runCli(['render', 'piers.yaml', 'warn.yaml'], tty.io);
    expect(tty.err()).toContain('[2/2] warn.yaml');
    const ci = io(dir);
    ci.io.isTTY = true;
    ci.io.env = { CI: 'true' };
    await runCli(['render', 'piers.yaml', 'warn.yaml'], ci.io);
    expect(ci.err()).not.toContain('[1/2]');
  });

  it('rejects a bad --scale as a usage error', async () => {
    const t = io(workspace());
    expect(await runCli(['render', 'piers.yaml', '--scale', 'big'], t.io)).toBe(EXIT.USAGE);
    expect(t.err()).toMatch(/scale/);
  });
});

describe('chartwright explain', () => {
  it('prints the form, rationale and diagnostics as the documented JSON', async () => {
    const dir = workspace();
    const t = io(dir);
    expect(await runCli(['explain', 'warn.yaml', '--json'], t.io)).toBe(EXIT.OK);
    const report = JSON.parse(t.out());
    expect(report.form).toBe('bar');
    expect(report.rationale.length).toBeGreaterThan(2);
    for (const r of report.rationale) expect(Object.keys(r).sort()).toEqual(['decision', 'rule']);
    expect(report.diagnostics[0]).toMatchObject({ code: 'derive.missing-values', severity: 'warning', message: expect.any(String) });
  });

  it('reports the brief\'s own rule problems together with data problems', async () => {
    const dir = workspace();
    // Pinned to bars: unpinned, a compare brief may get a dense layout (10,000+ keys), which has no baseline to refuse before the data are read.
    writeFileSync(join(dir, 'two.yaml'), 'data: piers.csv\nintent: compare\nform: bar\nkeys: pier\nvalues: crossing\nbaseline: fit\n');
    const t = io(dir);
    expect(await runCli(['explain', 'two.yaml', '--json'], t.io)).toBe(EXIT.FAILED);
    expect(JSON.parse(t.out()).diagnostics.map((d: { code: string }) => d.code)).toEqual(['brief.unknown-column', 'choice.baseline-fit-refused']);
  });

  // Found in a new-user trial: `explain folder/` printed a raw "(EISDIR)".
  it('says a folder is not a brief file, in words', async () => {
    const dir = workspace();
    mkdirSync(join(dir, 'briefs'));
    const t = io(dir);
    expect(await runCli(['explain', 'briefs'], t.io)).toBe(EXIT.FAILED);
    expect(t.out()).toContain('this is a folder, not a brief file');
    expect(t.out()).not.toContain('EISDIR');
  });

  it('explains in words, and fails for a brief with errors', async () => {
    const dir = workspace();
    const t = io(dir);
    expect(await runCli(['explain', 'piers.yaml'], t.io)).toBe(EXIT.OK);
    expect(t.out()).toMatch(/^form: bar\n- bar chart\n {4}because compare\.categorical-key/);
    const bad = io(dir);
    expect(await runCli(['explain', 'typo.yaml', '--json'], bad.io)).toBe(EXIT.FAILED);
    expect(JSON.parse(bad.out())).toMatchObject({ form: null, diagnostics: [{ code: 'brief.unknown-column', path: '/values' }] });
  });
});

describe('chartwright check, schema, help and version', () => {
  it('check passes clean briefs, fails bad ones, and fails warnings with --strict', async () => {
    const dir = workspace();
    expect(await runCli(['check', 'piers.yaml', 'warn.yaml'], io(dir).io)).toBe(EXIT.OK);
    expect(await runCli(['check', 'piers.yaml', 'warn.yaml', '--strict'], io(dir).io)).toBe(EXIT.FAILED);
    expect(await runCli(['check', 'typo.yaml'], io(dir).io)).toBe(EXIT.FAILED);
    expect(files(dir).filter((f) => f.endsWith('.svg'))).toEqual([]);
  });

  it('schema prints the JSON Schema of a brief', async () => {
    const t = io(tempDir());
    expect(await runCli(['schema'], t.io)).toBe(EXIT.OK);
    const schema = JSON.parse(t.out());
    expect(schema.$schema).toMatch(/2020-12/);
    expect(schema.properties.intent.enum).toContain('compare');
  });

  it('--help and --version exit 0; an unknown command is a usage error', async () => {
    const t = io(tempDir());
    expect(await runCli(['--version'], t.io)).toBe(EXIT.OK);
    expect(t.out()).toMatch(/^\d+\.\d+\.\d+\n$/);
    const h = io(tempDir());
    expect(await runCli(['--help'], h.io)).toBe(EXIT.OK);
    expect(h.out()).toMatch(/render.*\n.*explain/s);
    expect(await runCli(['paint'], io(tempDir()).io)).toBe(EXIT.USAGE);
  });
});

describe('chartwright demo', () => {
  it('renders every demo brief as SVG and PNG into the folder', async () => {
    const dir = tempDir();
    expect(await runCli(['demo', 'gallery', '--scale', '1'], io(dir).io)).toBe(EXIT.OK);
    const out = files(join(dir, 'gallery'));
    expect(out.filter((f) => f.endsWith('.svg')).length).toBeGreaterThanOrEqual(3);
    expect(out.filter((f) => f.endsWith('.png')).length).toBe(out.filter((f) => f.endsWith('.svg')).length);
  });
});

describe('diagnostic formatting', () => {
  it('uses colour only on a terminal without NO_COLOR or CI', () => {
    expect(colourAllowed(true, {})).toBe(true);
    expect(colourAllowed(false, {})).toBe(false);
    expect(colourAllowed(true, { NO_COLOR: '' })).toBe(false);
    expect(colourAllowed(true, { CI: 'true' })).toBe(false);
  });

  it('pins the layout of a formatted diagnostic', () => {
    expect(formatDiagnostic({ code: 'table.ragged-row', severity: 'error', message: 'line 3 has a different number of cells', file: 'd.csv', line: 3, found: '1 cells', expected: '2 cells', hint: 'quote cells' }))
      .toBe('d.csv: error[table.ragged-row] line 3 has a different number of cells\n  found: 1 cells; expected: 2 cells\n  hint: quote cells');
    expect(formatDiagnostic({ code: 'table.header-only', severity: 'error', message: 'the data file has a header but no data rows', file: 'd.csv', line: 1, hint: 'add rows' }))
      .toBe('d.csv: error[table.header-only] the data file has a header but no data rows (line 1)\n  hint: add rows');
    expect(formatDiagnostic({ code: 'choice.no-key', severity: 'error', message: 'm', path: '/keys' }, true)).toBe('\u001b[31merror\u001b[0m[choice.no-key] m (at /keys)');
  });
});
