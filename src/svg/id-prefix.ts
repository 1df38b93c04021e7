import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';

/** The longest id prefix accepted: ids stay short, and a page's ids stay readable. */
export const ID_PREFIX_MAX = 64;

// An ASCII name that may start an XML id (XML 1.0 NameStartChar, ASCII part, less ':'), with
// letters, digits, '-', '_' and '.' after it; also safe unescaped in url(#…) and CSS.
const SAFE_ID = /^[A-Za-z_][A-Za-z0-9_.-]*$/;

/** Why an id prefix cannot start the ids of an SVG, as a diagnostic; undefined when it can. */
export function idPrefixProblem(prefix: string, path = '/idPrefix'): Diagnostic | undefined {
  if (prefix.length <= ID_PREFIX_MAX && SAFE_ID.test(prefix)) return undefined;
  const suggestion = prefix.replace(/[^A-Za-z0-9_.-]/g, '-').replace(/^[^A-Za-z_]+/, '').slice(0, ID_PREFIX_MAX) || 'chart1';
  return diagnostic('render.bad-id-prefix', `the id prefix \`${prefix.slice(0, ID_PREFIX_MAX + 1)}\` cannot start an SVG id`, {
    path, found: prefix.slice(0, ID_PREFIX_MAX + 1), expected: `a letter or _ first, then letters, digits, _, - or .; at most ${ID_PREFIX_MAX} characters`,
    hint: `use e.g. \`${suggestion}\``,
  });
}
