// What every page's document shares, whichever of Next's routers serves it (app/layout.tsx for the
// App Router, pages/_app.tsx and pages/_document.tsx for the landing page): one source, so the two
// cannot drift apart.

export const SITE_NAME = "Trimrail";
export const SITE_DESCRIPTION = "Plan, balance and review payloads under helium kite-balloons.";
export const BODY_CLASS_NAME = "min-h-screen bg-paper font-sans text-ink antialiased";

/** The first link on every page. Every page marks where its own content starts with id="main" (past the header and navigation). */
export function SkipLink() {
  return (
    <a
      href="#main"
      className="sr-only rounded bg-ink px-3 py-2 text-white focus:not-sr-only focus:absolute focus:top-2 focus:left-2 focus:z-50"
    >
      Skip to main content
    </a>
  );
}
