/** Grey bars in the shape of a Setup page while its data loads. */
export function SetupSkeleton({ title, rows = 8 }: { title: string; rows?: number }) {
  return (
    <section className="space-y-4" aria-busy="true" aria-label={`${title}: loading`}>
      <div className="space-y-2">
        <p className="text-xs text-ink-faint">Setup › {title}</p>
        <h1 className="font-serif text-2xl">{title}</h1>
        <div className="h-4 w-2/3 animate-pulse rounded bg-paper-deep" />
      </div>
      <div className="h-9 w-1/2 animate-pulse rounded bg-paper-deep" />
      <div className="space-y-1 rounded border border-paper-edge bg-white/60 p-2">
        {Array.from({ length: rows }, (_, i) => (
          <div key={i} className="h-6 animate-pulse rounded bg-paper-deep/70" />
        ))}
      </div>
    </section>
  );
}
