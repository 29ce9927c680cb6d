import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PEOPLE } from '@api/seed/demo-people';
import { seedPeople } from '@api/seed/seed-people';
import { csrfAgent, signedInAgent } from '../helpers/agent';
import { startTestApp, type TestApp } from '../helpers/test-app';

let t: TestApp;
let ids: Map<string, number>;
const admin = DEMO_PEOPLE.find((p) => p.roles.includes('admin'))!;
const nonAdmins = DEMO_PEOPLE.filter((p) => !p.roles.includes('admin'));

beforeAll(async () => {
  t = await startTestApp();
  ids = await seedPeople(t.db);
});
afterAll(async () => t.close());

describe('admin routes', () => {
  it('answer 401 to a signed-out visitor', async () => {
    const client = await csrfAgent(t.url);
    expect((await client.get('/api/admin/users')).status).toBe(401);
    expect((await client.put('/api/admin/users/1/roles', { roles: [] })).status).toBe(401);
  });

  it.each(nonAdmins.map((p) => [p.roles.join('+'), p.email]))('answer 403 to a %s', async (_role, email) => {
    const client = await signedInAgent(t.url, email);
    const list = await client.get('/api/admin/users');
    const put = await client.put(`/api/admin/users/${ids.get(email)}/roles`, { roles: ['admin'] });
    expect([list.status, put.status]).toEqual([403, 403]);
    expect(put.body.error.code).toBe('FORBIDDEN');
  });

  it('let an admin list people and grant and revoke roles, recorded in the audit log', async () => {
    const client = await signedInAgent(t.url, admin.email);
    const list = await client.get('/api/admin/users');
    expect(list.body.map((u: { email: string }) => u.email)).toEqual(expect.arrayContaining(DEMO_PEOPLE.map((p) => p.email)));
    const target = ids.get(DEMO_PEOPLE[0].email)!;
    const granted = await client.put(`/api/admin/users/${target}/roles`, { roles: ['author', 'instructor'] });
    expect(granted.body.roles).toEqual(['author', 'instructor']);
    const audit = await t.db('audit_log').where({ subject_type: 'user', subject_id: String(target), action: 'account.roles-changed' });
    expect(audit).toHaveLength(1);
    expect(audit[0].details).toEqual({ before: ['author'], after: ['author', 'instructor'] });
  });

  it('validate the body and name the field, and refuse an unknown role', async () => {
    const client = await signedInAgent(t.url, admin.email);
    const res = await client.put(`/api/admin/users/${ids.get(admin.email)}/roles`, { roles: ['overlord'] });
    expect(res.status).toBe(400);
    expect(res.body.error.details[0].path).toEqual(['roles', '0']);
    const badId = await client.put('/api/admin/users/abc/roles', { roles: [] });
    expect(badId.status).toBe(400);
    expect(badId.body.error.details[0].path).toEqual(['id']);
  });

  it('keep an admin from removing their own admin role', async () => {
    const client = await signedInAgent(t.url, admin.email);
    const res = await client.put(`/api/admin/users/${ids.get(admin.email)}/roles`, { roles: ['author'] });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('LAST_ADMIN_GUARD');
  });
});
