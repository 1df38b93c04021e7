import { Alias, LineCounter, parseDocument, isMap, isScalar, isSeq, visit, type Document, type Node, type Pair, type YAMLMap } from 'yaml';
import { diagnostic, type Diagnostic, type Outcome, success, failure } from '../diagnostics/diagnostic.js';

/** A brief document parsed to plain data, with a way back from paths to source positions. */
export interface ParsedBrief {
  value: unknown;
  /** 1-based line and column of the value at a JSON-pointer path, or of its nearest parent. */
  locate(path: string): { line: number; column: number } | undefined;
}

/** Most aliases a brief may expand, all told; beyond it an alias "bomb" would grow without end. */
const MAX_ALIAS_COUNT = 100;

function splitPointer(path: string): string[] {
  if (!path) return [];
  return path.slice(1).split('/').map((p) => p.replace(/~1/g, '/').replace(/~0/g, '~'));
}

function keyText(pair: Pair): string {
  return String(isScalar(pair.key) ? pair.key.value : pair.key);
}

/** Finds the pairs of YAML maps by key through an index built once per map, so that locating many paths stays linear. */
function pairFinder(): (map: YAMLMap, key: string) => Pair | undefined {
  const indexes = new WeakMap<YAMLMap, Map<string, Pair>>();
  return (map, key) => {
    let index = indexes.get(map);
    if (!index) {
      index = new Map();
      for (const pair of map.items) if (!index.has(keyText(pair))) index.set(keyText(pair), pair);
      indexes.set(map, index);
    }
    return index.get(key);
  };
}

/** The first key repeated within one map, found with a set per map: yaml's own `uniqueKeys` check is quadratic (100,000 keys took minutes). */
function duplicateKey(doc: Document): Node | undefined {
  let found: Node | undefined;
  visit(doc, {
    Map(_key, map) {
      const seen = new Set<string>();
      for (const pair of map.items) {
        if (!isScalar(pair.key)) continue;
        // Keys are compared as the property names they become.
        const name = keyText(pair);
        if (seen.has(name)) { found = pair.key; return visit.BREAK; }
        seen.add(name);
      }
      return undefined;
    },
  });
  return found;
}

/** The first alias that refers to a node containing it (`keys: &a [*a]`), which would make the brief endless. */
function selfReference(doc: Document): Alias | undefined {
  let found: Alias | undefined;
  visit(doc, {
    Alias(_key, node, path) {
      const target = node.resolve(doc);
      if (target && path.includes(target)) { found = node; return visit.BREAK; }
      return undefined;
    },
  });
  return found;
}

function aliasProblem(message: string, lineCounter: LineCounter, at?: Node): Diagnostic {
  const offset = at?.range?.[0];
  const pos = offset === undefined ? undefined : lineCounter.linePos(offset);
  return diagnostic('brief.bad-alias', message, {
    line: pos?.line, column: pos?.col, found: 'a YAML alias (*name)',
    hint: 'write the repeated values out instead of using YAML anchors (&name) and aliases (*name)',
  });
}

/** The document as plain data, or a `brief.bad-alias` problem: aliases that refer to themselves, are undefined, or expand too far. */
function toPlain(doc: Document, lineCounter: LineCounter): Outcome<unknown> {
  const cycle = selfReference(doc);
  if (cycle) return failure([aliasProblem(`the alias *${cycle.source} refers to a value that contains it, so the brief would never end`, lineCounter, cycle)]);
  try {
    return success(doc.toJS({ maxAliasCount: MAX_ALIAS_COUNT }));
  } catch (e) {
    // yaml throws a ReferenceError for an undefined alias and for an alias "bomb".
    const excessive = /excessive alias/i.test(String((e as Error)?.message));
    return failure([aliasProblem(excessive
      ? `the brief's aliases expand to more than ${MAX_ALIAS_COUNT} copies (an alias bomb)`
      : `the brief has an alias that cannot be resolved (${String((e as Error)?.message ?? e).split('\n')[0]})`, lineCounter)]);
  }
}

/**
 * Parses brief text. JSON is a subset of YAML 1.2, so one parser reads both and keeps
 * positions for every node; duplicate keys are errors.
 */
export function parseBriefText(text: string): Outcome<ParsedBrief> {
  const lineCounter = new LineCounter();
  const doc = parseDocument(text, { lineCounter, uniqueKeys: false, prettyErrors: true, strict: true });
  if (doc.errors.length > 0) {
    const problems: Diagnostic[] = doc.errors.map((e) => {
      const pos = e.linePos?.[0];
      return diagnostic('brief.parse-error', e.message.split('\n')[0]!.replace(/ at line \d+, column \d+:?$/, ''), {
        line: pos?.line, column: pos?.col, hint: 'check indentation, quotes and colons near this line',
      });
    });
    return failure(problems);
  }
  const duplicate = duplicateKey(doc);
  if (duplicate) {
    const pos = duplicate.range ? lineCounter.linePos(duplicate.range[0]) : undefined;
    return failure([diagnostic('brief.parse-error', `the key \`${String((duplicate as { value?: unknown }).value)}\` appears twice in one mapping`, {
      line: pos?.line, column: pos?.col, found: String((duplicate as { value?: unknown }).value), hint: 'keep one of the two, or rename the other',
    })]);
  }
  const plain = toPlain(doc, lineCounter);
  if (!plain.ok) return failure(plain.diagnostics);
  const pairOf = pairFinder();
  const locate = (path: string) => {
    let node: unknown = doc.contents;
    let best: Node | undefined = node as Node | undefined;
    for (const key of splitPointer(path)) {
      if (isMap(node)) {
        const pair = pairOf(node, key);
        if (!pair) break;
        node = pair.value ?? pair.key;
        best = (pair.value ?? pair.key) as Node;
      } else if (isSeq(node)) {
        node = node.items[Number(key)];
        if (!node) break;
        best = node as Node;
      } else break;
    }
    const offset = best?.range?.[0];
    if (offset === undefined) return undefined;
    const pos = lineCounter.linePos(offset);
    return { line: pos.line, column: pos.col };
  };
  return success({ value: plain.value, locate });
}
