import { pathData } from '../svg/path.js';
import type { AxisInfo, Box, Datum, LegendInfo, PanelInfo, PathPoint, Role, Scene, SceneNode, TextNode } from './types.js';

/** A mark in the scene dump: role, pixel geometry, paint, and the datum it encodes. */
export interface DumpMark {
  role: Role;
  kind: 'rect' | 'path' | 'circle' | 'image';
  x?: number; y?: number; width?: number; height?: number;
  cx?: number; cy?: number; r?: number;
  d?: string;
  fill?: string;
  stroke?: string;
  strokeWidth?: number;
  dash?: number[];
  opacity?: number;
  datum?: Datum;
  /** The data points a line passes through, in px, each with its datum. */
  points?: PathPoint[];
  /** The series a line belongs to. */
  series?: Datum;
  /** For rasters: the grid of data cells drawn. */
  grid?: { columns: number; rows: number };
  /** For points: the shape drawn (a shape other than a circle also carries cx, cy and its equal-area r). */
  shape?: string;
  /** For radial bars: the centre angle (degrees clockwise from 12 o'clock) and the outer radius (px). */
  angle?: number;
  radius?: number;
}

/** A text in the scene dump: its measured box (top-left, width, height). */
export interface DumpText extends Box {
  role: Role;
  text: string;
  fill: string;
  anchor: TextNode['anchor'];
  size: number;
  /** Rotation in degrees, when the text is rotated. */
  rotate?: number;
}

/**
 * The scene as the documented JSON contract (`--scene FILE`): form, size, background, marks,
 * axes and texts, and since the form engine, panels and legends. Checked by tests outside the
 * project: extend it, never rename its keys.
 */
export interface SceneDump extends Pick<Scene, 'form' | 'width' | 'height' | 'background' | 'title' | 'description' | 'plot' | 'axes' | 'panels' | 'legends'> {
  /** The alt text (the SVG's <desc>): the scene's alt, or its description when it has none. */
  alt: string;
  marks: DumpMark[];
  texts: DumpText[];
}

const round = (n: number) => Math.round(n * 1000) / 1000 || 0;

function roundBox(b: Box): Box {
  return { x: round(b.x), y: round(b.y), width: round(b.width), height: round(b.height) };
}

/** Stroke, width, dash and opacity, as far as a mark sets them. */
function paintOf(node: { stroke?: string; strokeWidth?: number; dash?: number[]; opacity?: number }): Partial<DumpMark> {
  return {
    ...(node.stroke ? { stroke: node.stroke, strokeWidth: node.strokeWidth ?? 1 } : {}),
    // As the SVG writer draws them: a dash only on a stroke, an opacity only below 1.
    ...(node.stroke && node.dash?.length ? { dash: node.dash } : {}),
    ...(node.opacity !== undefined && node.opacity < 1 ? { opacity: node.opacity } : {}),
  };
}

function flatten(node: SceneNode, marks: DumpMark[], texts: DumpText[]): void {
  const datum = node.datum ? { datum: node.datum } : {};
  switch (node.kind) {
    case 'group': node.children.forEach((c) => flatten(c, marks, texts)); return;
    case 'text': texts.push({ role: node.role, text: node.text, ...roundBox(node.box), fill: node.fill, anchor: node.anchor, size: node.size, ...(node.rotate ? { rotate: node.rotate } : {}) }); return;
    case 'rect': marks.push({ role: node.role, kind: 'rect', ...roundBox(node), fill: node.fill, ...paintOf(node), ...datum }); return;
    case 'path': marks.push({
      role: node.role, kind: 'path', d: pathData(node.commands), ...(node.fill ? { fill: node.fill } : {}), ...paintOf(node), ...datum,
      ...(node.points ? { points: node.points.map((p) => ({ x: round(p.x), y: round(p.y), ...(p.datum ? { datum: p.datum } : {}) })) } : {}),
      ...(node.series ? { series: node.series } : {}),
      ...(node.at ? { cx: round(node.at.cx), cy: round(node.at.cy), r: round(node.at.r) } : {}), ...(node.shape ? { shape: node.shape } : {}),
      ...(node.angle !== undefined ? { angle: round(node.angle) } : {}),
      ...(node.radius !== undefined ? { radius: round(node.radius) } : {}),
    }); return;
    case 'circle': marks.push({ role: node.role, kind: 'circle', cx: round(node.cx), cy: round(node.cy), r: round(node.r), fill: node.fill, ...(node.shape ? { shape: node.shape } : {}), ...paintOf(node), ...datum }); return;
    case 'image': marks.push({ role: node.role, kind: 'image', ...roundBox(node), ...(node.grid ? { grid: node.grid } : {}) }); return;
  }
}

function roundAxis(a: AxisInfo): AxisInfo {
  return { ...a, tickPositions: a.tickPositions.map(round), range: [round(a.range[0]), round(a.range[1])], ...(a.position !== undefined ? { position: round(a.position) } : {}) };
}

function roundPanel(p: PanelInfo): PanelInfo {
  return { ...p, plot: roundBox(p.plot), axes: p.axes.map(roundAxis) };
}

function roundLegend(l: LegendInfo): LegendInfo {
  return { ...l, box: roundBox(l.box), entries: l.entries.map((e) => (e.r !== undefined ? { ...e, r: round(e.r) } : e)) };
}

/** Flattens a scene into the dump contract; numbers rounded to 1/1000 px. */
export function dumpScene(scene: Scene): SceneDump {
  const marks: DumpMark[] = [];
  const texts: DumpText[] = [];
  flatten(scene.root, marks, texts);
  return {
    form: scene.form, width: scene.width, height: scene.height, background: scene.background,
    title: scene.title, description: scene.description, alt: scene.alt ?? scene.description, plot: roundBox(scene.plot), marks,
    axes: scene.axes.map(roundAxis),
    texts,
    panels: scene.panels.map(roundPanel),
    legends: scene.legends.map(roundLegend),
  };
}
