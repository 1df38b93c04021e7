import { describe, expect, it } from 'vitest';
import { unionDomains, unionRooms } from '../../src/layout/facet-domains.js';
import type { CartesianDomains } from '../../src/layout/kit-types.js';

const domains = (keys: string[], extent: [number, number]): CartesianDomains => ({
  left: { kind: 'linear', name: 'value', field: 'v', title: 'V', extent },
  bottom: { kind: 'band', name: 'key', field: 'k', title: 'K', domain: keys },
  first: 'left', zeroLine: 'left',
});

describe('domains shared by small multiples', () => {
  it('extents cover every panel but not the whole chart\'s (whose values sum the panels)', () => {
    const u = unionDomains(domains(['c', 'a', 'b'], [0, 100]), [domains(['a'], [0, 7]), domains(['b', 'c'], [-2, 5])]);
    expect(u.left).toMatchObject({ kind: 'linear', extent: [-2, 7] });
  });

  it('categories follow the whole chart\'s order, keep only those drawn, then add those only a panel has', () => {
    const u = unionDomains(domains(['c', 'Others (3)', 'a', 'b'], [0, 1]), [domains(['a', 'z'], [0, 1]), domains(['b', 'c'], [0, 1])]);
    expect(u.bottom).toMatchObject({ kind: 'band', domain: ['c', 'a', 'b', 'z'] });
  });

  it('label room is the most any panel needs, shown only when every panel can show its labels', () => {
    expect(unionRooms([{ low: 1, high: 4, show: true }, { low: 3, high: 2, show: false }])).toEqual({ low: 3, high: 4, show: false });
  });
});
