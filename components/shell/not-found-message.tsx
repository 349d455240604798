import Link from "next/link";

/** The 404's words; app/not-found.tsx gives it a main landmark, the signed-in shell already has one. */
export function NotFoundMessage() {
  return (
    <>
      {/* React puts this in the head: the requested page's own title would otherwise stay. */}
      <title>Page not found · Trimrail</title>
      <p className="figure text-sm text-muted">404</p>
      <h1 className="mt-1 text-2xl">Nothing here</h1>
      <Link href="/" className="mt-6 inline-block text-accent underline">
        Go to the start page
      </Link>
    </>
  );
}
