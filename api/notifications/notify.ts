import type { Knex } from 'knex';
import * as outbox from '../mail/outbox.queries';
import { accessTo, canSee } from '../mechanisms/access';
import type { MechanismRow } from '../mechanisms/mechanisms.queries';
import * as users from '../users/users.queries';
import { composeMessage, type MailKind, type MessageFacts } from './messages';
import * as notifications from './notifications.queries';

export interface Notice {
  kind: MailKind;
  mechanism: MechanismRow;
  actorId: number;
  recipientIds: number[];
  facts: MessageFacts;
}

/**
 * An in-app notification and, unless the person turned the kind off, an e-mail in the outbox —
 * both in the caller's transaction. The actor is never told about their own act, and nobody hears
 * about a private mechanism they may not see.
 */
export async function notify(trx: Knex.Transaction, notice: Notice): Promise<void> {
  const { subject, text } = composeMessage(notice.kind, notice.facts);
  const recipients = [...new Set(notice.recipientIds)].filter((id) => id !== notice.actorId);
  for (const id of recipients) {
    const user = await users.findById(trx, id);
    if (!user || !canSee(notice.mechanism, await accessTo(trx, notice.mechanism, user))) continue;
    await notifications.insert(trx, {
      userId: id, mechanismId: notice.mechanism.id, kind: notice.kind, message: subject,
      details: { revision: notice.facts.revision, step: notice.facts.step ?? null },
    });
    if (user.mailPreferences[notice.kind] === false) continue;
    await outbox.insert(trx, { userId: id, toAddress: user.email, kind: notice.kind, subject, text });
  }
}
