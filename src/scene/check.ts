import type { Scene, SceneNode } from './types.js';

/** Numbers of a node that end up in the SVG. */
function numbersOf(node: SceneNode): number[] {
  switch (node.kind) {
    case 'group': return [];
    case 'rect': case 'image': return [node.x, node.y, node.width, node.height];
    case 'circle': return [node.cx, node.cy, node.r];
    case 'text': return [node.x, node.y, node.size, node.box.x, node.box.y, node.box.width, node.box.height];
    case 'path': return node.d.includes('NaN') || node.d.includes('Infinity') ? [Number.NaN] : [];
  }
}

/** Every node of a scene, depth first, in drawing order. */
export function nodesOf(node: SceneNode): SceneNode[] {
  return node.kind === 'group' ? [node, ...node.children.flatMap(nodesOf)] : [node];
}

/** Ids of nodes whose geometry has a non-finite number: a defect, caught before any SVG is written. */
export function nonFiniteNodes(scene: Scene): string[] {
  return nodesOf(scene.root).filter((n) => numbersOf(n).some((v) => !Number.isFinite(v))).map((n) => n.id);
}
