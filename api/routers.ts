import type { Router } from 'express';
import type { Knex } from 'knex';
import { analysisRoutes } from './analysis/analysis.routes';
import { attachmentsRoutes, mechanismAttachmentsRoutes } from './attachments/attachments.routes';
import { catalogueRoutes } from './catalogue/catalogue.routes';
import { comparisonRoutes } from './comparison/comparison.routes';
import { exportsRoutes, schemasRoutes } from './exports/exports.routes';
import { importsRoutes } from './imports/imports.routes';
import type { CapturedMail } from './mail/fake-smtp';
import { inboxRoutes } from './mail/inbox.routes';
import type { MailTransport } from './mail/mail-transport';
import { outboxKick } from './mail/outbox-kick';
import { mechanismsRoutes } from './mechanisms/mechanisms.routes';
import { notificationsRoutes } from './notifications/notifications.routes';
import { peopleRoutes } from './people/people.routes';
import { queuesRoutes } from './queues/queues.routes';
import { remarksRoutes } from './reviews/remarks.routes';
import { mechanismRoundsRoutes, roundsRoutes } from './reviews/rounds.routes';
import { revisionsRoutes } from './revisions/revisions.routes';
import type { JobQueue } from './jobs/job-queue';
import { simulationRoutes } from './simulations/simulations.routes';
import { setsRoutes } from './sets/sets.routes';

/** What feature routers need besides the database (mail, job queue…), filled in as features arrive. */
export interface FeatureDeps {
  db: Knex;
  /** SMTP for the mail outbox; without one, messages wait in the outbox (none is lost). */
  mailTransport?: MailTransport | null;
  /** What the local fake SMTP server caught (development and tests); null elsewhere. */
  devInbox?: CapturedMail[] | null;
  /** Endorsements a review round needs before it can be adopted (default 2). */
  endorsementsNeeded?: number;
  /** The simulation job queue; absent where it does not run (simulations then answer 503). */
  jobs?: JobQueue;
  /** Largest attachment in bytes (default 10 MB). */
  maxAttachmentBytes?: number;
  /** Largest file in an import upload in bytes (default 1 MB). */
  maxImportBytes?: number;
}

/** Every feature's router with its mount path: the one list app.ts mounts. */
export function apiRouters(deps: FeatureDeps): Array<[string, Router]> {
  const { db } = deps;
  return [
    ...(deps.mailTransport ? [['/api', outboxKick(db, deps.mailTransport)] as [string, Router]] : []),
    ['/api/analyse', analysisRoutes(db)],
    ['/api/mechanisms', mechanismsRoutes(db)],
    ['/api/mechanisms', revisionsRoutes(db)],
    ['/api/mechanisms', comparisonRoutes(db)],
    ['/api/mechanisms', mechanismRoundsRoutes(db, { endorsementsNeeded: deps.endorsementsNeeded ?? 2 })],
    ['/api/mechanisms', mechanismAttachmentsRoutes(db, deps.maxAttachmentBytes ?? 10 * 1024 * 1024)],
    ['/api/simulations', simulationRoutes(db, deps.jobs)],
    ['/api/rounds', roundsRoutes(db)],
    ['/api/remarks', remarksRoutes(db)],
    ['/api/attachments', attachmentsRoutes(db)],
    ['/api/notifications', notificationsRoutes(db)],
    ['/api/queues', queuesRoutes(db)],
    ['/api/people', peopleRoutes(db)],
    ['/api/catalogue', catalogueRoutes(db)],
    ['/api/sets', setsRoutes(db)],
    ['/api/exports', exportsRoutes(db)],
    ['/api/schemas', schemasRoutes()],
    ['/api/imports', importsRoutes(db, deps.maxImportBytes ?? 1024 * 1024)],
    ['/api/dev', inboxRoutes(deps.devInbox ?? null)],
  ];
}
