import { describe, expect, it } from 'vitest';
import { Ajv2020 } from 'ajv/dist/2020.js';
import { readBrief, checkBriefValue } from '../../src/brief/resolve.js';
import { BRIEF_SCHEMA } from '../../src/pipeline/vocabulary.js';
import { pointer } from '../../src/brief/validate.js';

const ok = (text: string) => {
  const r = readBrief(text);
  if (!r.ok) throw new Error(JSON.stringify(r.diagnostics));
  return r.value.brief;
};
const problems = (text: string) => {
  const r = readBrief(text);
  return r.diagnostics;
};

describe('brief stage', () => {
  it('resolves a minimal YAML brief with every default applied', () => {
    const b = ok('data: t.csv\nintent: compare\nkeys: pier\nvalues: crossings\n');
    expect(b).toMatchObject({
      data: { kind: 'file', path: 't.csv' }, intent: 'compare', keys: ['pier'], values: ['crossings'],
      order: 'auto', baseline: 'zero', aggregate: 'sum', style: 'report', size: { width: 720, height: 440 }, output: [], fields: {},
    });
  });

  it('reads JSON briefs with the same parser', () => {
    expect(ok('{"data": "t.csv", "intent": "compare", "keys": ["a", "b"]}').keys).toEqual(['a', 'b']);
  });

  it('takes "-" as stdin and inline rows as rows', () => {
    expect(ok('data: "-"\nintent: compare').data).toEqual({ kind: 'stdin' });
    expect(ok('rows: [{a: 1}]\nintent: compare').data).toEqual({ kind: 'rows', rows: [{ a: 1 }] });
  });

  it('names a misspelt option, its path and line, and suggests the option meant', () => {
    const [d] = problems('data: t.csv\nintent: compare\nvalus: crossings\n');
    expect(d).toMatchObject({ code: 'brief.unknown-option', path: '/valus', line: 3, found: 'valus' });
    expect(d!.hint).toContain('`values`');
  });

  it('suggests the intended value of an enum option', () => {
    const [d] = problems('data: t.csv\nintent: compair\n');
    expect(d).toMatchObject({ code: 'brief.bad-value', path: '/intent', line: 2 });
    expect(d!.hint).toContain('`compare`');
  });

  it('gives the path into nested options', () => {
    const [d] = problems('data: t.csv\nintent: compare\nfields:\n  month:\n    type: cyclical\n');
    expect(d).toMatchObject({ code: 'brief.bad-value', path: '/fields/month/type', line: 5 });
    expect(d!.hint).toContain('`cyclic`');
  });

  it('reports wrong types with what was found and expected', () => {
    const [d] = problems('data: t.csv\nintent: compare\nsize: { width: wide }\n');
    expect(d).toMatchObject({ code: 'brief.wrong-type', path: '/size/width', found: 'string "wide"', expected: 'an integer' });
  });

  it('reports sizes out of range', () => {
    expect(problems('data: t.csv\nintent: compare\nsize: { width: 20 }\n')[0]).toMatchObject({ code: 'brief.out-of-range', path: '/size/width' });
  });

  it('requires an intent and some data', () => {
    expect(problems('data: t.csv\n').map((d) => d.code)).toEqual(['brief.missing-option']);
    expect(problems('intent: compare\n')).toMatchObject([{ code: 'brief.missing-option', path: '/data' }]);
  });

  it('refuses data and rows together', () => {
    expect(problems('data: t.csv\nrows: []\nintent: compare\n')).toMatchObject([{ code: 'brief.data-and-rows' }]);
  });

  it('reports YAML syntax errors with their line', () => {
    const [d] = problems('data: t.csv\nintent: [compare\n');
    expect(d).toMatchObject({ code: 'brief.parse-error' });
    expect(d!.line).toBeGreaterThanOrEqual(2);
  });

  it('reports duplicate keys as a parse error', () => {
    expect(problems('intent: compare\nintent: trend\ndata: t.csv\n')[0]!.code).toBe('brief.parse-error');
  });

  it('refuses a brief that is not a mapping', () => {
    expect(problems('- compare\n')).toMatchObject([{ code: 'brief.not-an-object' }]);
    expect(checkBriefValue(42).diagnostics).toMatchObject([{ code: 'brief.not-an-object' }]);
  });
});

describe('brief schema', () => {
  // ajv (a general-purpose JSON Schema validator from npm) is the reference: the published
  // schema must be valid draft 2020-12 and accept and reject the same briefs as our validator.
  const ajv = new Ajv2020({ strict: false, allErrors: true });
  const validate = ajv.compile(BRIEF_SCHEMA);
  const cases: [string, unknown][] = [
    ['minimal', { data: 't.csv', intent: 'compare' }],
    ['full', { data: 't.csv', intent: 'compare', keys: ['a'], values: 'b', title: 't', fields: { b: { unit: 'x', type: 'quantitative', order: ['a', 1] } }, size: { width: 300, height: 200 }, output: ['a.svg', 'a.png'], order: 'value', baseline: 'zero', aggregate: 'mean' }],
    ['unknown option', { data: 't.csv', intent: 'compare', colour: 'red' }],
    ['bad intent', { data: 't.csv', intent: 'explain' }],
    ['empty keys list', { data: 't.csv', intent: 'compare', keys: [] }],
    ['bad field type', { data: 't.csv', intent: 'compare', fields: { a: { type: 'nominal' } } }],
    ['no intent', { data: 't.csv' }],
    ['fractional width', { data: 't.csv', intent: 'compare', size: { width: 300.5 } }],
    ['width too small', { data: 't.csv', intent: 'compare', size: { width: 10 } }],
    ['keys as number', { data: 't.csv', intent: 'compare', keys: 3 }],
  ];
  for (const [name, doc] of cases) {
    it(`agrees with ajv on the ${name} brief`, () => {
      const ours = checkBriefValue(doc).diagnostics.filter((d) => d.code !== 'brief.missing-option' || d.path !== '/data');
      expect(ours.length === 0).toBe(validate(doc));
    });
  }
});

describe('paths of brief problems', () => {
  // RFC 6901 §3: "~" is written "~0" and "/" is written "~1" in a JSON pointer's reference token.
  it('escape ~ and / in keys as a JSON pointer does, and leave other keys as they are', () => {
    expect(pointer('/fields', 'a/b~c')).toBe('/fields/a~1b~0c');
    expect(pointer('/rows', 3)).toBe('/rows/3');
    expect(pointer('', 'size')).toBe('/size');
  });
});
