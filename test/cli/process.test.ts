import { spawn } from 'node:child_process';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { root, tempDir } from '../helpers.js';

describe('the bin as a process', () => {
  it('stops quietly when its reader closes the pipe early (a past EPIPE stack trace)', async () => {
    const child = spawn(process.execPath, [join(root, 'bin', 'chartwright.js'), 'demo', tempDir(), '--scale', '1'], { stdio: ['ignore', 'pipe', 'pipe'] });
    let stderr = '';
    child.stderr.on('data', (d) => { stderr += String(d); });
    child.stdout.once('data', () => child.stdout.destroy());
    const code = await new Promise<number | null>((resolve) => child.on('exit', resolve));
    expect(stderr).toBe('');
    expect(code).toBe(0);
  });
});
