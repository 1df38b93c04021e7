import type { Decision } from './types.js';
import type { Fields } from '../fields/types.js';
import { isSiUnit, notationFor } from '../fields/notation.js';

/** The rationale's entry for how the chart's numbers are written, from its first value's unit and the brief's `notation`. */
export function notationDecision(fields: Fields): Decision | undefined {
  const value = fields.values.find((f) => f.type === 'quantitative');
  if (!value) return undefined;
  if (value.format) return { decision: `numbers of \`${value.name}\` written as \`${value.format}\``, rule: 'the field gives a `format:`' };
  const chosen = notationFor(value);
  const asked = value.notation !== 'auto';
  const unit = value.unit ? `the unit ${value.unit}` : 'no unit';
  const why = asked ? 'the brief asks for it (`notation:`)' : isSiUnit(value.unit) ? `${unit} is an SI unit, so large and small values take SI prefixes joined to it` : `${unit} is not an SI unit, so large values are written as thousands, millions, billions and trillions`;
  const words = { words: 'numbers from a million up written each in its own step, k, m, bn or tn, to three significant digits (more where two would read alike)', si: 'numbers written with SI prefixes joined to the unit (3.5 GWh, 2 ms)', digits: 'numbers written with every digit, grouped by thousands' }[chosen];
  return { decision: words, rule: why };
}
