import { ticks } from 'd3-array';
import type { TextMeasurer } from '../font/measurer.js';
import type { LegendEntry, LegendInfo, SceneNode, TextNode } from '../scene/types.js';
import type { Style } from '../style/types.js';
import type { Locale } from '../brief/types.js';
import { valueFormatter } from './number-format.js';
import { symbolNode, type ShapeName } from './symbols.js';
import { lineHeight, textBoxHeight, textNode, truncateText, wrapText } from './text.js';

/** What a legend explains: colours by category or by class, circle sizes, or point shapes. */
export type LegendSpec =
  | { kind: 'categorical'; field: string; title: string; entries: { label: string; fill: string; stroke?: string }[] }
  | { kind: 'binned'; field: string; title: string; bins: { from: number; to: number; fill: string }[]; format?: (n: number) => string; locale?: Locale }
  | { kind: 'size'; field: string; title: string; maxValue: number; maxRadius: number; fill: string; stroke?: string; format?: (n: number) => string; locale?: Locale }
  | { kind: 'shape'; field: string; title: string; entries: { label: string; shape: ShapeName; fill: string }[] };

/** Where a legend goes: its top-left corner, the width it may use, and how its entries run. */
export interface LegendPlace {
  x: number;
  y: number;
  width: number;
  /** 'top': entries in rows that wrap to the width; 'right': one entry per row. */
  placement: 'top' | 'right';
}

/** A drawn legend: a group of nodes, what it shows, and the size it took. */
export interface LegendLayout {
  nodes: SceneNode[];
  info: LegendInfo;
  /** Every legend's info when several are laid out together (see legends.ts). Default: just `info`. */
  infos?: LegendInfo[];
  width: number;
  height: number;
}

/** One entry before layout: what it says and how to draw its key in a box of keyWidth × keyHeight. */
interface Key {
  entry: LegendEntry;
  keyWidth: number;
  keyHeight: number;
  draw(id: string, cx: number, cy: number): SceneNode;
}

/** Smallest size-legend circle worth drawing, px: below it the circle is a dot (common practice). */
const MIN_RADIUS = 2;

/**
 * Up to three reference values for a size legend: the largest round value not above the
 * maximum, and round values near a quarter and a sixteenth of it (so radii near 1, ½ and ¼),
 * keeping those whose circle is at least MIN_RADIUS. Round: 1, 2 or 5 × 10ⁿ.
 */
export function sizeLegendValues(maxValue: number, maxRadius: number): number[] {
  if (!(maxValue > 0) || !(maxRadius > 0)) return [];
  const top = ticks(0, maxValue, 5).filter((v) => v > 0 && v <= maxValue).at(-1) ?? maxValue;
  const round = (x: number) => {
    const p = 10 ** Math.floor(Math.log10(x));
    return [1, 2, 5, 10].map((m) => m * p).reduce((a, b) => (Math.abs(Math.log(b / x)) < Math.abs(Math.log(a / x)) ? b : a));
  };
  const values = [top, round(top / 4), round(top / 16)];
  return [...new Set(values)].filter((v) => maxRadius * Math.sqrt(v / maxValue) >= MIN_RADIUS);
}

/**
 * The label of a class: "10–20" (one value alone when the class holds one); "−10 to 0" when any
 * class of the legend has a negative bound, where a dash would read as a minus, and then for
 * every class, so one legend reads one way.
 */
function binLabel(from: number, to: number, f: (n: number) => string, signed: boolean): string {
  if (from === to) return f(from);
  return signed ? `${f(from)} to ${f(to)}` : `${f(from)}–${f(to)}`;
}

/** The entries of a legend and their keys; `swatch` is the side of a colour square, px. */
function keysOf(spec: LegendSpec, swatch: number): Key[] {
  const square = (fill: string, stroke?: string) => (id: string, cx: number, cy: number): SceneNode => ({
    kind: 'rect', id, role: 'legend-swatch', x: cx - swatch / 2, y: cy - swatch / 2, width: swatch, height: swatch, fill,
    ...(stroke ? { stroke, strokeWidth: 1 } : {}),
  });
  switch (spec.kind) {
    case 'categorical':
      return spec.entries.map((e) => ({ entry: { label: e.label, fill: e.fill, ...(e.stroke ? { stroke: e.stroke } : {}) }, keyWidth: swatch, keyHeight: swatch, draw: square(e.fill, e.stroke) }));
    case 'binned': {
      const f = spec.format ?? valueFormatter(spec.bins.flatMap((b) => [b.from, b.to]), { locale: spec.locale });
      const signed = spec.bins.some((b) => b.from < 0 || b.to < 0);
      return spec.bins.map((b) => ({ entry: { label: binLabel(b.from, b.to, f, signed), fill: b.fill, from: b.from, to: b.to }, keyWidth: swatch, keyHeight: swatch, draw: square(b.fill) }));
    }
    case 'shape':
      return spec.entries.map((e) => ({
        entry: { label: e.label, fill: e.fill, shape: e.shape }, keyWidth: swatch, keyHeight: swatch,
        draw: (id, cx, cy) => symbolNode(e.shape, { id, role: 'legend-swatch', cx, cy, area: (swatch * swatch) / 2, paint: { fill: e.fill } }),
      }));
    case 'size': {
      const values = sizeLegendValues(spec.maxValue, spec.maxRadius);
      const f = spec.format ?? valueFormatter(values, { locale: spec.locale });
      return values.map((value) => {
        // Area-true: the area, not the radius, is proportional to the value.
        const r = spec.maxRadius * Math.sqrt(value / spec.maxValue);
        return {
          entry: { label: f(value), fill: spec.fill, r, value }, keyWidth: 2 * r, keyHeight: 2 * r,
          draw: (id, cx, cy) => ({ kind: 'circle', id, role: 'legend-swatch', cx, cy, r, fill: spec.fill, ...(spec.stroke ? { stroke: spec.stroke, strokeWidth: 1 } : {}) }),
        };
      });
    }
  }
}

