import type { CurrentModelReport } from "@/lib/data/screens-models";
import { formatPercent } from "@/components/document/format";

const TH = "sticky top-0 border-b border-paper-edge bg-paper-deep px-2 py-1.5 text-left text-xs font-medium text-ink-soft";
const TD = "px-2 py-1 font-mono text-xs tabular-nums";

/** F1 as a number with a thin bar, so weak cabinet types stand out without relying on colour. */
function F1Cell({ value }: { value: number }) {
  return (
    <span className="inline-flex items-center gap-2">
      <span className="w-10 text-right">{value.toFixed(3)}</span>
      <span aria-hidden="true" className="h-1 w-16 rounded-full bg-paper-deep">
        <span className="block h-1 rounded-full bg-verdigris" style={{ width: `${Math.max(0, Math.min(1, value)) * 100}%` }} />
      </span>
    </span>
  );
}

/** Cross-validated precision, recall and F1 per cabinet type for the current version. */
export function ClassMetrics({ report }: { report: CurrentModelReport }) {
  if (report.perClass.length === 0) return null;
  const rows = [...report.perClass].sort((a, b) => a.f1 - b.f1 || a.name.localeCompare(b.name));
  return (
    <section aria-labelledby="classes-heading">
      <div className="mb-2 flex flex-wrap items-baseline gap-x-3">
        <h2 id="classes-heading" className="font-serif text-lg">By cabinet type</h2>
        <p className="text-xs text-ink-soft">
          Version <span className="font-mono">#{report.versionId}</span>
          {report.method === "k-fold" && report.folds ? `, ${report.folds}-fold cross-validation` : report.method === "split" ? ", held-out split" : ""}
          {report.top3Accuracy !== null && ` · right type among the top three: ${formatPercent(report.top3Accuracy, 1)}`}
          {report.weightedF1 !== null && ` · weighted F1 ${report.weightedF1.toFixed(3)}`} · weakest first
        </p>
      </div>
      <div className="max-h-[50vh] overflow-auto rounded border border-paper-edge bg-white/70">
        <table className="w-full border-collapse text-sm" data-testid="class-metrics">
          <thead>
            <tr>
              <th scope="col" className={TH}>Cabinet type</th>
              <th scope="col" className={TH}>F1</th>
              <th scope="col" className={TH}>Precision</th>
              <th scope="col" className={TH}>Recall</th>
              <th scope="col" className={TH}>Documents</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((c) => (
              <tr key={c.name} className="border-t border-paper-edge/70">
                <td className="px-2 py-1">{c.name}</td>
                <td className={TD}><F1Cell value={c.f1} /></td>
                <td className={TD}>{formatPercent(c.precision, 1)}</td>
                <td className={TD}>{formatPercent(c.recall, 1)}</td>
                <td className={TD}>{c.support}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="mt-1 text-xs text-ink-faint">Precision: of the documents the model put in this type, the share that belonged there. Recall: of the documents that belong there, the share it found.</p>
    </section>
  );
}
