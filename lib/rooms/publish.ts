import "server-only";
import { revalidatePath } from "next/cache";

/** The public pages that show a school's room figures and CO2 readings. */
export function revalidateSchoolAir(schoolSlug: string): void {
  revalidatePath(`/schools/${schoolSlug}/air`);
  revalidatePath(`/schools/${schoolSlug}`);
}
