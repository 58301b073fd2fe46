// Stands in for @/lib/auth/guard in integration tests that call route handlers directly:
// every request is from the demo facilities account. Who may call a route is tested in the
// browser (tests/e2e/staff-api-guard.spec.ts); use it as
// `vi.mock("@/lib/auth/guard", () => import("../support/guard-as-facilities"))`.
export class AuthorizationError extends Error {
  constructor(
    readonly status: 401 | 403,
    message: string,
  ) {
    super(message);
  }
}

export async function requireRole() {
  return { id: 2, email: "facilities@example.org", name: "Facilities", role: "facilities" as const };
}
