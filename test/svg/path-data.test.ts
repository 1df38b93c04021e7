import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fmt, fmtPath } from '../../src/svg/fmt.js';
import { runs } from '../helpers.js';

// Command letters and separators of SVG path data: SVG 1.1 (Second Edition) §8.3.9, "The
// grammar for path data"; SVG 2 adds form feed to the white space.
const COMMANDS = 'MmLlHhVvCcSsQqTtAaZz';
const SEPARATORS = [' ', ',', '\t', '\n', '\r', '\f', ' , '];

describe('path data', () => {
  it('refuses NaN and Infinity where a number should be (they reached an SVG as d="MNaN …")', () => {
    for (const d of ['MNaN 0', 'M0 NaNL1 1', 'M0 Infinity', 'M-Infinity 0', 'M0 0L1e400 0', 'Mundefined 0', 'M0 0Lnull 1']) {
      expect(() => fmtPath(d), d).toThrow(RangeError);
    }
  });

  it('refuses any character that is neither a command, a separator nor part of a number', () => {
    const bad = fc.string({ minLength: 1, maxLength: 3 }).filter((s) => /[^MmLlHhVvCcSsQqTtAaZz\x20\t\r\n\f,0-9.eE+-]/.test(s));
    fc.assert(fc.property(bad, fc.nat(), (junk, at) => {
      const d = 'M0 0L10.5,-2Z';
      const i = at % (d.length + 1);
      expect(() => fmtPath(d.slice(0, i) + junk + d.slice(i))).toThrow(RangeError);
    }), { numRuns: runs(500) });
  });

  it('refuses a sign, point or exponent that belongs to no number', () => {
    for (const d of ['M- 0', 'M. 0', 'M1e 0', 'Me5 0', 'M0 0+', 'M1ee5 0']) expect(() => fmtPath(d), d).toThrow(RangeError);
  });

  it('keeps commands and separators and writes every number through fmt', () => {
    const number = fc.double({ min: -1e6, max: 1e6, noNaN: true });
    const piece = fc.tuple(fc.constantFrom(...COMMANDS), fc.array(fc.tuple(number, fc.constantFrom(...SEPARATORS)), { maxLength: 6 }));
    fc.assert(fc.property(fc.array(piece, { maxLength: 6 }), (pieces) => {
      const d = pieces.map(([c, ns]) => c + ns.map(([n, sep]) => `${n}${sep}`).join('')).join('');
      const expected = pieces.map(([c, ns]) => c + ns.map(([n, sep]) => `${fmt(n)}${sep}`).join('')).join('');
      expect(fmtPath(d)).toBe(expected);
    }), { numRuns: runs(1000) });
  });

  it('reads the number forms the grammar allows: signs, leading and trailing points, exponents', () => {
    expect(fmtPath('M+1.5,.25L5.-3e1 1.5.5z')).toBe('M1.5,0.25L5-30 1.5 0.5z');
  });

  it('keeps numbers written without a separator apart (2.0.5 must not become 20.5)', () => {
    expect(fmtPath('M2.0.5L-1-2')).toBe('M2 0.5L-1-2');
  });
});
