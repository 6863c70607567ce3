/** The centred card of the signed-out pages (sign-in, invitation, password reset). */
export function AuthCard({ title, lead, children }: { title: string; lead: string; children: React.ReactNode }) {
  return (
    <main className="flex min-h-screen items-center justify-center px-4">
      <div className="w-full max-w-sm">
        <h1 className="mb-1 font-serif text-3xl">{title}</h1>
        <p className="mb-6 text-sm text-ink-soft">{lead}</p>
        <div className="rounded-md border border-paper-edge bg-white/70 p-6 shadow-sm">{children}</div>
      </div>
    </main>
  );
}
