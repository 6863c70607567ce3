import Link from "next/link";
import type { Matter } from "@/lib/data/setup-matters";
import { cn } from "@/lib/utils";
import { hrefWith, type Dir } from "./list-query";
import { SortLink } from "./sort-link";

const TH = "sticky top-0 z-10 border-b border-paper-edge bg-paper-deep px-2 py-1.5 text-left text-xs text-ink-soft";
const TD = "px-2 py-1.5 align-top";
const PATH = "/setup/matters";

interface Props {
  rows: Matter[];
  params: Record<string, string>;
  sort: string;
  dir: Dir;
}

/** The matters with their dates, status, restriction and team; headers sort through the address. */
export function MattersTable({ rows, params, sort, dir }: Props) {
  const header = (label: string, key: string) => <SortLink label={label} sortKey={key} path={PATH} params={params} active={sort} dir={dir} className={TH} />;
  return (
    <div className="max-h-[60vh] overflow-auto rounded border border-paper-edge bg-white/70">
      <table className="w-full border-collapse text-sm" data-testid="matters-table">
        <thead>
          <tr>
            {header("Number", "number")}
            {header("Title", "title")}
            {header("Client", "client")}
            {header("Opened", "opened")}
            {header("Status", "status")}
            <th scope="col" className={TH}>Team</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((m) => (
            <tr key={m.id} className={cn("border-t border-paper-edge/70 hover:bg-paper/60", m.status === "closed" && "text-ink-soft")} data-testid="matter-row" data-number={m.number}>
              <td className={cn(TD, "whitespace-nowrap font-mono text-xs")}>
                <Link href={hrefWith(PATH, params, { matter: String(m.id), client: undefined })} className="text-verdigris hover:underline" scroll={false}>
                  {m.number}
                </Link>
              </td>
              <td className={TD}>
                {m.title}
                {m.restricted && <span className="ml-2 rounded bg-brick-light px-1.5 py-0.5 text-xs text-brick">Restricted</span>}
              </td>
              <td className={cn(TD, "text-xs")}>{m.clientName}</td>
              <td className={cn(TD, "whitespace-nowrap font-mono text-xs")}>{m.openedOn}</td>
              <td className={cn(TD, "whitespace-nowrap text-xs")}>{m.status === "closed" ? `Closed ${m.closedOn}` : "Open"}</td>
              <td className={cn(TD, "max-w-56 text-xs")}>
                {m.team.length ? m.team.map((p) => p.name).join(", ") : <span className="text-ink-faint">{m.restricted ? "admins only" : "none"}</span>}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
