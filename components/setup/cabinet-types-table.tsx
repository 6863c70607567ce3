import Link from "next/link";
import type { CabinetTypeWithCounts } from "@/lib/data/setup-cabinet-types";
import { cn } from "@/lib/utils";
import { CabinetTypeActions } from "./cabinet-type-actions";
import { hrefWith, type Dir } from "./list-query";
import { learningStatus, retentionWords } from "./learning-status";
import { SortLink } from "./sort-link";

const TH = "sticky top-0 z-10 border-b border-paper-edge bg-paper-deep px-2 py-1.5 text-left text-xs text-ink-soft";
const TD = "px-2 py-1.5 align-top";
const PATH = "/setup/cabinet-types";

export interface TypeRow extends CabinetTypeWithCounts {
  learned: boolean;
}

interface Props {
  rows: TypeRow[];
  activeTypes: { id: number; name: string }[];
  params: Record<string, string>;
  sort: string;
  dir: Dir;
  minExamples: number;
}

/** The cabinet types, dense, with sortable headers (state in the URL) and each row's actions. */
export function CabinetTypesTable({ rows, activeTypes, params, sort, dir, minExamples }: Props) {
  const header = (label: string, key: string) => <SortLink label={label} sortKey={key} path={PATH} params={params} active={sort} dir={dir} className={TH} />;
  return (
    <div className="max-h-[70vh] overflow-auto rounded border border-paper-edge bg-white/70">
      <table className="w-full border-collapse text-sm" data-testid="cabinet-types-table">
        <thead>
          <tr>
            {header("Name", "name")}
            <th scope="col" className={cn(TH, "hidden lg:table-cell")}>Keywords</th>
            {header("Retention", "retention")}
            {header("Filed", "filed")}
            {header("Model", "learning")}
            <th scope="col" className={TH}><span className="sr-only">Actions</span></th>
          </tr>
        </thead>
        <tbody>
          {rows.map((t) => {
            const status = learningStatus({ active: t.active, humanFiledCount: t.humanFiledCount, learned: t.learned, minExamples });
            return (
              <tr key={t.id} className={cn("border-t border-paper-edge/70 hover:bg-paper/60", !t.active && "text-ink-faint")} data-testid="cabinet-type-row" data-name={t.name}>
                <td className={cn(TD, "min-w-48")}>
                  <Link href={hrefWith(PATH, params, { edit: String(t.id) })} className="font-medium text-verdigris hover:underline" scroll={false}>
                    {t.name}
                  </Link>
                  {!t.active && <span className="ml-2 rounded bg-paper-deep px-1.5 py-0.5 text-xs text-ink-soft">Retired</span>}
                  <p className="line-clamp-2 max-w-md text-xs text-ink-soft">{t.description}</p>
                </td>
                <td className={cn(TD, "hidden max-w-52 text-xs lg:table-cell")}>{t.keywords.join(", ") || <span className="text-ink-faint">none</span>}</td>
                <td className={cn(TD, "whitespace-nowrap text-xs")}>{retentionWords(t.retentionYears, t.retentionTrigger)}</td>
                <td className={cn(TD, "text-right font-mono text-xs")}>{t.filedCount}</td>
                <td className={cn(TD, "min-w-40 max-w-56 text-xs", status.tone === "cold" && "text-amber")} data-testid="learning-status">
                  {status.text}
                </td>
                <td className={cn(TD, "whitespace-nowrap text-right")}>
                  <CabinetTypeActions type={{ id: t.id, name: t.name, active: t.active, filedCount: t.filedCount }} others={activeTypes.filter((o) => o.id !== t.id)} />
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
