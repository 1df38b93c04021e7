import { describe, expect, it } from 'vitest';
import { formatProblem, MAX_FORMAT_PRECISION, MAX_FORMAT_WIDTH } from '../../src/brief/format.js';
import { checkBriefValue, readBrief } from '../../src/brief/resolve.js';
import { MAX_BRIEF_PROBLEMS } from '../../src/brief/validate.js';
import { renderBrief } from '../../src/pipeline/render.js';
import { codes, env } from '../helpers.js';

const rows = '\nrows: [{k: a, v: 1}, {k: b, v: 2}]\nkeys: k\nvalues: v\n';

describe('format specifiers are checked with the brief', () => {
  for (const [format, why] of [['zz', 'not a specifier'], ['999999999,.2f', 'a width of a billion'], ['.25f', 'a precision over 20'], ['.2z', 'a type letter d3-format does not document']]) {
    it(`refuses fields.v.format ${JSON.stringify(format)} (${why}) with its path and line`, () => {
      const r = readBrief(`intent: compare${rows}fields:\n  v:\n    format: "${format}"\n`);
      expect(r.ok).toBe(false);
      expect(r.diagnostics).toMatchObject([{ code: 'brief.bad-format', path: '/fields/v/format', line: 7 }]);
      // The hint shows a valid specifier, and that example is itself accepted.
      expect(r.diagnostics[0]!.hint).toContain('",d"');
      expect(formatProblem(',d')).toBeUndefined();
    });
  }

  it('accepts the specifiers d3-format documents, up to the caps', () => {
    // Examples from the d3-format README.
    for (const ok of [',d', '.1f', '.0%', '+.2e', '$,.2f', '.2~s', '#x', '>10', '020,.3f', 'c', 'n', '']) expect(formatProblem(ok), ok).toBeUndefined();
    expect(formatProblem(`${MAX_FORMAT_WIDTH}d`)).toBeUndefined();
    expect(formatProblem(`${MAX_FORMAT_WIDTH + 1}d`)).toBeDefined();
    expect(formatProblem(`.${MAX_FORMAT_PRECISION}f`)).toBeUndefined();
    expect(formatProblem(`.${MAX_FORMAT_PRECISION + 1}f`)).toBeDefined();
  });

  it('renderBrief reports a bad format instead of throwing (it once threw "invalid format")', async () => {
    const r = await renderBrief({ brief: { intent: 'compare', keys: 'k', values: 'v', fields: { v: { format: 'zz' } } }, rows: [{ k: 'a', v: 1 }] }, env);
    expect(codes(r)).toEqual(['brief.bad-format']);
  });
});

describe('brief options are looked up as own properties only', () => {
  for (const name of ['constructor', '__proto__', 'toString', 'hasOwnProperty']) {
    it(`refuses \`${name}:\` as an unknown option, at the top level and in a field hint`, () => {
      expect(readBrief(`intent: compare${rows}${name}: 1\n`).diagnostics).toMatchObject([{ code: 'brief.unknown-option', path: `/${name}` }]);
      expect(readBrief(`intent: compare${rows}fields: {v: {${name}: 1}}\n`).diagnostics).toMatchObject([{ code: 'brief.unknown-option', path: `/fields/v/${name}` }]);
    });
  }

  it('accepts field hints for columns named after Object.prototype members', () => {
    const r = readBrief('intent: compare\nrows: [{constructor: a, __proto__: 1}]\nkeys: constructor\nvalues: __proto__\nfields: {__proto__: {unit: m}, constructor: {label: C}}\n');
    expect(r.diagnostics).toEqual([]);
  });
});

describe('YAML aliases', () => {
  it('refuses a self-referencing alias as brief.bad-alias with its line (it once threw)', () => {
    expect(readBrief('intent: compare\nkeys: &a [*a]\n').diagnostics).toMatchObject([{ code: 'brief.bad-alias', line: 2 }]);
    expect(readBrief('intent: compare\nfields: &f {v: {order: [*f]}}\n').diagnostics).toMatchObject([{ code: 'brief.bad-alias', line: 2 }]);
  });

  it('refuses an alias bomb (nine levels of nine copies) as brief.bad-alias', () => {
    const levels = ['a: &a [x, x, x, x, x, x, x, x, x]'];
    for (let i = 1; i < 9; i++) {
      const prev = String.fromCharCode(96 + i);
      const name = String.fromCharCode(97 + i);
      levels.push(`${name}: &${name} [${Array(9).fill(`*${prev}`).join(', ')}]`);
    }
    expect(codes(readBrief(`${levels.join('\n')}\nintent: compare\n`))).toEqual(['brief.bad-alias']);
  });

  it('refuses an alias to an anchor not yet defined', () => {
    expect(codes(readBrief('intent: compare\nkeys: *nope\n'))).toEqual(['brief.bad-alias']);
  });

  it('still reads an ordinary alias', () => {
    const r = readBrief(`intent: compare${rows}title: &t Crossings\nsubtitle: *t\n`);
    expect(r.ok && r.value.brief.subtitle).toBe('Crossings');
  });
});

