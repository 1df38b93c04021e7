import type { Weight } from '../style/types.js';

/** The datum a mark encodes: column name → value, as in the data. */
export type Datum = Record<string, string | number | boolean | null>;

/**
 * What a node is in the chart. A closed list: the scene dump, the SVG classes and the tests
 * all read it. Extend it when a form needs a new kind of mark; never rename a role.
 */
export type Role =
  | 'chart' | 'panel' | 'panel-title'
  // marks
  | 'bar' | 'segment' | 'line' | 'point' | 'task' | 'dependency' | 'bin' | 'box' | 'cell'
  | 'dendrogram' | 'layer' | 'raster' | 'area'
  // guides
  | 'gridline' | 'zero-line' | 'reference' | 'tick' | 'tick-mark' | 'axis-line' | 'axis-title'
  | 'legend' | 'legend-title' | 'legend-swatch' | 'legend-label'
  // words
  | 'label' | 'leader' | 'title' | 'subtitle' | 'note' | 'source'
  // small multiples: the other panels' marks drawn in grey behind a panel's own
  | 'context';

/** How a mark is painted. Absent parts are not written (SVG defaults apply). */
export interface Paint {
  fill?: string;
  stroke?: string;
  strokeWidth?: number;
  /** Dash pattern in px, e.g. [4, 3]. */
  dash?: number[];
  /** 0–1; 1 when absent. */
  opacity?: number;
  /** Round joins and caps for a stroke (data lines), so a sharp turn never grows a miter spike. Default: SVG's miter joins and butt caps. */
  round?: boolean;
}

interface NodeBase {
  /** Stable id, derived from the data the node draws (never from a counter shared across charts). */
  id: string;
  role: Role;
  datum?: Datum;
  /** The mark's tooltip as a reader reads it: field labels and numbers formatted as the chart prints them. Default: the datum as `column: value` pairs. */
  tooltip?: string;
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

export interface RectNode extends NodeBase, Box, Paint {
  kind: 'rect';
  fill: string;
}

/** One command of a path, in absolute pixel coordinates. */
export type PathCommand =
  | { op: 'M' | 'L'; x: number; y: number }
  | { op: 'C'; x1: number; y1: number; x2: number; y2: number; x: number; y: number }
  | { op: 'A'; rx: number; ry: number; rotation: number; large: boolean; sweep: boolean; x: number; y: number }
  | { op: 'Z' };

/** A point a path passes through, with the datum it draws (kept for the scene dump and tests). */
export interface PathPoint {
  x: number;
  y: number;
  datum?: Datum;
}

export interface PathNode extends NodeBase, Paint {
  kind: 'path';
  /** The outline, written through the one number formatter. */
  commands: PathCommand[];
  /** The data points of a line or polyline, when the path draws data. */
  points?: PathPoint[];
  /** The series (or item) a line belongs to. */
  series?: Datum;
  /** For a point drawn as a shape: its centre and the radius of the circle of equal area. */
  at?: { cx: number; cy: number; r: number };
  /** For a point mark: the shape it is drawn as (circle, square, triangle, …). */
  shape?: string;
  /** For a radial bar: the angle of its centre line, degrees clockwise from 12 o'clock. */
  angle?: number;
  /** For a radial bar: its outer radius, px from the circle's centre. */
  radius?: number;
}

export interface CircleNode extends NodeBase, Paint {
  kind: 'circle';
  cx: number;
  cy: number;
  r: number;
  fill: string;
  /** For a point mark: the shape it is drawn as ("circle"). */
  shape?: string;
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
  /** Rotation in degrees, clockwise, about the anchor point. Default: 0. */
  rotate?: number;
  /** The measured box of the text: from ascender to descender, advance width wide (axis-aligned, after rotation). */
  box: Box;
  /** The full text when `text` was shortened to fit (written as the SVG title). */
  full?: string;
}

export interface ImageNode extends NodeBase, Box {
  kind: 'image';
  href: string;
  /** For a raster of data cells: the grid it draws. */
  grid?: { columns: number; rows: number };
}

/** The closed set of scene nodes; the SVG writer switches over `kind` exhaustively. */
export type SceneNode = GroupNode | RectNode | PathNode | CircleNode | TextNode | ImageNode;

/** The kind of scale behind an axis. */
export type ScaleKind = 'linear' | 'band' | 'time' | 'log';

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
  /** The kind of scale. */
  scale: ScaleKind;
  /** For an axis among several side by side (parallel coordinates): its x, px. */
  position?: number;
}

/** One panel of a chart: its plot box, its axes, and the facet level it shows (if faceted). */
export interface PanelInfo {
  id: string;
  facet?: Datum;
  plot: Box;
  axes: AxisInfo[];
}

/** One entry of a legend: a label and how its marks look. */
export interface LegendEntry {
  label: string;
  fill?: string;
  stroke?: string;
  shape?: string;
  /** For size legends: the radius drawn, and the value it stands for. */
  r?: number;
  value?: number;
  /** For binned legends: the class boundaries. */
  from?: number;
  to?: number;
}

/** A legend: what it encodes, its entries, and where it is drawn. */
export interface LegendInfo {
  kind: 'categorical' | 'binned' | 'size' | 'shape';
  field: string;
  title: string;
  entries: LegendEntry[];
  box: Box;
}

/** The numbers a chart draws as a table: columns in first-seen order, one row per drawn datum. */
export interface DataTable {
  columns: string[];
  rows: Datum[];
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
  /** Alt text: what the chart is and its main reading, with its notes (the SVG's <desc>); the brief's `description` when given. Default: none (the description stands in). */
  alt?: string;
  /** The numbers drawn, for a form whose marks carry no datum of their own (a raster). Default: read from the marks. */
  data?: DataTable;
  root: GroupNode;
  /** The first panel's axes (every panel's are in `panels`). */
  axes: AxisInfo[];
  /** The first panel's plot area: where data marks may be. */
  plot: Box;
  panels: PanelInfo[];
  legends: LegendInfo[];
}
