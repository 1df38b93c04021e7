import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { FORM_NAMES, INTENTS } from '../../src/brief/types.js';
import { formsForIntent, supportedIntents } from '../../src/choose/rules.js';
import { FORMS } from '../../src/forms/registry.js';
import { VOCABULARY } from '../../src/pipeline/vocabulary.js';

function sources(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? sources(path) : path.endsWith('.ts') ? [path] : [];
  });
}

/** Every intent or form of the design named in the source after "intent" or "form" (`intent: trend`, "use intent trend"). */
function namesInSource(word: 'intent' | 'form', names: readonly string[]): Map<string, string[]> {
  const found = new Map<string, string[]>();
  const pattern = new RegExp(`\\b${word}:? \\\\?\`?([a-z][a-z-]*)`, 'g');
  for (const file of sources('src')) {
    for (const m of readFileSync(file, 'utf8').matchAll(pattern)) {
      if (!names.includes(m[1]!)) continue;
      found.set(m[1]!, [...(found.get(m[1]!) ?? []), file]);
    }
  }
  return found;
}

// Issue 6: hints must never send a user to an intent or form that is not drawn.
describe('hints name only what is drawn', () => {
  it('every intent a message or hint names is answered by a row of the rule table', () => {
    const named = namesInSource('intent', INTENTS);
    expect(named.size).toBeGreaterThan(3); // the scan finds the hints it guards
    const unsupported = [...named].filter(([name]) => !supportedIntents().includes(name as never));
    expect(unsupported).toEqual([]);
  });

  it('every form a message or hint names is in the registry', () => {
    const drawn = FORMS.map((f) => f.name as string);
    const named = namesInSource('form', FORM_NAMES);
    expect(named.size).toBeGreaterThan(3);
    expect([...named].filter(([name]) => !drawn.includes(name))).toEqual([]);
  });

  it('the vocabulary offered by the schema and suggestions is the rule table and the registry', () => {
    expect(VOCABULARY.intents).toEqual(supportedIntents());
    expect(VOCABULARY.forms).toEqual(FORMS.map((f) => f.name));
    // Every form the registry draws is reachable from some intent's rows, so no hint pins a form no intent answers.
    const reachable = new Set(supportedIntents().flatMap((i) => formsForIntent(i)));
    expect(FORMS.map((f) => f.name).filter((name) => !reachable.has(name))).toEqual([]);
  });
});
