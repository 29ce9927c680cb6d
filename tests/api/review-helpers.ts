import type { Knex } from 'knex';
import { hashPassword } from '@api/auth/auth.service';
import { startFakeSmtp, type FakeSmtp } from '@api/mail/fake-smtp';
import { createMailTransport } from '@api/mail/mail-transport';
import type { FeatureDeps } from '@api/routers';
import { DEMO_PASSWORD } from '@api/seed/demo-people';
import { seedPeople } from '@api/seed/seed-people';
import * as users from '@api/users/users.queries';
import type { Role } from '@api/users/users.schemas';
import { startTestApp, type TestApp } from '../helpers/test-app';

/** The demo people by their part in a review, plus two extra accounts the demo has no one for. */
export const WHO = {
  owner: 'rosalind.samphire@saltmarsh.example.test',
  reviewer: 'kofi.glasswort@saltmarsh.example.test',
  secondReviewer: 'mei.tidewell@saltmarsh.example.test',
  curator: 'anouk.spartina@saltmarsh.example.test',
  instructor: 'bram.sedge@saltmarsh.example.test',
  admin: 'ines.marram@saltmarsh.example.test',
  otherAuthor: 'tarn.mudflat@saltmarsh.example.test',
  unassignedReviewer: 'wren.saltpan@saltmarsh.example.test',
} as const;

const EXTRA: Array<{ name: string; email: string; roles: Role[] }> = [
  { name: 'Tarn Mudflat', email: WHO.otherAuthor, roles: ['author'] },
  { name: 'Wren Saltpan', email: WHO.unassignedReviewer, roles: ['reviewer'] },
];

export interface ReviewApp extends TestApp {
  smtp: FakeSmtp;
  ids: Map<string, number>;
}

async function seedExtraPeople(db: Knex, ids: Map<string, number>): Promise<void> {
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  for (const person of EXTRA) {
    const id = await users.insert(db, { name: person.name, email: person.email, passwordHash });
    await users.replaceRoles(db, id, person.roles);
    ids.set(person.email, id);
  }
}

/** A whole app on its own database, mailing through a fake SMTP server the test can read. */
export async function startReviewApp(deps: Partial<Omit<FeatureDeps, 'db'>> = {}): Promise<ReviewApp> {
  const smtp = await startFakeSmtp();
  const transport = createMailTransport({ host: '127.0.0.1', port: smtp.port, from: 'Cyclewright <no-reply@cyclewright.example.test>' });
  const app = await startTestApp({}, { mailTransport: transport, devInbox: smtp.messages, ...deps });
  const ids = await seedPeople(app.db);
  await seedExtraPeople(app.db, ids);
  return {
    ...app, smtp, ids,
    close: async () => {
      await app.close();
      transport.close();
      await smtp.close();
    },
  };
}

/** Polls until the condition holds (mail is sent after the response, in the background). */
export async function waitFor(condition: () => boolean | Promise<boolean>, what: string, attempts = 200): Promise<void> {
  for (let i = 0; i < attempts; i++) {
    if (await condition()) return;
    await new Promise((resolve) => setTimeout(resolve, 25));
  }
  throw new Error(`timed out waiting for ${what}`);
}

/** The salt-lake bromine cycle of the demo scenario (step notation as in step-notation.md). */
export const BROMINE_R1 = `%title Salt-lake bromine cycle
%terminal O3, O2

B1: Br• + O3 -> BrO• + O2              @ 1.7e-11 * exp(-800 / T)
B2: BrO• + BrO• -> 2 Br• + O2          @ 2.4e-12 * exp(40 / T)
B3: BrO• + hν -> Br• + O(3P)           @ 0.035
B4: O(3P) + O2 + M -> O3 + M           @ 6.0e-34 * (T / 300)^-2.4
B5: Br2 + hν -> 2 Br•                  @ 0.02
`;

/** r2: a new rate for B1, a comment line that shifts the steps down, and B5 dropped. */
export const BROMINE_R2 = `%title Salt-lake bromine cycle
%terminal O3, O2

# B1 rate re-fitted to the field-station chamber runs
B1: Br• + O3 -> BrO• + O2              @ 1.6e-11 * exp(-780 / T)
B2: BrO• + BrO• -> 2 Br• + O2          @ 2.4e-12 * exp(40 / T)
B3: BrO• + hν -> Br• + O(3P)           @ 0.035
B4: O(3P) + O2 + M -> O3 + M           @ 6.0e-34 * (T / 300)^-2.4
`;
