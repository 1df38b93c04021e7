import type { Weight } from '../style/types.js';

/** The datum a mark encodes: column name → value, as in the data. */
export type Datum = Record<string, string | number | boolean | null>;

interface NodeBase {
  /** Stable id, derived from the data the node draws (never from a counter shared across charts). */
  id: string;
  /** What the node is in the chart: "bar", "gridline", "tick", "title", … */
  role: string;
  datum?: Datum;
}

/** A box in pixels: top-left corner and size. */
export interface Box {
  x: number;
  y: number;
  width: number;
  height: number;
}

export interface GroupNode extends NodeBase {
  kind: 'group';
  children: SceneNode[];
}

export interface RectNode extends NodeBase, Box {
  kind: 'rect';
  fill: string;
}

export interface PathNode extends NodeBase {
  kind: 'path';
  /** Path data in absolute pixel coordinates. */
  d: string;
  fill: string | undefined;
  stroke: string | undefined;
  strokeWidth: number;
}

export interface CircleNode extends NodeBase {
  kind: 'circle';
  cx: number;
  cy: number;
  r: number;
  fill: string;
}

export interface TextNode extends NodeBase {
  kind: 'text';
  text: string;
  /** Anchor point: x by `anchor`, y on the baseline. */
  x: number;
  y: number;
  anchor: 'start' | 'middle' | 'end';
  size: number;
  weight: Weight;
  fill: string;
  /** The measured box of the text: from ascender to descender, advance width wide. */
  box: Box;
}

export interface ImageNode extends NodeBase, Box {
  kind: 'image';
  href: string;
}

/** The closed set of scene nodes; the SVG writer switches over `kind` exhaustively. */
export type SceneNode = GroupNode | RectNode | PathNode | CircleNode | TextNode | ImageNode;

/** What an axis shows, for the scene dump and for tests. */
export interface AxisInfo {
  orient: 'left' | 'bottom' | 'top' | 'right';
  field: string;
  title: string;
  /** [min, max] for a continuous axis, the categories in order for a band axis. */
  domain: number[] | string[];
  ticks: number[] | string[];
  /** Pixel positions of the ticks along the axis. */
  tickPositions: number[];
  /** Pixel range of the axis: [start, end] in its direction. */
  range: [number, number];
}

/** A finished chart in pixels: everything the SVG writer needs and nothing it must decide. */
export interface Scene {
  form: string;
  width: number;
  height: number;
  background: string;
  /** Accessible name (the brief title) and generated one-sentence description. */
  title: string;
  description: string;
  root: GroupNode;
  axes: AxisInfo[];
  /** The plot area: where data marks may be. */
  plot: Box;
}
