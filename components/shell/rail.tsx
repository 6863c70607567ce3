"use client";
import Link from "next/link";
import { usePathname } from "next/navigation";
import { cn } from "@/lib/utils";

export interface RailItem {
  href: string;
  label: string;
}

/** The narrow left rail with the areas this role may use. */
export function Rail({ items }: { items: RailItem[] }) {
  const path = usePathname();
  return (
    <nav aria-label="Areas" className="flex flex-col gap-0.5">
      {items.map((item) => {
        const active = path === item.href || path.startsWith(`${item.href}/`);
        return (
          <Link
            key={item.href}
            href={item.href}
            aria-current={active ? "page" : undefined}
            className={cn(
              "rounded px-3 py-1.5 text-sm",
              active ? "bg-verdigris text-white" : "text-ink-soft hover:bg-paper-deep hover:text-ink",
            )}
          >
            {item.label}
          </Link>
        );
      })}
    </nav>
  );
}
