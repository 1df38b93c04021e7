import type { SceneNode } from './types.js';

/** Every node of a scene, depth first, in drawing order. */
export function nodesOf(node: SceneNode): SceneNode[] {
  return node.kind === 'group' ? [node, ...node.children.flatMap(nodesOf)] : [node];
}
