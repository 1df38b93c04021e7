import type { ResolvedBrief } from '../brief/types.js';
import { localeDef } from '../fields/locales.js';
import type { Decision } from './types.js';

/** The rationale's entry for the locale the chart's numbers and dates are written in; none for English, the default. */
export function localeDecision(brief: Pick<ResolvedBrief, 'locale'>): Decision | undefined {
  if (brief.locale === 'en') return undefined;
  const def = localeDef(brief.locale);
  const steps = def.steps.map((s) => s.suffix.trim()).join(', ');
  const decision = `numbers and dates written in locale ${def.name}: decimal mark "${def.decimal}", thousands mark "${def.thousands}", scale words ${steps}, months as ${def.shortMonths.slice(0, 3).join(', ')} …`;
  return { decision, rule: `the brief asks for it (\`locale: ${def.name}\`, or --locale); the words of titles and notes stay English, only marks and date names change` };
}
