/* eslint-disable @next/next/no-html-link-for-pages -- this page ships no client router (see config below) */
import type { GetServerSideProps, PageConfig } from "next";
import { Logo } from "@/components/ui/logo";
import { SIGNED_IN_HEADER } from "@/lib/auth/signed-in-header";

// Words and links only: the page needs none of React's or Next's code in the browser, and leaving
// it out keeps the landing page inside its JavaScript budget (DEVELOPERS.md).
// Its links are plain anchors for the same reason: with no runtime there is no client router for
// next/link to hand them to.
export const config: PageConfig = { unstable_runtimeJS: false };

interface LandingPageProps {
  signedIn: boolean;
}

// The proxy has read the session (this router cannot import the server core) and says only
// whether there is one: the nav needs no more, and Next serves these props as JSON too.
export const getServerSideProps: GetServerSideProps<LandingPageProps> = async ({ req }) => ({
  props: { signedIn: req.headers[SIGNED_IN_HEADER] === "1" },
});

export default function LandingPage({ signedIn }: LandingPageProps) {
  return (
    <main className="mx-auto max-w-4xl px-6 py-12">
      <header className="flex items-center justify-between">
        <Logo />
        <nav className="flex gap-4 text-sm">
          {signedIn ? (
            <a href="/setups" className="rounded bg-accent px-3 py-1.5 text-white">
              Open your setups
            </a>
          ) : (
            <>
              <a href="/sign-in" className="px-3 py-1.5">
                Sign in
              </a>
              <a href="/sign-up" className="rounded bg-accent px-3 py-1.5 text-white">
                Create an account
              </a>
            </>
          )}
        </nav>
      </header>
      <section id="main" tabIndex={-1} className="mt-16 focus:outline-none">
        <h1 className="text-4xl">Know where the mount goes before the first flight.</h1>
        <p className="mt-4 max-w-2xl text-lg text-muted">
          Trimrail plans a payload under a helium kite-balloon: an antenna, a camera or a sensor package on the sliding mount of the belly
          rail. It works out gross and free lift at your site, the centre of mass against the centre of buoyancy, the trim in calm air and
          in wind, tether angle and tension, the attachment loads and the helium you need, and flags each as ok, caution or stop before the
          setup is saved.
        </p>
      </section>
      <section className="mt-12 grid gap-4 sm:grid-cols-3">
        <div className="panel p-4">
          <h2 className="text-lg">Customers</h2>
          <p className="mt-1 text-sm text-muted">Build a setup in the Planner, slide the mount to trim, and submit it for review.</p>
        </div>
        <div className="panel p-4">
          <h2 className="text-lg">Support</h2>
          <p className="mt-1 text-sm text-muted">Work the Review desk: read the balance report, comment, approve or send back.</p>
        </div>
        <div className="panel p-4">
          <h2 className="text-lg">The workshop</h2>
          <p className="mt-1 text-sm text-muted">
            Keep the catalogue of envelopes, units, mounts and payloads, and see what customers fly.
          </p>
        </div>
      </section>
      <aside className="mt-12 border-l-4 border-flag-caution bg-white p-4 text-sm" aria-label="Cautions">
        <p className="font-medium">Planning estimates, not permission to fly.</p>
        <p className="mt-1 text-muted">
          Helium cylinders are high-pressure vessels. Never fly near power lines, roads or airports, or in thunderstorms; conductive tethers
          and antennas carry extra danger. Moored balloons and kites fall under aviation rules (for example 14 CFR Part 101 in the US) and
          their local equivalents: follow them. A test flight with a safety line is still required.
        </p>
      </aside>
    </main>
  );
}
