import type { Role } from "@/db/types";

export const ROLE_LABELS: Record<Role, string> = {
  communications: "Communications",
  facilities: "Facilities",
  admin: "Administrator",
};

export const ROLE_DESCRIPTIONS: Record<Role, string> = {
  communications: "Sorts and answers families' questions, sends replies, publishes answers.",
  facilities: "Checks technical answers, keeps room and equipment data, uploads air readings.",
  admin: "Manages staff accounts, schools and district settings.",
};

export function hasRole(role: Role, allowed: readonly Role[]): boolean {
  return allowed.includes(role);
}
