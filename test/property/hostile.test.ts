import { DOMParser } from '@xmldom/xmldom';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CATALOGUE } from '../../src/diagnostics/catalogue.js';
import { renderBrief, type RenderResult } from '../../src/pipeline/render.js';
import { env, expectFiniteAttributes, memoryFiles, runs, utf16Bytes } from '../helpers.js';

// Hostile input through the whole pipeline: random briefs and tables with extreme numbers,
// prototype names, control characters, long texts and odd encodings. Every case must either
// render a well-formed SVG with only finite numbers, or fail with catalogued codes; none may
// throw, and none may report `render.internal` (a defect in chartwright, never the input's fault).

const PROTOTYPE_NAMES = ['constructor', 'toString', 'hasOwnProperty', '__proto__', 'valueOf', 'prototype'];
const extremeNumber = fc.oneof(
  fc.constantFrom(1.7976931348623157e308, -1.7976931348623157e308, 1e308, -1e308, 5e-324, -5e-324, -0, 0, Number.MAX_SAFE_INTEGER, 1e-300, 1e21, Number.NaN, Infinity, -Infinity),
  fc.double(),
  fc.integer({ min: -1000, max: 1000 }),
);
const controlText = fc.string({ unit: fc.oneof(fc.integer({ min: 0, max: 0x1f }).map((c) => String.fromCharCode(c)), fc.constantFrom('\u007f', '\u2028', '\ufeff', '\ud800', '\udfff', '<', '&', '"', ']]>', 'é', '港')), maxLength: 12 });
// Up to 5,000 characters: text fitting is linear now (it was quadratic: 2,500 characters took about 1 s).
const longText = fc.nat({ max: 5000 }).chain((n) => fc.constantFrom('x'.repeat(n), 'word '.repeat(Math.ceil(n / 5)), 'é'.repeat(n)));
const text = fc.oneof({ weight: 8, arbitrary: fc.string({ maxLength: 20 }) }, { weight: 3, arbitrary: controlText }, { weight: 1, arbitrary: longText }, { weight: 1, arbitrary: fc.constantFrom(...PROTOTYPE_NAMES, 'NaN', 'Infinity', '.nan', '−5', '1,250', '1.250,5', '0045-03-15', 'NA', '') });
const columnName = fc.oneof({ weight: 3, arbitrary: fc.constantFrom('k', 'v', 'w') }, { weight: 1, arbitrary: fc.constantFrom(...PROTOTYPE_NAMES) }, { weight: 1, arbitrary: text });
const cell = fc.oneof(
  { weight: 4, arbitrary: extremeNumber }, { weight: 3, arbitrary: text }, { weight: 1, arbitrary: fc.constantFrom(null, true, false, undefined) }, { weight: 1, arbitrary: fc.bigInt() },
);
const ordinaryNumber = fc.oneof(fc.integer({ min: -1e6, max: 1e6 }), fc.double({ min: -1e9, max: 1e9, noNaN: true }));
// Each table draws its values either from ordinary numbers (with a few odd cells) or from the extremes.
const valueCell = fc.oneof(
  { weight: 3, arbitrary: fc.constant(fc.oneof({ weight: 20, arbitrary: ordinaryNumber }, { weight: 1, arbitrary: cell })) },
  { weight: 2, arbitrary: fc.constant(fc.oneof({ weight: 12, arbitrary: extremeNumber }, { weight: 1, arbitrary: cell }, { weight: 1, arbitrary: fc.bigInt({ min: -(10n ** 400n), max: 10n ** 400n }) })) },
);
const keyCell = fc.oneof({ weight: 6, arbitrary: text }, { weight: 1, arbitrary: cell });
/** Values no table cell should hold; one in about ten tables gets one somewhere. */
const nestedCell = fc.constantFrom<unknown>([1, [2]], { a: 1 }, [], {});

