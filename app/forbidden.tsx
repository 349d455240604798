import Link from "next/link";

export default function Forbidden() {
  return (
    // Pages call forbidden() inside the signed-in shell, whose <main> this sits in.
    <div className="mx-auto max-w-xl px-6 py-16" data-testid="forbidden">
      {/* React puts this in the head: the requested page's own title would otherwise stay. */}
      <title>Not open to your role · Trimrail</title>
      <p className="figure text-sm text-muted">403</p>
      <h1 className="mt-1 text-2xl">This page is not open to your role</h1>
      <p className="mt-2 text-muted">Ask the workshop if you think your account should have access.</p>
      <Link href="/setups" className="mt-6 inline-block text-accent underline">
        Back to your setups
      </Link>
    </div>
  );
}
