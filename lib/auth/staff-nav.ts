import type { Role } from "@/db/types";

export interface StaffNavItem {
  href: string;
  label: string;
  roles: readonly Role[];
}

/** Who may open which staff page. Pages enforce the same lists with requireStaffPage. */
export const STAFF_PAGE_ROLES = {
  overview: ["communications", "facilities", "admin"],
  desk: ["communications", "admin"],
  // Reading a question: communications answer it, facilities check technical answers.
  question: ["communications", "facilities", "admin"],
  check: ["facilities", "admin"],
  snippets: ["communications", "admin"],
  rooms: ["facilities", "admin"],
  readings: ["facilities", "admin"],
  projects: ["facilities", "admin"],
  users: ["admin"],
  settings: ["admin"],
} as const satisfies Record<string, readonly Role[]>;

export const STAFF_NAV: StaffNavItem[] = [
  { href: "/staff", label: "Overview", roles: STAFF_PAGE_ROLES.overview },
  { href: "/staff/desk", label: "Questions", roles: STAFF_PAGE_ROLES.desk },
  { href: "/staff/check", label: "Facilities check", roles: STAFF_PAGE_ROLES.check },
  { href: "/staff/snippets", label: "Reply snippets", roles: STAFF_PAGE_ROLES.snippets },
  { href: "/staff/rooms", label: "Rooms", roles: STAFF_PAGE_ROLES.rooms },
  { href: "/staff/readings", label: "CO2 readings", roles: STAFF_PAGE_ROLES.readings },
  { href: "/staff/projects", label: "Building work", roles: STAFF_PAGE_ROLES.projects },
  { href: "/staff/users", label: "Staff accounts", roles: STAFF_PAGE_ROLES.users },
  { href: "/staff/settings", label: "Settings", roles: STAFF_PAGE_ROLES.settings },
];

export function staffNavFor(role: Role): StaffNavItem[] {
  return STAFF_NAV.filter((item) => item.roles.includes(role));
}