/** A table as column names and rows of cells: mostly a key `k` and a value `v`, sometimes named after Object.prototype members. */
const table = fc.tuple(
  fc.oneof({ weight: 3, arbitrary: fc.constant(['k', 'v']) }, { weight: 1, arbitrary: fc.constantFrom(...PROTOTYPE_NAMES).map((p) => [p, 'v']) }, { weight: 1, arbitrary: fc.constantFrom(...PROTOTYPE_NAMES).map((p) => ['k', p]) }),
  fc.uniqueArray(columnName, { maxLength: 2 }), fc.integer({ min: 0, max: 40 }),
).chain(([main, extra, n]) => {
  const names = [...new Set([...main, ...extra])];
  const rows = valueCell.chain((values) => {
    const row = fc.tuple(keyCell, values, fc.array(cell, { minLength: names.length - 2, maxLength: names.length - 2 })).map(([k, v, rest]) => [k, v, ...rest]);
    return fc.array(row, { minLength: n, maxLength: n });
  });
  const nested = fc.oneof({ weight: 9, arbitrary: fc.constant(null) }, { weight: 1, arbitrary: fc.tuple(fc.nat(), fc.nat(), nestedCell) });
  return fc.tuple(fc.constant(names), rows, nested).map(([ns, rs, inject]): [string[], unknown[][]] => {
    if (!inject || rs.length === 0) return [ns, rs];
    // A copy: generated values are reused while shrinking and must not be changed.
    const copy: unknown[][] = rs.map((r) => [...r]);
    copy[inject[0] % copy.length]![inject[1] % ns.length] = inject[2];
    return [ns, copy];
  });
});

const format = fc.oneof({ weight: 4, arbitrary: fc.constantFrom(',d', '.1f', '.0%', '$,.2f', '.2~s', '', '+.3e', '020,.3f') }, { weight: 1, arbitrary: fc.constantFrom('zz', '999999999,.2f', '.25f', '.2z') });
/** A brief over the table's first two columns, most of the time, with hostile texts and hints. */
const briefFor = (names: string[]) => fc.record({
  intent: fc.oneof({ weight: 12, arbitrary: fc.constant('compare') }, { weight: 1, arbitrary: fc.constant('trend') }),
  keys: fc.oneof({ weight: 14, arbitrary: fc.constant(names[0]!) }, { weight: 1, arbitrary: columnName }, { weight: 1, arbitrary: fc.array(columnName, { maxLength: 2 }) }),
  values: fc.oneof({ weight: 14, arbitrary: fc.constant(names[1]!) }, { weight: 1, arbitrary: columnName }),
  title: text, subtitle: text, source: text, description: text,
  // Sizes from the smallest allowed; text that cannot fit gets layout.frame-too-small.
  order: fc.constantFrom('auto', 'value', 'label', 'data'),
  aggregate: fc.constantFrom('sum', 'mean', 'count', 'max', 'min'),
  size: fc.record({ width: fc.integer({ min: 160, max: 2000 }), height: fc.integer({ min: 160, max: 1500 }) }),
  fields: fc.oneof(
    { weight: 3, arbitrary: fc.constant({}) },
    { weight: 1, arbitrary: fc.dictionary(fc.constantFrom(...names), fc.record({ format, unit: text, label: text, type: fc.constantFrom('categorical', 'ordinal', 'quantitative', 'temporal', 'cyclic'), order: fc.array(text, { maxLength: 5 }) }, { requiredKeys: [] }), { maxKeys: 2 }) },
  ),
}, { requiredKeys: ['intent', 'keys', 'values'] });

