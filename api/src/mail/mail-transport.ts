import nodemailer, { type Transporter } from 'nodemailer';

export interface SmtpSettings {
  host: string;
  port: number;
  secure: boolean;
  user?: string;
  pass?: string;
  /** The local capture server speaks plain SMTP only. */
  ignoreTls?: boolean;
}

/** A nodemailer SMTP transport; the timeouts keep one dead server from stalling the sender. */
export function createMailTransport(settings: SmtpSettings): Transporter {
  return nodemailer.createTransport({
    host: settings.host,
    port: settings.port,
    secure: settings.secure,
    ignoreTLS: settings.ignoreTls ?? false,
    auth: settings.user ? { user: settings.user, pass: settings.pass ?? '' } : undefined,
    // Ten seconds is ample on a LAN or to a relay; longer only delays the retry.
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 20_000,
  });
}
