import "server-only";
import { revalidatePath } from "next/cache";

// The pages that show the Settings page's values, so a change shows at once. Every
// staff page is re-rendered too: the desk counts school days from the same values.

function revalidateStaffPages(): void {
  revalidatePath("/staff", "layout");
}

/** The reply target is promised on the ask pages and in the "ask about this" box of every MDX page. */
export function revalidateReplyTarget(): void {
  revalidateStaffPages();
  revalidatePath("/ask");
  revalidatePath("/ask/sent");
  revalidatePath("/district/[page]", "page");
  revalidatePath("/schools/[school]", "page");
  revalidatePath("/schools/[school]/[topic]", "page");
}

/** Holidays and the time zone decide school days: due dates on the desk and the daily CO2 figures. */
export function revalidateSchoolCalendar(schoolSlugs: readonly string[]): void {
  revalidateStaffPages();
  for (const slug of schoolSlugs) {
    revalidatePath(`/schools/${slug}`);
    revalidatePath(`/schools/${slug}/air`);
  }
}

/** The synonym list changes what the answers search finds. */
export function revalidateSearchSynonyms(): void {
  revalidateStaffPages();
  revalidatePath("/answers");
}
