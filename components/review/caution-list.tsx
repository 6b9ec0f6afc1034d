type Signal = "DANGER" | "WARNING" | "CAUTION" | "NOTICE";

// Signal words as ANSI Z535.4 uses them; the one safety orange marks DANGER, WARNING and CAUTION.
const TONE: Record<Signal, string> = {
  DANGER: "border-caution bg-caution text-white",
  WARNING: "border-caution bg-caution-soft text-caution",
  CAUTION: "border-caution text-caution",
  NOTICE: "border-ink-line text-ink-soft",
};

/** The cautions that apply to a design, each with its signal word, for people deciding about it. */
export function CautionList({ cautions }: { cautions: { signal: Signal; text: string }[] }) {
  return (
    <ul className="flex flex-col gap-2" aria-label="Cautions" data-testid="review-cautions">
      {cautions.map((c, i) => (
        <li key={i} className="flex gap-2 text-sm">
          <span className={`h-fit shrink-0 rounded-plate border px-1.5 py-0.5 font-mono text-[11px] font-semibold tracking-wider ${TONE[c.signal]}`}>{c.signal}</span>
          <span>{c.text}</span>
        </li>
      ))}
    </ul>
  );
}
