type Signal = "DANGER" | "WARNING" | "CAUTION" | "NOTICE";

// Signal words as ANSI Z535.4 uses them; the one safety orange marks DANGER, WARNING and CAUTION.
export const SIGNAL_TONE: Record<Signal, string> = {
  DANGER: "border-caution-ink bg-caution-ink text-white",
  WARNING: "border-caution bg-caution-soft text-caution-ink",
  CAUTION: "border-caution text-caution-ink",
  NOTICE: "border-ink-line text-ink-soft",
};

/** The cautions that apply to a design, each with its signal word, for people deciding about it. */
export function CautionList({
  cautions,
  disclaimer,
}: {
  cautions: { signal: Signal; text: string; detail?: string }[];
  disclaimer?: string;
}) {
  const list = (
    <ul className="flex flex-col gap-2" aria-label="Cautions" data-testid="review-cautions">
      {cautions.map((c, i) => (
        <li key={i} className="flex gap-2 text-sm">
          <span
            className={`h-fit shrink-0 rounded-plate border px-1.5 py-0.5 font-mono text-[11px] font-semibold tracking-wider ${SIGNAL_TONE[c.signal]}`}
          >
            {c.signal}
          </span>
          <span>
            {c.text}
            {c.detail ? <span className="mt-0.5 block text-xs text-ink-soft">{c.detail}</span> : null}
          </span>
        </li>
      ))}
    </ul>
  );
  if (!disclaimer) return list;
  return (
    <div className="flex flex-col gap-2">
      {list}
      <p className="text-xs text-ink-soft" data-testid="cautions-disclaimer">
        {disclaimer}
      </p>
    </div>
  );
}
