// Third-party notices for the bundle: every npm package whose code esbuild put into dist/ is
// named with its version and licence, followed by its own licence file, so the notices travel
// with the code that needs them. Built from esbuild's metafile (the bundle's actual inputs),
// not from package.json, so a package pulled in indirectly (d3-color through d3-scale) is
// listed too, and one whose code was all tree-shaken away is not. Sorted by code points and free of dates: the same inputs give the same bytes.
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';

const LICENSE_FILE = /^(licen[cs]e|copying)(\.(md|txt|markdown))?$/i;

/** The package folder ("node_modules/@scope/name") of a bundle input path, or undefined for our own source. */
export function packageDirOf(input) {
  const parts = input.split('/');
  const at = parts.lastIndexOf('node_modules');
  if (at < 0) return undefined;
  const width = parts[at + 1]?.startsWith('@') ? 3 : 2;
  return parts.slice(0, at + width).join('/');
}

/**
 * The package folders whose code is in a metafile's outputs, unique and sorted by code points.
 * An input tree-shaken to nothing (d3-path, internmap today) ships no code, so no notice.
 */
export function bundledPackageDirs(metafile) {
  const inputs = Object.values(metafile.outputs).flatMap((out) => Object.entries(out.inputs));
  const shipped = inputs.filter(([, use]) => use.bytesInOutput > 0).map(([path]) => packageDirOf(path));
  const dirs = new Set(shipped.filter((d) => d !== undefined));
  return [...dirs].sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
}

/** One package's section: name, version, declared licence, then its licence file verbatim. */
function section(dir) {
  const pkg = JSON.parse(readFileSync(join(dir, 'package.json'), 'utf8'));
  const file = readdirSync(dir).filter((f) => LICENSE_FILE.test(f)).sort()[0];
  // A bundled package without a licence file is a notice we cannot ship: stop the build.
  if (!file) throw new Error(`scripts/notices.js: ${dir} has no licence file to ship in the notices`);
  const text = readFileSync(join(dir, file), 'utf8').replace(/\r\n?/g, '\n').trimEnd();
  return `${pkg.name}@${pkg.version} (${pkg.license})\n${'-'.repeat(60)}\n${text}\n`;
}

/** The notices text for a metafile: a header, then one section per bundled package. */
export function noticesText(metafile) {
  const dirs = bundledPackageDirs(metafile);
  const head =
    'chartwright bundles the following npm packages into dist/. Their licences follow.\n' +
    'The font data in templates/fonts/ is derived from Source Sans 3 (SIL Open Font License 1.1, templates/fonts/OFL.txt).\n' +
    'The fonts embedded in SVG output (templates/fonts/chartwright-sans-*.ttf and templates/fonts/subsets/) are modified\n' +
    'versions of it, renamed "chartwright sans" as the licence asks; the same licence applies.\n';
  return [head, ...dirs.map(section)].join('\n');
}
