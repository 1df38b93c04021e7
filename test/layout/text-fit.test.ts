import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { TextMeasurer } from '../../src/font/measurer.js';
import { capText, fitLabel, isWhiteSpace, MAX_LAYOUT_TEXT, truncateText, wrapText } from '../../src/layout/text.js';
import type { TextStyle, Weight } from '../../src/style/types.js';
import { env, runs } from '../helpers.js';

// The text fitting chartwright had before it measured each text once, kept verbatim as the
// oracle: every cut re-measured shorter prefixes (quadratic) and labels were wrapped whole.
function oracleWrap(measure: TextMeasurer, text: string, style: TextStyle, maxWidth: number): string[] {
  const fits = (s: string) => measure.width(s, style.size, style.weight) <= maxWidth;
  const lines: string[] = [];
  for (const paragraph of text.split(/\r?\n/)) {
    let line = '';
    for (const word of paragraph.split(/\s+/).filter(Boolean)) {
      const candidate = line ? `${line} ${word}` : word;
      if (fits(candidate)) { line = candidate; continue; }
      if (line) lines.push(line);
      line = word;
      let chars = [...line];
      while (!fits(line) && chars.length > 1) {
        let cut = chars.length - 1;
        while (cut > 1 && !fits(chars.slice(0, cut).join(''))) cut--;
        lines.push(chars.slice(0, cut).join(''));
        chars = chars.slice(cut);
        line = chars.join('');
      }
    }
    lines.push(line);
  }
  return lines;
}

function oracleTruncate(measure: TextMeasurer, text: string, style: TextStyle, maxWidth: number): string {
  if (measure.width(text, style.size, style.weight) <= maxWidth) return text;
  const chars = [...text];
  let n = chars.length - 1;
  while (n > 0 && measure.width(`${chars.slice(0, n).join('').trimEnd()}…`, style.size, style.weight) > maxWidth) n--;
  return n > 0 ? `${chars.slice(0, n).join('').trimEnd()}…` : '…';
}

function oracleFitVerbatim(measure: TextMeasurer, text: string, style: TextStyle, maxWidth: number, maxLines: number): { lines: string[]; shortened: boolean } {
  if (measure.width(text, style.size, style.weight) <= maxWidth) return { lines: [text], shortened: false };
  const wrapped = maxLines > 1 ? oracleWrap(measure, text, style, maxWidth) : [text];
  if (wrapped.length <= maxLines) return { lines: wrapped, shortened: false };
  const kept = wrapped.slice(0, maxLines - 1);
  const rest = text.slice(kept.join(' ').length).trim();
  return { lines: [...kept, oracleTruncate(measure, rest, style, maxWidth)], shortened: true };
}

/**
 * The old fitLabel with its two defects fixed: one line is shortened too (it was returned whole,
 * however wide), and the last line holds the words after the kept lines (the old code cut the
 * raw text at the length of the kept lines, so leading or doubled white space repeated letters).
 */
function oracleFit(measure: TextMeasurer, text: string, style: TextStyle, maxWidth: number, maxLines: number): { lines: string[]; shortened: boolean } {
  if (measure.width(text, style.size, style.weight) <= maxWidth) return { lines: [text], shortened: false };
  const wrapped = oracleWrap(measure, text, style, maxWidth);
  if (wrapped.length <= maxLines) return { lines: wrapped, shortened: false };
  const kept = wrapped.slice(0, maxLines - 1);
  const words = text.split(/\s+/).filter(Boolean).join(' ');
  let at = 0;
  for (const line of kept) {
    at += line.length;
    if (words[at] === ' ') at++;
  }
  return { lines: [...kept, oracleTruncate(measure, words.slice(at).trim(), style, maxWidth)], shortened: true };
}

/** Work done through a measurer: calls, code points measured, and width look-ups on rulers. */
interface Work { calls: number; codePoints: number; lookups: number }

function countingMeasurer(measure: TextMeasurer): { measure: TextMeasurer; work: Work } {
  const work: Work = { calls: 0, codePoints: 0, lookups: 0 };
  const count = (text: string) => { work.calls++; work.codePoints += text.length; };
  return {
    work,
    measure: {
      ...measure,
      width: (text, size, weight) => (count(text), measure.width(text, size, weight)),
      ruler: (text, size, weight) => {
        count(text);
        const r = measure.ruler(text, size, weight);
        return { ...r, length: r.length, width: (a, b, suffix) => (work.lookups++, r.width(a, b, suffix)) };
      },
    },
  };
}

