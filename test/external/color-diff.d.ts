// color-diff 1.4.0 ships no type declarations; only what the tests use.
declare module 'color-diff' {
  /** CIEDE2000 difference of two CIELAB colours. */
  export function diff(a: { L: number; a: number; b: number }, b: { L: number; a: number; b: number }): number;
}
