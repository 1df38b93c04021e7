import type { Outcome } from '../diagnostics/diagnostic.js';

/** A derivation's outcome with the plan it was derived by carried along, for layout and words. */
export function withPlan<P, D extends object>(plan: P, derived: Outcome<D>): Outcome<D & { plan: P }> {
  return derived.ok ? { ...derived, value: { ...derived.value, plan } } : derived;
}
