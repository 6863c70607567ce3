/** An area whose screens are not built yet says so plainly instead of pretending. */
export function NotBuiltYet({ title, blurb }: { title: string; blurb: string }) {
  return (
    <section className="max-w-2xl">
      <h1 className="font-serif text-2xl">{title}</h1>
      <p className="mt-1 text-sm text-ink-soft">{blurb}</p>
      <p className="mt-6 rounded border border-dashed border-paper-edge bg-white/50 px-4 py-3 text-sm">
        This area is not built yet. It will appear here in a coming release; nothing is lost meanwhile.
      </p>
    </section>
  );
}
