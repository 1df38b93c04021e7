import { describe, expect, it } from 'vitest';
import { MAX_LAYOUT_TEXT } from '../../src/layout/text.js';
import { nodesOf } from '../../src/scene/walk.js';
import { parseXml, renderRows } from '../helpers.js';

describe('text that reaches layout has a limit', () => {
  // Guards the issue-7 cases: a 100 kB label or title used to take minutes and gigabytes.
  it('a 100,000-character label and title render with every scene text capped, the full key kept in the bar\'s datum', async () => {
    const long = 'harbour '.repeat(12_500).trim();
    const r = await renderRows({ intent: 'compare', keys: 'k', values: 'v', title: long, size: { width: 720, height: 4000 }, fields: { v: { unit: 'u' } } }, [{ k: long, v: 3 }, { k: 'Short', v: 2 }]);
    expect(r.scene).toBeDefined();
    const texts = nodesOf(r.scene!.root).filter((n) => n.kind === 'text');
    for (const t of texts) if (t.kind === 'text') expect([...t.text].length).toBeLessThanOrEqual(MAX_LAYOUT_TEXT);
    const bar = nodesOf(r.scene!.root).find((n) => n.role === 'bar' && n.datum?.k === long);
    expect(bar).toBeDefined();
    if (r.svg) parseXml(r.svg);
  });
});
