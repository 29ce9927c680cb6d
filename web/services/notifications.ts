import { http, request } from './http';

/** One of the signed-in person's notifications (`GET /api/notifications`). */
export interface AppNotification {
  id: number;
  kind: 'review-requested' | 'remark' | 'verdict' | 'adopted';
  message: string;
  details: Record<string, unknown>;
  mechanismSlug: string;
  readAt: string | null;
  createdAt: string;
}

export const listNotifications = (unreadOnly: boolean) =>
  http.get<AppNotification[]>(`/api/notifications?unread=${unreadOnly}`);

export const markNotificationRead = (id: number) => http.post<void>(`/api/notifications/${id}/read`);

/** The kinds of e-mail a person can turn off; absent from the preferences means on. */
export const MAIL_KINDS = [
  { kind: 'review-requested', label: 'You are asked to review a revision' },
  { kind: 'remark', label: 'A remark on your mechanism' },
  { kind: 'verdict', label: 'A verdict on your mechanism' },
  { kind: 'adopted', label: 'Your revision was adopted' },
] as const;

export type MailKind = (typeof MAIL_KINDS)[number]['kind'];
export type MailPreferences = Partial<Record<MailKind, boolean>>;

interface AccountWithMail {
  mailPreferences: MailPreferences;
}

export const getMailPreferences = async () => (await http.get<AccountWithMail>('/api/me')).mailPreferences;

export async function saveMailPreferences(preferences: MailPreferences): Promise<MailPreferences> {
  return (await request<AccountWithMail>('/api/me', { method: 'PATCH', body: { mailPreferences: preferences } })).mailPreferences;
}
