import fc from 'fast-check';
import * as fontkit from 'fontkit';
import { describe, expect, it } from 'vitest';
import { createNodeEnv } from '../../src/io/node-env.js';
import { renderBrief, type RenderResult } from '../../src/pipeline/render.js';
import { allNodes } from '../../src/scene/walk.js';
import { runsOf, unicodeRange } from '../../src/svg/embed.js';
import { env, parseXml, renderRows, runs } from '../helpers.js';
import { bundledCharset, outsideBlocks } from '../font/subset-helpers.js';

interface Face { weight: number; cmap: Set<number>; range: string }

/** The @font-face rules of an SVG, each font parsed back from its WOFF2 data URI with fontkit (an independent reader). */
function facesOf(svg: string): Face[] {
  const css = parseXml(svg).getElementsByTagName('style')[0]?.textContent ?? '';
  return [...css.matchAll(/@font-face\{font-family:"([^"]+)";font-weight:(\d+);src:url\(data:font\/woff2;base64,([A-Za-z0-9+/=]+)\) format\("woff2"\);unicode-range:([^}]+)\}/g)].map((m) => {
    const font = fontkit.create(Buffer.from(m[3]!, 'base64')) as fontkit.Font;
    // WOFF2 signature 'wOF2' (W3C WOFF 2.0, section 3)
    expect(Buffer.from(m[3]!, 'base64').subarray(0, 4).toString('latin1')).toBe('wOF2');
    expect(font.familyName).not.toMatch(/source/i);
    return { weight: Number(m[2]), cmap: new Set(font.characterSet), range: m[4]! };
  });
}

/** Whether a CSS unicode-range (U+A, U+A-B, comma-separated) includes a code point. */
function rangeHas(range: string, cp: number): boolean {
  return range.split(',').some((part) => {
    const [a, b] = part.replace('U+', '').split('-').map((h) => parseInt(h, 16));
    return cp >= a! && cp <= (b ?? a!);
  });
}

/** Every character the bundled font has, in every text node of the scene, is in a face of its weight whose range and cmap both hold it. */
function expectCovered(result: RenderResult): void {
  const faces = facesOf(result.svg!);
  for (const node of allNodes([result.scene!.root])) {
    if (node.kind !== 'text') continue;
    const weight = node.weight === 'regular' ? 400 : 600;
    for (const ch of node.text) {
      const cp = ch.codePointAt(0)!;
      if (!bundledCharset(node.weight).has(cp)) continue;
      const face = faces.find((f) => f.weight === weight && rangeHas(f.range, cp));
      expect(face?.cmap.has(cp), `U+${cp.toString(16)} at weight ${weight}`).toBe(true);
    }
  }
}

const alphabet = [...'abcXYZ019 .,-éüøłşñÅçαβγΩλЖдяЁщ€°–’…'].concat(outsideBlocks('regular').slice(0, 6).map((cp) => String.fromCodePoint(cp)));
const label = fc.array(fc.constantFrom(...alphabet), { minLength: 1, maxLength: 14 }).map((cs) => cs.join('').trim() || 'x');

describe('embedded fonts', () => {
  it('cover every character of every text node, accented Latin, Greek, Cyrillic and rare symbols alike', async () => {
    await fc.assert(fc.asyncProperty(fc.uniqueArray(label, { minLength: 2, maxLength: 5 }), label, async (keys, title) => {
      const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', title, fields: { v: { unit: 'kg' } } }, keys.map((k, i) => ({ k, v: i + 1 })));
      if (!r.ok) return;
      expectCovered(r);
    }), { numRuns: runs(6) });
  });

  it('embed only the basic block for a plain ASCII chart, and no run-time subset', async () => {
    const counted = { ...env, embedFonts: () => ({ ...env.embedFonts(), subset: () => { throw new Error('no run-time subset expected'); } }) };
    const r = await renderBrief({ brief: { intent: 'compare', keys: 'k', values: 'v', title: 'Plain words', fields: { v: { unit: 'kg' } }, rows: [{ k: 'North', v: 2 }, { k: 'South', v: 1 }] } }, counted);
    expect(r.ok).toBe(true);
    const faces = facesOf(r.svg!);
    expect(faces.map((f) => f.weight)).toEqual([400, 600]);
    expect(faces.every((f) => rangeHas(f.range, 0x41) && !rangeHas(f.range, 0x3b1))).toBe(true);
  });

  it('cut a run-time subset holding exactly the characters outside the prebuilt blocks', async () => {
    const rare = outsideBlocks('regular').slice(0, 3);
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', fields: { v: { unit: 'kg' } } }, [{ k: `A${String.fromCodePoint(...rare)}`, v: 1 }, { k: 'B', v: 2 }]);
    const runtime = facesOf(r.svg!).filter((f) => f.weight === 400 && rangeHas(f.range, rare[0]!));
    expect(runtime).toHaveLength(1);
    expect(runtime[0]!.range).toBe(unicodeRange(runsOf(rare)));
    for (const cp of rare) expect(runtime[0]!.cmap.has(cp)).toBe(true);
  });

  it('give the same bytes for the same input, from a fresh environment or a warm cache', async () => {
    const rows = [{ k: `Zoë αβ Жд ${String.fromCodePoint(...outsideBlocks('regular').slice(0, 2))}`, v: 3 }, { k: 'B', v: 1 }];
    const brief = { intent: 'compare', keys: 'k', values: 'v', fields: { v: { unit: 'kg' } }, rows };
    const first = await renderBrief({ brief }, createNodeEnv());
    const warm = await renderBrief({ brief }, env);
    const again = await renderBrief({ brief }, env);
    expect(first.svg).toBe(warm.svg);
    expect(again.svg).toBe(warm.svg);
  });
});

describe('a font that cannot be embedded', () => {
  it('is a coded error naming the way around it, never a crash', async () => {
    const failing = { ...env, embedFonts: () => ({ ...env.embedFonts(), subset: () => Promise.reject(new Error('no subsetter')) }) };
    const rare = String.fromCodePoint(outsideBlocks('regular')[0]!);
    const r = await renderBrief({ brief: { intent: 'compare', keys: 'k', values: 'v', fields: { v: { unit: 'kg' } }, rows: [{ k: `A${rare}`, v: 1 }, { k: 'B', v: 2 }] } }, failing);
    expect(r.ok).toBe(false);
    expect(r.svg).toBeUndefined();
    expect(r.diagnostics.map((d) => d.code)).toEqual(['render.embed-failed']);
    const live = await renderBrief({ brief: { intent: 'compare', keys: 'k', values: 'v', fields: { v: { unit: 'kg' } }, rows: [{ k: `A${rare}`, v: 1 }, { k: 'B', v: 2 }] }, textMode: 'live' }, failing);
    expect(live.ok).toBe(true);
  });
});

describe('unicode-range', () => {
  it('writes runs of code points as CSS Fonts 4 unicode-range values', () => {
    // CSS Fonts Module Level 4, the unicode-range descriptor: U+<hex> or U+<hex>-<hex>, comma-separated.
    expect(unicodeRange(runsOf([0x20, 0x21, 0x22, 0x41, 0x1f130, 0x1f131]))).toBe('U+20-22,U+41,U+1F130-1F131');
  });
});
