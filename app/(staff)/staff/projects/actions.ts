"use server";

import { db } from "@/db/client";
import { AuthorizationError, requireRole } from "@/lib/auth/guard";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { revalidateSchoolProjects } from "@/lib/projects/publish";
import { getProject, updateProjectStatus } from "@/lib/projects/repository";
import { projectStatusSchema } from "@/lib/validation/building-project";
import { staffIdSchema } from "@/lib/validation/staff-account";

export interface ProjectActionResult {
  ok: boolean;
  message: string;
}

export async function updateProjectAction(_previous: ProjectActionResult | null, form: FormData): Promise<ProjectActionResult> {
  try {
    const actor = await requireRole(STAFF_PAGE_ROLES.projects);
    const id = staffIdSchema.safeParse(form.get("id"));
    const project = id.success ? await getProject(db(), id.data) : null;
    if (!project) return { ok: false, message: "That project no longer exists." };
    const parsed = projectStatusSchema.safeParse({ status: form.get("status"), statusDate: form.get("statusDate") });
    if (!parsed.success) return { ok: false, message: parsed.error.issues[0]?.message ?? "Check the status and date." };
    await updateProjectStatus(db(), project.id, parsed.data, actor.id);
    revalidateSchoolProjects(project.schoolSlug);
    return { ok: true, message: `${project.title}: saved. The public page shows it now.` };
  } catch (error) {
    if (error instanceof AuthorizationError) return { ok: false, message: error.message };
    throw error;
  }
}
