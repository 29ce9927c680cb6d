import request from 'supertest';
import { DEMO_PASSWORD } from '@api/seed/demo-people';

/** A cookie-keeping client that sends the session's CSRF token on writes, like the web client does. */
export async function csrfAgent(baseUrl: string) {
  const agent = request.agent(baseUrl);
  let token: string = (await agent.get('/api/session')).body.csrfToken;
  const withToken = <T extends { set: (name: string, value: string) => T }>(req: T) => req.set('X-CSRF-Token', token);
  return {
    agent,
    get: (path: string) => agent.get(path),
    post: (path: string, body?: object) => withToken(agent.post(path)).send(body ?? {}),
    put: (path: string, body?: object) => withToken(agent.put(path)).send(body ?? {}),
    patch: (path: string, body?: object) => withToken(agent.patch(path)).send(body ?? {}),
    delete: (path: string) => withToken(agent.delete(path)),
    setToken: (next: string) => {
      token = next;
    },
    get token() {
      return token;
    },
  };
}

export type CsrfAgent = Awaited<ReturnType<typeof csrfAgent>>;

/** Signs in with e-mail and password (the demo password by default) and keeps the new CSRF token. */
export async function signedInAgent(baseUrl: string, email: string, password = DEMO_PASSWORD): Promise<CsrfAgent> {
  const client = await csrfAgent(baseUrl);
  const res = await client.post('/api/auth/sign-in', { email, password });
  if (res.status !== 200) throw new Error(`sign-in as ${email} failed: ${res.status} ${JSON.stringify(res.body)}`);
  client.setToken(res.body.csrfToken);
  return client;
}
