import { execFileSync } from 'node:child_process';
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { EXIT } from '../../src/cli/exit-codes.js';
import { runCli } from '../../src/cli/run.js';
import { root, tempDir } from '../helpers.js';
import { io, pierBrief, workspace } from './cli-helpers.js';

const bin = join(root, 'bin', 'chartwright.js');

function renderInFreshProcess(brief: string, out: string, extraEnv: Record<string, string> = {}): void {
  execFileSync(process.execPath, [bin, 'render', brief, '-o', out, '--png'], { cwd: root, env: { ...process.env, ...extraEnv }, stdio: 'pipe' });
}

/** The drawn texts of an SVG, in order. */
const texts = (svg: string) => [...svg.matchAll(/<text[^>]*>([^<]*)<\/text>/g)].map((m) => m[1]!);

describe('--locale and the brief\'s locale', () => {
  it('a locale-de chart is the same bytes under any machine locale and time zone (no Intl, no toLocaleString)', () => {
    const brief = join(root, 'demo-data', 'kiosk-takings.yaml');
    const [a, b] = [tempDir(), tempDir()];
    renderInFreshProcess(brief, a, { LANG: 'C', LC_ALL: 'C', TZ: 'UTC' });
    renderInFreshProcess(brief, b, { TZ: 'Pacific/Chatham', LANG: 'de_DE.UTF-8', LC_ALL: 'de_DE.UTF-8' });
    for (const name of ['kiosk-takings.svg', 'kiosk-takings.png']) {
      expect(readFileSync(join(b, name)).equals(readFileSync(join(a, name)))).toBe(true);
    }
  });

  it('--locale de on render writes German marks over an English brief; without it the same brief is English', async () => {
    const dir = workspace();
    writeFileSync(join(dir, 'big.csv'), 'pier,crossings\nNorth,1212.5\nSouth,640.25\n');
    writeFileSync(join(dir, 'big.yaml'), 'data: big.csv\nintent: compare\nkeys: pier\nvalues: crossings\nfields: { crossings: { unit: crossings } }\n');
    expect(await runCli(['render', 'big.yaml', '-o', 'de', '--locale', 'de'], io(dir).io)).toBe(EXIT.OK);
    expect(await runCli(['render', 'big.yaml', '-o', 'en'], io(dir).io)).toBe(EXIT.OK);
    expect(texts(readFileSync(join(dir, 'de', 'big.svg'), 'utf8'))).toContain('1.212,5');
    expect(texts(readFileSync(join(dir, 'en', 'big.svg'), 'utf8'))).toContain('1,212.5');
  });

  it('--locale en overrides a brief\'s locale: de', async () => {
    const dir = workspace();
    writeFileSync(join(dir, 'de.yaml'), pierBrief('locale: de\n'));
    const t = io(dir);
    expect(await runCli(['explain', 'de.yaml', '--json'], t.io)).toBe(EXIT.OK);
    expect(t.out()).toContain('locale de');
    const u = io(dir);
    expect(await runCli(['explain', 'de.yaml', '--json', '--locale', 'en'], u.io)).toBe(EXIT.OK);
    expect(u.out()).not.toContain('locale de');
  });

  it('check takes --locale; an unknown locale is a usage error (exit 2)', async () => {
    const dir = workspace();
    expect(await runCli(['check', 'piers.yaml', '--locale', 'de'], io(dir).io)).toBe(EXIT.OK);
    expect(await runCli(['check', 'piers.yaml', '--locale', 'fr'], io(dir).io)).toBe(EXIT.USAGE);
  });

  it('a brief naming an unknown locale is refused by the schema, at /locale', async () => {
    const dir = workspace();
    writeFileSync(join(dir, 'fr.yaml'), pierBrief('locale: fr\n'));
    const t = io(dir);
    expect(await runCli(['check', 'fr.yaml'], t.io)).toBe(EXIT.FAILED);
    expect(t.err()).toContain('error[brief.bad-value] /locale');
  });
});
