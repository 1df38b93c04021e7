import type { CartesianDomains, Channel, LabelRoom } from './kit-types.js';

/**
 * One channel covering every panel's: continuous extents unioned; categories in the order of the
 * whole chart's channel (e.g. bars sorted by their total over all panels), those no panel draws
 * left out, then any category only a panel has, in panel order.
 */
function unionChannel(whole: Channel, panels: readonly Channel[]): Channel {
  if (whole.kind === 'band') {
    const drawn = new Set(panels.flatMap((c) => (c.kind === 'band' ? c.domain : [])));
    const domain = whole.domain.filter((d) => drawn.has(d));
    const seen = new Set(domain);
    for (const c of panels) if (c.kind === 'band') for (const d of c.domain) if (!seen.has(d)) { seen.add(d); domain.push(d); }
    return { ...whole, domain };
  }
  let [lo, hi] = [Infinity, -Infinity];
  for (const c of panels) if (c.kind === whole.kind) { lo = Math.min(lo, c.extent[0]); hi = Math.max(hi, c.extent[1]); }
  return { ...whole, extent: lo <= hi ? [lo, hi] : whole.extent };
}

/**
 * The domains every panel of a small-multiples chart shares: the whole chart's channels (titles,
 * fields, legend, zero line) with extents and categories covering every panel, so every panel
 * gets one and the same x and y scale.
 */
export function unionDomains(whole: CartesianDomains, panels: readonly CartesianDomains[]): CartesianDomains {
  const gutters = panels.map((p) => p.rightGutter ?? 0);
  const rightGutter = Math.max(whole.rightGutter ?? 0, ...gutters);
  return {
    ...whole,
    left: unionChannel(whole.left, panels.map((p) => p.left)),
    bottom: unionChannel(whole.bottom, panels.map((p) => p.bottom)),
    ...(rightGutter > 0 ? { rightGutter } : {}),
  };
}

/** Room for every panel's labels: the most any panel needs at each end, shown only if every panel can show its own. */
export function unionRooms(rooms: readonly LabelRoom[]): LabelRoom {
  return { show: rooms.every((r) => r.show), low: Math.max(0, ...rooms.map((r) => r.low)), high: Math.max(0, ...rooms.map((r) => r.high)) };
}
