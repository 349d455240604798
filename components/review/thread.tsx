"use client";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useEffect, useId, useState } from "react";
import { addCommentRequest, fetchThread, markThreadReadRequest, type ThreadItemView } from "@/lib/client/api";
import { COMMENT_MAX_LENGTH } from "@/lib/domain";

interface ThreadProps {
  setupId: string;
  viewerId: string;
  /** The thread as the server rendered it, so it shows before any request. */
  initialItems: ThreadItemView[];
  title?: string;
}

const WHEN = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" });

function Item({ item, mine }: { item: ThreadItemView; mine: boolean }) {
  const decision = item.decision === "approved" ? "Approved" : item.decision === "changes_requested" ? "Sent back for changes" : null;
  return (
    <li
      className={`rounded border p-3 ${decision ? "border-ink/20 bg-paper" : "border-hairline bg-white"}`}
      data-testid={decision ? "thread-decision" : "thread-comment"}
    >
      <p className="text-xs text-muted">
        <span className="font-medium text-ink">{mine ? "You" : item.authorName}</span> ({item.authorRole}) ·{" "}
        <time dateTime={item.at}>{WHEN.format(new Date(item.at))} UTC</time>
        {item.setupVersion !== null && <> · on version {item.setupVersion}</>}
      </p>
      {decision && <p className="mt-1 font-medium">{decision}</p>}
      {item.body && <p className="mt-1 whitespace-pre-wrap text-sm">{item.body}</p>}
    </li>
  );
}

/** The conversation about one setup: comments and decisions in order, and a reply box. */
export function Thread({ setupId, viewerId, initialItems, title = "Discussion" }: ThreadProps) {
  const client = useQueryClient();
  const key = ["thread", setupId];
  const thread = useQuery({ queryKey: key, queryFn: () => fetchThread(setupId), initialData: { items: initialItems } });
  const [body, setBody] = useState("");
  const fieldId = useId();
  const add = useMutation({
    mutationFn: (text: string) => addCommentRequest(setupId, text),
    onSuccess: () => {
      setBody("");
      return client.invalidateQueries({ queryKey: key });
    },
  });
  const read = useMutation({ mutationFn: () => markThreadReadRequest(setupId) });
  const latestAt = thread.data.items.at(-1)?.at;
  const { mutate: markRead } = read;
  // Seen on screen means read: the unread marker in the Setups list clears.
  useEffect(() => {
    if (latestAt) markRead();
  }, [latestAt, markRead]);

  const tooLong = body.length > COMMENT_MAX_LENGTH;
  return (
    <section aria-labelledby={`${fieldId}-title`} className="panel space-y-3 p-4" data-testid="thread">
      <h2 id={`${fieldId}-title`} className="text-lg">
        {title}
      </h2>
      {thread.data.items.length === 0 ? (
        <p className="text-sm text-muted">No comments yet.</p>
      ) : (
        <ol className="space-y-2">
          {thread.data.items.map((item) => (
            <Item key={item.id} item={item} mine={item.authorId === viewerId} />
          ))}
        </ol>
      )}
      <form
        className="space-y-2"
        onSubmit={(e) => {
          e.preventDefault();
          if (body.trim() && !tooLong) add.mutate(body.trim());
        }}
      >
        <label htmlFor={fieldId} className="block text-sm text-muted">
          Add a comment
        </label>
        <textarea
          id={fieldId}
          value={body}
          onChange={(e) => setBody(e.target.value)}
          rows={3}
          className="w-full rounded border border-hairline bg-white px-2 py-1 text-sm"
          aria-describedby={`${fieldId}-hint`}
          aria-invalid={tooLong || undefined}
          data-testid="comment-input"
        />
        <p id={`${fieldId}-hint`} className={`text-xs ${tooLong ? "text-flag-stop" : "text-muted"}`}>
          {body.length} / {COMMENT_MAX_LENGTH} characters
        </p>
        <button
          type="submit"
          disabled={add.isPending || !body.trim() || tooLong}
          className="rounded bg-accent px-3 py-1.5 text-sm font-medium text-white disabled:opacity-60"
          data-testid="comment-send"
        >
          Send comment
        </button>
        {add.error && (
          <p role="alert" className="text-sm text-flag-stop">
            {add.error.message}
          </p>
        )}
      </form>
    </section>
  );
}
