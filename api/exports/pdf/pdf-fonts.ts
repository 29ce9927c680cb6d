import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';
import * as fontkit from 'fontkit';

const require = createRequire(import.meta.url);

/**
 * Fonts embedded in PDF worksheets, shipped as npm packages (no download at run time).
 * pdfkit embeds TrueType/OpenType; @fontsource/noto-sans ships only WOFF/WOFF2 files split into
 * script subsets, so the full Noto Sans TTFs come from @embedpdf/fonts-latin (OFL-1.1). Noto Sans
 * has no arrows (→ ⇌); those glyphs come from Noto Sans Math (@fontsource/noto-sans-math). Its
 * WOFF file, not the WOFF2: pdfkit's subset of a WOFF2 font copies its transformed glyph table, so
 * every arrow was embedded as an empty outline (text for pdftotext, nothing on paper). The WOFF
 * costs more (fontkit inflates its tables again on every read) but prints.
 */
const notoDir = path.join(path.dirname(require.resolve('@embedpdf/fonts-latin')), '..', 'fonts');

export const PDF_FONT_FILES = {
  text: path.join(notoDir, 'NotoSans-Regular.ttf'),
  bold: path.join(notoDir, 'NotoSans-Bold.ttf'),
  symbols: require.resolve('@fontsource/noto-sans-math/files/noto-sans-math-latin-400-normal.woff'),
} as const;

export type PdfFontName = keyof typeof PDF_FONT_FILES;

let loaded: Record<PdfFontName, fontkit.Font> | null = null;

/**
 * The fonts, read once per process: fontkit parses a font's layout tables on first use (about
 * half a second for Noto Sans), so every worksheet after the first reuses the parsed fonts.
 * pdfkit still embeds a fresh subset of each in every document.
 */
export function pdfFonts(): Record<PdfFontName, fontkit.Font> {
  loaded ??= Object.fromEntries(
    Object.entries(PDF_FONT_FILES).map(([name, file]) => [name, fontkit.create(readFileSync(file)) as fontkit.Font]),
  ) as Record<PdfFontName, fontkit.Font>;
  return loaded;
}
