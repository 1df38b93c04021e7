/** A 32-bit FNV-1a hash of a text's UTF-16 code units: a stable seed from a group's label. */
export function seedOf(text: string): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193);
  }
  return h >>> 0;
}

/** One draw in [0, 1) for (seed, index): a stateless integer mixer (splitmix32's finaliser), so draw i never depends on the others. */
function draw(seed: number, index: number): number {
  let z = (seed + Math.imul(index + 1, 0x9e3779b9)) >>> 0;
  z = Math.imul(z ^ (z >>> 16), 0x85ebca6b);
  z = Math.imul(z ^ (z >>> 13), 0xc2b2ae35);
  return ((z ^ (z >>> 16)) >>> 0) / 4294967296;
}

/**
 * `count` jitter offsets in [−1, 1), seeded by a text (a group's label): the same text and count
 * give the same offsets on every run and machine. Scale them to half the room across a strip.
 * No Math.random: a chart must be the same bytes every time.
 */
export function jitterOffsets(count: number, seedText: string): number[] {
  const seed = seedOf(seedText);
  const out = new Array<number>(count);
  for (let i = 0; i < count; i++) out[i] = 2 * draw(seed, i) - 1;
  return out;
}