/** Pieces of labels: kerning pairs, zero-advance marks, .notdef characters, every kind of white space. */
const PIECES = ['A', 'V', 'T', '.', ',', '\u2019', 'f', 'i', 'W', 'a', 'y', 'Library', 'of', 'North', ' ', ' ', ' ', '  ', '\t', '\n', '\r\n', '\u00a0', '\u2003', '\u0301', '\u{1F600}', '\u6e2f', '\u2026'];
const shortText = fc.array(fc.constantFrom(...PIECES), { maxLength: 40 }).map((a) => a.join(''));
const style = fc.record({ size: fc.constantFrom(11, 12, 14, 17.5), weight: fc.constantFrom<Weight>('regular', 'semibold'), color: fc.constant('#000000') });
const anyWidth = fc.oneof(fc.double({ min: -5, max: 260, noNaN: true }), fc.integer({ min: 0, max: 260 }));
/** Widths for a text: any, or exactly the width of one of its word-joined prefixes, where a `<` for `<=` would show. */
const widthFor = (text: string, s: TextStyle, pick: number | null, w: number) => {
  if (pick === null) return w;
  const joined = text.split(/\s+/).filter(Boolean).join(' ');
  return env.measure.width([...joined].slice(0, pick % (joined.length + 1)).join(''), s.size, s.weight);
};
const width = fc.tuple(fc.option(fc.nat(), { freq: 2 }), anyWidth);

describe('text fitting matches the old quadratic fitting line for line', () => {
  it('wraps and truncates exactly as the oracle', () => {
    fc.assert(fc.property(shortText, style, width, (text, s, [pick, any]) => {
      const w = widthFor(text, s, pick, any);
      expect(wrapText(env.measure, text, s, w)).toEqual(oracleWrap(env.measure, text, s, w));
      expect(truncateText(env.measure, text, s, w)).toBe(oracleTruncate(env.measure, text, s, w));
    }), { numRuns: runs(3000) });
  });

  it('keeps the first lines of the full wrap when asked for at most n lines', () => {
    fc.assert(fc.property(shortText, style, width, fc.integer({ min: 0, max: 5 }), (text, s, [pick, any], n) => {
      const w = widthFor(text, s, pick, any);
      expect(wrapText(env.measure, text, s, w, n)).toEqual(oracleWrap(env.measure, text, s, w).slice(0, n));
    }), { numRuns: runs(1000) });
  });

  it('fits labels exactly as the oracle', () => {
    fc.assert(fc.property(shortText, style, width, fc.integer({ min: 1, max: 4 }), (text, s, [pick, any], n) => {
      const w = widthFor(text, s, pick, any);
      expect(fitLabel(env.measure, text, s, w, n)).toEqual(oracleFit(env.measure, text, s, w, n));
    }), { numRuns: runs(3000) });
  });

  it('fits single-spaced labels in two lines exactly as the old code did, so charts keep their bytes', () => {
    const words = fc.array(fc.array(fc.constantFrom('A', 'V', 'T', 'a', 'e', 'r', 'f', 'y', '.', '\u2019', 'Library', 'of'), { minLength: 1, maxLength: 6 }).map((a) => a.join('')), { minLength: 1, maxLength: 8 }).map((a) => a.join(' '));
    fc.assert(fc.property(words, style, width, (text, s, [pick, any]) => {
      const w = widthFor(text, s, pick, any);
      expect(fitLabel(env.measure, text, s, w, 2)).toEqual(oracleFitVerbatim(env.measure, text, s, w, 2));
    }), { numRuns: runs(2000) });
  });
});

