import Link from "next/link";

/** The top of a Setup page: the way back to Setup's index, the title and what the page is for. */
export function SetupHeader({ title, blurb, children }: { title: string; blurb: string; children?: React.ReactNode }) {
  return (
    <div className="flex flex-wrap items-end justify-between gap-3">
      <div>
        <p className="text-xs text-ink-faint">
          <Link href="/setup" className="text-verdigris hover:underline">
            Setup
          </Link>{" "}
          › {title}
        </p>
        <h1 className="font-serif text-2xl">{title}</h1>
        <p className="mt-1 max-w-3xl text-sm text-ink-soft">{blurb}</p>
      </div>
      {children}
    </div>
  );
}