/** An entry measured for layout: its key, its (possibly shortened) label and its size. */
interface Measured { key: Key; text: string; textWidth: number; width: number; height: number }

function measureEntries(keys: Key[], place: LegendPlace, style: Style, measure: TextMeasurer, keyGap: number): Measured[] {
  const ls = style.text.tick;
  const textHeight = textBoxHeight(measure, ls);
  return keys.map((key) => {
    const room = Math.max(0, place.width - key.keyWidth - keyGap);
    const text = truncateText(measure, key.entry.label, ls, room);
    const textWidth = measure.width(text, ls.size, ls.weight);
    return { key, text, textWidth, width: key.keyWidth + keyGap + textWidth, height: Math.max(key.keyHeight, textHeight) };
  });
}

/** Entry positions (top-left) in rows: wrapped to the width for 'top', one per row for 'right'. */
function flow(entries: Measured[], place: LegendPlace, top: number, entryGap: number, rowGap: number): { at: { x: number; y: number; rowHeight: number }[]; bottom: number; right: number } {
  const at: { x: number; y: number; rowHeight: number }[] = [];
  let row: number[] = [];
  let x = 0;
  let y = top;
  let right = 0;
  const closeRow = () => {
    const h = Math.max(0, ...row.map((i) => entries[i]!.height));
    for (const i of row) at[i]!.rowHeight = h;
    y += h + rowGap;
    row = [];
    x = 0;
  };
  entries.forEach((e, i) => {
    if (row.length && (place.placement === 'right' || x + e.width > place.width)) closeRow();
    at.push({ x, y, rowHeight: 0 });
    row.push(i);
    right = Math.max(right, x + e.width);
    x += e.width + entryGap;
  });
  if (row.length) closeRow();
  return { at, bottom: entries.length ? y - rowGap : top, right };
}

/** The title lines, wrapped to the width, and the height they take. */
function titleBlock(spec: LegendSpec, place: LegendPlace, style: Style, measure: TextMeasurer, id: (part: string) => string): { nodes: TextNode[]; height: number } {
  const ts = style.text.axisTitle;
  const lines = spec.title ? wrapText(measure, spec.title, ts, place.width) : [];
  const lh = lineHeight(ts, style.spacing.lineHeight);
  const nodes = lines.map((line, i) => textNode(measure, { id: id(`title-${i + 1}`), role: 'legend-title', text: line, style: ts, x: place.x, top: place.y + i * lh }));
  return { nodes, height: lines.length * lh };
}

/** Keys for a placement: in a column they share one width, so their centres line up (circles of a size legend too). */
function keysFor(spec: LegendSpec, place: LegendPlace, swatch: number): Key[] {
  const keys = keysOf(spec, swatch);
  if (place.placement !== 'right') return keys;
  const column = Math.max(0, ...keys.map((k) => k.keyWidth));
  return keys.map((k) => ({ ...k, keyWidth: column }));
}

/**
 * Lays out a legend at `place`: the title (wrapped to the width), then one key and label per
 * entry, keys and labels centred on their row. Labels too long for the width are shortened
 * with an ellipsis (the full text kept on the node). Everything lies inside
 * `place.x … place.x + width` and `place.y … place.y + height`; width ≤ place.width as long as
 * a key and an ellipsis fit. Returns one group of role 'legend'.
 */
export function layoutLegend(spec: LegendSpec, place: LegendPlace, style: Style, measure: TextMeasurer): LegendLayout {
  const ls = style.text.tick;
  const keyGap = 0.4 * ls.size;
  const rowGap = 0.3 * ls.size;
  const textHeight = textBoxHeight(measure, ls);
  const id = (part: string) => `legend-${spec.field}-${part}`;
  const title = titleBlock(spec, place, style, measure, id);
  const entries = measureEntries(keysFor(spec, place, textHeight * 0.75), place, style, measure, keyGap);
  const top = place.y + title.height + (title.height ? rowGap : 0);
  const { at, bottom, right } = flow(entries, place, top, 1.2 * ls.size, rowGap);
  const children: SceneNode[] = [...title.nodes];
  entries.forEach((e, i) => {
    const { x, y, rowHeight } = at[i]!;
    children.push(e.key.draw(id(`swatch-${i + 1}`), place.x + x + e.key.keyWidth / 2, y + rowHeight / 2));
    const label = textNode(measure, { id: id(`label-${i + 1}`), role: 'legend-label', text: e.text, style: ls, x: place.x + x + e.key.keyWidth + keyGap, top: y + (rowHeight - textHeight) / 2 });
    children.push(e.text === e.key.entry.label ? label : { ...label, full: e.key.entry.label });
  });
  const width = Math.max(right, ...title.nodes.map((t) => t.box.width));
  const height = entries.length ? bottom - place.y : title.height;
  const info: LegendInfo = { kind: spec.kind, field: spec.field, title: spec.title, entries: entries.map((e) => e.key.entry), box: { x: place.x, y: place.y, width, height } };
  return { nodes: [{ kind: 'group', id: id('group'), role: 'legend', children }], info, width, height };
}
