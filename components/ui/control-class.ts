// The one look of a text box or select, shared by the controlled inputs and the server-action fields.
export const controlClass =
  "w-full rounded-plate border border-ink-line bg-white/70 px-2 py-1 text-sm text-ink placeholder:text-ink-faint aria-[invalid=true]:border-caution disabled:bg-paper-deep";
