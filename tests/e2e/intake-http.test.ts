import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Client } from "./http";
import { makeDocx, makeTextPdf, renderTextPng } from "../helpers/make-files";
import { encryptWithQpdf, makeElfBytes, makeNoiseBytes, makeZeroPart, repackDocx } from "../helpers/make-hostile-files";
import { ownerDb } from "../helpers/db";
import { listKeys } from "../helpers/storage";

// The bad-input matrix through the real upload route and reading workers of the built app.
// Each case checks the exact sentence the clerk sees, and that nothing was lost or half-stored:
// a refused file leaves no row and no object; an accepted-but-unreadable file keeps its original,
// byte for byte, downloadable.
const owner = ownerDb();
const BUCKET = "foldwright-test";
let clerk: Client;

async function upload(name: string, bytes: Uint8Array, type = "application/octet-stream") {
  const form = new FormData();
  form.append("file", new Blob([new Uint8Array(bytes)], { type }), name);
  const res = await clerk.request("POST", "/api/documents", form);
  return { status: res.status, body: await res.json() };
}

async function counts() {
  const [{ n }] = await owner("documents").count({ n: "*" });
  return { rows: Number(n), objects: (await listKeys(BUCKET)).length };
}

async function waitForReading(id: number) {
  const deadline = Date.now() + 120_000;
  for (;;) {
    const res = await clerk.request("GET", `/api/documents/${id}`);
    const { document } = await res.json();
    if (document.status !== "reading") return document;
    if (Date.now() > deadline) throw new Error(`document ${id} still reading`);
    await new Promise((r) => setTimeout(r, 300));
  }
}

async function expectRefused(name: string, bytes: Uint8Array, status: number, code: string, message: string) {
  const before = await counts();
  const r = await upload(name, bytes);
  expect(r.status).toBe(status);
  expect(r.body.files[0]).toMatchObject({ status: "rejected", error: { code, message } });
  expect(await counts()).toEqual(before);
}

async function expectKeptButUnreadable(name: string, bytes: Uint8Array, reason: string | RegExp) {
  const r = await upload(name, bytes);
  expect(r.status).toBe(201);
  const doc = await waitForReading(r.body.files[0].id);
  expect(doc.status).toBe("unreadable");
  if (typeof reason === "string") expect(doc.reason).toBe(reason);
  else expect(doc.reason).toMatch(reason);
  const original = await clerk.request("GET", `/api/documents/${doc.id}/original`);
  expect(original.status).toBe(200);
  expect(Buffer.from(await original.arrayBuffer()).equals(Buffer.from(bytes))).toBe(true);
}

beforeAll(async () => {
  clerk = await Client.signedIn("clerk@example.com");
});
afterAll(async () => {
  await owner.destroy();
});

