import { formatLocale, formatSpecifier, type FormatLocaleObject } from 'd3-format';

import type { Locale } from '../brief/types.js';
import { LOCALE_DEFS, localeDef, type LocaleDef } from '../fields/locales.js';
import { notationFor, siBase, type NumberStyle } from '../fields/notation.js';

export type { NumberStyle };

function styleOf(style: string | NumberStyle | undefined): NumberStyle {
  return typeof style === 'string' ? { format: style } : (style ?? {});
}

/**
 * d3-format's locales made from our table, one per locale, never d3's replaceable default.
 * English is d3's own default (en-US): "$" stays "$" in every locale, since a specifier's
 * currency is the brief's, not the reader's.
 */
const D3_LOCALES = Object.fromEntries(Object.values(LOCALE_DEFS).map((d) => [d.name, formatLocale({
  decimal: d.decimal, thousands: d.thousands, grouping: [3], currency: ['$', ''], percent: d.percent,
})])) as Record<Locale, FormatLocaleObject>;

/** A d3-format specifier's formatter in a locale's marks: `numberFormatIn('de', ',.1f')(1234.5)` is "1.234,5". */
export function numberFormatIn(locale: Locale | undefined, specifier: string): (n: number) => string {
  return D3_LOCALES[locale ?? 'en'].format(specifier);
}

/**
 * The number a label in a locale's marks reads as ("1.234,5" in de is 1234.5; U+2212 is a
 * minus); NaN when it is not a plain number. Whatever follows the digits (a scale word, a unit,
 * a percent sign) must be cut off first.
 */
export function readNumber(locale: Locale | undefined, label: string): number {
  const def = localeDef(locale);
  const text = label.replaceAll('\u2212', '-').split(def.thousands).join('');
  return Number(def.decimal === '.' ? text : text.replace(def.decimal, '.'));
}

/** Decimals needed to write every number exactly, up to `limit`; `limit + 1` if that is not enough. */
export function decimalsNeeded(values: readonly number[], limit = 6): number {
  for (let d = 0; d <= limit; d++) {
    const f = 10 ** d;
    // Float noise is about 1e-16 of a value; 1e-11 forgives it, and no real digit is that small
    // next to its number (a seventh decimal of 400 is 2.5e-10 of it).
    if (values.every((v) => Math.abs(Math.round(v * f) - v * f) < 1e-11 * Math.max(1, Math.abs(v * f)))) return d;
  }
  return limit + 1;
}

/** Exponent form (2.5e-7) with at most p digits after the point, trailing zeros dropped; zero as 0. */
function exponentForm(p: number, def: LocaleDef): (n: number) => string {
  const f = D3_LOCALES[def.name].format(`.${p}~e`);
  // d3-format writes the exponent's sign as a hyphen; match the U+2212 of its other minus signs.
  return (n) => (n === 0 ? '0' : f(n).replace('e-', 'e\u2212'));
}

/**
 * Exponent form for ticks with the fewest digits that write every tick as it is: ticks are
 * round numbers, and a tick at 2.5e-7 labelled "3e-7" would misstate the axis.
 */
function exponentTicks(ticks: readonly number[], def: LocaleDef): (n: number) => string {
  for (let p = 0; p < 12; p++) {
    const f = exponentForm(p, def);
    if (ticks.every((t) => Math.abs(readNumber(def.name, f(t)) - t) <= 1e-12 * Math.abs(t))) return f;
  }
  return exponentForm(12, def);
}

/** The first formatter that writes distinct values as distinct labels (the last one offered otherwise). */
function firstDistinct(values: readonly number[], candidates: readonly ((n: number) => string)[]): (n: number) => string {
  const distinct = new Set(values).size;
  return candidates.find((f) => new Set(values.map(f)).size === distinct) ?? candidates[candidates.length - 1]!;
}

/** Exponent form for data values: three significant digits, more where needed to keep them apart. */
function exponentValues(values: readonly number[], def: LocaleDef): (n: number) => string {
  return firstDistinct(values, [2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12].map((p) => exponentForm(p, def)));
}

/** Largest magnitude among numbers, by a loop: spreading a column into Math.max overflows the stack. */
function maxAbsOf(values: readonly number[]): number {
  let m = 0;
  for (const v of values) if (Number.isFinite(v)) m = Math.max(m, Math.abs(v));
  return m;
}

/**
 * From a thousand trillion up, scale words stop helping (1e308 would read "1e+299bn"): such
 * numbers are written in exponent form. Common practice.
 */
const EXPONENT_FROM = 1e15;
/** Below a million, every digit is written: six digits read at a glance (common practice). */
const WORDS_FROM = 1e6;

/**
 * The user's d3-format specifier. A percent of a value beyond about 1.8e306 overflows to
 * "Infinity%"; it is written in exponent form with the exponent moved by two instead.
 */
