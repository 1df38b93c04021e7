import {
  symbolCircle, symbolCross, symbolDiamond, symbolSquare, symbolStar, symbolTriangle, symbolWye,
  type CanvasPath_D3Shape, type SymbolType,
} from 'd3-shape';
import type { Datum, Paint, PathCommand, Role, SceneNode } from '../scene/types.js';

/** The point shapes a shape encoding may use, in the order they are handed to categories. */
export const SHAPES = ['circle', 'square', 'triangle', 'diamond', 'cross', 'star', 'wye'] as const;

/** One point shape. */
export type ShapeName = (typeof SHAPES)[number];

const TYPES: Record<ShapeName, SymbolType> = {
  circle: symbolCircle, square: symbolSquare, triangle: symbolTriangle, diamond: symbolDiamond,
  cross: symbolCross, star: symbolStar, wye: symbolWye,
};

/**
 * The outline of a shape of `area` px² centred on (cx, cy), as path commands. The geometry is
 * d3-shape's symbol set, whose shapes all have the same area for the same size, so no shape
 * looks bigger than another. Only straight segments: the circle is drawn as a circle node.
 */
export function symbolCommands(shape: Exclude<ShapeName, 'circle'>, cx: number, cy: number, area: number): PathCommand[] {
  const commands: PathCommand[] = [];
  const recorder = {
    moveTo: (x: number, y: number) => { commands.push({ op: 'M', x: cx + x, y: cy + y }); },
    lineTo: (x: number, y: number) => { commands.push({ op: 'L', x: cx + x, y: cy + y }); },
    closePath: () => { commands.push({ op: 'Z' }); },
    rect: (x: number, y: number, w: number, h: number) => {
      commands.push({ op: 'M', x: cx + x, y: cy + y }, { op: 'L', x: cx + x + w, y: cy + y },
        { op: 'L', x: cx + x + w, y: cy + y + h }, { op: 'L', x: cx + x, y: cy + y + h }, { op: 'Z' });
    },
  };
  // The polygon symbols call only these four methods of the canvas path interface.
  TYPES[shape].draw(recorder as unknown as CanvasPath_D3Shape, area);
  return commands;
}

/** A point mark (or legend key) of a shape, `area` px², centred on (cx, cy). */
export function symbolNode(shape: ShapeName, spec: {
  id: string; role: Role; cx: number; cy: number; area: number; paint: Paint & { fill: string }; datum?: Datum;
}): SceneNode {
  const { id, role, cx, cy, area, paint, datum } = spec;
  const base = { id, role, ...(datum ? { datum } : {}), ...paint };
  if (shape === 'circle') return { kind: 'circle', ...base, cx, cy, r: Math.sqrt(area / Math.PI) };
  return { kind: 'path', ...base, commands: symbolCommands(shape, cx, cy, area) };
}
