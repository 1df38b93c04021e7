import { diagnostic, failure, success, type Outcome } from '../diagnostics/diagnostic.js';
import { shareAlt } from './bar-alt.js';
import { polar, shareAngles, wedgePath } from '../layout/arc.js';
import type { BodyMarks } from '../layout/chart.js';
import { inkOn } from '../layout/ink.js';
import type { LayoutContext } from '../layout/kit-types.js';
import type { LegendSpec } from '../layout/legend.js';
import { textBoxHeight, textNode } from '../layout/text.js';
import type { Box, SceneNode, TextNode } from '../scene/types.js';
import type { BarPlan } from './bar-plan.js';
import { deriveShares, planShares, type ShareBars } from './share-bars.js';
import { percentText } from './stack-text.js';
import type { FormDef, Planned, PlanInput } from './types.js';
import { inSentence } from '../fields/labels.js';

/** The hole's radius as a share of the outer radius (common practice: a ring thin enough to read as arcs, thick enough to hold a label). */
const HOLE = 0.58;

/** The plan: the share bars' plan (order and combining), without their orientation, with the donut's own words. */
function planDonut(input: PlanInput): Outcome<Planned<BarPlan>> {
  if (input.fields.keys.length !== 1) {
    return failure([diagnostic(input.fields.keys.length ? 'choice.too-many-keys' : 'choice.no-key', 'a donut shows the parts of one whole: it needs one key, the parts', {
      path: '/keys', found: input.fields.keys.map((k) => k.name).join(', ') || undefined, expected: 'one key column', hint: 'remove `form: donut` to draw normalized bars, one per group',
    })]);
  }
  const shares = planShares(input);
  if (!shares.ok) return shares;
  const decisions = shares.value.decisions.filter((d) => !/^(vertical|horizontal) bars$/.test(d.decision) && !d.decision.startsWith('bars of each key'));
  const order = decisions.findIndex((d) => d.decision.startsWith('bars '));
  const byValue = shares.value.plan.order === 'value';
  if (order >= 0) decisions[order] = byValue
    ? { decision: 'parts by value, largest first; ties by label', rule: 'the largest part starts at 12 o\'clock, where its angle is read against the vertical; a categorical key has no order of its own' }
    : { ...decisions[order]!, decision: decisions[order]!.decision.replace(/^bars /, 'parts ') };
  decisions.push({ decision: 'parts clockwise from 12 o\'clock, each as its share of the ring; named in a legend, percent inside where it fits', rule: 'common practice for pies and donuts: the first part starts at the top, so its angle is read against the vertical' });
  return success({ ...shares.value, decisions }, shares.diagnostics);
}

function fills(derived: ShareBars, ctx: LayoutContext): string[] {
  const { categorical } = ctx.style.palette;
  return derived.bars.map((_, i) => categorical[i % categorical.length]!);
}

function legend(derived: ShareBars, ctx: LayoutContext): LegendSpec {
  const f = fills(derived, ctx);
  return { kind: 'categorical', field: derived.query.key.name, title: derived.query.key.label, entries: derived.bars.map((b, i) => ({ label: b.label, fill: f[i]! })) };
}

/** A wedge's percent, centred in the ring at its middle angle, where it fits the ring's thickness and the wedge's arc. */
function wedgeLabel(text: string, fill: string, at: { x: number; y: number }, room: { thickness: number; arc: number }, ctx: LayoutContext, id: string): TextNode | undefined {
  const { label } = ctx.style.text;
  const [w, h] = [ctx.measure.width(text, label.size, label.weight), textBoxHeight(ctx.measure, label)];
  if (Math.hypot(w, h) > Math.min(room.thickness, room.arc) - 4) return undefined;
  return textNode(ctx.measure, { id, role: 'label', text, style: { ...label, color: inkOn(fill, label.color, ctx.style.background) }, x: at.x, top: at.y - h / 2, anchor: 'middle' });
}

function layoutDonut(derived: ShareBars, body: Box, ctx: LayoutContext): BodyMarks {
  const outer = Math.max(0, Math.min(body.width, body.height) / 2 - 2);
  const [cx, cy, inner] = [body.x + body.width / 2, body.y + body.height / 2, outer * HOLE];
  const f = fills(derived, ctx);
  const marks: SceneNode[] = [];
  const labels: TextNode[] = [];
  const angles = shareAngles(derived.bars.map((b) => b.value));
  derived.bars.forEach((bar, i) => {
    const { start, end } = angles[i]!;
    if (end <= start) return;
    const id = ctx.id('segment', bar.label);
    const datum = { [derived.query.key.name]: bar.label, [derived.sourceName]: derived.originals.get(bar.label) ?? null, share: bar.value };
    marks.push({ kind: 'path', id, role: 'segment', datum, commands: wedgePath({ cx, cy, inner, outer, start, end }), fill: f[i]!, stroke: ctx.style.background, strokeWidth: 1 });
    const mid = (inner + outer) / 2;
    const label = wedgeLabel(percentText(bar.value, derived.query.key.locale), f[i]!, polar(cx, cy, mid, (start + end) / 2), { thickness: outer - inner, arc: mid * (end - start) }, ctx, ctx.id('label', bar.label));
    if (label) labels.push(label);
  });
  const plot = { x: cx - outer, y: cy - outer, width: 2 * outer, height: 2 * outer };
  return { marks, labels, guides: [], panels: [{ id: 'panel', plot, axes: [] }], diagnostics: [] };
}

/**
 * The donut: a ring of 2 or 3 parts of one whole, each wedge's angle its share, clockwise from
 * 12 o'clock. Drawn only when the brief pins it; the radial hard rule refuses more parts.
 */
export const DONUT: FormDef<BarPlan, ShareBars> = {
  name: 'donut',
  noun: 'donut chart',
  traits: { lengthCoded: false, connectsKey: false, radial: true, coloursCategories: true, axisPerValue: false, partsOfWhole: true },
  plan: planDonut,
  derive: deriveShares,
  legend,
  layoutBody: layoutDonut,
  alt: (d) => shareAlt(d, 'Donut chart'),
  words(derived) {
    const name = inSentence(derived.query.key.label);
    const parts = derived.bars.map((b) => `${b.label} ${percentText(b.value, derived.query.key.locale)}`).join(', ');
    return { title: `${derived.query.value!.label} by ${name}`, description: `Donut chart of the ${derived.bars.length} parts of the whole by ${name}: ${parts}.`, notes: [] };
  },
};