describe("intake bad-input matrix", () => {
  it("refuses zero bytes", () =>
    expectRefused("empty.pdf", new Uint8Array(0), 422, "empty", "This file is empty (0 bytes). Check that it finished saving or downloading, then upload it again."));

  it("refuses random bytes named .pdf", () =>
    expectRefused(
      "scan.pdf",
      makeNoiseBytes(4096),
      415,
      "unknown_type",
      "This file is named like a PDF, but its contents are not: it may be damaged, or renamed from another kind of file. Foldwright keeps PDF, Word (.docx), PNG, JPEG and TIFF files. Open the original and save it as PDF, then upload that.",
    ));

  it("refuses a program renamed .pdf", () =>
    expectRefused(
      "invoice.pdf",
      makeElfBytes(),
      415,
      "unsupported_type",
      "This file is a Linux program, not a document, even though its name ends in .pdf. Foldwright keeps PDF, Word (.docx), PNG, JPEG and TIFF files. Do not open it; ask the sender what they meant to send.",
    ));

  // The whole upload is refused as it streams in (tests/e2e/upload-stream.test.ts has the rest).
  it("refuses a file over the size limit (UPLOAD_MAX_BYTES = 2 MB in the tests)", async () => {
    const before = await counts();
    const r = await upload("big.pdf", Buffer.concat([Buffer.from("%PDF-1.7\n"), Buffer.alloc(3 * 1024 * 1024 - 9, 32)]));
    expect(r.status).toBe(413);
    expect(r.body.error).toMatchObject({ code: "too_large", message: expect.stringMatching(/larger than the 2 MB Foldwright takes/) });
    expect(await counts()).toEqual(before);
  });

  it("keeps a truncated PDF and marks it unreadable", async () => {
    const pdf = await makeTextPdf([[`Lease schedule ${Date.now()}`, "Rent review every five years"]]);
    await expectKeptButUnreadable(
      "cut-off.pdf",
      pdf.slice(0, Math.floor(pdf.length / 2)),
      "This PDF is damaged or incomplete (it may have been cut off while downloading or scanning), so Foldwright cannot read it. The original is kept and you can still file it by hand, or upload a fresh copy.",
    );
  });

  it("keeps a password-protected PDF (qpdf --encrypt) and marks it unreadable", async () => {
    const pdf = encryptWithQpdf(await makeTextPdf([[`Private letter ${Date.now()}`]]));
    await expectKeptButUnreadable(
      "locked.pdf",
      pdf,
      "This PDF is locked with a password, so Foldwright cannot read its text. The original is kept and you can still file it by hand, or ask the sender for a copy without a password and upload that.",
    );
  });

  it("keeps a DOCX zip bomb unopened and marks it unreadable", async () => {
    const bomb = await repackDocx(await makeDocx([`Minutes ${Date.now()}`]), [await makeZeroPart("word/media/filler.bin", 300)]);
    expect(bomb.length).toBeLessThan(2 * 1024 * 1024);
    await expectKeptButUnreadable("minutes.docx", bomb, /^This Word file .*far beyond any real document, so Foldwright did not open it: it may be damaged or made to cause harm\. The original is kept/);
  });

  // Control characters in a name are cleaned by cleanFileName (tests/unit/intake/clean-file-name.test.ts);
  // over HTTP the multipart reader refuses them in a part header (below).
  it("refuses a file name with a control character with a sentence (400)", async () => {
    const r = await upload("pass\u0007wd.pdf", await makeTextPdf([[`Name test ${Date.now()}`]]));
    expect(r.status).toBe(400);
    expect(r.body.error.message).toMatch(/control characters/);
  });

  it("cleans a file name with path separators and 300 characters", async () => {
    const name = `..\\..//etc/passwd-${"x".repeat(300)}.pdf`;
    const r = await upload(name, await makeTextPdf([[`Name test ${Date.now()}`]]));
    expect(r.status).toBe(201);
    const stored: string = r.body.files[0].name;
    expect(stored).not.toMatch(/[\\/\u0000-\u001f\u007f]/);
    expect(stored.length).toBeLessThanOrEqual(200);
    expect(stored.endsWith(".pdf")).toBe(true);
    const row = await owner("documents").where({ id: r.body.files[0].id }).first("original_name");
    expect(row.original_name).toBe(stored);
  });

  it("answers a duplicate with the first copy, and stores nothing new", async () => {
    const bytes = await makeTextPdf([[`Card statement ${Date.now()}`]]);
    const first = await upload("statement.pdf", bytes);
    const before = await counts();
    const again = await upload("statement-again.pdf", bytes);
    expect(again.status).toBe(200);
    expect(again.body.files[0]).toMatchObject({ status: "duplicate", duplicateOf: { id: first.body.files[0].id } });
    expect(again.body.files[0].duplicateOf.message).toMatch(/from Tamsin Reyes\. It is not filed yet\. It was not stored again\.$/);
    expect(await counts()).toEqual(before);
  });
});

describe("reading through the app", () => {
  it("reads a text PDF exactly, a Word file, and a scan by OCR; masks sensitive numbers in the text it answers", async () => {
    const stamp = Date.now();
    const pdf = await upload("letter.pdf", await makeTextPdf([[`Engagement letter ${stamp}`, "Card on file 4111 1111 1111 1111 for the retainer."]]));
    const docx = await upload("minutes.docx", await makeDocx([`Board minutes ${stamp}`, "Quorum present."]));
    const scan = await upload("notice.png", await renderTextPng(["Notice of assessment", `Reference ${stamp}`]));
    const [a, b, c] = await Promise.all([pdf, docx, scan].map((u) => waitForReading(u.body.files[0].id)));
    expect(a).toMatchObject({ status: "ready", ocrUsed: false, pageCount: 1, sensitive: { card: 1 } });
    expect(a.text).toContain(`Engagement letter ${stamp}`);
    expect(a.text).toContain("**** **** **** 1111");
    expect(a.text).not.toContain("4111 1111 1111 1111");
    expect(b).toMatchObject({ status: "ready", ocrUsed: false });
    expect(b.text).toContain(`Board minutes ${stamp}`);
    expect(c).toMatchObject({ status: "ready", ocrUsed: true });
    expect(c.text).toMatch(/Notice of assessment/i);
  });

  it("finds a document by the words read from it", async () => {
    const word = `zephyrine${Date.now()}`;
    const up = await upload("search.pdf", await makeTextPdf([[`Unusual word ${word} appears here`]]));
    await waitForReading(up.body.files[0].id);
    const res = await clerk.request("GET", `/api/documents?q=${word}`);
    const body = await res.json();
    expect(body.total).toBe(1);
    expect(body.items[0].id).toBe(up.body.files[0].id);
  });
});
