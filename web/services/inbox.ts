import type { CapturedMail as ServerCapturedMail } from '@api/mail/inbox.schemas';
import { http } from './http';
import type { Jsonified } from './jsonified';

/** A message the local fake SMTP server caught (development and tests only), dates as strings. */
export type CapturedMail = Jsonified<ServerCapturedMail>;

/** Newest first; 404 `NOT_FOUND` where no fake mail server runs. */
export const listInbox = () => http.get<CapturedMail[]>('/api/dev/inbox');
