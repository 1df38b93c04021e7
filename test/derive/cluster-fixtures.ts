/**
 * The five-item worked example of the UPGMA, WPGMA, single- and complete-linkage articles of
 * Wikipedia (5S rRNA distances of a Bacillus subtilis, b B. stearothermophilus, c Lactobacillus
 * viridescens, d Acholeplasma modicum, e Micrococcus luteus), as in REFERENCES §8.
 */
export const BACTERIA = ['a', 'b', 'c', 'd', 'e'];
export const BACTERIA_DISTANCES = Float64Array.from([
  0, 17, 21, 31, 23,
  17, 0, 30, 34, 21,
  21, 30, 0, 28, 39,
  31, 34, 28, 0, 43,
  23, 21, 39, 43, 0,
]);

/** A deterministic pseudo-random generator (mulberry32), so random matrices are the same on every run. */
export { seededRandom as seeded } from '../../src/color/random.js';

/** A rows × columns matrix of uniform values in [0, 100). */
export function randomMatrix(rows: number, columns: number, random: () => number): Float64Array[] {
  return Array.from({ length: rows }, () => Float64Array.from({ length: columns }, () => Math.floor(random() * 10000) / 100));
}
