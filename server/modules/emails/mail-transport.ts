import nodemailer, { type Transporter } from 'nodemailer';

export interface MailSettings {
  host: string;
  port: number;
  secure: boolean;
  user?: string;
  pass?: string;
  /** The From header, e.g. `Ridgeline reports <reports@example.com>`. */
  from: string;
}

let configured: { transporter: Transporter; from: string } | undefined;

/** Points the outbox at one SMTP server; called once when the app is built. */
export function configureMail(settings: MailSettings): void {
  configured?.transporter.close();
  configured = {
    from: settings.from,
    transporter: nodemailer.createTransport({
      host: settings.host,
      port: settings.port,
      secure: settings.secure,
      auth: settings.user ? { user: settings.user, pass: settings.pass ?? '' } : undefined,
      // A mail server that does not answer must not hold the worker for minutes.
      connectionTimeout: 10_000,
      greetingTimeout: 10_000,
      socketTimeout: 30_000,
    }),
  };
}

export function mailer(): { transporter: Transporter; from: string } {
  if (!configured) throw new Error('mail is not configured: build the app with createApp() (or call configureMail) first');
  return configured;
}
