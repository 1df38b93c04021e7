import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { renderBrief } from '../../src/pipeline/render.js';
import type { TextModeName } from '../../src/style/types.js';
import { ID_PREFIX_MAX } from '../../src/svg/id-prefix.js';
import { demoBriefs, env, renderRows } from '../helpers.js';

/** Every id an SVG defines, and every id it refers to (href="#…", url(#…), aria-labelledby). */
function idsOf(svg: string): { defined: string[]; referred: string[] } {
  const defined = [...svg.matchAll(/\sid="([^"]+)"/g)].map((m) => m[1]!);
  const hrefs = [...svg.matchAll(/href="#([^"]+)"/g), ...svg.matchAll(/url\(#([^)]+)\)/g)].map((m) => m[1]!);
  const labelled = [...svg.matchAll(/aria-labelledby="([^"]+)"/g)].flatMap((m) => m[1]!.split(' '));
  return { defined, referred: [...hrefs, ...labelled] };
}

async function renderWith(file: string, idPrefix: string, textMode: TextModeName): Promise<string> {
  const r = await renderBrief({ brief: readFileSync(file, 'utf8'), file, idPrefix, textMode }, env);
  expect(r.ok, file).toBe(true);
  return r.svg!;
}

describe('idPrefix', () => {
  for (const textMode of ['outline', 'embed'] as const) {
    it(`${textMode}: two renders of every gallery chart with different prefixes share no id, and each reference resolves in its own SVG`, async () => {
      for (const file of demoBriefs()) {
        const [a, b] = [idsOf(await renderWith(file, 'figA', textMode)), idsOf(await renderWith(file, 'figB', textMode))];
        expect(a.defined.length, file).toBeGreaterThan(0);
        expect(a.defined.filter((id) => b.defined.includes(id)), file).toEqual([]);
        for (const [ids, prefix] of [[a, 'figA'], [b, 'figB']] as const) {
          expect(new Set(ids.defined).size, file).toBe(ids.defined.length);
          expect(ids.defined.every((id) => id.startsWith(prefix)), file).toBe(true);
          expect(ids.referred.filter((id) => !ids.defined.includes(id)), file).toEqual([]);
        }
      }
    });
  }

  it('refuses a prefix that cannot start an XML id, or a long one, with a coded error and a fix', async () => {
    for (const bad of ['1chart', 'a b', 'x"y', '', 'é', 'a'.repeat(ID_PREFIX_MAX + 1)]) {
      const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v' }, [{ k: 'a', v: 1 }], { idPrefix: bad });
      expect(r.ok).toBe(false);
      expect(r.diagnostics).toMatchObject([{ code: 'render.bad-id-prefix', path: '/idPrefix' }]);
      expect(r.diagnostics[0]!.hint).toMatch(/^use e\.g\. `[A-Za-z_][A-Za-z0-9_.-]*`$/);
    }
    const ok = await renderRows({ intent: 'compare', keys: 'k', values: 'v' }, [{ k: 'a', v: 1 }], { idPrefix: `_a.b-${'c'.repeat(ID_PREFIX_MAX - 5)}` });
    expect(ok.ok).toBe(true);
  });
});
