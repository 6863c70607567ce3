import nodemailer from "nodemailer";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { env } from "@/lib/env";
import { Client } from "./http";
import { ownerDb } from "../helpers/db";
import { makeDocx, makeTextPdf } from "../helpers/make-files";
import { waitForMail } from "../helpers/mail";

// Scans by e-mail, sent with nodemailer to the app's real SMTP listener (127.0.0.1:MAIL_INTAKE_PORT).
// The demo allows its own domain, alderquay.example, filed as the demo clerk. SMTP reply codes:
// RFC 5321 §4.2.2–4.2.3; enhanced codes: RFC 3463.
const stamp = Date.now();
const transport = nodemailer.createTransport({ host: "127.0.0.1", port: env.mail.intakePort, secure: false, ignoreTLS: true });
const owner = ownerDb();
let clerk: Client;

beforeAll(async () => {
  clerk = await Client.signedIn("clerk@example.com");
});
afterAll(async () => {
  transport.close();
  await owner.destroy();
});

function refusal(e: unknown): { responseCode?: number; response?: string } {
  return e as { responseCode?: number; response?: string };
}

describe("scans by e-mail", () => {
  it("a PDF and a DOCX become two documents that reach To review, and the receipt is caught", async () => {
    const from = `copier-${stamp}@alderquay.example`;
    const pdf = Buffer.from(await makeTextPdf([[`Invoice 4471 from Marlowe Street Bakery ${stamp}`, "Amount due 120.00"]]));
    const docx = Buffer.from(await makeDocx([`Engagement letter for the Ostrander Family Trust ${stamp}`, "Our fees are set out below."]));
    const info = await transport.sendMail({
      from,
      to: env.mail.intakeAddress,
      subject: `Scan ${stamp}`,
      text: "Scanned on the copier.",
      attachments: [
        { filename: `invoice-${stamp}.pdf`, content: pdf, contentType: "application/pdf" },
        { filename: `letter-${stamp}.docx`, content: docx },
      ],
    });
    expect(info.response).toMatch(/^250 2\.6\.0 Received as message #\d+: 2 attachments/);

    const names = [`invoice-${stamp}.pdf`, `letter-${stamp}.docx`];
    await expect
      .poll(
        async () => {
          const queue = await (await clerk.request("GET", "/api/review?pageSize=200&sort=age&dir=desc")).json();
          return names.filter((n) => queue.items.some((d: { name: string }) => d.name === n)).length;
        },
        { timeout: 90_000, interval: 500 },
      )
      .toBe(2);

    const docs = await owner("documents as d").join("users as u", "u.id", "d.uploaded_by").whereIn("d.original_name", names).select("d.id", "u.email");
    expect(docs.map((d) => d.email)).toEqual(["clerk@example.com", "clerk@example.com"]);
    const message = await owner("mail_intake_messages").where({ envelope_from: from }).first();
    expect(message.state).toBe("done");
    expect(message.raw_key).toBeNull(); // removed once every attachment was a document
    const fates = await owner("mail_intake_attachments").where({ message_id: message.id }).orderBy("part_index").select("fate", "document_id");
    expect(fates.map((f) => f.fate)).toEqual(["reading", "reading"]);
    expect(fates.map((f) => f.document_id).sort()).toEqual(docs.map((d) => d.id).sort());

    const receipt = await waitForMail(from, { subject: "Received: 2 of 2" });
    for (const n of names) expect(receipt.text).toContain(n);
  });

  it("a duplicate and a file that is not a document are named in the receipt; the good one is kept", async () => {
    const from = `scanner-${stamp}@alderquay.example`;
    const pdf = Buffer.from(await makeTextPdf([[`Bank statement ${stamp}`]]));
    await transport.sendMail({
      from,
      to: env.mail.intakeAddress,
      subject: `Mixed ${stamp}`,
      attachments: [
        { filename: "statement.pdf", content: pdf },
        { filename: "statement-again.pdf", content: pdf },
        { filename: "notes.pdf", content: Buffer.from("these are not the bytes of a PDF") },
      ],
    });
    const receipt = await waitForMail(from, { subject: "Received: 1 of 3", timeoutMs: 60_000 });
    expect(receipt.text).toMatch(/statement-again\.pdf: This exact file is already held/);
    expect(receipt.text).toMatch(/notes\.pdf: .+/);
  });

  it("refuses a sender that is not allowed, another mailbox, an oversize message and one without attachments", async () => {
    const pdf = Buffer.from(await makeTextPdf([["Refused"]]));
    const stranger = await transport.sendMail({ from: "someone@elsewhere.example", to: env.mail.intakeAddress, subject: "x", attachments: [{ filename: "a.pdf", content: pdf }] }).catch(refusal);
    expect(stranger.responseCode).toBe(550);
    expect(stranger.response).toMatch(/5\.7\.1 someone@elsewhere\.example may not send scans to this office/);

    const wrongBox = await transport.sendMail({ from: `x-${stamp}@alderquay.example`, to: "billing@alderquay.example", subject: "x", attachments: [{ filename: "a.pdf", content: pdf }] }).catch(refusal);
    expect(wrongBox.responseCode).toBe(550);
    expect(wrongBox.response).toMatch(/5\.1\.1/);

    const big = Buffer.alloc(env.mail.intakeMaxBytes, 7);
    const oversize = await transport.sendMail({ from: `big-${stamp}@alderquay.example`, to: env.mail.intakeAddress, subject: "x", attachments: [{ filename: "big.pdf", content: big }] }).catch(refusal);
    expect(oversize.responseCode).toBe(552);
    expect(oversize.response).toMatch(/larger than/);

    const bare = await transport.sendMail({ from: `bare-${stamp}@alderquay.example`, to: env.mail.intakeAddress, subject: "Nothing attached", text: "Here you go." }).catch(refusal);
    expect(bare.responseCode).toBe(554);
    expect(bare.response).toMatch(/5\.6\.0 This message has no attachment/);

    // A sender who is a person speaks for that person: a deactivated account is refused.
    const leaver = `leaver-${stamp}@alderquay.example`;
    await owner("users").insert({ email: leaver, name: "Former Clerk", role: "clerk", password_hash: "x", active: false });
    const gone = await transport.sendMail({ from: leaver, to: env.mail.intakeAddress, subject: "x", attachments: [{ filename: "a.pdf", content: pdf }] }).catch(refusal);
    expect(gone.responseCode).toBe(550);
    expect(gone.response).toMatch(/5\.7\.1 The Foldwright account of .+ is not active/);

    const kept = await owner("mail_intake_messages").whereIn("envelope_from", ["someone@elsewhere.example", `big-${stamp}@alderquay.example`, `bare-${stamp}@alderquay.example`, leaver]).count({ n: "id" });
    expect(Number(kept[0].n)).toBe(0);
  });
});
