import Link from "next/link";

export default function NotFound() {
  return (
    <main className="mx-auto max-w-xl px-6 py-16">
      <h1 className="font-serif text-2xl">Page not found</h1>
      <p className="mt-2 text-sm text-ink-soft">
        This address does not lead to anything in Foldwright. <Link href="/" className="text-verdigris underline">Go to your start page</Link>.
      </p>
    </main>
  );
}
