import { format as d3format } from 'd3-format';

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

/** Exponent form (2.5e-7) with the fewest significant digits that keep the numbers apart. */
function exponentFormatter(values: readonly number[]): (n: number) => string {
  for (let p = 0; p < 12; p++) {
    // d3-format writes the exponent's sign as a hyphen; match the U+2212 of its other minus signs.
    const f = (n: number) => d3format(`.${p}e`)(n).replace('e-', 'e\u2212');
    if (new Set(values.map(f)).size === new Set(values).size) return (n) => (n === 0 ? '0' : f(n));
  }
  return d3format('.12e');
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
  if (specifier) return d3format(specifier);
  const maxAbs = Math.max(0, ...ticks.map(Math.abs));
  const { divisor, suffix } = magnitudeFor(maxAbs);
  const decimals = decimalsNeeded(ticks.map((t) => t / divisor));
  // Steps finer than a millionth would print as rows of zeros.
  if (decimals > 6) return exponentFormatter(ticks);
  const f = d3format(`,.${decimals}f`);
  return (n) => (n === 0 ? '0' : `${f(n / divisor)}${suffix}`);
}

/** A formatter for data values shown as labels: up to 2 decimals, as the data needs; significant digits for tiny values. */
export function valueFormatter(values: readonly number[], specifier?: string): (n: number) => string {
  if (specifier) return d3format(specifier);
  const maxAbs = Math.max(0, ...values.map(Math.abs));
  // Values all below 0.01 would read "0.00": three significant digits instead.
  if (maxAbs > 0 && maxAbs < 0.01) return d3format('.3~g');
  const { divisor, suffix } = magnitudeFor(maxAbs);
  const decimals = divisor > 1 ? Math.min(2, Math.max(1, decimalsNeeded(values.map((v) => v / divisor)))) : Math.min(2, decimalsNeeded(values));
  const f = d3format(`,.${decimals}f`);
  return (n) => `${f(n / divisor)}${suffix}`;
}
