import type { Locale } from '../brief/types.js';
import { axisTitle } from '../layout/axis.js';
import type { FormWords } from '../layout/kit-types.js';
import type { DerivedScatter } from './scatter-derive.js';
import { inSentence } from '../fields/labels.js';

import { numberFormatIn } from '../layout/number-format.js';

/** "r = 0.82" with two decimals, and a true minus sign (d3-format's); "r = 0,82" in de. */
export function rText(r: number, locale?: Locale): string {
  return `r = ${numberFormatIn(locale, '.2f')(r).replace('-', '−')}`;
}

/** The notes under a scatter: the fit's r and n, the density's meaning, and the rows left out. */
function notes(derived: DerivedScatter): string[] {
  const { plan, fit } = derived;
  const count = numberFormatIn(plan.x.locale, ',d');
  const out: string[] = [];
  if (fit) out.push(`Line: least-squares fit of ${inSentence(plan.y.label)} on ${inSentence(plan.x.label)}; Pearson ${rText(fit.r, plan.x.locale)}, n = ${count(fit.n)}.`);
  if (derived.bins) out.push(`${count(derived.points.length)} points are binned into hexagons, each coloured by how many points fall in it.`);
  if (derived.leftOut > 0) out.push(`${count(derived.leftOut)} row${derived.leftOut === 1 ? ' is' : 's are'} left out for missing values.`);
  return out;
}

/** A scatter's default title, its one-sentence description, and its notes. */
export function scatterWords(derived: DerivedScatter): FormWords {
  const { plan, fit } = derived;
  const [x, y] = [axisTitle(plan.x, plan.x.label), axisTitle(plan.y, plan.y.label)];
  const count = numberFormatIn(plan.x.locale, ',d');
  const coded = [plan.color && `coloured by ${inSentence(plan.color.label)}`, plan.shape && `shaped by ${inSentence(plan.shape.label)}`, plan.area && `circle area shows ${inSentence(plan.area.label)}`].filter(Boolean);
  const what = derived.bins ? `Binned density of ${count(derived.points.length)} points` : `Scatter plot of ${count(derived.points.length)} points`;
  const codings = coded.length && !derived.bins ? `, ${coded.join(', ')}` : '';
  const line = fit ? `; least-squares line, ${rText(fit.r, plan.x.locale)}` : '';
  return {
    title: `${plan.y.label} against ${inSentence(plan.x.label)}`,
    description: `${what}: ${inSentence(y)} against ${inSentence(x)}${codings}${line}.`,
    notes: notes(derived),
  };
}
