import Link from "next/link";
import type { ClientWithCounts } from "@/lib/data/setup-clients";
import { cn } from "@/lib/utils";
import { hrefWith, type Dir } from "./list-query";
import { SortLink } from "./sort-link";

const TH = "sticky top-0 z-10 border-b border-paper-edge bg-paper-deep px-2 py-1.5 text-left text-xs text-ink-soft";
const TD = "px-2 py-1.5 align-top";
const PATH = "/setup/matters";

interface Props {
  rows: ClientWithCounts[];
  params: Record<string, string>;
  sort: string;
  dir: Dir;
}

/** The clients with what the matter matcher reads from papers: aliases, e-mail domains, the tax ID's last four. */
export function ClientsTable({ rows, params, sort, dir }: Props) {
  const header = (label: string, key: string, className = "") => <SortLink label={label} sortKey={key} path={PATH} params={params} active={sort} dir={dir} className={cn(TH, className)} sortParam="csort" dirParam="cdir" />;
  return (
    <div className="max-h-[40vh] overflow-auto rounded border border-paper-edge bg-white/70">
      <table className="w-full border-collapse text-sm" data-testid="clients-table">
        <thead>
          <tr>
            {header("Client", "name")}
            <th scope="col" className={TH}>Aliases</th>
            <th scope="col" className={TH}>E-mail domains</th>
            <th scope="col" className={TH}>Tax ID</th>
            {header("Matters", "matters", "text-right")}
          </tr>
        </thead>
        <tbody>
          {rows.map((c) => (
            <tr key={c.id} className="border-t border-paper-edge/70 hover:bg-paper/60" data-testid="client-row" data-name={c.name}>
              <td className={TD}>
                <Link href={hrefWith(PATH, params, { client: String(c.id), matter: undefined })} className="font-medium text-verdigris hover:underline" scroll={false}>
                  {c.name}
                </Link>
              </td>
              <td className={cn(TD, "text-xs")}>{c.aliases.join(", ") || <span className="text-ink-faint">none</span>}</td>
              <td className={cn(TD, "font-mono text-xs")}>{c.emailDomains.join(", ") || <span className="font-sans text-ink-faint">none</span>}</td>
              <td className={cn(TD, "font-mono text-xs")}>{c.taxIdLast4 ? `…${c.taxIdLast4}` : <span className="font-sans text-ink-faint">none</span>}</td>
              <td className={cn(TD, "text-right font-mono text-xs")}>
                <Link href={hrefWith(PATH, params, { mclient: String(c.id) })} className="hover:underline" title={`Show the matters of ${c.name}`} scroll={false}>
                  {c.matterCount}
                </Link>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
