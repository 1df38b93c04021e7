import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import type { Style } from './types.js';

const HEX = /^#[0-9a-f]{6}$/;

/** Checks a style document has every part a render needs, with colours as #rrggbb. */
export function checkStyle(value: unknown, file: string): Diagnostic[] {
  const problems: Diagnostic[] = [];
  const s = value as Partial<Style> | null;
  const need = (ok: boolean, what: string, path: string) => {
    if (!ok) problems.push(diagnostic('brief.bad-style', `the style file is missing or has a bad ${what}`, { file, path, expected: what, hint: 'start from templates/styles/report.json' }));
  };
  need(!!s && typeof s === 'object', 'style object', '');
  if (!s || typeof s !== 'object') return problems;
  need(typeof s.background === 'string' && HEX.test(s.background), 'background colour (#rrggbb)', '/background');
  for (const key of ['title', 'subtitle', 'source', 'tick', 'axisTitle', 'label', 'note'] as const) {
    const t = s.text?.[key];
    need(!!t && typeof t.size === 'number' && t.size > 0 && HEX.test(t.color) && (t.weight === 'regular' || t.weight === 'semibold'), `text.${key} (size, weight, colour)`, `/text/${key}`);
  }
  for (const key of ['primary', 'negative', 'others'] as const) need(HEX.test(String(s.palette?.[key])), `palette.${key} colour`, `/palette/${key}`);
  for (const key of ['axis', 'grid', 'zero'] as const) need(HEX.test(String(s.lines?.[key])), `lines.${key} colour`, `/lines/${key}`);
  need(!!s.spacing && Object.values(s.spacing).every((v) => typeof v === 'number' && Number.isFinite(v) && v >= 0), 'spacing (non-negative numbers)', '/spacing');
  return problems;
}