function userFormatter(specifier: string, def: LocaleDef): (n: number) => string {
  const f = D3_LOCALES[def.name].format(specifier);
  const { type } = formatSpecifier(specifier);
  if (type !== '%' && type !== 'p') return f;
  const e = D3_LOCALES[def.name].format('.3~e');
  return (n) => (Number.isFinite(n * 100) ? f(n) : `${e(n).replace(/e\+(\d+)$/, (_, x: string) => `e+${Number(x) + 2}`)}${def.percent}`);
}

/** A scale step: numbers from `from` up are divided by it and written with `suffix`. */
interface Step { from: number; suffix: string }

/** SI prefixes (BIPM SI Brochure, 9th ed., table 7), joined to the unit after a space: "3.5 GWh". */
const SI_STEPS: readonly Step[] = [
  { from: 1e24, suffix: 'Y' }, { from: 1e21, suffix: 'Z' }, { from: 1e18, suffix: 'E' }, { from: 1e15, suffix: 'P' },
  { from: 1e12, suffix: 'T' }, { from: 1e9, suffix: 'G' }, { from: 1e6, suffix: 'M' }, { from: 1e3, suffix: 'k' },
  { from: 1, suffix: '' }, { from: 1e-3, suffix: 'm' }, { from: 1e-6, suffix: 'µ' }, { from: 1e-9, suffix: 'n' },
  { from: 1e-12, suffix: 'p' },
];

/** The step a number is written in: the largest whose threshold it reaches. */
function stepFor(n: number, steps: readonly Step[]): Step | undefined {
  return steps.find((s) => Math.abs(n) >= s.from);
}

/**
 * Writes each number in its own step, so that €350 thousand next to €4.2 billion reads "350k",
 * never "0.00bn". `digits(x)` writes the divided number; below the smallest step, `small(n)`.
 */
function stepped(steps: readonly Step[], digits: (x: number) => string, small: (n: number) => string, join: (text: string, suffix: string) => string, def: LocaleDef): (n: number) => string {
  const round = (x: number) => readNumber(def.name, digits(x));
  return (n) => {
    if (n === 0) return '0';
    const step = stepFor(n, steps);
    if (!step) return small(n);
    const x = n / step.from;
    // Rounding may carry into the next step: 999,999 at 3 digits is "1m", not "1,000k".
    const written = round(x);
    const bigger = steps[steps.indexOf(step) - 1];
    if (bigger && Math.abs(written) * step.from >= bigger.from) return join(digits(n / bigger.from), bigger.suffix);
    return join(digits(x), step.suffix);
  };
}

const joinWord = (text: string, suffix: string) => `${text}${suffix}`;
const joinUnit = (unit: string) => (text: string, prefix: string) => `${text} ${prefix}${unit}`;

/** Grouped digits with up to `max` decimals, trailing zeros dropped; a non-zero number never reads 0. */
function plainDigits(max: number, def: LocaleDef): (n: number) => string {
  const f = D3_LOCALES[def.name].format(`,.${max}~f`);
  const tiny = D3_LOCALES[def.name].format('.3~g');
  return (n) => {
    const s = f(n);
    return n !== 0 && readNumber(def.name, s) === 0 ? tiny(n) : s;
  };
}

/**
 * The SI unit numbers of this size are rewritten in, or undefined to keep them as written: bare
 * SI units from ten thousand (or below a tenth), units already prefixed (km, MW) from a million,
 * where "150m km" would read as metres or milli. The numbers are then rescaled to the bare unit
 * and take the prefix that fits them: 149,600,000 km is 150 Gm, 4,500,000 MW is 4.5 TW.
 */
function siSpan(unit: string | undefined, maxAbs: number): { base: string; factor: number } | undefined {
  const si = siBase(unit);
  if (!si || maxAbs * si.factor >= 1e27) return undefined;
  const from = si.factor === 1 ? 1e4 : 1e6;
  return maxAbs >= from || (maxAbs > 0 && maxAbs < 0.1) ? si : undefined;
}

/** Digits for tick values divided by a step: exactly as many decimals as the ticks need. */
function tickDigits(scaled: readonly number[], def: LocaleDef): (x: number) => string {
  return D3_LOCALES[def.name].format(`,.${Math.min(6, decimalsNeeded(scaled))}~f`);
}

/** Formatter for the ticks of one axis in words or SI; undefined when the ticks cannot be written exactly that way. */
function steppedTicks(ticks: readonly number[], steps: readonly Step[], join: (t: string, s: string) => string, def: LocaleDef): ((n: number) => string) | undefined {
  const scaled = ticks.filter((t) => t !== 0).map((t) => {
    const s = steps.find((st) => Math.abs(t) >= st.from);
    return s ? t / s.from : t;
  });
  if (decimalsNeeded(scaled) > 6) return undefined;
  const digits = tickDigits(scaled, def);
  return stepped(steps, digits, digits, join, def);
}

