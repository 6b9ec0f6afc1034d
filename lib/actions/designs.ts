"use server";
import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { z } from "zod";
import { formAction } from "@/lib/server/action";
import { requireProjectAccess } from "@/lib/server/dal";
import { createDesign } from "@/lib/server/designs";
import { AppError } from "@/lib/server/errors";
import { idParam } from "@/lib/server/route";
import { presetById } from "@/lib/studio/presets";

const newDesignForm = z.object({
  name: z
    .string({ error: "Enter a design name." })
    .trim()
    .min(1, { error: "Enter a design name." })
    .max(160, { error: "A design name has at most 160 characters." }),
  preset: z.string({ error: "Choose a starting point." }).min(1, { error: "Choose a starting point." }),
});

const createDesignForm = formAction(
  newDesignForm,
  (raw) =>
    requireProjectAccess(idParam(typeof raw.projectId === "string" ? raw.projectId : undefined, "project"), "manage"),
  async (input, access) => {
    const preset = presetById(input.preset);
    if (!preset)
      throw new AppError("bad_request", "Choose one of the starting points.", {
        preset: ["Choose one of the starting points."],
      });
    const id = await createDesign(access.user, access.projectId, { name: input.name, spec: preset.spec });
    revalidatePath(`/projects/${access.projectId}`);
    redirect(`/projects/${access.projectId}/designs/${id}`);
  },
);
export async function createDesignAction(...args: Parameters<typeof createDesignForm>) {
  return createDesignForm(...args);
}
