import type { ReactNode } from "react";

export function Panel({ title, children, actions }: { title: string; children: ReactNode; actions?: ReactNode }) {
  return (
    <section className="rounded-plate border border-paper-edge bg-paper/95 shadow-sheet">
      <header className="flex items-center justify-between border-b border-paper-edge px-4 py-2">
        <h2 className="text-sm font-semibold uppercase tracking-wider text-ink-soft">{title}</h2>
        {actions}
      </header>
      <div className="p-4">{children}</div>
    </section>
  );
}

export function Badge({ children, tone = "ink" }: { children: ReactNode; tone?: "ink" | "caution" | "pass" }) {
  const styles = {
    ink: "border-ink-line text-ink-soft",
    caution: "border-caution text-caution-ink",
    pass: "border-pass/50 text-pass",
  }[tone];
  return (
    <span className={`inline-block rounded-plate border px-1.5 py-0.5 font-mono text-xs ${styles}`}>{children}</span>
  );
}
