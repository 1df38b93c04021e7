import type { ResolvedBrief } from '../brief/types.js';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import { isOrdered, refOf, type Field, type Fields } from '../fields/types.js';
import type { Candidate, ChosenFacet, Decision, FacetOrder, FacetRequest } from './types.js';
import { article } from '../diagnostics/words.js';

/** The rule behind small multiples asked for by the brief. */
const BRIEF_RULE = 'facet.brief: the brief asks for small multiples (`facet:`); panels on one shared x and y scale can be compared at a glance, with one set of axis titles for all (Tufte 1983, small multiples)';

function orderOf(brief: ResolvedBrief, field: Field, noun: string): { order: FacetOrder; decision: Decision } {
  if (brief.order === 'label' || brief.order === 'data') {
    return { order: brief.order, decision: { decision: `panels in ${brief.order} order`, rule: 'facet.order: the brief asks for it (`order:`)' } };
  }
  if (brief.order === 'auto' && isOrdered(field.type)) {
    return { order: 'key', decision: { decision: `panels in the order of \`${field.name}\``, rule: `facet.order: the facet is ${field.type}, so its order carries meaning and the panels are not re-sorted` } };
  }
  return { order: 'value', decision: { decision: `panels ordered by their ${noun}, largest first; ties by label`, rule: 'facet.order: panels ranked by a data value let the reader find the largest and the smallest at a glance' } };
}

/**
 * Small multiples for a brief: asked for by `facet:` (which wins) or by the form's plan. Refused
 * for a form that cannot be drawn in panels, and for a facet column the chart already shows as a
 * key or value (each panel would hold one mark), except the key the form names as its panels'
 * (`facets.keyIndex`: a line's series key, one line per panel). Each decision comes with its rule.
 */
export function chooseFacet(fields: Fields, brief: ResolvedBrief, form: Candidate, request: FacetRequest | undefined): { facet?: ChosenFacet; decisions: Decision[]; problems: Diagnostic[] } {
  const by = brief.facet?.by ?? request?.by;
  if (by === undefined) return { decisions: [], problems: [] };
  if (!form.facets) {
    return { decisions: [], problems: [diagnostic('choice.facet-not-supported', `${article(form.noun)} is not drawn as small multiples`, {
      path: '/facet', found: by, expected: 'a form drawn on a left and a bottom axis', hint: 'remove `facet:` and write one brief per panel',
    })] };
  }
  const keyAt = brief.keys.indexOf(by);
  if ((keyAt >= 0 && keyAt !== form.facets.keyIndex) || brief.values.includes(by)) {
    return { decisions: [], problems: [diagnostic('choice.facet-on-key', `\`${by}\` is already a key or value of the chart, so each panel would hold a single level of it`, {
      path: '/facet', found: by, expected: 'a column that is neither a key nor a value', hint: `facet by another column, or remove \`${by}\` from \`keys:\` and \`values:\``,
    })] };
  }
  const field = fields.all.find((f) => f.name === by)!;
  const context = brief.facet ? brief.facet.context : request!.context;
  const { order, decision } = orderOf(brief, field, form.facets.noun);
  const decisions: Decision[] = [
    { decision: `small multiples: one panel per level of \`${by}\`, all on one shared x and y scale`, rule: brief.facet ? BRIEF_RULE : `facet.form: ${request!.why}` },
    decision,
  ];
  if (context) decisions.push({ decision: 'each panel shows the other panels\' marks in light grey behind its own', rule: 'facet.context: the brief asks for it; grey context lets each panel be read against the whole without a tangle of colours' });
  return { facet: { field: refOf(field), context, order }, decisions, problems: [] };
}
