import type { DB } from "@/db/connection";
import type { BuildingProject, ProjectStatus } from "@/db/types";

export const PROJECT_STATUS_LABELS: Record<ProjectStatus, string> = {
  planned: "Planned",
  under_way: "Under way",
  finished: "Finished",
};

export async function listProjects(db: DB, schoolSlug: string): Promise<BuildingProject[]> {
  return db
    .selectFrom("building_projects")
    .innerJoin("schools", "schools.id", "building_projects.school_id")
    .selectAll("building_projects")
    .where("schools.slug", "=", schoolSlug)
    .orderBy("building_projects.sort_order")
    .execute();
}

export async function getProject(db: DB, id: number): Promise<(BuildingProject & { schoolSlug: string }) | null> {
  const row = await db
    .selectFrom("building_projects")
    .innerJoin("schools", "schools.id", "building_projects.school_id")
    .selectAll("building_projects")
    .select("schools.slug as schoolSlug")
    .where("building_projects.id", "=", id)
    .executeTakeFirst();
  return row ?? null;
}

export async function updateProjectStatus(
  db: DB,
  id: number,
  change: { status: ProjectStatus; statusDate: string },
  actorId: number,
): Promise<BuildingProject | null> {
  const row = await db
    .updateTable("building_projects")
    .set({ status: change.status, status_date: change.statusDate, updated_at: new Date().toISOString(), updated_by: actorId })
    .where("id", "=", id)
    .returningAll()
    .executeTakeFirst();
  return row ?? null;
}
