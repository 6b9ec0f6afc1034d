"use client";
// The mock-up and the comment thread together: pins on the drawing are the thread's pinned
// comments, a pin picked on the drawing goes with the next comment, and choosing a pin in either
// place brings the roll to it.
import { useState } from "react";
import type { RunChoice } from "@/lib/review/run-scene";
import { CommentThread, pinNumbers, type ThreadComment } from "./comment-thread";
import { MockUp } from "./mock-up";

interface Props {
  reviewId: number;
  spec: unknown;
  run: RunChoice | null;
  pair: boolean;
  comments: ThreadComment[];
}

export function ReviewWorkspace({ reviewId, spec, run, pair, comments }: Props) {
  const [picking, setPicking] = useState(false);
  const [pinAt, setPinAt] = useState<number | null>(null);
  const [selected, setSelected] = useState<number | null>(null);
  const pins = pinNumbers(comments);
  const markers = comments.filter((c) => c.at !== null).map((c) => ({ id: c.id, n: pins.get(c.id)!, at: c.at! }));
  const focusAt = selected !== null ? (comments.find((c) => c.id === selected)?.at ?? null) : null;
  return (
    <div className="flex flex-col gap-4">
      {/* The mock-up takes the screen's width, as the studio's canvas does; the thread keeps the page's. */}
      <div className="relative left-1/2 w-[min(96rem,calc(100vw-2rem))] -translate-x-1/2">
        <MockUp
          spec={spec}
          run={run}
          markers={markers}
          selected={selected}
          onSelectMarker={(id) => setSelected((s) => (s === id ? null : id))}
          picking={picking}
          onPickPlace={(at) => {
            setPinAt(at);
            setPicking(false);
          }}
          focusAt={focusAt}
        />
      </div>
      <section aria-labelledby="thread-heading" className="flex flex-col gap-2">
        <h2 id="thread-heading" className="text-sm font-semibold uppercase tracking-wider text-ink-soft">
          Comments
        </h2>
        <CommentThread
          reviewId={reviewId}
          comments={comments}
          pair={pair}
          pinAt={pinAt}
          picking={picking}
          onPickToggle={() => setPicking((p) => !p)}
          onClearPin={() => setPinAt(null)}
          selectedId={selected}
          onSelect={setSelected}
        />
      </section>
    </div>
  );
}
