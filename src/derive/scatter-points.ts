import { describeRows, diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import { keyText } from '../fields/labels.js';
import type { FieldRef } from '../fields/types.js';
import { columnOf, type Table } from '../table/types.js';

/** What a scatter reads from each row: x and y, and the optional codings. */
export interface PointQuery {
  x: FieldRef;
  y: FieldRef;
  area?: FieldRef;
  color?: FieldRef;
  shape?: FieldRef;
  /** The key naming each point (carried in its datum, not drawn). */
  key?: FieldRef;
}

/** One row as a point: its values, its codings, and where it is in the source. */
export interface ScatterPoint {
  x: number;
  y: number;
  area?: number;
  color?: string;
  shape?: string;
  key?: string;
  /** The row's position in the source (line or item number). */
  row: number;
}

/** The points of a table and what was left out or refused. */
export interface PointsRead {
  points: ScatterPoint[];
  /** Source positions of rows whose area value is negative (an error: an area cannot be negative). */
  negativeArea: number[];
  diagnostics: Diagnostic[];
}

type Reason = 'x' | 'y' | 'area' | 'color' | 'shape';

const number = (v: unknown): number | undefined => (typeof v === 'number' && Number.isFinite(v) ? v : undefined);

/** The rows left out for a missing or unusable cell, one warning per column, naming the rows. */
function missingWarnings(missing: Map<Reason, number[]>, query: PointQuery, table: Table): Diagnostic[] {
  return [...missing].map(([reason, rows]) => {
    const field = query[reason]!.name;
    const one = rows.length === 1;
    return diagnostic('derive.missing-values', `${describeRows(rows, table.positionNoun)} ha${one ? 's' : 've'} no usable \`${field}\` and ${one ? 'is' : 'are'} left out, not drawn at zero`, {
      file: table.origin.file, field, rows, hint: 'fill in the values, or remove those rows if they are not data',
    });
  });
}

/**
 * The derive step for a scatter: each row with finite x and y (and, where coded, an area value
 * and colour and shape levels) becomes a point. Rows missing any of them are left out with a
 * warning naming them, never drawn at zero; negative area values are collected for the form to
 * refuse (a circle's area cannot be negative).
 */
export function readPoints(table: Table, query: PointQuery): PointsRead {
  const col = (f: FieldRef | undefined) => (f ? columnOf(table, f.name) : undefined);
  const [xs, ys, areas, colors, shapes, keys] = [col(query.x)!, col(query.y)!, col(query.area), col(query.color), col(query.shape), col(query.key)];
  const points: ScatterPoint[] = [];
  const negativeArea: number[] = [];
  const missing = new Map<Reason, number[]>();
  const leaveOut = (reason: Reason, row: number) => { const list = missing.get(reason); if (list) list.push(row); else missing.set(reason, [row]); };
  for (let i = 0; i < table.rowCount; i++) {
    const row = table.rowPositions[i]!;
    const [x, y] = [number(xs.values[i]), number(ys.values[i])];
    const area = areas ? number(areas.values[i]) : undefined;
    const color = colors ? keyText(colors, i) : undefined;
    const shape = shapes ? keyText(shapes, i) : undefined;
    const gap: Reason | undefined = x === undefined ? 'x' : y === undefined ? 'y' : areas && area === undefined ? 'area' : color === null ? 'color' : shape === null ? 'shape' : undefined;
    if (gap) { leaveOut(gap, row); continue; }
    if (area !== undefined && area < 0) { negativeArea.push(row); continue; }
    const key = keys ? keyText(keys, i) : undefined;
    points.push({
      x: x!, y: y!, row, ...(area !== undefined ? { area } : {}), ...(color ? { color } : {}), ...(shape ? { shape } : {}), ...(key ? { key } : {}),
    });
  }
  return { points, negativeArea, diagnostics: missingWarnings(missing, query, table) };
}

/** The refusal of negative area values, naming their rows. */
export function negativeAreaError(rows: readonly number[], field: string, table: Table): Diagnostic {
  return diagnostic('derive.negative-area', `${describeRows(rows, table.positionNoun)} ha${rows.length === 1 ? 's' : 've'} a negative \`${field}\`, but a circle's area cannot be negative`, {
    file: table.origin.file, field, rows: [...rows], found: 'negative values', expected: 'zero or more',
    hint: `correct those rows, or show \`${field}\` by position (e.g. as x or y) where negative values have a place`,
  });
}
