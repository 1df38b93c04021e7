import { describe, expect, it } from 'vitest';
import * as api from '../src/index.js';
import { env } from './helpers.js';

describe('library API', () => {
  it('exports exactly the documented names', () => {
    expect(Object.keys(api).sort()).toEqual([
      'BRIEF_SCHEMA', 'CATALOGUE', 'FORMS', 'RenderError', 'checkBriefValue', 'choose', 'createNodeEnv', 'deriveBars', 'dumpScene',
      'formatDiagnostic', 'inferFields', 'layoutCartesian', 'layoutChart', 'loadInputs', 'outlineSvg', 'rasterize', 'readBrief', 'readTable', 'render',
      'renderBrief', 'renderInputs', 'resolveBrief', 'runCli', 'writeSvg',
    ]);
  });

  it('render(brief, rows) returns svg, scene, rationale and warnings', async () => {
    const out = await api.render({ intent: 'compare', keys: 'pier', values: 'n', fields: { n: { unit: 'crossings' } } }, [{ pier: 'North', n: 3 }, { pier: 'South', n: null }], { env, pngScale: 1 });
    expect(out.svg).toMatch(/^<svg /);
    expect(out.png!.subarray(1, 4).toString()).toBe('PNG');
    expect(out.form).toBe('bar');
    expect(out.scene.marks.filter((m) => m.role === 'bar')).toHaveLength(1);
    expect(out.rationale.length).toBeGreaterThan(0);
    expect(out.warnings.map((w) => w.code)).toEqual(['derive.missing-values']);
  });

  it('render throws a RenderError carrying the diagnostics', async () => {
    const failing = api.render({ intent: 'compare', keys: 'pier', values: 'n', baseline: 'fit' }, [{ pier: 'North', n: 3 }], { env });
    await expect(failing).rejects.toBeInstanceOf(api.RenderError);
    await expect(failing).rejects.toMatchObject({ diagnostics: [{ code: 'choice.baseline-fit-refused' }] });
  });

  it('every catalogued code has a severity, and codes are namespaced by stage', () => {
    for (const [code, severity] of Object.entries(api.CATALOGUE)) {
      expect(code).toMatch(/^(brief|table|fields|choice|derive|layout|output|render|cli)\.[a-z-]+$/);
      expect(['error', 'warning', 'info']).toContain(severity);
    }
  });
});
