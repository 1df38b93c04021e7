import type { Box, Datum, Scene, SceneNode, TextNode } from './types.js';

/** A mark in the scene dump: role, pixel geometry, fill, and the datum it encodes. */
export interface DumpMark {
  role: string;
  kind: 'rect' | 'path' | 'circle' | 'image';
  x?: number; y?: number; width?: number; height?: number;
  cx?: number; cy?: number; r?: number;
  d?: string;
  fill?: string;
  stroke?: string;
  datum?: Datum;
}

/** A text in the scene dump: its measured box (top-left, width, height). */
export interface DumpText extends Box {
  role: string;
  text: string;
  fill: string;
  anchor: TextNode['anchor'];
  size: number;
}

/**
 * The scene as the documented JSON contract (`--scene FILE`): form, size, background, marks,
 * axes and texts. Checked by tests outside the project: extend it, never rename its keys.
 */
export interface SceneDump extends Pick<Scene, 'form' | 'width' | 'height' | 'background' | 'title' | 'description' | 'plot' | 'axes'> {
  marks: DumpMark[];
  texts: DumpText[];
}

const round = (n: number) => Math.round(n * 1000) / 1000 || 0;

function roundBox(b: Box): Box {
  return { x: round(b.x), y: round(b.y), width: round(b.width), height: round(b.height) };
}

function flatten(node: SceneNode, marks: DumpMark[], texts: DumpText[]): void {
  switch (node.kind) {
    case 'group': node.children.forEach((c) => flatten(c, marks, texts)); return;
    case 'text': texts.push({ role: node.role, text: node.text, ...roundBox(node.box), fill: node.fill, anchor: node.anchor, size: node.size }); return;
    case 'rect': marks.push({ role: node.role, kind: 'rect', ...roundBox(node), fill: node.fill, ...(node.datum ? { datum: node.datum } : {}) }); return;
    case 'path': marks.push({ role: node.role, kind: 'path', d: node.d, ...(node.fill ? { fill: node.fill } : {}), ...(node.stroke ? { stroke: node.stroke } : {}), ...(node.datum ? { datum: node.datum } : {}) }); return;
    case 'circle': marks.push({ role: node.role, kind: 'circle', cx: round(node.cx), cy: round(node.cy), r: round(node.r), fill: node.fill, ...(node.datum ? { datum: node.datum } : {}) }); return;
    case 'image': marks.push({ role: node.role, kind: 'image', ...roundBox(node) }); return;
  }
}

/** Flattens a scene into the dump contract; numbers rounded to 1/1000 px. */
export function dumpScene(scene: Scene): SceneDump {
  const marks: DumpMark[] = [];
  const texts: DumpText[] = [];
  flatten(scene.root, marks, texts);
  return {
    form: scene.form, width: scene.width, height: scene.height, background: scene.background,
    title: scene.title, description: scene.description, plot: roundBox(scene.plot), marks,
    axes: scene.axes.map((a) => ({ ...a, tickPositions: a.tickPositions.map(round), range: [round(a.range[0]), round(a.range[1])] as [number, number] })),
    texts,
  };
}