describe('text fitting does work linear in the text', () => {
  const tick: TextStyle = { size: 12, weight: 'regular', color: '#000000' };
  // Each text is measured a fixed number of times (the whole, each paragraph once, and a short
  // paragraph first whole from the cache; the rest of a shortened label), and every cut costs a
  // number of look-ups logarithmic in its own length.
  const expectLinear = (work: Work, n: number, paragraphs: number) => {
    expect(work.codePoints).toBeLessThanOrEqual(3 * n + 64);
    expect(work.calls).toBeLessThanOrEqual(2 * paragraphs + 3);
    expect(work.lookups).toBeLessThanOrEqual(6 * n + 64);
  };
  // A label up to 1 MB, built by repeating a short random piece (cheap to generate).
  const longText = fc.record({
    unit: fc.array(fc.constantFrom(...PIECES), { minLength: 1, maxLength: 12 }).map((a) => a.join('')),
    length: fc.oneof(fc.integer({ min: 0, max: 5_000 }), fc.integer({ min: 0, max: 1 << 20 }), fc.constant(1 << 20)),
  }).map(({ unit, length }) => unit.repeat(Math.ceil(length / unit.length)).slice(0, length));

  it('fits, wraps and truncates texts up to 1 MB with a bounded number of measurements', () => {
    fc.assert(fc.property(longText, fc.integer({ min: 20, max: 400 }), (text, w) => {
      const paragraphs = text.split(/\r?\n/).length;
      for (const fit of [
        (m: TextMeasurer) => fitLabel(m, text, tick, w, 2),
        (m: TextMeasurer) => fitLabel(m, text, tick, w, 1),
        (m: TextMeasurer) => truncateText(m, text, tick, w),
        (m: TextMeasurer) => wrapText(m, text, tick, w),
      ]) {
        const { measure, work } = countingMeasurer(env.measure);
        fit(measure);
        expectLinear(work, text.length, paragraphs);
      }
    }), { numRuns: runs(10) });
  });

  // The cases of issue 7, which took 2 s to over 120 s and up to 4 GiB before.
  const label = (text: string) => {
    const { measure, work } = countingMeasurer(env.measure);
    const fitted = fitLabel(measure, text, tick, 150, 2);
    expectLinear(work, text.length, 1);
    expect(fitted.shortened).toBe(true);
    expect(fitted.lines).toHaveLength(2);
    for (const line of fitted.lines) expect(env.measure.width(line, tick.size, tick.weight)).toBeLessThanOrEqual(150);
    return fitted.lines;
  };

  it('fits a 4,000-character label with no spaces with linear work', () => {
    const [first, second] = label('x'.repeat(4000));
    expect(`${first}${second!.slice(0, -1)}`).toBe('x'.repeat(first!.length + second!.length - 1));
  });

  it('fits a 10,000-character label with no spaces with linear work', () => {
    label('Harbour'.repeat(1430).slice(0, 10_000));
  });

  it('fits a 100 kB label of words with linear work', () => {
    const words = 'north pier library archive of the harbour district reading rooms '.repeat(1600).slice(0, 100_000);
    const [first, second] = label(words);
    expect(words.startsWith(`${first} ${second!.slice(0, -1)}`)).toBe(true);
  });

  it('wraps a 2,722-character title in a 169 px frame with linear work', () => {
    const report = env.style('report', undefined);
    if (!report.ok) throw new Error('style');
    const title = 'Monthly'.repeat(389).slice(0, 2722);
    const { measure, work } = countingMeasurer(env.measure);
    const w = 169 - 2 * report.value.spacing.padding;
    const lines = wrapText(measure, title, report.value.text.title, w);
    expectLinear(work, title.length, 1);
    expect(lines.join('')).toBe(title);
    for (const line of lines) expect(env.measure.width(line, report.value.text.title.size, report.value.text.title.weight)).toBeLessThanOrEqual(w);
  });
});

describe('fixed defects of label fitting', () => {
  const s: TextStyle = { size: 14, weight: 'regular', color: '#000000' };

  it('shortens a label kept to one line (it was returned whole, however wide)', () => {
    const fitted = fitLabel(env.measure, 'Westfield Library and Archive', s, 90, 1);
    expect(fitted.shortened).toBe(true);
    expect(fitted.lines).toHaveLength(1);
    expect(fitted.lines[0]!.endsWith('…')).toBe(true);
    expect(env.measure.width(fitted.lines[0]!, 14, 'regular')).toBeLessThanOrEqual(90);
  });

  it('continues the last line after the kept ones when the label has leading or doubled spaces (it repeated letters)', () => {
    const fitted = fitLabel(env.measure, '   Westfield   Library and Archive of the Harbour', s, 120, 2);
    expect(fitted.lines[0]).toBe('Westfield Library');
    expect(fitted.lines[1]!.startsWith('and ')).toBe(true);
  });
});

describe('text length cap', () => {
  it('passes texts within the cap unchanged and cuts longer ones to the cap, ending in an ellipsis', () => {
    expect(capText('North pier')).toBe('North pier');
    expect(capText('x'.repeat(MAX_LAYOUT_TEXT))).toBe('x'.repeat(MAX_LAYOUT_TEXT));
    expect(capText('x'.repeat(MAX_LAYOUT_TEXT + 1))).toBe(`${'x'.repeat(MAX_LAYOUT_TEXT - 1)}…`);
    expect(capText('ab cd', 4)).toBe('ab…');
  });

  it('counts code points, never splitting a character outside the BMP', () => {
    fc.assert(fc.property(fc.string({ unit: 'grapheme', maxLength: 60 }), fc.integer({ min: 1, max: 30 }), (text, limit) => {
      const capped = capText(text, limit);
      const points = [...text];
      if (points.length <= limit) expect(capped).toBe(text);
      else expect(capped).toBe(`${points.slice(0, limit - 1).join('').trimEnd()}…`);
      expect([...capped].length).toBeLessThanOrEqual(limit);
    }), { numRuns: runs(1000) });
  });
});

describe('white space', () => {
  it('is what \\s reads as white space, at every code point', () => {
    for (let cp = 0; cp <= 0x10ffff; cp++) {
      if (isWhiteSpace(cp) !== /\s/u.test(String.fromCodePoint(cp))) expect.fail(`U+${cp.toString(16)}`);
    }
  });
});
