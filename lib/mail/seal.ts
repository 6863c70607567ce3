// A queued message may carry a one-time link, so its content waits in mail_log sealed with the
// session secret (iron-session's sealData: AES-256-CBC + HMAC): a copy of the database alone does
// not reveal a working link. The seal is cleared once the message is sent.
import { sealData, unsealData } from "iron-session";
import { sessionSecret } from "@/lib/env";
import type { OutgoingMail } from "@/lib/mail/transport";

// Long enough for the retries of a mail server that is down for days; 0 would mean "never expires".
const SEAL_TTL_SECONDS = 14 * 86_400;

export function sealMail(mail: OutgoingMail): Promise<string> {
  return sealData(mail, { password: sessionSecret(), ttl: SEAL_TTL_SECONDS });
}

export async function unsealMail(sealed: string): Promise<OutgoingMail> {
  const mail = await unsealData<OutgoingMail>(sealed, { password: sessionSecret(), ttl: SEAL_TTL_SECONDS });
  if (!mail || typeof mail.to !== "string" || typeof mail.text !== "string") {
    throw new Error("The queued message could not be opened (the session secret changed, or it expired). It cannot be sent; queue it again.");
  }
  return mail;
}
