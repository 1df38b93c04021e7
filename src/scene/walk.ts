import type { SceneNode } from './types.js';

/** Every node of a scene, depth first, in drawing order. */
export function nodesOf(node: SceneNode): SceneNode[] {
  return allNodes([node]);
}

/**
 * Every node of these trees, depth first, in drawing order, gathered into one array (the
 * scene-wide checks walk every scene, and flatMap over nested arrays allocated at each level).
 */
export function allNodes(roots: readonly SceneNode[]): SceneNode[] {
  const out: SceneNode[] = [];
  const visit = (node: SceneNode) => {
    out.push(node);
    if (node.kind === 'group') for (const child of node.children) visit(child);
  };
  for (const root of roots) visit(root);
  return out;
}
