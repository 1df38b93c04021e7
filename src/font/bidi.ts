import { createRequire } from 'node:module';

interface Bidi {
  getEmbeddingLevels(text: string, direction?: 'ltr' | 'rtl'): { levels: Uint8Array };
  getMirroredCharacter(ch: string): string | null;
}
let bidi: Bidi | undefined;

/** bidi-js (the Unicode Bidirectional Algorithm, UAX #9), loaded only when a label holds right-to-left letters. */
function loadBidi(): Bidi {
  const require = createRequire(import.meta.url);
  bidi ??= (require('bidi-js') as () => Bidi)();
  return bidi;
}

/**
 * The embedding level of each UTF-16 unit of a line (UAX #9 rules P2-I2, paragraph direction
 * from its first strong letter): even levels run left to right, odd ones right to left.
 */
export function embeddingLevels(text: string): Uint8Array {
  return loadBidi().getEmbeddingLevels(text).levels;
}

/** The text of a right-to-left run of a face that cannot shape it: mirrored brackets (UAX #9 L4) in reversed order. */
export function mirroredReversed(text: string): string {
  const b = loadBidi();
  return [...text].reverse().map((ch) => b.getMirroredCharacter(ch) ?? ch).join('');
}

/**
 * The visual order of runs given each run's level (UAX #9 rule L2): from the highest level down
 * to the lowest odd one, every maximal sequence of runs at that level or higher is reversed.
 */
export function visualOrder(levels: readonly number[]): number[] {
  const order = levels.map((_, i) => i);
  if (levels.length === 0) return order;
  // Loops, not Math.max(...levels): a long line has more runs than a call can take arguments.
  let highest = 0;
  let lowestOdd = Infinity;
  for (const l of levels) {
    highest = Math.max(highest, l);
    lowestOdd = Math.min(lowestOdd, l % 2 ? l : l + 1);
  }
  for (let level = highest; level >= lowestOdd; level--) {
    for (let i = 0; i < order.length; i++) {
      if (levels[order[i]!]! < level) continue;
      let j = i;
      while (j + 1 < order.length && levels[order[j + 1]!]! >= level) j++;
      order.splice(i, j - i + 1, ...order.slice(i, j + 1).reverse());
      i = j;
    }
  }
  return order;
}
