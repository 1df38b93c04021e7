import type { DataTable, Datum, PathNode, Role, Scene, SceneNode } from './types.js';

export type { DataTable };

/** The roles of marks that draw data; guides, labels, legends, dendrograms and other panels' grey context do not. */
const DATA_ROLES: ReadonlySet<Role> = new Set<Role>(['bar', 'segment', 'point', 'line', 'task', 'bin', 'box', 'cell', 'layer', 'area']);

/** Where a mark sits, to find the panel of small multiples it is drawn in. */
function anchorOf(node: SceneNode, point?: { x: number; y: number }): { x: number; y: number } | undefined {
  if (point) return point;
  switch (node.kind) {
    case 'rect': case 'image': return { x: node.x + node.width / 2, y: node.y + node.height / 2 };
    case 'circle': return { x: node.cx, y: node.cy };
    case 'path': {
      if (node.at) return { x: node.at.cx, y: node.at.cy };
      const first = node.commands.find((c) => c.op !== 'Z');
      return first && 'x' in first ? { x: first.x, y: first.y } : undefined;
    }
    default: return undefined;
  }
}

/** The facet levels of the panel whose plot holds a point (panels never overlap), or none. */
function facetAt(scene: Scene, at: { x: number; y: number } | undefined): Datum {
  if (!at || scene.panels.every((p) => !p.facet)) return {};
  const panel = scene.panels.find((p) => p.facet && at.x >= p.plot.x - 0.5 && at.x <= p.plot.x + p.plot.width + 0.5 && at.y >= p.plot.y - 0.5 && at.y <= p.plot.y + p.plot.height + 0.5);
  return panel?.facet ?? {};
}

/** The rows one mark draws: its datum (under its series), or, for a path with none, each point's. */
function rowsOf(scene: Scene, node: SceneNode): Datum[] {
  const series = node.kind === 'path' ? (node as PathNode).series ?? {} : {};
  if (node.datum) return [{ ...facetAt(scene, anchorOf(node)), ...series, ...node.datum }];
  if (node.kind !== 'path' || !node.points) return [];
  return node.points.flatMap((p) => (p.datum ? [{ ...facetAt(scene, anchorOf(node, p)), ...series, ...p.datum }] : []));
}

function collect(scene: Scene, nodes: readonly SceneNode[], out: Datum[]): void {
  for (const node of nodes) {
    if (node.role === 'legend' || node.role === 'context') continue;
    if (node.kind === 'group') collect(scene, node.children, out);
    else if (DATA_ROLES.has(node.role)) out.push(...rowsOf(scene, node));
  }
}

/**
 * The data a scene draws, as a table: one row per data mark's datum (a line's points each give a
 * row, under the line's series), the panel's facet level first for small multiples; identical
 * rows (a point drawn twice, as a line's vertex and as a dot) once. Columns in first-seen order.
 * A form that draws its data as a raster gives the table itself (`scene.data`).
 */
export function drawnData(scene: Scene): DataTable {
  if (scene.data) return scene.data;
  const all: Datum[] = [];
  collect(scene, scene.root.children, all);
  const columns: string[] = [];
  const seenColumns = new Set<string>();
  const seenRows = new Set<string>();
  const rows: Datum[] = [];
  for (const row of all) {
    for (const k of Object.keys(row)) if (!seenColumns.has(k)) { seenColumns.add(k); columns.push(k); }
  }
  for (const row of all) {
    const key = JSON.stringify(columns.map((c) => row[c] ?? null));
    if (seenRows.has(key)) continue;
    seenRows.add(key);
    rows.push(row);
  }
  return { columns, rows };
}
