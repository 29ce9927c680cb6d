import type { Remark } from '@web/services/reviews';

/** A remark in one line, as the editor and the Steps section show it beside its step. */
export interface RemarkSummary {
  id: number;
  author: string;
  firstLine: string;
  replies: string;
  state: Remark['state'];
  /** The tooltip of the control that opens the thread: the whole first line, which may be cut on screen. */
  hint: string;
}

/**
 * The first line of a remark's text as a reader sees it: read from the server's safe HTML (an inert
 * template element, so nothing runs) rather than the Markdown, so `**N1**` shows as `N1`.
 */
export function firstLineOf(bodyHtml: string): string {
  const template = document.createElement('template');
  template.innerHTML = bodyHtml.replace(/<\/(p|li|h\d|blockquote|pre)>|<br\s*\/?>/gi, '$&\n');
  const lines = (template.content.textContent ?? '').split('\n').map((line) => line.trim());
  return lines.find((line) => line !== '') ?? '';
}

export function summariseRemark(remark: Remark): RemarkSummary {
  const count = remark.replies.length;
  const firstLine = firstLineOf(remark.bodyHtml);
  const replies = count === 1 ? '1 reply' : `${count} replies`;
  return {
    id: remark.id,
    author: remark.authorName,
    firstLine,
    replies,
    state: remark.state,
    hint: `${firstLine}\n(opens the thread in the Remarks section)`,
  };
}
