/** Decimal places of every coordinate written into SVG: 1/100 px is below what any raster shows. */
export const PRECISION = 2;

/**
 * Writes a number into SVG: fixed precision, trailing zeros dropped, never `-0`, never an
 * exponent. A non-finite number is a defect upstream and throws.
 */
export function fmt(n: number): string {
  if (!Number.isFinite(n)) throw new RangeError(`non-finite number in scene: ${n}`);
  // String() switches to exponent form from 1e21; no coordinate of a real chart comes near.
  if (Math.abs(n) >= 1e15) throw new RangeError(`number too large for a coordinate: ${n}`);
  const f = 10 ** PRECISION;
  const r = Math.round(n * f) / f;
  if (r === 0) return '0';
  // k/100 as a double prints as its shortest round-trip form, which is the ≤ 2-decimal one.
  return String(r);
}

/**
 * One token of SVG path data (SVG 1.1 §8.3.9 grammar): a command letter, a run of separators
 * (white space and commas), or a number. Anything else (NaN, Infinity, undefined) is not path data.
 */
const PATH_TOKEN = /[MmLlHhVvCcSsQqTtAaZz]|[\x20\t\r\n\f,]+|[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?/g;

function badPath(d: string, at: number): RangeError {
  return new RangeError(`not path data at character ${at}: ${JSON.stringify(d.slice(at, at + 24))}`);
}

/**
 * Rewrites every number in path data through `fmt`, keeping command letters and separators.
 * Path data is read token by token and anything that is not a command, a separator or a finite
 * number throws, so `MNaN 0` or `M0 Infinity` can never reach an SVG.
 */
export function fmtPath(d: string): string {
  let at = 0;
  let afterNumber = false;
  const out = d.replace(PATH_TOKEN, (token: string, offset: number) => {
    if (offset !== at) throw badPath(d, at);
    at = offset + token.length;
    const number = /\d/.test(token);
    const written = number ? fmt(Number(token)) : token;
    // "2.0.5" is 2.0 and .5; written as "2" and "0.5" they would merge into 20.5.
    const joined = number && afterNumber && written[0] !== '-' ? ` ${written}` : written;
    afterNumber = number;
    return joined;
  });
  if (at !== d.length) throw badPath(d, at);
  return out;
}
