import MarkdownIt from 'markdown-it';

const SAFE_LINK = /^(https?:|mailto:)/i;

// Raw HTML is off, so any tag in a remark is shown as text; links keep only http, https and mailto.
const markdown = new MarkdownIt({ html: false, linkify: true, typographer: false });
markdown.validateLink = (url: string) => SAFE_LINK.test(url.trim());

const defaultLinkOpen = markdown.renderer.rules.link_open ?? ((tokens, idx, options, _env, self) => self.renderToken(tokens, idx, options));
markdown.renderer.rules.link_open = (tokens, idx, options, env, self) => {
  tokens[idx].attrSet('rel', 'nofollow noopener noreferrer');
  return defaultLinkOpen(tokens, idx, options, env, self);
};

/** Renders a remark or reply body to HTML that is safe to insert into the page. */
export function renderMarkdown(text: string): string {
  return markdown.render(text);
}
