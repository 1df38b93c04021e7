import { readFileSync } from 'node:fs';
import { basename } from 'node:path';
import { describe, expect, it } from 'vitest';
import { contrastRatio, MARK_CONTRAST, TEXT_CONTRAST } from '../../src/color/wcag.js';
import { renderBrief } from '../../src/pipeline/render.js';
import { dumpScene } from '../../src/scene/dump.js';
import { demoBriefs, env } from '../helpers.js';
import { marksOffCanvas } from './canvas-contracts.js';
import { markContrasts, textContrasts } from './contrast-contracts.js';
import { checkTexts } from './text-contracts.js';

const STYLES = ['report', 'slide', 'print', 'dark'] as const;

/**
 * WCAG 2.x SC 1.4.3 asks 4.5:1 of text and 3:1 of large text; a label inside a filled mark can
 * only be as clear as the better of the style's two inks (its label colour and its page colour)
 * on that fill, which on mid-tone fills lies between 4.0 and 4.5:1 for the shipped styles. So
 * such a label must be in the better ink and keep at least the large-text 3:1.
 */
const ON_MARK_FLOOR = 3;

describe.each(STYLES)('every gallery chart in the %s style', (style) => {
  it.each(demoBriefs().map((f) => [basename(f, '.yaml'), f]))('%s: no text collides, nothing leaves the canvas, and text and marks contrast with what they sit on', async (_name, file) => {
    const result = await renderBrief({ brief: readFileSync(file, 'utf8'), file, style }, env);
    expect(result.ok, JSON.stringify(result.diagnostics.filter((d) => d.severity === 'error'))).toBe(true);
    const scene = result.scene!;
    checkTexts(dumpScene(scene));
    expect(marksOffCanvas(scene).map((m) => `${m.role} ${m.id}`)).toEqual([]);
    const resolved = env.style(style, undefined);
    if (!resolved.ok) throw new Error(`the ${style} preset does not load`);
    const inks = [resolved.value.text.label.color, resolved.value.background];
    const texts = textContrasts(scene);
    expect(texts.length).toBeGreaterThan(0);
    const unread = texts.filter((t) => (t.on === 'background'
      ? t.ratio < TEXT_CONTRAST
      : t.ratio < ON_MARK_FLOOR || t.ratio < Math.max(...inks.map((ink) => contrastRatio(ink, t.under))) - 1e-9));
    expect(unread.map((t) => `${JSON.stringify(t.text)} (${t.role}) ${t.fill} on ${t.on} ${t.under}: ${t.ratio.toFixed(2)}:1`)).toEqual([]);
    // WCAG 2.1 SC 1.4.11: graphical objects 3:1 against adjacent colours. A mark drawn translucent
    // on purpose (so piles of marks read darker) is held to it at full strength.
    const faint = markContrasts(scene).filter((m) => m.ratio < MARK_CONTRAST || (m.opacity === 1 && m.drawnRatio < MARK_CONTRAST));
    expect([...new Set(faint.map((m) => `${m.role} ${m.colour}: ${m.ratio.toFixed(2)}:1`))]).toEqual([]);
  });
});
