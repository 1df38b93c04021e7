/**
 * What a form on a left and a bottom axis gives the composer to be drawn as small multiples:
 * what ranks its panels and how thin a band of its marks may get. The composer does the rest
 * (split rows, shared scales, grid, outer tick labels, panel titles).
 */
export interface FacetHooks<D> {
  /** What a panel is ranked by, in words ("total", "latest value"): stated in the rationale. */
  noun: string;
  /** The panel's ranking value (bars: the total; a line: its latest value). Larger comes first. */
  value(derived: D): number;
  /**
   * Thinnest band a panel's band axis may give each category, px, for its marks to keep their
   * contract (e.g. bars at least 3 px thick). Default: 1.
   */
  minBand?(derived: D): number;
  /**
   * The position in `keys:` of a key whose levels may become panels (a line's series key: each
   * panel then holds one series). Faceting by any other key is refused. Default: none.
   */
  keyIndex?: number;
}
