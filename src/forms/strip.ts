import { jitterOffsets } from '../derive/jitter.js';
import type { GroupDistribution } from '../derive/distribution.js';
import { rule } from '../layout/axes.js';
import type { LayoutContext, PlotArea } from '../layout/kit-types.js';
import { asBand, asLinear } from '../layout/scales.js';
import type { SceneNode } from '../scene/types.js';
import { groupsForm, type DerivedGroups } from './groups.js';

/** Dot radius in px, and the share of the band's half-height the jitter may use (the rest keeps strips apart). */
export const STRIP_DOT_R = 3;
export const JITTER_SHARE = 0.8;
/** Dot opacity: overlapping dots read darker (common practice for strip plots). */
const DOT_OPACITY = 0.6;

/** One group's dots, jittered across its band by offsets seeded with its label, and its median as a rule. */
function stripOf(d: DerivedGroups, g: GroupDistribution, area: PlotArea, ctx: LayoutContext): SceneNode[] {
  const x = asLinear(area.x);
  const band = asBand(area.y);
  const centre = band.center(g.label);
  const r = Math.max(0.5, Math.min(STRIP_DOT_R, band.bandwidth / 4));
  const reach = Math.max(0, band.bandwidth / 2 - r) * JITTER_SHARE;
  const offsets = jitterOffsets(g.values.length, g.label);
  const { key, value } = d.query;
  const dots: SceneNode[] = g.values.map((v, i) => ({
    kind: 'circle', id: ctx.id('point', `${g.label}-${i}`), role: 'point', datum: { [key.name]: g.label, [value.name]: v, row: g.rows[i]! },
    cx: x.map(v), cy: centre + offsets[i]! * reach, r, fill: ctx.style.palette.primary, opacity: DOT_OPACITY,
  }));
  const m = x.map(g.stats.median);
  const median = { ...rule(ctx.id('median', g.label), 'reference', m, centre - band.bandwidth / 2, m, centre + band.bandwidth / 2, ctx.style.lines.zero, 2), datum: { [key.name]: g.label, median: g.stats.median } };
  return [...dots, median];
}

/**
 * The strip chart: one row per group, every value a dot along a shared value axis, jittered
 * across the row (seeded by the group's label, so the same data gives the same picture), with
 * the group's median marked.
 */
export const STRIP = groupsForm({
  name: 'strip',
  noun: 'strip chart of jittered dots',
  article: 'a strip chart',
  title: 'Strip chart',
  marksOf: stripOf,
  decisions: [
    { decision: 'each value one dot, jittered across its row; the median marked by a line', rule: 'jitter keeps equal and near-equal values from hiding one another (common practice); it is seeded by the group\'s label, so the same data always gives the same picture' },
    { decision: `dots ${STRIP_DOT_R} px, drawn at ${DOT_OPACITY} opacity`, rule: 'translucent dots read darker where they pile up, so density stays visible (common practice)' },
  ],
  how: 'Each dot is one row, spread up and down at random (seeded, the same on every run) so that equal values stay visible; the dark line marks the median.',
});
