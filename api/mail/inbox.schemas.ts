/** A message the local fake SMTP server caught (`GET /api/dev/inbox`, development and tests only). */
export interface CapturedMail {
  id: number;
  from: string;
  to: string[];
  subject: string;
  text: string;
  receivedAt: Date;
}
