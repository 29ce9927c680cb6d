import express, { type Express } from 'express';

/**
 * A local stand-in for GitHub's OAuth endpoints, for development and tests only. It is stateless:
 * the code and the token carry the chosen identity, so no cookie or store is shared with the app.
 */
export interface FakeGithubIdentity {
  id: number;
  login: string;
  name: string;
  email: string;
}

export const FAKE_GITHUB_IDENTITIES: FakeGithubIdentity[] = [
  { id: 910001, login: 'tamsin-reedbed', name: 'Tamsin Reedbed', email: 'tamsin.reedbed@example.test' },
  { id: 910002, login: 'ola-brine', name: 'Ola Brine', email: 'ola.brine@saltmarsh.example.test' },
];

const encode = (identity: FakeGithubIdentity) => Buffer.from(JSON.stringify(identity)).toString('base64url');
const decode = (text: string): FakeGithubIdentity | null => {
  try {
    return JSON.parse(Buffer.from(text, 'base64url').toString('utf8')) as FakeGithubIdentity;
  } catch {
    return null;
  }
};

function identityFromAuth(header: string | undefined): FakeGithubIdentity | null {
  const token = header?.replace(/^(Bearer|token)\s+/i, '') ?? '';
  return token.startsWith('fake-') ? decode(token.slice(5)) : null;
}

function chooserPage(redirectUri: string, state: string): string {
  const links = FAKE_GITHUB_IDENTITIES.map((who) => {
    const url = new URL(redirectUri);
    url.searchParams.set('code', encode(who));
    url.searchParams.set('state', state);
    return `<li><a href="${url.href.replace(/"/g, '&quot;')}">Continue as ${who.name} (@${who.login})</a></li>`;
  });
  return `<!doctype html><meta charset="utf-8"><title>Fake GitHub</title>
<h1>Fake GitHub sign-in (development only)</h1><ul>${links.join('')}</ul>`;
}

export function createFakeGithub(): Express {
  const app = express();
  app.use(express.urlencoded({ extended: false }));
  app.use(express.json());

  app.get('/login/oauth/authorize', (req, res) => {
    const redirectUri = String(req.query.redirect_uri ?? '');
    const state = String(req.query.state ?? '');
    const login = req.query.login ? String(req.query.login) : null;
    if (!redirectUri) return void res.status(400).send('redirect_uri is required');
    const chosen = FAKE_GITHUB_IDENTITIES.find((who) => who.login === login);
    if (!chosen) return void res.type('html').send(chooserPage(redirectUri, state));
    const url = new URL(redirectUri);
    url.searchParams.set('code', encode(chosen));
    url.searchParams.set('state', state);
    res.redirect(302, url.href);
  });

  app.post('/login/oauth/access_token', (req, res) => {
    const identity = decode(String(req.body?.code ?? ''));
    if (!identity) return void res.status(400).json({ error: 'bad_verification_code' });
    res.json({ access_token: `fake-${encode(identity)}`, token_type: 'bearer', scope: 'user:email' });
  });

  app.get('/api/user', (req, res) => {
    const who = identityFromAuth(req.get('authorization'));
    if (!who) return void res.status(401).json({ message: 'Bad credentials' });
    res.json({ id: who.id, login: who.login, name: who.name, html_url: `https://github.invalid/${who.login}`, avatar_url: '', email: who.email });
  });

  app.get('/api/user/emails', (req, res) => {
    const who = identityFromAuth(req.get('authorization'));
    if (!who) return void res.status(401).json({ message: 'Bad credentials' });
    res.json([{ email: who.email, primary: true, verified: true }]);
  });

  return app;
}

/** The four URLs passport-github2 needs, for a fake listening at baseUrl. */
export function fakeGithubUrls(baseUrl: string) {
  return {
    authorizationUrl: `${baseUrl}/login/oauth/authorize`,
    tokenUrl: `${baseUrl}/login/oauth/access_token`,
    userProfileUrl: `${baseUrl}/api/user`,
    userEmailUrl: `${baseUrl}/api/user/emails`,
  };
}
