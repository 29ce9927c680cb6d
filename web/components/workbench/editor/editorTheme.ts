import { EditorView } from '@codemirror/view';

/** The editor in Cyclewright's look: Noto Sans Mono, our greys, the selected step's line tinted and barred. */
export const editorTheme = EditorView.theme({
  '&': { fontSize: '0.95rem', height: '100%' },
  '.cm-scroller': { fontFamily: "'Noto Sans Mono', ui-monospace, monospace", lineHeight: '1.6' },
  '.cm-gutters': { background: '#f6f7f9', color: '#5f6773', borderRight: '1px solid #dce0e6' },
  '.cm-activeLineGutter': { background: '#eceef2', color: '#1b1f26' },
  '.cm-activeLine': { background: '#f6f7f966' },
  '.cm-selected-step': { background: '#eef2f8', boxShadow: 'inset 3px 0 0 #2b4b7e' },
  '&.cm-focused': { outline: '2px solid #2b4b7e', outlineOffset: '-2px' },
  '.cm-tooltip-lint': { fontFamily: "'Noto Sans', system-ui, sans-serif", maxWidth: '32rem' },
  '.cm-diagnosticAction': { background: '#2b4b7e', borderRadius: '4px', padding: '0.15rem 0.5rem' },
});
