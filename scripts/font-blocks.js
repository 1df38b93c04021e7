// The Unicode block groups prebuilt as WOFF2 (scripts/font-subsets.js), and the subsetter
// options every embedded font is cut with (at build time and at run time alike).
// Ranges are inclusive and disjoint. "basic" is what nearly every chart uses (ASCII, no-break
// and thin spaces, degree, times, dashes, quotes, ellipsis, minus, euro) so a typical chart
// embeds one small file per weight; the rest of a script comes in only when a label needs it.

/** @type {{ name: string, ranges: [number, number][] }[]} */
export const BLOCKS = [
  { name: 'basic', ranges: [[0x20, 0x7e], [0xa0, 0xa0], [0xb0, 0xb0], [0xd7, 0xd7], [0x2009, 0x2009], [0x2013, 0x2014], [0x2018, 0x2019], [0x201c, 0x201d], [0x2026, 0x2026], [0x202f, 0x202f], [0x20ac, 0x20ac], [0x2212, 0x2212]] },
  { name: 'latin-1', ranges: [[0xa1, 0xaf], [0xb1, 0xd6], [0xd8, 0xff]] },
  { name: 'latin-ext', ranges: [[0x100, 0x24f]] },
  { name: 'latin-more', ranges: [[0x250, 0x36f], [0x1d00, 0x1dff], [0x1e00, 0x1eff], [0x2c60, 0x2c7f], [0xa720, 0xa7ff], [0xab30, 0xab6f], [0xfb00, 0xfb06]] },
  { name: 'greek', ranges: [[0x370, 0x3ff], [0x1f00, 0x1fff]] },
  { name: 'cyrillic', ranges: [[0x400, 0x52f], [0x1c80, 0x1c8f], [0x2de0, 0x2dff], [0xa640, 0xa69f]] },
  { name: 'punctuation', ranges: [[0x2000, 0x2008], [0x200a, 0x2012], [0x2015, 0x2017], [0x201a, 0x201b], [0x201e, 0x2025], [0x2027, 0x202e], [0x2030, 0x209f], [0x20a0, 0x20ab], [0x20ad, 0x20cf], [0x2e00, 0x2e7f]] },
  { name: 'symbols', ranges: [[0x2100, 0x2211], [0x2213, 0x23ff], [0x25a0, 0x27ef]] },
];

/**
 * How every embedded font is cut: no hinting (browsers scale outlines), and only the layout
 * features chartwright's own measure agrees with: kerning and mark placement. Ligatures and
 * other substitutions would make a browser draw text wider or narrower than it was measured.
 * Name ids 0–6 (harfbuzz keeps them by default) plus the licence (13, 14) and the typographic
 * family (16, 17).
 */
export const SUBSET_OPTIONS = { noHinting: true, keepFeatures: ['kern', 'mark', 'mkmk'], preserveNameIds: [0, 1, 2, 3, 4, 5, 6, 13, 14, 16, 17] };
