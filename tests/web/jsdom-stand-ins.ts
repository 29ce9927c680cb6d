// Loaded before every web test (vite.config.ts setupFiles): browser APIs that jsdom lacks and PrimeVue uses.

// Select and other overlays listen to orientation changes through matchMedia.
window.matchMedia ??= ((query: string) => ({
  matches: false, media: query, onchange: null, addEventListener: () => {}, removeEventListener: () => {},
  addListener: () => {}, removeListener: () => {}, dispatchEvent: () => false,
})) as typeof window.matchMedia;

// Textarea's auto-resize and DataTable's scroller watch sizes; jsdom lays nothing out.
globalThis.ResizeObserver ??= class {
  observe() {}
  unobserve() {}
  disconnect() {}
} as unknown as typeof ResizeObserver;

// The Remarks section scrolls an opened thread into view; jsdom lays nothing out to scroll.
Element.prototype.scrollIntoView ??= function scrollIntoView() {};

// CodeMirror measures text through ranges when the whole workbench is mounted; jsdom lays nothing out.
Range.prototype.getClientRects ??= function getClientRects() {
  return [] as unknown as DOMRectList;
};
Range.prototype.getBoundingClientRect ??= function getBoundingClientRect() {
  return new DOMRect();
};
