/** The kinds a person hears about; each can be turned off for e-mail in `mailPreferences`. */
export const MAIL_KINDS = ['review-requested', 'remark', 'verdict', 'adopted'] as const;
export type MailKind = (typeof MAIL_KINDS)[number];

export interface MessageFacts {
  mechanismTitle: string;
  slug: string;
  actorName: string;
  revision: number;
  verdict?: string;
  comment?: string;
  step?: string;
  remark?: string;
}

const link = (facts: MessageFacts) => `/m/${facts.slug}/r/${facts.revision}`;

/** The subject and plain-text body of each kind of message (the in-app notification uses the subject). */
export function composeMessage(kind: MailKind, facts: MessageFacts): { subject: string; text: string } {
  const where = `"${facts.mechanismTitle}" r${facts.revision}`;
  switch (kind) {
    case 'review-requested':
      return {
        subject: `Review requested: ${where}`,
        text: `${facts.actorName} asked you to review ${where}.\n\nOpen it in Cyclewright: ${link(facts)}\n`,
      };
    case 'remark':
      return {
        subject: `New remark on ${where}, step ${facts.step}`,
        text: `${facts.actorName} left a remark on step ${facts.step} of ${where}:\n\n${facts.remark}\n\n${link(facts)}\n`,
      };
    case 'verdict':
      return {
        subject: `Verdict on ${where}: ${facts.verdict}`,
        text: `${facts.actorName} gave the verdict "${facts.verdict}" on ${where}.\n\n${facts.comment ?? ''}\n\n${link(facts)}\n`,
      };
    case 'adopted':
      return {
        subject: `Adopted: ${where} is now the reference revision`,
        text: `${facts.actorName} adopted ${where}; it is now the mechanism's reference revision.\n\n${link(facts)}\n`,
      };
  }
}
