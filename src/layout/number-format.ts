import { format as d3format, formatSpecifier } from 'd3-format';

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
function exponentForm(p: number): (n: number) => string {
  const f = d3format(`.${p}~e`);
  // d3-format writes the exponent's sign as a hyphen; match the U+2212 of its other minus signs.
  return (n) => (n === 0 ? '0' : f(n).replace('e-', 'e\u2212'));
}

/** The number a label written by `exponentForm` reads as. */
function readBack(label: string): number {
  return Number(label.replaceAll('\u2212', '-'));
}

/**
 * Exponent form for ticks with the fewest digits that write every tick as it is: ticks are
 * round numbers, and a tick at 2.5e-7 labelled "3e-7" would misstate the axis.
 */
function exponentTicks(ticks: readonly number[]): (n: number) => string {
  for (let p = 0; p < 12; p++) {
    const f = exponentForm(p);
    if (ticks.every((t) => Math.abs(readBack(f(t)) - t) <= 1e-12 * Math.abs(t))) return f;
  }
  return exponentForm(12);
}

/** Exponent form for data values: three significant digits, more where needed to keep them apart. */
function exponentValues(values: readonly number[]): (n: number) => string {
  const distinct = new Set(values).size;
  for (let p = 2; p < 12; p++) {
    const f = exponentForm(p);
    if (new Set(values.map(f)).size === distinct) return f;
  }
  return exponentForm(12);
}

/** Largest magnitude among numbers, by a loop: spreading a column into Math.max overflows the stack. */
function maxAbsOf(values: readonly number[]): number {
  let m = 0;
  for (const v of values) m = Math.max(m, Math.abs(v));
  return m;
}

/**
 * From a thousand trillion up, scale words stop helping (1e308 would read "1e+299bn"): such
 * numbers are written in exponent form. Common practice; the notation is to be redesigned.
 */
const EXPONENT_FROM = 1e15;

/**
 * The user's d3-format specifier. A percent of a value beyond about 1.8e306 overflows to
 * "Infinity%"; it is written in exponent form with the exponent moved by two instead.
 */
function userFormatter(specifier: string): (n: number) => string {
  const f = d3format(specifier);
  const { type } = formatSpecifier(specifier);
  if (type !== '%' && type !== 'p') return f;
  const e = d3format('.3~e');
  return (n) => (Number.isFinite(n * 100) ? f(n) : `${e(n).replace(/e\+(\d+)$/, (_, x: string) => `e+${Number(x) + 2}`)}%`);
}

/** A scale word for large numbers: values are shown divided by `divisor` with `suffix`. */
interface Magnitude { divisor: number; suffix: string }

function magnitudeFor(maxAbs: number): Magnitude {
  if (maxAbs >= 1e9) return { divisor: 1e9, suffix: 'bn' };
  if (maxAbs >= 1e6) return { divisor: 1e6, suffix: 'M' };
  return { divisor: 1, suffix: '' };
}

/**
 * A formatter for the tick values of one axis: the user's d3-format specifier when given,
 * otherwise grouped digits with just enough decimals, and M or bn for millions and billions.
 * Minus signs are U+2212, as d3-format writes them.
 */
export function tickFormatter(ticks: readonly number[], specifier?: string): (n: number) => string {
  if (specifier) return userFormatter(specifier);
  const maxAbs = maxAbsOf(ticks);
  if (maxAbs >= EXPONENT_FROM) return exponentTicks(ticks);
  const { divisor, suffix } = magnitudeFor(maxAbs);
  const decimals = decimalsNeeded(ticks.map((t) => t / divisor));
  const f = d3format(`,.${decimals}f`);
  const format = (n: number) => (n === 0 ? '0' : `${f(n / divisor)}${suffix}`);
  // Steps finer than a millionth would print as rows of zeros (at 1e-300, every tick as "0").
  if (decimals > 6 || new Set(ticks.map(format)).size < new Set(ticks).size) return exponentTicks(ticks);
  return format;
}

/** A formatter for data values shown as labels: up to 2 decimals, as the data needs; significant digits for tiny values. */
export function valueFormatter(values: readonly number[], specifier?: string): (n: number) => string {
  if (specifier) return userFormatter(specifier);
  const maxAbs = maxAbsOf(values);
  if (maxAbs >= EXPONENT_FROM) return exponentValues(values);
  // Values all below 0.01 would read "0.00": three significant digits instead.
  if (maxAbs > 0 && maxAbs < 0.01) return d3format('.3~g');
  const { divisor, suffix } = magnitudeFor(maxAbs);
  const decimals = divisor > 1 ? Math.min(2, Math.max(1, decimalsNeeded(values.map((v) => v / divisor)))) : Math.min(2, decimalsNeeded(values));
  const f = d3format(`,.${decimals}f`);
  return (n) => `${f(n / divisor)}${suffix}`;
}
