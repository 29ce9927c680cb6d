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
