import MarkdownIt from 'markdown-it';

const SAFE_LINK = /^(https?:|mailto:)/i;

/*
 * The writer's preview, configured as the server renders remarks (api/reviews/markdown.ts): raw
 * HTML off, so tags show as text; links only http, https and mailto. What is shown after sending
 * is always the server's own HTML; tests/web/remark-markdown.test.ts keeps the two in step.
 */
const markdown = new MarkdownIt({ html: false, linkify: true, typographer: false });
markdown.validateLink = (url: string) => SAFE_LINK.test(url.trim());

const defaultLinkOpen = markdown.renderer.rules.link_open ?? ((tokens, idx, options, _env, self) => self.renderToken(tokens, idx, options));
markdown.renderer.rules.link_open = (tokens, idx, options, env, self) => {
  tokens[idx].attrSet('rel', 'nofollow noopener noreferrer');
  return defaultLinkOpen(tokens, idx, options, env, self);
};

/** The HTML a remark body will have once the server stores it. */
export function previewMarkdown(text: string): string {
  return markdown.render(text);
}
