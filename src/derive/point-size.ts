/**
 * The radius of a circle whose area shows `value` on a scale where `maxValue` gets `maxRadius`:
 * r = maxRadius·√(value / maxValue), so the area, πr², is proportional to the value (area-true;
 * common practice). Flannery's (1971) perceptual correction, an exponent of about 0.57 instead of
 * 0.5 to offset how readers underestimate large circles, is deliberately not applied: it makes
 * the drawn areas untrue and readers differ in how much they underestimate.
 */
export function areaRadius(value: number, maxValue: number, maxRadius: number): number {
  if (!(maxValue > 0) || !(value > 0)) return 0;
  return maxRadius * Math.sqrt(value / maxValue);
}
