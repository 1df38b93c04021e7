import type { GroupDistribution } from '../derive/distribution.js';
import type { LayoutContext, PlotArea } from '../layout/kit-types.js';
import { asBand, asLinear } from '../layout/scales.js';
import type { PathCommand, SceneNode } from '../scene/types.js';
import { groupsForm, type DerivedGroups } from './groups.js';
import { tint } from '../color/srgb.js';

/** The box's height as a share of its band, and the whisker caps' as a share of the box. */
const BOX_SHARE = 0.6;
const CAP_SHARE = 0.5;
const OUTLIER_R = 2.5;

const line = (x1: number, y1: number, x2: number, y2: number): PathCommand[] => [{ op: 'M', x: x1, y: y1 }, { op: 'L', x: x2, y: y2 }];

/** One group's box (quartiles), median, whiskers with caps, and outliers as open circles. */
/** How strongly a box is filled with the primary colour: a quarter, so the median line stands out against it; the outline stays solid. */
const BOX_FILL_SHARE = 0.25;

function boxOf(d: DerivedGroups, g: GroupDistribution, area: PlotArea, ctx: LayoutContext): SceneNode[] {
  const x = asLinear(area.x);
  const band = asBand(area.y);
  const { key, value } = d.query;
  const { palette, background } = ctx.style;
  const s = g.stats;
  const c = band.center(g.label);
  const h = band.bandwidth * BOX_SHARE;
  const cap = (h * CAP_SHARE) / 2;
  const [lo, q1, med, q3, hi] = [s.low, s.q1, s.median, s.q3, s.high].map((v) => x.map(v)) as [number, number, number, number, number];
  const id = (part: string) => ctx.id(part, g.label);
  const datum = { [key.name]: g.label, low: s.low, q1: s.q1, median: s.median, q3: s.q3, high: s.high, n: s.n, outliers: s.outliers.length };
  const whiskers: PathCommand[] = [...line(lo, c, q1, c), ...line(q3, c, hi, c), ...line(lo, c - cap, lo, c + cap), ...line(hi, c - cap, hi, c + cap)];
  return [
    { kind: 'path', id: id('whisker'), role: 'box', datum: { [key.name]: g.label, part: 'whiskers', low: s.low, high: s.high }, commands: whiskers, stroke: palette.primary, strokeWidth: 1.5 },
    { kind: 'rect', id: id('box'), role: 'box', datum, x: q1, y: c - h / 2, width: q3 - q1, height: h, fill: tint(palette.primary, background, BOX_FILL_SHARE), stroke: palette.primary, strokeWidth: 1.5 },
    { kind: 'path', id: id('median'), role: 'box', datum: { [key.name]: g.label, part: 'median', median: s.median }, commands: line(med, c - h / 2, med, c + h / 2), stroke: palette.primary, strokeWidth: 3 },
    ...s.outliers.map((v, i): SceneNode => ({
      kind: 'circle', id: ctx.id('point', `${g.label}-outlier-${i}`), role: 'point', datum: { [key.name]: g.label, [value.name]: v, outlier: true },
      cx: x.map(v), cy: c, r: OUTLIER_R, fill: background, stroke: palette.primary, strokeWidth: 1,
    })),
  ];
}

/**
 * The box plot: one row per group, the box from the first to the third quartile (Hyndman–Fan
 * type 7) with the median across it, whiskers to the most extreme values within 1.5 IQR, and
 * every value beyond drawn as an open circle.
 */
export const BOX = groupsForm({
  name: 'box',
  noun: 'box plot',
  article: 'a box plot',
  title: 'Box plot',
  marksOf: boxOf,
  decisions: [
    { decision: 'boxes from the first to the third quartile, the median across them', rule: 'quartiles by Hyndman & Fan (1996) definition 7, the default of R and d3-array, so the numbers match what readers compute' },
    { decision: 'whiskers to the most extreme values within 1.5 IQR of the box; every value beyond drawn as a circle', rule: "Tukey's fences (Tukey 1977, Exploratory Data Analysis): unusual values are shown, not hidden in the whisker" },
  ],
  how: 'Boxes span the middle half of the values (first to third quartile, Hyndman–Fan type 7) with the median as a thick line; whiskers reach the furthest values within 1.5 box lengths; circles are values beyond.',
});
