import type { Metadata } from "next";
import Link from "next/link";
import { forbidden } from "next/navigation";
import { SetupHeader } from "@/components/setup/setup-header";
import { ImportStart } from "@/components/imports/import-start";
import { formatUtc } from "@/components/document/format";
import { requirePageUser } from "@/lib/data/current-user";
import { listImports } from "@/lib/data/imports";

export const metadata: Metadata = { title: "Import an archive" };

const STATE_WORDS = { proposed: "To confirm", importing: "Storing", reading: "Reading", done: "Finished", failed: "Stopped" } as const;

export default async function ImportPage() {
  const { user, allowed } = await requirePageUser("setup.manage");
  if (!allowed) forbidden();
  const imports = await listImports(user);
  return (
    <section className="max-w-5xl space-y-6">
      <SetupHeader
        title="Import an archive"
        blurb="Bring in the office's existing filed folders: a zip or a folder whose top-level folders are cabinet types (a second level may be matter numbers). Foldwright proposes where each folder goes; once you confirm, every file is stored, read and filed as imported, in your name, and a retraining starts at the end."
      />
      <ImportStart />
      <p className="max-w-3xl text-xs text-ink-faint">
        Imported filings teach the model as if a person had filed each one. Check a sample of what was imported, and keep the original folders as the office&apos;s record until you have.
      </p>
      <section aria-label="Imports">
        <h2 className="mb-2 font-serif text-lg">Imports</h2>
        {imports.length === 0 ? (
          <p className="text-sm text-ink-soft">No archive has been imported yet.</p>
        ) : (
          <ul className="divide-y divide-paper-edge rounded border border-paper-edge bg-white/70" data-testid="import-list">
            {imports.map((i) => (
              <li key={i.id} className="flex flex-wrap items-center gap-3 px-3 py-2 text-sm">
                <Link href={`/setup/import/${i.id}`} className="min-w-0 flex-1 truncate font-medium text-verdigris hover:underline">
                  {i.sourceName}
                </Link>
                <span className="text-xs text-ink-soft">{STATE_WORDS[i.state]}</span>
                <span className="text-xs tabular-nums text-ink-soft">{i.settled} of {i.files} files settled</span>
                <span className="text-xs text-ink-faint">{formatUtc(i.createdAt)} UTC · {i.createdBy}</span>
              </li>
            ))}
          </ul>
        )}
      </section>
    </section>
  );
}
