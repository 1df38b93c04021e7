import { format } from 'd3-format';
import type { Decision } from '../choose/types.js';
import type { ScatterPlan } from './scatter-plan.js';

const percent = (share: number) => `${Math.round(share * 100)} %`;
const count = format(',d');

/** How overplotting was handled, and the rule (with the share measured) that decided it. */
function overplotDecision(plan: ScatterPlan, n: number): Decision {
  const measured = `${percent(plan.overlap)} of the ${count(n)} points overlap another at full size`;
  if (plan.mode === 'points') {
    return { decision: `points drawn opaque, with a radius of ${format('.1f')(plan.radius)} px${plan.area ? ' for the largest' : ''}`, rule: `overplotting measured: ${measured}, no more than the 25 % at which marks start hiding one another` };
  }
  if (plan.mode === 'translucent') {
    return { decision: 'points drawn smaller and translucent (50 %)', rule: `overplotting measured: ${measured}, more than 25 %; smaller, see-through marks let piled-up points show as darker patches` };
  }
  const lost = [plan.color && 'colour', plan.shape && 'shape', plan.area && 'circle area'].filter(Boolean);
  return {
    decision: `binned density: hexagons coloured by how many points fall in each${lost.length ? `; ${lost.join(', ')} not shown` : ''}`,
    rule: `overplotting measured: ${measured} and ${percent(plan.overlapSmall)} still do when drawn small; with 10,000 points or more, a binned density shows where points pile up, which overlapping marks hide (Carr et al., JASA 1987)`,
  };
}

/** The decisions of a scatter's plan, each with its rule. */
export function scatterDecisions(plan: ScatterPlan, n: number): Decision[] {
  const decisions: Decision[] = [
    { decision: 'the axes span the data and need not include zero', rule: 'points are read by their position against the scales, not by a length from zero, so the axes fit the data (Cleveland 1985)' },
  ];
  if (plan.area && plan.mode !== 'binned') {
    decisions.push({ decision: `circle area shows \`${plan.area.name}\` (radius ∝ √value), with a size legend`, rule: 'hard rule: size coding is area-true, so a value 4 times as large gets a circle 4 times the area (twice the radius); Flannery\'s 1971 perceptual correction is not applied, so areas stay true; largest circles drawn first, so small ones stay visible' });
  }
  if (plan.shape && plan.mode !== 'binned') {
    decisions.push({ decision: `shape tells the ${plan.shape.levels.length} levels of \`${plan.shape.name}\` apart, every shape of the same area`, rule: `at most 5 shapes, the most a reader tells apart at a glance (common practice; more are refused); equal areas, so no level looks larger (d3-shape's symbols)` });
  }
  if (plan.fit) {
    decisions.push({ decision: 'a least-squares line of y on x, with Pearson\'s r and n stated in a note', rule: 'the brief asks for it (`fit: linear`); least squares minimises the vertical distances, so the line predicts y from x, and r says how closely the points follow it' });
  }
  if (plan.key) decisions.push({ decision: 'points are not labelled; each names its key in its title', rule: 'labels on points cover the data and one another; the key stays readable where the chart is viewed interactively' });
  decisions.push(overplotDecision(plan, n));
  return decisions;
}
