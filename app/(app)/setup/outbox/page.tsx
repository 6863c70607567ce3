import type { Metadata } from "next";
import { forbidden } from "next/navigation";
import { Notice } from "@/components/ui/notice";
import { formatWhen } from "@/components/people/types";
import { requirePageUser } from "@/lib/data/current-user";
import { listOutbox } from "@/lib/data/mail-log";
import { env } from "@/lib/env";
import { listCaught } from "@/lib/mail/caught";
import { catcherIsTransport } from "@/lib/mail/transport";

export const metadata: Metadata = { title: "Outbox" };

const PAGE_SIZE = 100;
const TH = "sticky top-0 border-b border-paper-edge bg-paper-deep px-2 py-1.5 text-left text-xs font-medium text-ink-soft";
const STATE_WORDS = { queued: "Waiting", sent: "Sent", failed: "Failed" } as const;

export default async function OutboxPage() {
  const { allowed } = await requirePageUser("setup.manage");
  if (!allowed) forbidden();
  const local = catcherIsTransport();
  const [{ items, total }, caught] = await Promise.all([listOutbox(1, PAGE_SIZE), local ? listCaught(env.mail.catcherDir) : Promise.resolve([])]);
  const bodies = new Map(caught.map((c) => [c.messageId, c]));
  return (
    <section className="space-y-4">
      <div>
        <h1 className="font-serif text-2xl">Outbox</h1>
        <p className="mt-1 max-w-3xl text-sm text-ink-soft">
          Every message Foldwright sent or is sending, newest first ({total} in all). A message waits here when the mail server does not answer
          and goes out when it is back.
        </p>
      </div>
      {local ? (
        <Notice tone="warning" title="Mail stays on this machine">
          The local mail catcher is the mail server (127.0.0.1:{env.mail.catcherPort}): nothing leaves this machine, and each message can be read below.
          Links in it work once, as for the person it was meant for. Set MAIL_HOST and MAIL_PORT to send real mail.
        </Notice>
      ) : (
        <p className="text-sm text-ink-soft">Mail goes out through {env.mail.host}:{env.mail.port}. Message contents are not kept here.</p>
      )}
      {items.length === 0 ? (
        <p className="rounded border border-dashed border-paper-edge bg-white/50 px-4 py-3 text-sm text-ink-soft">
          Nothing sent yet. Invitations, password resets, digests, retraining alerts and scan receipts appear here.
        </p>
      ) : (
        <div className="max-h-[70vh] overflow-auto rounded border border-paper-edge bg-white/70">
          <table className="w-full border-collapse text-sm" data-testid="outbox-table">
            <thead>
              <tr>
                <th scope="col" className={TH}>Queued (UTC)</th>
                <th scope="col" className={TH}>To</th>
                <th scope="col" className={TH}>Subject</th>
                <th scope="col" className={TH}>State</th>
              </tr>
            </thead>
            <tbody>
              {items.map((m) => {
                const body = m.messageId ? bodies.get(m.messageId) : undefined;
                return (
                  <tr key={m.id} className="border-t border-paper-edge/70 align-top" data-testid="outbox-row">
                    <td className="whitespace-nowrap px-2 py-1.5 font-mono text-xs">{formatWhen(m.createdAt)}</td>
                    <td className="px-2 py-1.5 font-mono text-xs">{m.to}</td>
                    <td className="px-2 py-1.5">
                      {body ? (
                        <details>
                          <summary className="cursor-pointer">{m.subject}</summary>
                          <pre className="mt-2 whitespace-pre-wrap rounded bg-paper px-3 py-2 font-mono text-xs">{body.text}</pre>
                        </details>
                      ) : (
                        m.subject
                      )}
                    </td>
                    <td className="px-2 py-1.5">
                      <span className={m.state === "failed" ? "text-brick" : m.state === "queued" ? "text-amber" : undefined}>{STATE_WORDS[m.state]}</span>
                      {m.state !== "sent" && m.lastError && (
                        <span className="block max-w-xs text-xs text-ink-soft">
                          {m.attempts} attempt{m.attempts === 1 ? "" : "s"}: {m.lastError}
                        </span>
                      )}
                      {m.sentAt && <span className="block font-mono text-xs text-ink-faint">{formatWhen(m.sentAt)}</span>}
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}
