// Outgoing mail over SMTP with nodemailer, configured only by MAIL_* (lib/env.ts): the local
// catcher by default, any hosted provider by configuration, no code change.
import nodemailer, { type Transporter } from "nodemailer";
import { env } from "@/lib/env";

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
}

// A connection attempt gives up after this long, so a dead server fails the job quickly and the
// queue's backoff (not a hanging socket) decides when to try again.
const CONNECT_TIMEOUT_MS = 10_000;

export interface SmtpSettings {
  host: string;
  port: number;
  secure: boolean;
  user: string;
  password: string;
}

export function smtpFromEnv(): SmtpSettings {
  const { host, port, secure, user, password } = env.mail;
  return { host, port, secure, user, password };
}

export function createMailTransport(s: SmtpSettings = smtpFromEnv()): Transporter {
  const local = s.host === "127.0.0.1" || s.host === "localhost";
  return nodemailer.createTransport({
    host: s.host,
    port: s.port,
    secure: s.secure,
    // The loopback catcher speaks plain SMTP; elsewhere STARTTLS is used whenever it is offered.
    ignoreTLS: local && !s.secure,
    auth: s.user ? { user: s.user, pass: s.password } : undefined,
    connectionTimeout: CONNECT_TIMEOUT_MS,
    greetingTimeout: CONNECT_TIMEOUT_MS,
  });
}

/** Sends one message and answers its Message-ID. Throws when the server refuses or is away. */
export async function sendMail(transport: Transporter, mail: OutgoingMail): Promise<string> {
  const info = await transport.sendMail({ from: env.mail.from, to: mail.to, subject: mail.subject, text: mail.text });
  return String(info.messageId ?? "");
}

/** While the catcher is the transport, admins may read what was sent in Setup › Outbox. */
export function catcherIsTransport(): boolean {
  const local = env.mail.host === "127.0.0.1" || env.mail.host === "localhost";
  return local && env.mail.port === env.mail.catcherPort;
}