describe('hostile brief values from the library never throw', () => {
  it('reports BigInt, circular and 100,000-deep option values as wrong types', () => {
    let deep: unknown = 'x';
    for (let i = 0; i < 100_000; i++) deep = [deep];
    const cyclic: Record<string, unknown> = {};
    cyclic.self = cyclic;
    const r = checkBriefValue({ intent: 'compare', rows: [], title: 10n, subtitle: deep, source: cyclic, size: { width: cyclic } });
    expect(r.diagnostics.map((d) => [d.code, d.path])).toEqual([
      ['brief.wrong-type', '/title'], ['brief.wrong-type', '/subtitle'], ['brief.wrong-type', '/source'], ['brief.wrong-type', '/size/width'],
    ]);
    for (const d of r.diagnostics) expect(d.found!.length).toBeLessThanOrEqual(50);
  });
});

describe('values shown in diagnostics', () => {
  it('keeps the found value of a long bad enum value as JSON that parses back to it', () => {
    const intent = `compare${'x'.repeat(5000)}`;
    const [d] = checkBriefValue({ intent, rows: [{ k: 'a' }] }).diagnostics;
    expect(d).toMatchObject({ code: 'brief.bad-value', path: '/intent' });
    expect(JSON.parse(d!.found!)).toBe(intent);
    expect(d!.message.length).toBeLessThan(120);
  });
});

describe('deeply nested brief text', () => {
  it('reports a YAML brief nested 20,000 deep as a parse error, not a stack overflow', () => {
    const deep = `${'['.repeat(20_000)}${']'.repeat(20_000)}`;
    expect(codes(readBrief(`intent: compare\nrows: [{k: a, v: ${deep}}]\n`))).toEqual(['brief.parse-error']);
  });
});

describe('many problems in one brief', () => {
  it(`reports at most ${MAX_BRIEF_PROBLEMS} problems and one line counting the rest, for 100,000 unknown options`, () => {
    const brief: Record<string, unknown> = { intent: 'compare', rows: [{ k: 'a' }] };
    for (let i = 0; i < 100_000; i++) brief[`option${i}`] = i;
    const r = checkBriefValue(brief);
    expect(r.diagnostics).toHaveLength(MAX_BRIEF_PROBLEMS + 1);
    expect(r.diagnostics.slice(0, MAX_BRIEF_PROBLEMS).every((d) => d.code === 'brief.unknown-option')).toBe(true);
    expect(r.diagnostics[MAX_BRIEF_PROBLEMS]).toMatchObject({ code: 'brief.too-many-problems', found: '100000 problems' });
  });

  it('locates the problems of a long YAML brief on their own lines', () => {
    const lines = Array.from({ length: 5000 }, (_, i) => `option${i}: ${i}`);
    const r = readBrief(`intent: compare${rows}${lines.join('\n')}\n`);
    expect(r.diagnostics[0]).toMatchObject({ code: 'brief.unknown-option', path: '/option0', line: 5 });
    expect(r.diagnostics[49]).toMatchObject({ path: '/option49', line: 54 });
  });

  it(`reports at most ${MAX_BRIEF_PROBLEMS} bad formats and one line counting the rest`, () => {
    const fields = Object.fromEntries(Array.from({ length: 200 }, (_, i) => [`c${i}`, { format: 'zz' }]));
    const r = checkBriefValue({ intent: 'compare', rows: [{ k: 'a' }], fields });
    expect(codes(r).filter((c) => c === 'brief.bad-format')).toHaveLength(MAX_BRIEF_PROBLEMS);
    expect(codes(r).at(-1)).toBe('brief.too-many-problems');
  });
});
