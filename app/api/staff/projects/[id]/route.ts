import { NextResponse } from "next/server";
import { db } from "@/db/client";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { jsonError, validationError } from "@/lib/http/errors";
import { readJson, staffRoute } from "@/lib/http/staff-route";
import { revalidateSchoolProjects } from "@/lib/projects/publish";
import { getProject, updateProjectStatus } from "@/lib/projects/repository";
import { staffIdSchema } from "@/lib/validation/staff-account";
import { projectStatusSchema } from "@/lib/validation/building-project";

export const dynamic = "force-dynamic";

type Context = { params: Promise<{ id: string }> };

export const PATCH = staffRoute<Context>(STAFF_PAGE_ROLES.projects, async (request, { params }, actor) => {
  const id = staffIdSchema.safeParse((await params).id);
  const project = id.success ? await getProject(db(), id.data) : null;
  if (!project) return jsonError(404, "No building project has this id.");
  const read = await readJson(request);
  if (!read.ok) return read.response;
  const parsed = projectStatusSchema.safeParse(read.body);
  if (!parsed.success) return validationError(parsed.error);
  const updated = await updateProjectStatus(db(), project.id, parsed.data, actor.id);
  revalidateSchoolProjects(project.schoolSlug);
  return NextResponse.json({ project: updated });
});