/** Writes a table as delimited text, quoting as RFC 4180 asks. */
function delimited(names: string[], rows: unknown[][], sep: string): string {
  const quote = (v: unknown) => {
    const s = typeof v === 'bigint' ? String(v) : v === null || v === undefined ? '' : typeof v === 'object' ? JSON.stringify(v) : String(v);
    return /["\n\r]/.test(s) || s.includes(sep) ? `"${s.replace(/"/g, '""')}"` : s;
  };
  return [names, ...rows].map((r) => r.map(quote).join(sep)).join('\n');
}

/** Encodes data text as one of the encodings met in the wild, some of them invalid. */
function encode(s: string, how: string): Uint8Array {
  const utf8 = new TextEncoder().encode(s);
  if (how === 'utf16le' || how === 'utf16be') return utf16Bytes(s, how === 'utf16be');
  if (how === 'bom') return new Uint8Array([0xef, 0xbb, 0xbf, ...utf8]);
  if (how === 'latin1') return new Uint8Array([...utf8, 0xe9, 0x0a]);
  return utf8;
}

type Source = { kind: 'rows' } | { kind: 'file'; ext: string; encoding: string };
const source: fc.Arbitrary<Source> = fc.oneof(
  fc.constant({ kind: 'rows' as const }),
  fc.record({ kind: fc.constant('file' as const), ext: fc.constantFrom('csv', 'tsv', 'json', 'ndjson', 'semicolon'), encoding: fc.constantFrom('utf8', 'utf8', 'utf8', 'bom', 'utf16le', 'utf16be', 'latin1') }),
);

function dataFile(names: string[], rows: unknown[][], s: Extract<Source, { kind: 'file' }>): { name: string; bytes: Uint8Array } {
  const objects = rows.map((r) => Object.fromEntries(names.map((n, i) => [n, typeof r[i] === 'bigint' ? String(r[i]) : r[i]])));
  const body = s.ext === 'json' ? JSON.stringify(objects) : s.ext === 'ndjson' ? objects.map((o) => JSON.stringify(o)).join('\n')
    : delimited(names, rows, s.ext === 'tsv' ? '\t' : s.ext === 'semicolon' ? ';' : ',');
  return { name: `t.${s.ext === 'semicolon' ? 'csv' : s.ext}`, bytes: encode(body, s.encoding) };
}

/** Runs one hostile case; returns the result, or throws when the pipeline throws. */
async function renderHostile(b: Record<string, unknown>, names: string[], rows: unknown[][], s: Source): Promise<RenderResult> {
  if (s.kind === 'rows') {
    // Own properties even for `__proto__`, as JSON.parse would make them.
    const objects = rows.map((r) => { const o: Record<string, unknown> = {}; names.forEach((n, i) => Object.defineProperty(o, n, { value: r[i], enumerable: true, writable: true, configurable: true })); return o; });
    return renderBrief({ brief: { ...b, rows: objects } }, env);
  }
  const file = dataFile(names, rows, s);
  return renderBrief({ brief: { ...b, data: file.name }, file: 'b.yaml' }, { ...env, table: memoryFiles({ [file.name]: file.bytes }) });
}

/**
 * Parses SVG as XML, failing on any error or warning but one: U+FFFD in the text, which is
 * what hostile input (a lone surrogate, or bytes the data file already held as U+FFFD) rightly becomes.
 */
function parseSvg(svg: string): void {
  const problems: string[] = [];
  new DOMParser({ onError: (level, msg) => { if (!/replacement character/.test(msg)) problems.push(`${level}: ${msg}`); } }).parseFromString(svg, 'image/svg+xml');
  if (problems.length) throw new Error(problems.join('\n'));
}

/** The invariant: a well-formed SVG with finite numbers, or catalogued errors; never render.internal. */
function checkHostile(r: RenderResult): void {
  for (const d of r.diagnostics) {
    expect(Object.hasOwn(CATALOGUE, d.code), d.code).toBe(true);
    expect(d.code, d.message).not.toBe('render.internal');
    if (d.severity === 'error') expect(d.hint, d.code).toBeTruthy();
  }
  if (r.ok) {
    parseSvg(r.svg!);
    expectFiniteAttributes(r.svg!);
  } else expect(r.diagnostics.some((d) => d.severity === 'error')).toBe(true);
}

/** The hostile cases: a table, a brief over it, and where the data comes from. */
const cases = table.chain(([names, rows]) => fc.tuple(briefFor(names), fc.constant(names), fc.constant(rows), source));

describe('property: hostile input renders or fails with catalogued codes', () => {
  it('never throws: random briefs and tables with extreme numbers, prototype names, control characters, long texts and odd encodings', async () => {
    // Outcomes by first error code, printed for large runs (FC_SCALE) to show what was covered.
    const tally = new Map<string, number>();
    await fc.assert(fc.asyncProperty(cases, async ([b, names, rows, s]) => {
      const r = await renderHostile(b, names, rows, s);
      const outcome = r.ok ? 'rendered' : `refused: ${r.diagnostics.find((d) => d.severity === 'error')?.code ?? '(none)'}`;
      tally.set(outcome, (tally.get(outcome) ?? 0) + 1);
      checkHostile(r);
    }), { numRuns: runs(150) });
    if (process.env.FC_SCALE) console.log([...tally].sort((a, b) => b[1] - a[1]).map(([k, n]) => `${n}\t${k}`).join('\n'));
  }, runs(30_000)); // the suite's 30 s per test, scaled with the runs
});
