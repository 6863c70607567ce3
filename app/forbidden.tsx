import Link from "next/link";

export default function Forbidden() {
  return (
    <main className="mx-auto max-w-xl px-6 py-16">
      <h1 className="font-serif text-2xl">Not allowed</h1>
      <p className="mt-2 text-sm text-ink-soft">
        Your role, or your place on a restricted matter&apos;s team, does not give access to this page. If you need it for your work, ask an admin.{" "}
        <Link href="/" className="text-verdigris underline">
          Go to your start page
        </Link>
        .
      </p>
    </main>
  );
}
