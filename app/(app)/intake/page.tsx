import type { Metadata } from "next";
import { forbidden } from "next/navigation";
import { IntakeBoard } from "@/components/intake/intake-board";
import { requirePageUser } from "@/lib/data/current-user";
import { env } from "@/lib/env";

export const metadata: Metadata = { title: "Intake" };

export default async function IntakePage() {
  const { allowed } = await requirePageUser("documents.upload");
  if (!allowed) forbidden();
  return (
    <section className="max-w-4xl">
      <h1 className="font-serif text-2xl">Intake</h1>
      <p className="mb-5 mt-1 text-sm text-ink-soft">
        Drop scans, photos and digital files. Foldwright keeps each original, reads its text in the background (OCR for scans), and tells you
        what happened to every file.
      </p>
      <IntakeBoard maxBytes={env.uploadMaxBytes} />
    </section>
  );
}
