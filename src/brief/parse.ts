import { LineCounter, parseDocument, isMap, isSeq, type Node } from 'yaml';
import { diagnostic, type Diagnostic, type Outcome, success, failure } from '../diagnostics/diagnostic.js';

/** A brief document parsed to plain data, with a way back from paths to source positions. */
export interface ParsedBrief {
  value: unknown;
  /** 1-based line and column of the value at a JSON-pointer path, or of its nearest parent. */
  locate(path: string): { line: number; column: number } | undefined;
}

function splitPointer(path: string): string[] {
  if (!path) return [];
  return path.slice(1).split('/').map((p) => p.replace(/~1/g, '/').replace(/~0/g, '~'));
}

/**
 * Parses brief text. JSON is a subset of YAML 1.2, so one parser reads both and keeps
 * positions for every node; duplicate keys are errors.
 */
export function parseBriefText(text: string): Outcome<ParsedBrief> {
  const lineCounter = new LineCounter();
  const doc = parseDocument(text, { lineCounter, uniqueKeys: true, prettyErrors: true, strict: true });
  if (doc.errors.length > 0) {
    const problems: Diagnostic[] = doc.errors.map((e) => {
      const pos = e.linePos?.[0];
      return diagnostic('brief.parse-error', e.message.split('\n')[0]!.replace(/ at line \d+, column \d+:?$/, ''), {
        line: pos?.line, column: pos?.col, hint: 'check indentation, quotes and colons near this line',
      });
    });
    return failure(problems);
  }
  const value: unknown = doc.toJS({ maxAliasCount: 100 });
  const locate = (path: string) => {
    let node: unknown = doc.contents;
    let best: Node | undefined = node as Node | undefined;
    for (const key of splitPointer(path)) {
      if (isMap(node)) {
        const pair = node.items.find((p) => String((p.key as { value?: unknown })?.value ?? p.key) === key);
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
  return success({ value, locate });
}
