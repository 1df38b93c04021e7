import { describe, expect, it } from 'vitest';
import { dumpScene } from '../../src/scene/dump.js';
import { codes, renderRows } from '../helpers.js';

const notes = (r: Awaited<ReturnType<typeof renderRows>>) => dumpScene(r.scene!).texts.filter((t) => t.role === 'note').map((t) => t.text).join(' ');
const CROPS = ['Oats', 'Rye', 'Barley', 'Wheat'];
const MONTHS = ['2025-01', '2025-02', '2025-03', '2025-04', '2025-05', '2025-06', '2025-07', '2025-08'];

/** Monthly tonnes per crop; `skip` months have no row at all, `blank` cells an empty value. */
function harvest(skip: string[], blank: [string, string][]) {
  return MONTHS.filter((m) => !skip.includes(m)).flatMap((month, i) => CROPS.map((crop, j) => ({
    month, crop, tonnes: blank.some(([c, m]) => c === crop && m === month) ? null : 5 + ((i * 3 + j * 5) % 7),
  })));
}
const brief = { intent: 'flow', keys: ['month', 'crop'], values: 'tonnes', fields: { tonnes: { unit: 't' } } };

describe('a streamgraph says where it has no data instead of flowing smoothly through', () => {
  it('a blank value is named in the note with its series and period, drawn as zero thickness', async () => {
    const r = await renderRows(brief, harvest([], [['Rye', '2025-03']]));
    expect(r.ok).toBe(true);
    expect(r.scene!.form).toBe('stream');
    expect(notes(r)).toContain('No data for Rye in Mar 2025: drawn as zero thickness, not smoothed over.');
  });

  it('a month with no rows at all is put back at its place (zero thickness), warned about and named in the note', async () => {
    const r = await renderRows(brief, harvest(['2025-05'], []));
    expect(r.ok).toBe(true);
    expect(codes(r)).toContain('derive.uneven-dates');
    expect(notes(r)).toContain('No rows for May 2025: every layer narrows to zero thickness there.');
  });

  it('monthly data is ticked at months or coarser, never by week or day', async () => {
    // Three months across a wide plot: a tick finder not bound to the grain would tick every week ("13 Jan, 27 Jan").
    const r = await renderRows({ ...brief, size: { width: 900, height: 500 } }, harvest([], []).filter((row) => row.month <= '2025-03'));
    expect(r.ok).toBe(true);
    const ticks = dumpScene(r.scene!).texts.filter((t) => t.role === 'tick').map((t) => t.text);
    const keyTicks = ticks.filter((t) => /[A-Za-z]/.test(t));
    expect(keyTicks.length).toBeGreaterThan(1);
    // A day-of-month tick reads "13 Jan"; a monthly one "Feb" or "Feb 2025".
    for (const t of keyTicks) expect(t).not.toMatch(/^\d{1,2} [A-Z][a-z]{2}/);
  });
});
