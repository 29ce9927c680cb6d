import { http } from './http';

/** A message the local fake SMTP server caught (development and tests only). */
export interface CapturedMail {
  id: number;
  from: string;
  to: string[];
  subject: string;
  text: string;
  receivedAt: string;
}

/** Newest first; 404 `NOT_FOUND` where no fake mail server runs. */
export const listInbox = () => http.get<CapturedMail[]>('/api/dev/inbox');
