import "server-only";
import { revalidatePath } from "next/cache";

/** The public pages that show a school's building work. */
export function revalidateSchoolProjects(schoolSlug: string): void {
  revalidatePath(`/schools/${schoolSlug}`);
  revalidatePath(`/schools/${schoolSlug}/building`);
}
