import { diagnostic, failure, success, type Outcome } from '../diagnostics/diagnostic.js';

type Encoding = 'utf-8' | 'utf-16le' | 'utf-16be';

/** The encoding a byte-order mark announces; UTF-8 without one. (Unicode 15, section 23.8.) */
function encodingOf(bytes: Uint8Array): Encoding {
  if (bytes[0] === 0xff && bytes[1] === 0xfe) return 'utf-16le';
  if (bytes[0] === 0xfe && bytes[1] === 0xff) return 'utf-16be';
  return 'utf-8';
}

/** The 1-based line of the first bytes that do not decode, found line by line. */
function firstBadLine(bytes: Uint8Array, encoding: Encoding): number {
  const decoder = new TextDecoder(encoding, { fatal: true });
  const unit = encoding === 'utf-8' ? 1 : 2;
  let line = 1;
  let start = 0;
  for (let i = 0; i + unit <= bytes.length; i += unit) {
    const newline = encoding === 'utf-16be' ? bytes[i] === 0 && bytes[i + 1] === 10 : bytes[i] === 10 && (unit === 1 || bytes[i + 1] === 0);
    if (!newline) continue;
    try {
      decoder.decode(bytes.subarray(start, i));
    } catch {
      return line;
    }
    line++;
    start = i + unit;
  }
  return line;
}

/**
 * Decodes the bytes of a data file or stdin. UTF-8 is the default; a byte-order mark selects
 * UTF-16 (little or big endian) and is dropped, as is a UTF-8 one. Bytes that are not valid in
 * the encoding are a coded error naming the file and line, never silent U+FFFD characters.
 */
export function decodeTable(bytes: Uint8Array, file: string): Outcome<string> {
  const encoding = encodingOf(bytes);
  try {
    return success(new TextDecoder(encoding, { fatal: true }).decode(bytes));
  } catch (e) {
    if (!(e instanceof TypeError)) throw e;
    const line = firstBadLine(bytes, encoding);
    const name = encoding === 'utf-8' ? 'UTF-8' : encoding === 'utf-16le' ? 'UTF-16 (little endian)' : 'UTF-16 (big endian)';
    return failure([diagnostic('table.bad-encoding', `the data file is not valid ${name}: line ${line} has bytes that are not text in that encoding`, {
      file, line, found: `bytes that are not ${name}`, expected: 'UTF-8 text (or UTF-16 with a byte-order mark)',
      hint: 'save the file as UTF-8, e.g. `iconv -f latin1 -t utf-8 in.csv > out.csv` for a Latin-1 file',
    })]);
  }
}
