export function NotAllowed({ area }: { area: string }) {
  return (
    <section className="max-w-xl">
      <h1 className="font-serif text-2xl">Not allowed</h1>
      <p className="mt-2 text-sm text-ink-soft">
        Your role does not give access to {area}. If you need it for your work, ask an admin to change your role.
      </p>
    </section>
  );
}
