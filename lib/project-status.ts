// The project's stages in plain words, the same on every page, in e-mails and in the build log.
import type { ProjectStatus } from "@/db/schema";

export const STATUS_LABEL: Record<ProjectStatus, string> = {
  design: "In design",
  review: "Client review",
  approved: "Approved",
  cutting: "Cutting",
  installing: "Installing",
  installed: "Installed",
  archived: "Archived",
};
