import { format } from 'd3-format';
import { pearson } from '../derive/correlation.js';
import type { FieldRef } from '../fields/types.js';
import type { ProfileItem } from '../derive/profile.js';
import { inSentence } from '../fields/labels.js';
import { axisTitle } from '../layout/axis.js';
import { count, strengthWord, type AltText } from './alt-words.js';
import { rText } from './scatter-text.js';
import type { DerivedScatter } from './scatter-derive.js';

const n = format(',d');

/** "strong positive correlation (r = 0.74, n = 24)", or undefined when r is not defined (a constant variable). */
function correlationWords(r: number, items: number): string | undefined {
  if (!Number.isFinite(r)) return undefined;
  return `${strengthWord(r)} correlation (Pearson ${rText(r)}, n = ${n(items)})`;
}

/** Scatter plot: Pearson's r and n (the fit's when a line is drawn, the same statistic otherwise). */
export function scatterAlt(derived: DerivedScatter): AltText {
  const { plan } = derived;
  const what = `${derived.bins ? 'Binned density' : 'Scatter plot'} of ${count(derived.points.length, 'point')}, ${inSentence(axisTitle(plan.y, plan.y.label))} against ${inSentence(axisTitle(plan.x, plan.x.label))}`;
  const r = derived.fit?.r ?? pearson(derived.points.map((p) => p.x), derived.points.map((p) => p.y));
  const words = correlationWords(r, derived.fit?.n ?? derived.points.length);
  return { what, reading: words ?? `${count(derived.points.length, 'point')}, no correlation defined (a variable does not vary)` };
}

/** The pair of attributes with the strongest correlation (largest |r|), with r; undefined with fewer than two attributes. */
export function strongestPair(attributes: readonly FieldRef[], items: readonly ProfileItem[]): { a: FieldRef; b: FieldRef; r: number } | undefined {
  let best: { a: FieldRef; b: FieldRef; r: number } | undefined;
  for (let i = 0; i < attributes.length; i++) {
    for (let j = i + 1; j < attributes.length; j++) {
      const r = pearson(items.map((it) => it.values[i]!), items.map((it) => it.values[j]!));
      if (Number.isFinite(r) && (!best || Math.abs(r) > Math.abs(best.r))) best = { a: attributes[i]!, b: attributes[j]!, r };
    }
  }
  return best;
}

/** Scatterplot matrix: the strongest pair of attributes and n. */
export function scatterMatrixAlt(attributes: readonly FieldRef[], items: readonly ProfileItem[]): AltText {
  const p = attributes.length;
  const what = `Scatterplot matrix of ${count(items.length, 'item')}, ${count((p * (p - 1)) / 2, 'panel')}, one for each pair of ${attributes.map((a) => inSentence(a.label)).join(', ')}`;
  const best = strongestPair(attributes, items);
  return { what, reading: best ? `the strongest pair is ${inSentence(best.a.label)} and ${inSentence(best.b.label)}, a ${correlationWords(best.r, items.length)}` : 'no pair varies together' };
}

/** Parallel coordinates: the axis order (chosen so correlated attributes stand side by side) and the strongest neighbouring pair. */
export function parallelAlt(attributes: readonly FieldRef[], pairs: readonly { left: string; right: string; r: number }[], items: number): AltText {
  const label = (name: string) => inSentence(attributes.find((a) => a.name === name)?.label ?? name);
  const what = `Parallel coordinates of ${count(items, 'item')} over ${count(attributes.length, 'attribute')}`;
  const order = `Axes in this order, related attributes side by side: ${attributes.map((a) => inSentence(a.label)).join(', ')}.`;
  const strongest = pairs.filter((p) => Number.isFinite(p.r)).reduce<(typeof pairs)[number] | undefined>((a, p) => (!a || Math.abs(p.r) > Math.abs(a.r) ? p : a), undefined);
  return { what, reading: strongest ? `the strongest neighbouring pair is ${label(strongest.left)} and ${label(strongest.right)}, a ${correlationWords(strongest.r, items)}` : '', more: [order] };
}
