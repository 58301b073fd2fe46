import { ProjectStatusForm } from "@/components/staff/project-status-form";
import { db } from "@/db/client";
import { requireStaffPage } from "@/lib/auth/guard";
import { STAFF_PAGE_ROLES } from "@/lib/auth/staff-nav";
import { listProjects } from "@/lib/projects/repository";
import { listSchools } from "@/lib/schools/repository";

export const metadata = { title: "Building work" };

export default async function ProjectsPage() {
  await requireStaffPage(STAFF_PAGE_ROLES.projects, "/staff/projects");
  const schools = await listSchools(db());
  const bySchool = await Promise.all(schools.map(async (s) => ({ school: s, projects: await listProjects(db(), s.slug) })));
  return (
    <>
      <h1 className="text-2xl">Building work</h1>
      <p className="mt-2 max-w-prose text-ink-soft">
        The status and date of each project, as families see them on each school&apos;s Building work page. A saved change
        shows on the public page straight away.
      </p>
      {bySchool.map(({ school, projects }) => (
        <section key={school.slug} aria-labelledby={`projects-${school.slug}`} className="mt-6">
          <h2 id={`projects-${school.slug}`} className="text-xl">
            {school.name}
          </h2>
          <ul className="mt-2 divide-y divide-paper-line rounded-plate border-2 border-paper-line bg-white">
            {projects.map((p) => (
              <li key={p.id} className="p-4">
                <p className="font-bold">{p.title}</p>
                <p className="mb-2 text-sm text-ink-soft">{p.summary}</p>
                <ProjectStatusForm id={p.id} title={p.title} status={p.status} statusDate={p.status_date} />
              </li>
            ))}
          </ul>
        </section>
      ))}
    </>
  );
}
