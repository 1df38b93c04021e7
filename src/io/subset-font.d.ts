// subset-font ships no types; chartwright calls only its default export.
declare module 'subset-font' {
  /** A subset of a TTF/WOFF/WOFF2 font holding the glyphs of `text` (harfbuzz hb-subset in wasm). */
  export default function subsetFont(font: Uint8Array, text: string, options?: Record<string, unknown>): Promise<Buffer>;
}
