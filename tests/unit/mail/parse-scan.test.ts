import MailComposer from "nodemailer/lib/mail-composer";
import { describe, expect, it } from "vitest";
import { parseScanMessage } from "@/lib/mail/parse-scan";
import { scanReceiptMail } from "@/lib/mail/templates";

function compose(options: ConstructorParameters<typeof MailComposer>[0]): Promise<Buffer> {
  return new MailComposer(options).compile().build();
}

describe("taking a received message apart", () => {
  it("keeps attachments with their names and bytes, not the inline images of the letter", async () => {
    const pdf = Buffer.from("%PDF-1.4 fake bytes for the parser only");
    const raw = await compose({
      from: "copier@alderquay.example",
      to: "intake@alderquay.example",
      subject: "Scan 0042",
      html: '<p>Scanned.</p><img src="cid:logo@office">',
      attachments: [
        { filename: "scan-0042.pdf", content: pdf, contentType: "application/pdf" },
        { filename: "logo.png", content: Buffer.from([0x89, 0x50, 0x4e, 0x47]), cid: "logo@office" },
        { filename: "notes.txt", content: "Second attachment" },
      ],
    });
    const parsed = await parseScanMessage(raw);
    expect(parsed.subject).toBe("Scan 0042");
    expect(parsed.attachments.map((a) => a.name)).toEqual(["scan-0042.pdf", "notes.txt"]);
    expect(Buffer.from(parsed.attachments[0].bytes).equals(pdf)).toBe(true);
  });

  it("finds nothing to file in a message without attachments", async () => {
    const parsed = await parseScanMessage(await compose({ from: "a@alderquay.example", to: "intake@alderquay.example", subject: "Hi", text: "No files" }));
    expect(parsed.attachments).toEqual([]);
  });
});

describe("the scan receipt", () => {
  it("lists each attachment's fate in order and counts what was taken in", () => {
    const mail = scanReceiptMail("copier@alderquay.example", "Scan 0042", [
      { name: "a.pdf", fate: "reading", sentence: "Taken in as document #7; it is being read." },
      { name: "b.pdf", fate: "duplicate", sentence: "This exact file is already held." },
      { name: "c.exe", fate: "rejected", sentence: "This file is a program, not a document." },
    ]);
    expect(mail.subject).toBe("Received: 1 of 3 attachments taken in (Scan 0042)");
    expect(mail.text).toContain("1. a.pdf: Taken in as document #7");
    expect(mail.text).toContain("3. c.exe: This file is a program");
  });
});
