/** No model yet: what makes the first one. */
export function NoModelYet({ minExamples, canManage }: { minExamples: number; canManage: boolean }) {
  return (
    <section className="rounded border border-dashed border-paper-edge bg-white/50 px-4 py-4 text-sm" data-testid="models-empty">
      <h2 className="font-serif text-lg">No model yet</h2>
      <p className="mt-1 text-ink-soft">
        Until there is one, Foldwright ranks cabinet types by their descriptions and keywords, and the screens say so.
      </p>
      <ol className="mt-2 list-decimal space-y-1 pl-5">
        <li>File documents in To review: accept, refile or file by hand. Only filings a person made or confirmed teach the model.</li>
        <li>
          The first model trains (in the nightly run) once at least two cabinet types have {minExamples} or more filed examples each.
        </li>
        <li>{canManage ? "Or press Retrain now to try straight away: if there are too few filed examples, the version fails and says what is missing." : "An admin can also start a training run at any time."}</li>
      </ol>
    </section>
  );
}
