import { NotFoundMessage } from "@/components/shell/not-found-message";

// notFound() in a signed-in page: this renders inside the shell's <main>, so it adds no landmark.
export default function AppNotFound() {
  return (
    <div className="mx-auto max-w-xl px-6 py-16">
      <NotFoundMessage />
    </div>
  );
}
