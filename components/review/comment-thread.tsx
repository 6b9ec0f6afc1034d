"use client";
// The thread on a review, oldest first. A comment may be pinned to a place along the run (or a pair's
// turn); pins are numbered in the thread and on the drawing alike.
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { failureOf, postJson } from "@/components/api/request-json";
import { formatWhen } from "@/components/format";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";

export interface ThreadComment {
  id: number;
  text: string;
  at: number | null;
  author: string;
  authorRole: string | null;
  createdAt: string;
}

/** "2.35 m along the run" or "90° into the driver's turn". */
export function placeText(at: number, pair: boolean): string {
  if (pair) return `${at.toFixed(0)}° into the driver's turn`;
  return at >= 1000 ? `${(at / 1000).toFixed(2)} m along the run` : `${at.toFixed(0)} mm along the run`;
}

/** Pin numbers in thread order: the nth pinned comment is pin n. */
export function pinNumbers(comments: ThreadComment[]): Map<number, number> {
  const out = new Map<number, number>();
  for (const c of comments) if (c.at !== null) out.set(c.id, out.size + 1);
  return out;
}

interface Props {
  reviewId: number;
  comments: ThreadComment[];
  pair: boolean;
  /** A place chosen on the drawing for the next comment, or null. */
  pinAt: number | null;
  picking: boolean;
  onPickToggle: () => void;
  onClearPin: () => void;
  selectedId: number | null;
  onSelect: (id: number | null) => void;
}

export function CommentThread({
  reviewId,
  comments,
  pair,
  pinAt,
  picking,
  onPickToggle,
  onClearPin,
  selectedId,
  onSelect,
}: Props) {
  const router = useRouter();
  const [text, setText] = useState("");
  const post = useMutation({
    mutationFn: (body: { text: string; at?: number }) =>
      postJson<{ comment: ThreadComment }>(`/api/reviews/${reviewId}/comments`, body),
    onSuccess: () => {
      setText("");
      onClearPin();
      router.refresh();
    },
  });
  const failure = failureOf(post.error);
  const pins = pinNumbers(comments);

  function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    post.mutate({ text, ...(pinAt !== null ? { at: pinAt } : {}) });
  }

  return (
    <div className="flex flex-col gap-3" data-testid="comment-thread">
      {comments.length === 0 ? <p className="text-sm text-ink-soft">No comments yet.</p> : null}
      <ol className="flex flex-col gap-2">
        {comments.map((c) => {
          const pin = pins.get(c.id);
          return (
            <li
              key={c.id}
              data-testid={`comment-${c.id}`}
              className={`rounded-plate border px-3 py-2 text-sm ${selectedId === c.id ? "border-ink bg-white/80" : "border-ink-line bg-white/50"}`}
            >
              <div className="flex flex-wrap items-baseline gap-x-2 text-xs text-ink-soft">
                <span className="font-semibold text-ink">{c.author}</span>
                {c.authorRole ? <span>({c.authorRole})</span> : null}
                <span className="font-mono">{formatWhen(c.createdAt)}</span>
                {pin !== undefined && c.at !== null ? (
                  <button
                    type="button"
                    className="font-mono underline"
                    onClick={() => onSelect(selectedId === c.id ? null : c.id)}
                    aria-pressed={selectedId === c.id}
                    data-testid={`pin-link-${pin}`}
                  >
                    pin {pin}: {placeText(c.at, pair)}
                  </button>
                ) : null}
              </div>
              <p className="mt-1 whitespace-pre-wrap">{c.text}</p>
            </li>
          );
        })}
      </ol>
      <form onSubmit={submit} className="flex flex-col gap-2" aria-label="Add a comment">
        <label htmlFor="field-comment" className="text-sm font-medium">
          Add a comment
        </label>
        <textarea
          id="field-comment"
          value={text}
          onChange={(e) => setText(e.target.value)}
          rows={3}
          maxLength={4000}
          required
          aria-describedby="field-comment-error"
          className="w-full rounded-plate border border-ink-line bg-white/70 px-2.5 py-1.5 text-sm"
        />
        <div id="field-comment-error" aria-live="polite">
          {(failure?.fields?.text ?? []).concat(failure?.fields?.at ?? []).map((m) => (
            <p key={m} className="text-xs font-medium text-caution-ink">
              {m}
            </p>
          ))}
        </div>
        <div className="flex flex-wrap items-center gap-2 text-sm">
          <Button type="button" variant="quiet" onClick={onPickToggle} aria-pressed={picking} data-testid="pin-toggle">
            {picking ? "Choose the place on the drawing…" : pinAt !== null ? "Move the pin" : "Pin to a place"}
          </Button>
          {pinAt !== null ? (
            <span className="font-mono text-xs" data-testid="pin-at">
              pinned {placeText(pinAt, pair)}{" "}
              <button type="button" className="font-sans underline" onClick={onClearPin}>
                remove
              </button>
            </span>
          ) : null}
          <Button type="submit" disabled={post.isPending || text.trim() === ""}>
            {post.isPending ? "Posting…" : "Post comment"}
          </Button>
        </div>
        {failure ? <Notice tone="problem">{failure.message}</Notice> : null}
      </form>
    </div>
  );
}
