import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { renderPlan } from '../../src/cli/batch.js';
import { planRun } from '../../src/cli/plan.js';
import { env } from '../helpers.js';
import { pierBrief, workspace } from './cli-helpers.js';

describe('a planned brief is rendered from the text its outputs were planned from', () => {
  it('renders the brief as it was when planned, even if the file changed after', async () => {
    const dir = workspace();
    const file = join(dir, 'planned.yaml');
    writeFileSync(file, pierBrief('title: As planned\noutput: planned-chart.svg\n'));
    const { plans } = planRun([{ file }], { png: false }, dir);
    writeFileSync(file, pierBrief('title: Changed later\noutput: other-name.svg\n'));
    const result = await renderPlan(plans[0]!, env, { strict: false, lenient: false, debug: false });
    expect(plans[0]!.files.map((f) => f.path)).toEqual([join(dir, 'planned-chart.svg')]);
    expect(result.brief?.title).toBe('As planned');
  });

  it('reads the brief file again when planning could not parse it, and reports why', async () => {
    const dir = workspace();
    const file = join(dir, 'broken.yaml');
    writeFileSync(file, 'intent: [compare\n');
    const { plans } = planRun([{ file }], { png: false }, dir);
    const result = await renderPlan(plans[0]!, env, { strict: false, lenient: false, debug: false });
    expect(plans[0]!.source).toBeUndefined();
    expect(result.ok).toBe(false);
    expect(result.diagnostics.map((d) => d.code)).toContain('brief.parse-error');
  });
});
