import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { EXIT } from '../../src/cli/exit-codes.js';
import { runCli } from '../../src/cli/run.js';
import { INPUT_LIMITS, inputLimit, readBounded } from '../../src/io/bounded-read.js';
import { root, tempDir } from '../helpers.js';
import { io, pierBrief, workspace } from './cli-helpers.js';

describe('reading a file up to a limit (style: /dev/zero once reached 11.8 GiB)', () => {
  it('reads a file of exactly the limit, and refuses one byte more', () => {
    const dir = tempDir();
    writeFileSync(join(dir, 'ten'), '0123456789');
    expect(readBounded(join(dir, 'ten'), 10)).toEqual({ ok: true, text: '0123456789' });
    expect(readBounded(join(dir, 'ten'), 9)).toEqual({ ok: false, tooLarge: true });
  });

  it.skipIf(!existsSync('/dev/zero'))('stops an endless file at the limit instead of reading it all', () => {
    expect(readBounded('/dev/zero', 1024)).toEqual({ ok: false, tooLarge: true });
  });

  it('takes a limit from its environment variable only when that is a positive integer', () => {
    expect(inputLimit('brief', {})).toBe(1024 * 1024);
    expect(inputLimit('style', { CHARTWRIGHT_MAX_STYLE_BYTES: '4096' })).toBe(4096);
    for (const bad of ['', '-1', '0', '1.5', 'lots']) expect(inputLimit('brief', { CHARTWRIGHT_MAX_BRIEF_BYTES: bad }), bad).toBe(INPUT_LIMITS.brief.bytes);
  });
});

describe('brief and style files larger than their limits are coded errors that say how to raise them', () => {
  it('a brief over 1 MiB is cli.brief-too-large; CHARTWRIGHT_MAX_BRIEF_BYTES raises the limit', async () => {
    const dir = workspace();
    writeFileSync(join(dir, 'long.yaml'), `${pierBrief()}${'# padding\n'.repeat(110_000)}`);
    const t = io(dir);
    expect(await runCli(['render', 'long.yaml'], t.io)).toBe(EXIT.FAILED);
    expect(t.err()).toContain('long.yaml: error[cli.brief-too-large] the brief file is larger than 1 MiB');
    expect(t.err()).toContain('CHARTWRIGHT_MAX_BRIEF_BYTES');
    const raised = io(dir);
    raised.io.env = { CHARTWRIGHT_MAX_BRIEF_BYTES: String(2 * 1024 * 1024) };
    expect(await runCli(['render', 'long.yaml'], raised.io)).toBe(EXIT.OK);
  });

  it.skipIf(!existsSync('/dev/zero'))('a /dev/zero brief or style stops at the limit', async () => {
    const dir = workspace();
    const t = io(dir);
    expect(await runCli(['check', '/dev/zero'], t.io)).toBe(EXIT.FAILED);
    expect(t.err()).toContain('error[cli.brief-too-large]');
    writeFileSync(join(dir, 'zero.yaml'), pierBrief('style: /dev/zero\n'));
    const s = io(dir);
    expect(await runCli(['check', 'zero.yaml'], s.io)).toBe(EXIT.FAILED);
    expect(s.err()).toMatch(/zero\.yaml: error\[cli\.style-too-large\] .* \(at \/style, line 6:8\)/);
  });

  it('a style file over CHARTWRIGHT_MAX_STYLE_BYTES is cli.style-too-large; under the default 256 KiB it renders', async () => {
    const dir = workspace();
    writeFileSync(join(dir, 'mine.json'), readFileSync(join(root, 'templates', 'styles', 'report.json')));
    writeFileSync(join(dir, 'styled.yaml'), pierBrief('style: ./mine.json\n'));
    expect(await runCli(['check', 'styled.yaml'], io(dir).io)).toBe(EXIT.OK);
    const t = io(dir);
    t.io.env = { CHARTWRIGHT_MAX_STYLE_BYTES: '100' };
    expect(await runCli(['check', 'styled.yaml'], t.io)).toBe(EXIT.FAILED);
    expect(t.err()).toContain('error[cli.style-too-large] the style file `./mine.json` is larger than 100 bytes');
    expect(t.err()).toContain('CHARTWRIGHT_MAX_STYLE_BYTES');
  });
});
