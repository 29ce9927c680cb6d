import { createRequire } from 'node:module';
import path from 'node:path';

const require = createRequire(import.meta.url);

/**
 * Fonts embedded in PDF worksheets, shipped as npm packages (no download at run time).
 * pdfkit embeds TrueType/OpenType; @fontsource/noto-sans ships only WOFF/WOFF2 files split into
 * script subsets, so the full Noto Sans TTFs come from @embedpdf/fonts-latin (OFL-1.1). Noto Sans
 * has no arrows (→ ⇌); those glyphs come from Noto Sans Math (@fontsource/noto-sans-math, a
 * WOFF that pdfkit's fontkit reads).
 */
const notoDir = path.join(path.dirname(require.resolve('@embedpdf/fonts-latin')), '..', 'fonts');

export const PDF_FONTS = {
  text: path.join(notoDir, 'NotoSans-Regular.ttf'),
  bold: path.join(notoDir, 'NotoSans-Bold.ttf'),
  symbols: require.resolve('@fontsource/noto-sans-math/files/noto-sans-math-latin-400-normal.woff'),
} as const;

export type PdfFont = keyof typeof PDF_FONTS;
