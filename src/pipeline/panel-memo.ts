/** Memo keys of the layout kit whose results depend on the key alone (frame words, tick search, fitted band labels), never on a panel's rows. */
const KIT_KEYS = ['frame\u0000', 'ticks\u0000', 'band-labels\u0000'];

const shared = (key: string) => KIT_KEYS.some((prefix) => key.startsWith(prefix));

/**
 * A panel's memory of measured results: what a form memoizes about its own rows (e.g. the bar's
 * grouped rows and value texts) stays with the panel, while the layout kit's results, which
 * depend only on their key, are shared with the whole chart, so six panels lay out the frame and
 * search ticks once, not six times. Pure: a cache of deterministic results within one render.
 */
export class PanelMemo extends Map<string, unknown> {
  constructor(private readonly chart: Map<string, unknown>) {
    super();
  }

  override has(key: string): boolean {
    return shared(key) ? this.chart.has(key) : super.has(key);
  }

  override get(key: string): unknown {
    return shared(key) ? this.chart.get(key) : super.get(key);
  }

  override set(key: string, value: unknown): this {
    if (shared(key)) this.chart.set(key, value);
    else super.set(key, value);
    return this;
  }
}
