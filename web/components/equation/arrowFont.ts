import mathFontUrl from '@fontsource/noto-sans-math/files/noto-sans-math-latin-400-normal.woff2?url';

/**
 * Noto Sans has no reaction arrows (→ ⇌). Noto Sans Math has them but weighs ~270 KB, so it is
 * registered for those two code points only: the browser fetches it (from our own server) only
 * when an equation is on screen.
 */
export const ARROW_FONT_FAMILY = 'Cyclewright Arrows';

let registered = false;

export function registerArrowFont(): void {
  if (registered || typeof FontFace === 'undefined' || typeof document === 'undefined') return;
  registered = true;
  const face = new FontFace(ARROW_FONT_FAMILY, `url(${mathFontUrl}) format('woff2')`, { unicodeRange: 'U+2192, U+21CC' });
  document.fonts.add(face);
}
