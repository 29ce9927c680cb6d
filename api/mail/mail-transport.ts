import nodemailer from 'nodemailer';

export interface MailSettings {
  host: string;
  port: number;
  from: string;
  /** Where people open the app; relative links in messages (`/m/…`) are made absolute with it. */
  publicUrl?: string;
}

/** Messages are composed with app-relative links; a mail reader needs the full address. */
export function absoluteLinks(text: string, publicUrl: string | undefined): string {
  if (!publicUrl) return text;
  const base = publicUrl.replace(/\/+$/, '');
  return text.replace(/(^|\s)(\/m\/\S+)/g, (_all, before: string, path: string) => `${before}${base}${path}`);
}

export interface MailTransport {
  send(message: { to: string; subject: string; text: string }): Promise<void>;
  close(): void;
}

/** nodemailer over plain SMTP to the configured host (the local fake in development and tests). */
export function createMailTransport(settings: MailSettings): MailTransport {
  const transporter = nodemailer.createTransport({
    host: settings.host,
    port: settings.port,
    secure: false,
    // smtp-server's built-in certificate has expired; a loopback relay needs no TLS (stack.md §4).
    ignoreTLS: settings.host === '127.0.0.1' || settings.host === 'localhost',
    connectionTimeout: 5_000,
    greetingTimeout: 5_000,
  });
  return {
    async send(message) {
      await transporter.sendMail({ from: settings.from, ...message, text: absoluteLinks(message.text, settings.publicUrl) });
    },
    close: () => transporter.close(),
  };
}