/**
 * A formatter for the tick values of one axis: the user's d3-format specifier when given;
 * otherwise grouped digits with just enough decimals below a million, and from there each tick
 * in its own step (500k, 1m, 1.5m; 500bn, 1tn) or SI prefix (500 MWh, 1 GWh). Every tick is
 * written exactly. Minus signs are U+2212, as d3-format writes them.
 */
export function tickFormatter(ticks: readonly number[], style?: string | NumberStyle): (n: number) => string {
  const { format, unit, locale } = styleOf(style);
  const def = localeDef(locale);
  if (format) return userFormatter(format, def);
  const notation = notationFor(styleOf(style));
  const maxAbs = maxAbsOf(ticks);
  const exact = (f: (n: number) => string) => new Set(ticks.map(f)).size === new Set(ticks).size;
  const si = notation === 'si' ? siSpan(unit, maxAbs) : undefined;
  if (si) {
    const f = steppedTicks(ticks.map((t) => t * si.factor), SI_STEPS, joinUnit(si.base), def);
    const g = f && ((n: number) => f(n * si.factor));
    if (g && exact(g)) return g;
  }
  if (notation === 'words' && maxAbs >= WORDS_FROM && maxAbs < EXPONENT_FROM) {
    const f = steppedTicks(ticks, def.steps, joinWord, def);
    if (f && exact(f)) return f;
  }
  if (maxAbs >= EXPONENT_FROM && notation !== 'digits') return exponentTicks(ticks, def);
  const decimals = decimalsNeeded(ticks);
  const f = D3_LOCALES[def.name].format(`,.${decimals}f`);
  const format0 = (n: number) => (n === 0 ? '0' : f(n));
  // Steps finer than a millionth would print as rows of zeros (at 1e-300, every tick as "0").
  if (decimals > 6 || !exact(format0)) return exponentTicks(ticks, def);
  return format0;
}

/**
 * A formatter for data values shown as labels: the user's specifier when given; otherwise below
 * a million up to 2 decimals as the data needs (three significant digits for a number that would
 * read 0), and from there each value in its own step with three significant digits, more where
 * two values would read alike (4.2m, 350k, 1.83bn), or an SI prefix joined to an SI unit.
 */
export function valueFormatter(values: readonly number[], style?: string | NumberStyle): (n: number) => string {
  const { format, unit, locale } = styleOf(style);
  const def = localeDef(locale);
  if (format) return userFormatter(format, def);
  const notation = notationFor(styleOf(style));
  const maxAbs = maxAbsOf(values);
  const plain = plainDigits(Math.min(2, decimalsNeeded(values)), def);
  const significant = (p: number) => D3_LOCALES[def.name].format(`,.${p}~r`);
  const si = notation === 'si' ? siSpan(unit, maxAbs) : undefined;
  if (si) {
    const f = firstDistinct(values.map((v) => v * si.factor), [3, 4, 5, 6].map((p) => stepped(SI_STEPS, significant(p), plain, joinUnit(si.base), def)));
    return (n) => f(n * si.factor);
  }
  if (notation === 'digits' || maxAbs < WORDS_FROM) return plain;
  const words = firstDistinct(values.filter((v) => Math.abs(v) < EXPONENT_FROM), [3, 4, 5, 6].map((p) => stepped(def.steps, significant(p), plain, joinWord, def)));
  if (maxAbs < EXPONENT_FROM) return words;
  // Beyond a thousand trillion, exponent form; the smaller values of the same chart keep their words.
  const huge = exponentValues(values.filter((v) => Math.abs(v) >= EXPONENT_FROM), def);
  return (n) => (Math.abs(n) >= EXPONENT_FROM ? huge(n) : words(n));
}

/** What labels of a field are written with: its d3-format specifier and its locale (or the other field's, when it has none: a count has no value field). */
export function labelStyle(field: Pick<NumberStyle, 'format' | 'locale'> | undefined, other?: Pick<NumberStyle, 'locale'>): NumberStyle {
  return { format: field?.format, locale: field?.locale ?? other?.locale };
}

/**
 * One number written as a chart of this locale writes it as a label (the API for sentences
 * that quote the chart's numbers): `formatNumberIn('de', 4_200_000)` is "4,2 Mio.",
 * `formatNumberIn('en', 1234.5)` is "1,234.5". `style` adds a unit, a d3-format specifier or a
 * notation, as for a field.
 */
export function formatNumberIn(locale: Locale, n: number, style: Omit<NumberStyle, 'locale'> = {}): string {
  return valueFormatter([n], { ...style, locale })(n);
}
