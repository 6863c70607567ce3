import Link from "next/link";
import { cn } from "@/lib/utils";

const TABS = [
  { href: "/history", label: "Filing record" },
  { href: "/history/setup", label: "Setup record" },
] as const;

/** The two append-only records, one tab each. */
export function HistoryTabs({ active }: { active: (typeof TABS)[number]["href"] }) {
  return (
    <nav aria-label="Records" className="flex gap-1 border-b border-paper-edge text-sm">
      {TABS.map((t) => (
        <Link
          key={t.href}
          href={t.href}
          aria-current={t.href === active ? "page" : undefined}
          className={cn("-mb-px rounded-t border px-3 py-1.5", t.href === active ? "border-paper-edge border-b-paper bg-paper font-medium" : "border-transparent text-ink-soft hover:text-ink")}
        >
          {t.label}
        </Link>
      ))}
    </nav>
  );
}
