export function formatWhen(iso: string): string {
  return new Date(iso).toLocaleString("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" }) + " UTC";
}

export const STATUS_LABEL: Record<string, string> = {
  design: "In design",
  review: "Client review",
  approved: "Approved",
  cutting: "Cutting",
  installing: "Installing",
  installed: "Installed",
  archived: "Archived",
};
