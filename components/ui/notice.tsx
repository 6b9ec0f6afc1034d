import type { ReactNode } from "react";

/** A message line after a form or above a page: plain for news, safety orange for problems. */
export function Notice({
  tone = "info",
  children,
  testId,
}: {
  tone?: "info" | "problem" | "done";
  children: ReactNode;
  testId?: string;
}) {
  const styles = {
    info: "border-ink-line bg-white/60 text-ink",
    problem: "border-caution bg-caution-soft text-caution-ink",
    done: "border-pass/40 bg-white/60 text-pass",
  }[tone];
  return (
    <p
      role={tone === "problem" ? "alert" : "status"}
      data-testid={testId}
      className={`rounded-plate border px-3 py-2 text-sm ${styles}`}
    >
      {children}
    </p>
  );
}

export function FormMessage({ state }: { state: { ok?: boolean; message?: string } }) {
  if (!state.message) return null;
  return (
    <Notice tone={state.ok ? "done" : "problem"} testId="form-message">
      {state.message}
    </Notice>
  );
}
