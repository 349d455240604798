import Link from "next/link";

export default function NotFound() {
  return (
    <main className="mx-auto max-w-xl px-6 py-16">
      <p className="figure text-sm text-muted">404</p>
      <h1 className="mt-1 text-2xl">Nothing here</h1>
      <Link href="/" className="mt-6 inline-block text-accent underline">Go to the start page</Link>
    </main>
  );
}
