import type { HistoryEntry } from "@/db/queries/audit";
import { STATUS_WORDS, type SetupStatus } from "@/lib/domain";

const WHEN = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" });
const ACTIONS: Record<string, string> = {
  "setup.create": "created it",
  "setup.save": "saved it",
  "setup.submit": "submitted it for review",
  "setup.decision": "decided",
  "setup.delete": "deleted it",
  "setup.attachment.add": "attached a file",
  "setup.attachment.delete": "removed a file",
};

const statusWord = (value: unknown) => (typeof value === "string" && value in STATUS_WORDS ? STATUS_WORDS[value as SetupStatus] : null);

/** Who did what to a setup and when, with each status change and its reason. */
export function HistoryList({ entries }: { entries: HistoryEntry[] }) {
  return (
    <section className="panel p-4" aria-labelledby="history-title" data-testid="history">
      <h2 id="history-title" className="text-lg">
        History
      </h2>
      {entries.length === 0 ? (
        <p className="mt-2 text-sm text-muted">Nothing recorded yet.</p>
      ) : (
        <ol className="mt-2 space-y-1 text-sm">
          {entries.map((e, i) => {
            const from = statusWord(e.detail.from);
            const to = statusWord(e.detail.to);
            const version = typeof e.detail.version === "number" ? e.detail.version : null;
            return (
              <li key={i} data-testid="history-entry">
                <time className="figure text-muted" dateTime={e.at.toISOString()}>
                  {WHEN.format(e.at)}
                </time>{" "}
                · {e.actorName ?? "a removed account"} {ACTIONS[e.action] ?? e.action}
                {version !== null && <> (version {version})</>}
                {from && to && from !== to && (
                  <>
                    : {from} → {to}
                  </>
                )}
                {typeof e.detail.fileName === "string" && <>: {e.detail.fileName}</>}
                {typeof e.detail.reason === "string" && e.detail.reason && (
                  <span className="block pl-4 text-muted">“{e.detail.reason}”</span>
                )}
              </li>
            );
          })}
        </ol>
      )}
    </section>
  );
}
