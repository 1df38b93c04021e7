import { format as d3format } from 'd3-format';

/** Decimals needed to write every number exactly (up to 6). */
export function decimalsNeeded(values: readonly number[]): number {
  for (let d = 0; d <= 6; d++) {
    const f = 10 ** d;
    if (values.every((v) => Math.abs(Math.round(v * f) - v * f) < 1e-6 * Math.max(1, Math.abs(v * f)))) return d;
  }
  return 6;
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
  const f = d3format(`,.${decimals}f`);
  return (n) => (n === 0 ? '0' : `${f(n / divisor)}${suffix}`);
}

/** A formatter for data values shown as labels: up to 2 decimals, as the data needs. */
export function valueFormatter(values: readonly number[], specifier?: string): (n: number) => string {
  if (specifier) return d3format(specifier);
  const maxAbs = Math.max(0, ...values.map(Math.abs));
  const { divisor, suffix } = magnitudeFor(maxAbs);
  const decimals = divisor > 1 ? Math.min(2, Math.max(1, decimalsNeeded(values.map((v) => v / divisor)))) : Math.min(2, decimalsNeeded(values));
  const f = d3format(`,.${decimals}f`);
  return (n) => `${f(n / divisor)}${suffix}`;
}
