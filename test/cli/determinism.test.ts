import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { root, tempDir } from '../helpers.js';

const bin = join(root, 'bin', 'chartwright.js');

function renderInFreshProcess(brief: string, out: string, extraEnv: Record<string, string> = {}): void {
  execFileSync(process.execPath, [bin, 'render', brief, '-o', out, '--png'], { cwd: root, env: { ...process.env, ...extraEnv }, stdio: 'pipe' });
}

describe('determinism', () => {
  it('the same brief rendered in two separate processes gives identical SVG and PNG bytes', () => {
    const brief = join(root, 'demo-data', 'hut-overnights.yaml');
    const [a, b] = [tempDir(), tempDir()];
    renderInFreshProcess(brief, a);
    // A different time zone and locale must not matter either.
    renderInFreshProcess(brief, b, { TZ: 'Pacific/Chatham', LANG: 'de_DE.UTF-8', LC_ALL: 'de_DE.UTF-8' });
    for (const name of ['hut-overnights.svg', 'hut-overnights.png']) {
      expect(readFileSync(join(b, name)).equals(readFileSync(join(a, name)))).toBe(true);
    }
  });

  it('the code-cached CommonJS loader and the ESM bundle write identical bytes', () => {
    const brief = join(root, 'demo-data', 'cistern-balance.yaml');
    const [a, b] = [tempDir(), tempDir()];
    renderInFreshProcess(brief, a);
    renderInFreshProcess(brief, b, { CHARTWRIGHT_ESM: '1' });
    for (const name of ['cistern-balance.svg', 'cistern-balance.png']) {
      expect(readFileSync(join(b, name)).equals(readFileSync(join(a, name)))).toBe(true);
    }
  });

  it('the bundled CLI writes the same SVG as the golden', () => {
    const out = tempDir();
    renderInFreshProcess(join(root, 'demo-data', 'ferry-crossings.yaml'), out);
    expect(readFileSync(join(out, 'ferry-crossings.svg'), 'utf8')).toBe(readFileSync(join(root, 'golden', 'ferry-crossings', 'ferry-crossings.svg'), 'utf8'));
  });
});
