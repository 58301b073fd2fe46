import { describe, expect, it } from "vitest";
import { safeCallbackUrl } from "@/lib/auth/callback-url";

describe("safeCallbackUrl", () => {
  it("keeps a path on this site", () => {
    expect(safeCallbackUrl("/staff/desk?x=1")).toBe("/staff/desk?x=1");
  });
  it.each(["https://elsewhere.example.net/", "//elsewhere.example.net", "/\\elsewhere.example.net", "javascript:alert(1)", undefined, 42])(
    "sends %s back to the staff overview",
    (value) => {
      expect(safeCallbackUrl(value)).toBe("/staff");
    },
  );
});
