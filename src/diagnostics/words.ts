/**
 * Small words for messages, so that every count agrees with its noun ("1 cell", "3 cells") and
 * every article with its word ("an integer", "a unit"). English only: messages are in English.
 */

/** "1 cell", "3 cells"; the plural is the noun with an "s" unless given. */
export function count(n: number, noun: string, plural = `${noun}s`): string {
  return `${n} ${n === 1 ? noun : plural}`;
}

/** The word that agrees with a count: `agree(n, 'has', 'have')`. */
export function agree(n: number, one: string, many: string): string {
  return n === 1 ? one : many;
}

/** The ordinal as words say "every …": "second", "third", then "4th", "21st", "22nd", "23rd", "111th". */
export function ordinal(k: number): string {
  if (k === 2) return 'second';
  if (k === 3) return 'third';
  const teen = k % 100 >= 11 && k % 100 <= 13;
  const suffix = teen ? 'th' : ({ 1: 'st', 2: 'nd', 3: 'rd' } as Record<number, string>)[k % 10] ?? 'th';
  return `${k}${suffix}`;
}

// Spelled with a vowel but said with a consonant ("a unit", "a one-off"), and the reverse ("an hour").
const SAID_WITH_CONSONANT = /^(uni|use|usu|uti|ure|eu|one|once)/i;
const SAID_WITH_VOWEL = /^(hour|honest|honou?r|heir)/i;

/** The phrase with "a" or "an" before it, chosen by how its first word is said: "an integer", "a unit", "an index line chart". */
export function article(phrase: string): string {
  const vowel = SAID_WITH_VOWEL.test(phrase) || (/^[aeiou]/i.test(phrase) && !SAID_WITH_CONSONANT.test(phrase));
  return `${vowel ? 'an' : 'a'} ${phrase}`;
}
