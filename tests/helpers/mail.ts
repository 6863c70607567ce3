// What the real local mail catcher caught (.eml files in MAIL_CATCHER_DIR), for the tests.
import { env } from "@/lib/env";
import { listCaught, type CaughtMail } from "@/lib/mail/caught";

const POLL_MS = 200;

/** Waits for a message to this address (and subject part, when given) that arrived after `since`. */
export async function waitForMail(to: string, options: { subject?: string; since?: number; timeoutMs?: number } = {}): Promise<CaughtMail> {
  const deadline = Date.now() + (options.timeoutMs ?? 30_000);
  const since = options.since ?? 0;
  for (;;) {
    const found = (await listCaught(env.mail.catcherDir, 500)).find(
      (m) => m.to.includes(to.toLowerCase()) && (!options.subject || m.subject.includes(options.subject)) && (!m.date || Date.parse(m.date) >= since - 1000),
    );
    if (found) return found;
    if (Date.now() > deadline) throw new Error(`no mail to ${to}${options.subject ? ` about "${options.subject}"` : ""} reached the catcher in time`);
    await new Promise((r) => setTimeout(r, POLL_MS));
  }
}

/** Every message caught for this address. */
export async function mailsTo(to: string): Promise<CaughtMail[]> {
  return (await listCaught(env.mail.catcherDir, 500)).filter((m) => m.to.includes(to.toLowerCase()));
}

/** The one-time link in a message: /invite/{token} or /reset-password/{token}. */
export function linkIn(mail: CaughtMail, kind: "invite" | "reset-password"): { url: string; token: string } {
  const match = mail.text.match(new RegExp(`(https?://\\S+/${kind}/([A-Za-z0-9_-]+))`));
  if (!match) throw new Error(`no ${kind} link in "${mail.subject}"`);
  return { url: match[1], token: match[2] };
}
