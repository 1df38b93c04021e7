// Renames an sfnt (TTF/OTF) font: replaces its `name` table with one naming our own family and
// keeping the copyright, version, licence and licence URL of the original, then rewrites the
// table directory, the table checksums and head.checkSumAdjustment (OpenType spec, "Calculating
// checksums"). The SIL OFL 1.1 reserves the original's name ("Source") for unmodified copies,
// so a subset we ship must not carry it.

const KEEP_IDS = [0, 5, 13, 14]; // copyright, version, licence description, licence URL

function checksum(bytes) {
  const padded = new Uint8Array((bytes.length + 3) & ~3);
  padded.set(bytes);
  const view = new DataView(padded.buffer);
  let sum = 0;
  for (let i = 0; i < padded.length; i += 4) sum = (sum + view.getUint32(i)) >>> 0;
  return sum;
}

/** The tables of an sfnt as { tag: bytes }, in directory order. */
function readTables(font) {
  const view = new DataView(font.buffer, font.byteOffset, font.byteLength);
  const count = view.getUint16(4);
  const tables = new Map();
  for (let i = 0; i < count; i++) {
    const at = 12 + i * 16;
    const tag = String.fromCharCode(...font.subarray(at, at + 4));
    tables.set(tag, font.slice(view.getUint32(at + 8), view.getUint32(at + 8) + view.getUint32(at + 12)));
  }
  return { version: view.getUint32(0), tables };
}

/** The Windows (platform 3, encoding 1, English US) strings of a name table, by name id. */
function windowsNames(name) {
  const view = new DataView(name.buffer, name.byteOffset, name.byteLength);
  const count = view.getUint16(2);
  const storage = view.getUint16(4);
  const names = new Map();
  for (let i = 0; i < count; i++) {
    const at = 6 + i * 12;
    if (view.getUint16(at) !== 3 || view.getUint16(at + 2) !== 1 || view.getUint16(at + 4) !== 0x409) continue;
    const start = storage + view.getUint16(at + 10);
    const bytes = name.subarray(start, start + view.getUint16(at + 8));
    let text = '';
    for (let j = 0; j + 1 < bytes.length; j += 2) text += String.fromCharCode((bytes[j] << 8) | bytes[j + 1]);
    names.set(view.getUint16(at + 6), text);
  }
  return names;
}

/** A format-0 name table holding the given strings as Windows English (US) UTF-16BE records. */
function nameTable(entries) {
  const sorted = [...entries].sort((a, b) => a[0] - b[0]);
  const strings = sorted.map(([, text]) => {
    const out = new Uint8Array(text.length * 2);
    for (let i = 0; i < text.length; i++) { out[i * 2] = text.charCodeAt(i) >> 8; out[i * 2 + 1] = text.charCodeAt(i) & 0xff; }
    return out;
  });
  const head = 6 + sorted.length * 12;
  const table = new Uint8Array(head + strings.reduce((s, b) => s + b.length, 0));
  const view = new DataView(table.buffer);
  view.setUint16(2, sorted.length);
  view.setUint16(4, head);
  let offset = 0;
  sorted.forEach(([id], i) => {
    const at = 6 + i * 12;
    [3, 1, 0x409, id, strings[i].length, offset].forEach((v, k) => view.setUint16(at + k * 2, v));
    table.set(strings[i], head + offset);
    offset += strings[i].length;
  });
  return table;
}

/** Writes tables back into an sfnt with a fresh directory, checksums and head.checkSumAdjustment. */
function writeSfnt(version, tables) {
  const tags = [...tables.keys()].sort();
  const n = tags.length;
  const pow = 2 ** Math.floor(Math.log2(n));
  let offset = 12 + n * 16;
  const total = tags.reduce((s, t) => s + ((tables.get(t).length + 3) & ~3), offset);
  const out = new Uint8Array(total);
  const view = new DataView(out.buffer);
  [version >>> 16, version & 0xffff].forEach((v, i) => view.setUint16(i * 2, v));
  view.setUint16(4, n); view.setUint16(6, pow * 16); view.setUint16(8, Math.log2(pow)); view.setUint16(10, n * 16 - pow * 16);
  let headAt = -1;
  tags.forEach((tag, i) => {
    const bytes = tables.get(tag);
    if (tag === 'head') { new DataView(bytes.buffer, bytes.byteOffset).setUint32(8, 0); headAt = offset; }
    const at = 12 + i * 16;
    for (let k = 0; k < 4; k++) out[at + k] = tag.charCodeAt(k);
    view.setUint32(at + 4, checksum(bytes)); view.setUint32(at + 8, offset); view.setUint32(at + 12, bytes.length);
    out.set(bytes, offset);
    offset += (bytes.length + 3) & ~3;
  });
  view.setUint32(headAt + 8, (0xb1b0afba - checksum(out)) >>> 0);
  return out;
}

/**
 * The font renamed to `family` (with `style`, e.g. "Semibold"), keeping the original's
 * copyright, version and licence strings, and recording what it derives from.
 */
export function renameFont(font, { family, style, postscript, derivedFrom }) {
  const { version, tables } = readTables(font);
  const old = windowsNames(tables.get('name'));
  const entries = KEEP_IDS.filter((id) => old.has(id)).map((id) => [id, old.get(id)]);
  const full = style === 'Regular' ? family : `${family} ${style}`;
  const ribbi = style === 'Regular' || style === 'Bold';
  entries.push([1, ribbi ? family : full], [2, ribbi ? style : 'Regular'], [3, `${postscript}; derived from ${derivedFrom}`], [4, full], [6, postscript]);
  if (!ribbi) entries.push([16, family], [17, style]);
  tables.set('name', nameTable(entries));
  return writeSfnt(version, tables);
}
