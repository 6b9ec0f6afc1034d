// Canvas colours, the same values as the Tailwind theme (tailwind.config.ts): Konva draws on a
// <canvas>, which cannot read CSS classes.
export const INK = { base: "#1d3557", soft: "#3d5a80", faint: "#8da2bb", line: "#c4cfdc" } as const;
/** The single safety orange, for cautions only. */
export const CAUTION = "#e8590c";

const MONO_FALLBACK = "ui-monospace, monospace";

/**
 * The monospace family for canvas text. A canvas font string cannot hold var(--…), so read the
 * family next/font put on <html> (app/fonts.ts) once we are in the browser.
 */
export function monoFamily(): string {
  if (typeof document === "undefined") return MONO_FALLBACK;
  const family = getComputedStyle(document.documentElement).getPropertyValue("--font-plex-mono").trim();
  return family ? `${family}, ${MONO_FALLBACK}` : MONO_FALLBACK;
}
