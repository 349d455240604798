import { NotFoundMessage } from "@/components/shell/not-found-message";

export const metadata = { title: "Page not found" };

// A URL that matches no route: only the root layout is around this page, so it brings its own main.
export default function NotFound() {
  return (
    <main id="main" tabIndex={-1} className="mx-auto max-w-xl px-6 py-16 focus:outline-none">
      <NotFoundMessage />
    </main>
  );
}
