import type { ButtonHTMLAttributes } from "react";

type Variant = "primary" | "quiet" | "caution";

const STYLES: Record<Variant, string> = {
  primary: "bg-ink text-paper hover:bg-ink-soft border-ink",
  quiet: "bg-transparent text-ink hover:bg-paper-deep border-ink-line",
  caution: "bg-transparent text-caution-ink hover:bg-caution-soft border-caution",
};

export function Button({
  variant = "primary",
  className = "",
  ...props
}: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: Variant }) {
  return (
    <button
      className={`inline-flex items-center gap-2 rounded-plate border px-3 py-1.5 text-sm font-medium transition-colors disabled:cursor-not-allowed disabled:opacity-50 ${STYLES[variant]} ${className}`}
      {...props}
    />
  );
}
