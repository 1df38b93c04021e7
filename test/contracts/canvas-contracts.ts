import type { Box, PathCommand, Scene, SceneNode } from '../../src/scene/types.js';
import { polygon } from './path-geometry.js';

/** The points that bound a path: its outline (arcs sampled along their circle) and a curve's control points (its hull holds it). */
function pathPoints(commands: readonly PathCommand[]): [number, number][] {
  const controls = commands.flatMap((c): [number, number][] => (c.op === 'C' ? [[c.x1, c.y1], [c.x2, c.y2]] : []));
  return [...polygon(commands).flat(), ...controls];
}

/** A node's bounding box, ink of its stroke included; none for groups and texts (texts have their own contract). */
function boundsOf(node: SceneNode): Box | undefined {
  const half = 'strokeWidth' in node && node.stroke ? (node.strokeWidth ?? 1) / 2 : 0;
  const grow = (b: Box): Box => ({ x: b.x - half, y: b.y - half, width: b.width + 2 * half, height: b.height + 2 * half });
  if (node.kind === 'rect' || node.kind === 'image') return grow(node);
  if (node.kind === 'circle') return grow({ x: node.cx - node.r, y: node.cy - node.r, width: 2 * node.r, height: 2 * node.r });
  if (node.kind !== 'path') return undefined;
  const pts = pathPoints(node.commands);
  if (!pts.length) return undefined;
  const xs = pts.map((p) => p[0]);
  const ys = pts.map((p) => p[1]);
  return grow({ x: Math.min(...xs), y: Math.min(...ys), width: Math.max(...xs) - Math.min(...xs), height: Math.max(...ys) - Math.min(...ys) });
}

/** Marks (and guides) whose drawn extent reaches past the canvas by more than half a pixel. */
export function marksOffCanvas(scene: Scene): { role: string; id: string; box: Box }[] {
  const out: { role: string; id: string; box: Box }[] = [];
  const visit = (node: SceneNode) => {
    if (node.kind === 'group') return node.children.forEach(visit);
    const b = boundsOf(node);
    if (b && (b.x < -0.5 || b.y < -0.5 || b.x + b.width > scene.width + 0.5 || b.y + b.height > scene.height + 0.5)) out.push({ role: node.role, id: node.id, box: b });
  };
  visit(scene.root);
  return out;
}
