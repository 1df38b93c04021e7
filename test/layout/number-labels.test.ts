import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { tickFormatter, valueFormatter } from '../../src/layout/number-format.js';
import { niceTicks } from '../../src/layout/ticks.js';
import { runs } from '../helpers.js';

/**
 * How a reader of each locale reads marks and scale words: English short scale; German from
 * CLDR 48 (de.xml: decimal ",", group ".", compact short "Mio.", "Mrd.", "Bio.", thousands in
 * digits), the words after a no-break space. SI prefixes from the BIPM SI Brochure, table 7.
 */
const READERS = {
  en: { decimal: '.', thousands: ',', words: { k: 1e3, m: 1e6, bn: 1e9, tn: 1e12 } as Record<string, number>, join: '' },
  de: { decimal: ',', thousands: '.', words: { 'Mio.': 1e6, 'Mrd.': 1e9, 'Bio.': 1e12 } as Record<string, number>, join: '\u00a0' },
} as const;

/** What a label reads as, by the marks, words and prefixes a reader of the locale knows. */
function readLabel(label: string, unit = '', locale: keyof typeof READERS = 'en'): number {
  const r = READERS[locale];
  const prefixes: Record<string, number> = { '': 1, k: 1e3, M: 1e6, G: 1e9, T: 1e12, P: 1e15, m: 1e-3, 'µ': 1e-6, n: 1e-9, p: 1e-12 };
  const digits = (t: string) => t.replaceAll('\u2212', '-').replaceAll(r.thousands, '').replace(r.decimal, '.');
  if (unit && label.endsWith(unit) && label.includes(' ')) {
    const [num, rest] = label.split(' ') as [string, string];
    return Number(digits(num)) * prefixes[rest.slice(0, rest.length - unit.length)]!;
  }
  const [num, word] = r.join ? label.split(r.join) as [string, string | undefined] : /^([^a-df-z]+)([a-z]*)$/.exec(label)?.slice(1) ?? [];
  if (num === undefined || !/^-?[\d.e+-]+$/.test(digits(num)) || (word && !r.words[word])) throw new Error(`unreadable label ${label}`);
  return Number(digits(num)) * (word ? r.words[word]! : 1);
}

