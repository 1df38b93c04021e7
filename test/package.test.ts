import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { createRequire, isBuiltin } from 'node:module';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { BRIEF_SCHEMA } from '../src/pipeline/vocabulary.js';
import { root } from './helpers.js';

// These tests read the built package (dist/, schema/): `npm test` builds it before vitest runs.
interface PackageJson {
  license: string;
  engines: { node: string };
  dependencies: Record<string, string>;
  devDependencies: Record<string, string>;
  exports: Record<string, unknown>;
}
const pkg = JSON.parse(readFileSync(join(root, 'package.json'), 'utf8')) as PackageJson;
const read = (path: string) => readFileSync(join(root, path), 'utf8');
const sorted = (items: Iterable<string>) => [...new Set(items)].sort();

/** The bare module names a bundle loads at run time (require, import(), import … from), builtins left out. */
function loadedPackages(code: string): string[] {
  const specifiers = [...code.matchAll(/\b(?:require\d*|import)\(\s*["']([^"']+)["']\s*\)|^import\b[^;\n]*\bfrom\s*["']([^"']+)["']/gm)].map((m) => (m[1] ?? m[2])!);
  const bare = specifiers.filter((s) => !s.startsWith('.') && !s.startsWith('/') && !isBuiltin(s));
  return sorted(bare.map((s) => s.split('/').slice(0, s.startsWith('@') ? 2 : 1).join('/')));
}

describe('the published package', () => {
  let packed: string[];
  beforeAll(() => {
    // npm's own list of what `npm publish` would ship (scripts off: dist/ is already built).
    const out = execFileSync('npm', ['pack', '--dry-run', '--json', '--ignore-scripts'], { cwd: root, encoding: 'utf8' });
    packed = (JSON.parse(out) as { files: { path: string }[] }[])[0]!.files.map((f) => f.path);
  });

  it('is MIT-licensed: package.json says MIT and LICENSE carries the MIT text and the copyright line', () => {
    expect(pkg.license).toBe('MIT');
    const license = read('LICENSE');
    // The MIT licence text as SPDX lists it (https://spdx.org/licenses/MIT.html).
    expect(license).toMatch(/^MIT License\n\nCopyright \(c\) 2026 the chartwright authors\n/);
    expect(license).toContain('Permission is hereby granted, free of charge, to any person obtaining a copy');
    expect(license).toContain('THE SOFTWARE IS PROVIDED "AS IS", WITHOUT WARRANTY OF ANY KIND');
    expect(packed).toContain('LICENSE');
  });

  it('lists as runtime dependencies exactly the packages dist/ loads at run time (everything else is bundled)', () => {
    // Besides them, the subsetter's own dependencies whose versions decide the bytes of an
    // embedded font (harfbuzz, brotli), pinned exactly so an install cannot float them.
    const pins = ['harfbuzzjs', 'wawoff2'];
    expect(pins.map((p) => pkg.dependencies[p])).toEqual(pins.map((p) => JSON.parse(read(`node_modules/${p}/package.json`)).version));
    for (const bundle of ['dist/chartwright.js', 'dist/chartwright.cjs']) {
      expect(loadedPackages(read(bundle)), bundle).toEqual(sorted(Object.keys(pkg.dependencies).filter((d) => !pins.includes(d))));
    }
  });

  it('ships notices naming every npm package bundled into dist/, each with its own licence file', () => {
    // esbuild marks each bundled file with a `// node_modules/<package>/<file>` comment: an
    // account of the bundle's contents independent of the metafile the notices come from.
    const bundled = sorted([...read('dist/chartwright.js').matchAll(/^\/\/ node_modules\/((?:@[^/\n]+\/)?[^/\n]+)\//gm)].map((m) => m[1]!));
    expect(bundled).toContain('yaml');
    const notices = read('dist/THIRD-PARTY-NOTICES.txt');
    const named = [...notices.matchAll(/^((?:@[^/\s]+\/)?[^@\s]+)@\d\S* \(/gm)].map((m) => m[1]!);
    expect(named).toEqual(bundled);
    for (const name of bundled) {
      const firstLine = read(join('node_modules', name, 'LICENSE')).trim().split('\n')[0]!.trim();
      expect(notices, name).toContain(firstLine);
    }
    expect(packed).toContain('dist/THIRD-PARTY-NOTICES.txt');
  });

  it('ships the Source Sans 3 OFL text beside the font data derived from it', () => {
    expect(read('templates/fonts/OFL.txt')).toBe(read('node_modules/source-sans/LICENSE.md'));
    expect(read('templates/fonts/OFL.txt')).toContain('SIL OPEN FONT LICENSE Version 1.1');
    expect(packed).toContain('templates/fonts/OFL.txt');
  });

  it('ships the fonts an embedded-text SVG needs: the renamed base faces and every prebuilt subset the index names', () => {
    const index = JSON.parse(read('templates/fonts/subsets/index.json')) as { faces: { base: string; blocks: Record<string, { file: string }> }[] };
    const needed = ['templates/fonts/subsets/index.json', ...index.faces.flatMap((f) => [f.base, ...Object.values(f.blocks).map((b) => b.file)].map((file) => `templates/fonts/${file}`))];
    expect(needed.filter((file) => !packed.includes(file))).toEqual([]);
    expect(needed.length).toBeGreaterThan(10);
    expect(read('dist/THIRD-PARTY-NOTICES.txt')).toContain('renamed "chartwright sans"');
  });

  it('ships the brief JSON Schema the code builds, exported as chartwright/brief.schema.json', () => {
    expect(read('schema/brief.schema.json')).toBe(`${JSON.stringify(BRIEF_SCHEMA, null, 2)}\n`);
    expect(pkg.exports['./brief.schema.json']).toBe('./schema/brief.schema.json');
    expect(packed).toContain('schema/brief.schema.json');
  });

  it('declares Node >=20.19, the floor for require() of the ES module bundle, and type-checks against it', () => {
    // Node's changelog: require(esm) unflagged in v20.19.0; zlib.crc32 added in v20.15.0.
    expect(pkg.engines.node).toBe('>=20.19');
    expect(pkg.devDependencies['@types/node']).toMatch(/^20\.19\./);
    const required = createRequire(import.meta.url)(join(root, 'dist', 'chartwright.js')) as { render?: unknown };
    expect(typeof required.render).toBe('function');
  });
});
