// The SMTP listener for scans by e-mail, on 127.0.0.1:MAIL_INTAKE_PORT for INTAKE_ADDRESS. In
// production the office's mail relay (which checks SPF/DKIM; a From address alone can be forged)
// forwards the intake address here. Replies follow RFC 5321 §4.2 with RFC 3463 enhanced codes in
// the text: 550 5.7.1 sender not allowed, 550 5.1.1 no such mailbox, 552 5.3.4 too large,
// 554 5.6.0 nothing to file, 451 4.3.0 try later (storage or database away: nothing was kept).
import { SMTPServer, type SMTPServerSession } from "smtp-server";
import { env } from "@/lib/env";
import { keepIncomingMessage } from "@/lib/data/mail-intake";
import { decideSender, type SenderDecision } from "@/lib/data/senders";
import { parseScanMessage } from "@/lib/mail/parse-scan";

function reply(code: number, text: string): Error {
  return Object.assign(new Error(text), { responseCode: code });
}

const TRY_LATER = "4.3.0 Foldwright could not keep this message just now (its storage or database is not answering). Nothing was kept; send it again in a few minutes.";

export interface IntakeListener {
  port: number;
  stop(): Promise<void>;
}

export async function startIntakeListener(port = env.mail.intakePort): Promise<IntakeListener> {
  const decisions = new Map<string, SenderDecision>();
  const maxMb = Math.round(env.mail.intakeMaxBytes / 1048576);
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS", "AUTH"],
    size: env.mail.intakeMaxBytes,
    banner: "Foldwright scan intake",
    logger: false,
    onClose: (session: SMTPServerSession) => void decisions.delete(session.id),
    onMailFrom(address, session, callback) {
      decideSender(address.address).then(
        (decision) => {
          if (!decision.ok) return callback(reply(550, `5.7.1 ${decision.message}`));
          decisions.set(session.id, decision);
          callback();
        },
        () => callback(reply(451, TRY_LATER)),
      );
    },
    onRcptTo(address, _session, callback) {
      if (address.address.toLowerCase() === env.mail.intakeAddress) return callback();
      callback(reply(550, `5.1.1 This server takes scans for ${env.mail.intakeAddress} only; there is no mailbox ${address.address} here.`));
    },
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on("data", (c: Buffer) => {
        if (!stream.sizeExceeded) chunks.push(c); // past the limit, keep reading but hold nothing
      });
      stream.on("end", () => {
        if (stream.sizeExceeded) {
          return callback(reply(552, `5.3.4 This message is larger than the ${maxMb} MB Foldwright accepts. Send the scans in several messages.`));
        }
        void accept(Buffer.concat(chunks), session).then((text) => callback(null, text), callback);
      });
    },
  });

  async function accept(raw: Buffer, session: SMTPServerSession): Promise<string> {
    const decision = decisions.get(session.id);
    const from = session.envelope.mailFrom ? session.envelope.mailFrom.address.toLowerCase() : "";
    if (!decision?.ok) throw reply(503, "5.5.1 Say who the message is from (MAIL FROM) first.");
    let parsed;
    try {
      parsed = await parseScanMessage(raw);
    } catch {
      throw reply(554, "5.6.0 This message could not be read as e-mail. Send the scans again as ordinary attachments.");
    }
    if (parsed.attachments.length === 0) {
      throw reply(554, "5.6.0 This message has no attachment, so there is nothing to file. Attach the scans (PDF, Word, PNG, JPEG or TIFF) and send it again.");
    }
    try {
      const id = await keepIncomingMessage({ from, uploader: decision.uploader, raw, subject: parsed.subject, attachmentCount: parsed.attachments.length });
      const n = parsed.attachments.length;
      return `2.6.0 Received as message #${id}: ${n} attachment${n === 1 ? "" : "s"} to take in. A receipt follows by e-mail.`;
    } catch (e) {
      console.error("[mail intake] could not keep a message:", e);
      throw reply(451, TRY_LATER);
    }
  }

  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, "127.0.0.1", () => resolve());
  });
  server.on("error", (e) => console.error("[mail intake]", e.message));
  return { port, stop: () => new Promise((resolve) => server.close(() => resolve())) };
}