describe('number labels never lie', () => {
  it('money across six orders of magnitude: each value in its own step, none reads 0', () => {
    const values = [4.2e6, 350e3, 1.83e9, 12, 1830e9];
    const f = valueFormatter(values, { unit: '€' });
    expect(values.map(f)).toEqual(['4.2m', '350k', '1.83bn', '12', '1.83tn']);
  });

  it('a tick at two trillion reads 2tn, not 2,000bn', () => {
    const ticks = [0, 500e9, 1e12, 1.5e12, 2e12];
    expect(ticks.map(tickFormatter(ticks))).toEqual(['0', '500bn', '1tn', '1.5tn', '2tn']);
  });

  it('SI units take SI prefixes joined to the unit (3.5 GWh), never money words', () => {
    expect(valueFormatter([3.5e9, 4.2e3], { unit: 'Wh' })(3.5e9)).toBe('3.5 GWh');
    expect(valueFormatter([3.5e9, 4.2e3], { unit: 'Wh' })(4.2e3)).toBe('4.2 kWh');
    const ticks = [0, 0.002, 0.004];
    expect(ticks.map(tickFormatter(ticks, { unit: 's' }))).toEqual(['0', '2 ms', '4 ms']);
  });

  // Guards a defect a new user met: 149,600,000 km was labelled "150m" under "(km)", which reads as
  // metres or milli. A unit that already carries an SI prefix is rescaled to its bare unit.
  it('units that carry an SI prefix are rescaled, never given "m" for million (150 Gm, 4.5 TW, 4.5 PB)', () => {
    expect(valueFormatter([149_600_000, 384_400], { unit: 'km' })(149_600_000)).toBe('150 Gm');
    expect(valueFormatter([4_500_000], { unit: 'MW' })(4_500_000)).toBe('4.5 TW');
    expect(valueFormatter([4_500_000], { unit: 'GB' })(4_500_000)).toBe('4.5 PB');
    expect(valueFormatter([4_500_000, 20], { unit: 'ms' })(4_500_000)).toBe('4.5 ks');
    // Below a million, prefixed units keep their numbers as written.
    expect(valueFormatter([384_400, 344], { unit: 'km' })(384_400)).toBe('384,400');
    const ticks = [0, 50e6, 100e6, 150e6];
    expect(ticks.map(tickFormatter(ticks, { unit: 'km' }))).toEqual(['0', '50 Gm', '100 Gm', '150 Gm']);
  });

  it('notation can be set: digits writes every digit, words overrides an SI unit', () => {
    expect(tickFormatter([0, 1e6, 2e6], { notation: 'digits' })(2e6)).toBe('2,000,000');
    expect(valueFormatter([3.5e9], { unit: 'W', notation: 'words' })(3.5e9)).toBe('3.5bn');
  });

  it('a 1e308 cell is written in exponent form and the small values beside it keep their words', () => {
    const f = valueFormatter([1e308, 2e6, 2]);
    expect(f(1e308)).toBe('1e+308');
    expect(f(2e6)).toBe('2m');
    expect(f(2)).toBe('2');
  });

  it('rounding that reaches the next step moves to it (999,999,999 reads 1bn, not 1,000m)', () => {
    expect(valueFormatter([999_999_999, 1.2e6])(999_999_999)).toBe('1bn');
  });

  it('no trailing zeros: 1,830 billion reads 1.83tn, and 22.10 reads 22.1', () => {
    expect(valueFormatter([1.83e12, 5e9])(1.83e12)).toBe('1.83tn');
    expect(valueFormatter([22.1, 3])(22.1)).toBe('22.1');
  });

  it('a small non-zero value next to large ones never reads 0 (0.004 beside 500)', () => {
    expect(valueFormatter([0.004, 500, 22.13])(0.004)).toBe('0.004');
  });

  for (const locale of ['en', 'de'] as const) {
    it(`property (${locale}): every value label reads back within half a unit of its third significant digit, never as 0 when non-zero`, () => {
      const value = fc.oneof(fc.double({ min: -1e14, max: 1e14, noNaN: true }), fc.integer({ min: -5_000_000, max: 5_000_000 }));
      fc.assert(fc.property(fc.array(value, { minLength: 1, maxLength: 12 }), (values) => {
        const f = valueFormatter(values, { locale });
        for (const v of values) {
          const read = readLabel(f(v), '', locale);
          if (v !== 0) expect(read).not.toBe(0);
          // Up to 2 decimals below a million, 3 significant digits from there (common practice).
          const tolerance = Math.abs(v) < 1e6 ? Math.max(0.005, Math.abs(v) * 0.005) : Math.abs(v) * 0.005;
          expect(Math.abs(read - v)).toBeLessThanOrEqual(tolerance * (1 + 1e-9));
        }
      }), { numRuns: runs(200) });
    });

    it(`property (${locale}): tick labels read back exactly and are distinct, in words and in SI`, () => {
      fc.assert(fc.property(fc.double({ min: 1, max: 1e14, noNaN: true }), fc.integer({ min: 2, max: 10 }), fc.boolean(), (hi, m, si) => {
        const ticks = niceTicks(0, hi, m, true);
        const unit = si ? 'Wh' : '';
        const labels = ticks.map(tickFormatter(ticks, { unit: unit || undefined, locale }));
        expect(new Set(labels).size).toBe(ticks.length);
        ticks.forEach((t, i) => expect(readLabel(labels[i]!, unit, locale)).toBeCloseTo(t, 6 - Math.max(0, Math.floor(Math.log10(Math.max(1, Math.abs(t)))))));
      }), { numRuns: runs(200) });
    });
  }
});
