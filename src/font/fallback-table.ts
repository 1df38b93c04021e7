import type { ScriptName } from './scripts.js';

/**
 * An optional npm package holding an open-licence face for some scripts, and the files in it
 * that draw chartwright's two weights. Semibold text is drawn with the package's bold (700),
 * the nearest weight these packages ship.
 */
export interface FallbackPackage {
  package: string;
  family: string;
  scripts: readonly ScriptName[];
  files: { regular: string; semibold: string };
}

/**
 * The one table from script to fallback package. All Noto, all SIL OFL 1.1. Chosen for size:
 * the @embedpdf packages hold only Regular and Bold for Arabic and Hebrew (150 kB each), and
 * one CJK region's glyph set (JIS, GB 2312, Big5, KS X 1001) instead of every ideograph;
 * Devanagari and the monochrome emoji come from the Google Fonts packages. Han is looked up in
 * Japanese, then Simplified and Traditional Chinese faces: a character missing from one is
 * taken from the next installed one (per-character fallback).
 */
export const FALLBACK_PACKAGES: readonly FallbackPackage[] = [
  { package: '@embedpdf/fonts-jp', family: 'Noto Sans JP', scripts: ['Han', 'Hiragana', 'Katakana'], files: { regular: 'fonts/NotoSansJP-Regular.otf', semibold: 'fonts/NotoSansJP-Bold.otf' } },
  { package: '@embedpdf/fonts-sc', family: 'Noto Sans SC', scripts: ['Han', 'Bopomofo'], files: { regular: 'fonts/NotoSansHans-Regular.otf', semibold: 'fonts/NotoSansHans-Bold.otf' } },
  { package: '@embedpdf/fonts-tc', family: 'Noto Sans TC', scripts: ['Han', 'Bopomofo'], files: { regular: 'fonts/NotoSansHant-Regular.otf', semibold: 'fonts/NotoSansHant-Bold.otf' } },
  { package: '@embedpdf/fonts-kr', family: 'Noto Sans KR', scripts: ['Hangul'], files: { regular: 'fonts/NotoSansKR-Regular.otf', semibold: 'fonts/NotoSansKR-Bold.otf' } },
  { package: '@embedpdf/fonts-arabic', family: 'Noto Naskh Arabic', scripts: ['Arabic'], files: { regular: 'fonts/NotoNaskhArabic-Regular.ttf', semibold: 'fonts/NotoNaskhArabic-Bold.ttf' } },
  { package: '@embedpdf/fonts-hebrew', family: 'Noto Sans Hebrew', scripts: ['Hebrew'], files: { regular: 'fonts/NotoSansHebrew-Regular.ttf', semibold: 'fonts/NotoSansHebrew-Bold.ttf' } },
  { package: '@expo-google-fonts/noto-sans-devanagari', family: 'Noto Sans Devanagari', scripts: ['Devanagari'], files: { regular: '400Regular/NotoSansDevanagari_400Regular.ttf', semibold: '700Bold/NotoSansDevanagari_700Bold.ttf' } },
  { package: '@expo-google-fonts/noto-emoji', family: 'Noto Emoji', scripts: ['Emoji'], files: { regular: '400Regular/NotoEmoji_400Regular.ttf', semibold: '700Bold/NotoEmoji_700Bold.ttf' } },
];

/** The packages that draw a script, in the order they are tried. */
export function packagesFor(script: ScriptName): FallbackPackage[] {
  return FALLBACK_PACKAGES.filter((p) => p.scripts.includes(script));
}
